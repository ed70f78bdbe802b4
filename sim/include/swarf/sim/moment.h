#pragma once
// One moment of the plan: the part as it stands at a point of the pass plan, its deviation from
// the drawing, where the tool is and what the dials read. The window, the snapshots and the
// tests all go through describeMoment(), so what is drawn can be checked without pixels.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <Eigen/Core>
#include <string>
#include <vector>

namespace swarf {

/// The cut at one position of the pass slider.
///
/// The slider runs from 0 (the bar before the first pass) to N = number of passes. The whole
/// number k (1..N) is the moment pass k (1-based) has just ended; k + f (0 < f < 1) is the
/// fraction f of the way through pass k + 1, measured along the tool's path in that pass.
struct MomentView {
    double position = 0;     ///< the slider position this describes, clamped to [0, N]
    int passCount = 0;       ///< N
    int pass = -1;           ///< 0-based pass under way or just ended; −1 before the first
    double passFraction = 0; ///< how far through `pass`, 0..1
    std::string passKind;    ///< "compound", "saddle", "cross-slide" or "path"; "" before
    std::string passNote;    ///< what the person does in this pass (Pass::note)
    double feedMmPerRev = 0; ///< feed of the pass, mm/rev (0 before the first pass)
    Profile profile;         ///< the as-cut profile at this moment (exact, axisymmetric)
    /// Signed deviation from the drawing per profile sample, mm, normal to the drawn surface:
    /// + metal left on, − overcut; NaN where the drawing says nothing. At the finished part the
    /// feed marks' crests count where they stand out further than the valleys sink in
    /// (compare.h, markedDeviation): what the colours show.
    std::vector<double> deviationMm;
    bool finished = false; ///< true at position N: the part as the plan leaves it
    /// Inside work (CutResult::bored): the bore at this moment (exact; 0 where the bar is solid)
    /// and its signed deviation from the drawn bore per sample, mm (+ metal left on within the
    /// drawn bore, − overcut into the wall; NaN off the inside drawing; at the finished part the
    /// crests count as in `deviationMm`). Both empty for outside work.
    Profile bore;
    std::vector<double> boreDeviationMm;
    Eigen::Vector2d tipZX{0, 0}; ///< imaginary tip of the tool now (z, x), mm
    /// Dial readings now, mm of dial (interpolated along the current move).
    double crossMm = 0, compoundMm = 0, saddleMm = 0;
};

/// Describes the moment at slider `position` (clamped to [0, N]). Whole positions use the
/// kernel's afterPass profiles; positions inside a pass use profileUpTo(); position N uses
/// the final asCut profile (the bore likewise: boreAfterPass, boredProfile(), bore). The deviation
/// is the kernel's (compare.h: normalDeviation). `result` must come from simulate() on the same
/// scene (or be built with the same sampling: stock, nominal and afterPass on one grid).
MomentView describeMoment(const Scene& scene, const CutResult& result, double position);

/// Indices into result.moves of the moves that make pass `pass` (0-based), in order.
std::vector<std::size_t> movesOfPass(const CutResult& result, int pass);

} // namespace swarf
