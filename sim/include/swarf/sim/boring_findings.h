#pragma once
// Findings of a boring bar in its hole, made by the inside kernel (inside_kernel.h) from the
// moves and the bore as it stands before and after each pass. Results, not errors:
//
//   bar_too_big       the hole the head passes through, from the mouth to the tip, is smaller
//                     than the bar's min_bore: as it stands before a move's start, as the pass
//                     leaves it at the move's end (the head enters a bore as its insert opens
//                     it, so a pass boring less than min_bore is one too)
//   bar_rubs_bore     the shank behind the insert reaches the bore wall at a move's start (the
//                     bore before the pass) or end (after it); the message gives how far in,
//                     and the clearance the bar has where it is tightest
//   past_bore_bottom  the insert reaches past the bottom of a blind hole, into solid metal
//   long_overhang     the overhang is more than kSteelBarOverhangDiameters bar diameters:
//                     about what a steel bar takes before it chatters (common practice)
//
// The insert's own heel (its flank under the cutting edge in a small bore) is taken as the
// maker's min_bore covers it: the head's size is in that figure (scenes/README.md).
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/tool_outline.h"

#include <vector>

namespace swarf {

/// The boring findings of a plan cut with a boring bar. `boreStock` is the hole before the first
/// pass and `boreAfterPass` the as-cut bore after each pass (one per pass of the plan), on the
/// same samples; `moves` the cutting moves (imaginary tip, mm). Precondition: tool.kind ==
/// BoringBar. One finding of a kind per pass; long_overhang once, with no pass (−1).
std::vector<Finding> boringFindings(const Scene& scene, const ToolOutline& outline,
                                    const std::vector<ToolMove>& moves, const Profile& boreStock,
                                    const std::vector<Profile>& boreAfterPass);

/// Metal left on and overcut of the features on one side, as findCutFindings does outside:
/// left_on from the crests' deviation (the pass whose move left that sample last), overcut from
/// the valleys (the first pass after which the sample went below the band). `profile`,
/// `nominal`, the deviations and `mask` per sample; `finalMove` per sample (−1: the stock);
/// `afterPass` the side's profile after each pass.
std::vector<Finding>
sideToleranceFindings(const Scene& scene, Side side, const Profile& profile, const Profile& nominal,
                      const std::vector<double>& deviationMm,
                      const std::vector<double>& crestDeviationMm, const std::vector<bool>& mask,
                      const std::vector<FeatureReport>& reports, const std::vector<int>& finalMove,
                      const std::vector<ToolMove>& moves, const std::vector<Profile>& afterPass);

} // namespace swarf
