#pragma once
// The moves between passes (machine.h: betweenPassMoves) are moves that should cut nothing: the
// cross-slide backed out, the compound and saddle wound back past their next readings and
// brought up to them, the cross-slide fed in. Each is checked against the metal as it stands at
// that moment (the profile after the pass before it); one that would cut is a finding of kind
// cut_between_passes, naming the pass and the move. They are checked, not cut: the as-cut part
// is what the passes leave.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <string>
#include <vector>

namespace swarf {

/// The move in words, for people: "backing the cross-slide out", "winding the compound back
/// past its next reading", ...
std::string betweenMoveWords(const BetweenMove& move);

/// How deep a move would cut into the metal, radially, and where.
struct MetalInTheWay {
    /// Largest radius the move would take off, mm; negative: the closest it stays clear of the
    /// metal (−1e9 if there is no metal within its reach).
    double depthMm = 0;
    double zMm = 0; ///< where along the axis
};

/// The metal a tool move would cut from `metal` (a profile on the sweep's grid; no metal before
/// the stock's free end, the bar beyond the grid's far end). Samples at the grid's spacing.
MetalInTheWay metalInTheWay(const Scene& scene, const ToolOutline& outline, const ToolMove& move,
                            const Profile& metal);

/// The metal as it stands before a between-move: the profile after the pass before it, or the
/// stock before the first. `sweep` must hold per-pass profiles.
const Profile& metalBefore(const BetweenMove& move, const ExactSweep& sweep);

/// "back_out", "wind_back", "bring_up", "dial", "feed_in": a step as result.json spells it.
const char* returnStepKey(ReturnStep step);

/// "cross", "compound", "saddle": a slide as result.json spells it.
const char* slideKey(SlideName slide);

/// Checks each move between passes against the metal, setting its cutsMm; one finding for
/// each pass whose moves would cut more than kAirCutMm (findings.h), the deepest, tied to the
/// pass the move leads to (the pass it follows, for the last back-out).
std::vector<Finding> findCutsBetweenPasses(const Scene& scene, const ToolOutline& outline,
                                           std::vector<BetweenMove>& moves,
                                           const ExactSweep& sweep);

} // namespace swarf
