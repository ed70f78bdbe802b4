#pragma once
// After the trial cut: from what was measured after a pass, the cone as it is (cone_fit.h), the
// error that made it (the compound's true angle, and an offset of the cross-slide's zero), and
// the corrections in handwheel numbers for the rest of the plan: the compound turned by the
// angle it is off, every remaining cross-slide reading moved by the offset, the finishing pass
// moved in when it would not clean up the cone, and passes added where the next cut would be
// deeper than the plan allows. The corrected scene replays the whole story: the passes already
// cut as they really were, the rest at the corrected settings (Pass::compoundAngleRad). If metal
// is already gone below the drawing's lower limit the part is scrap and no correction is made.
// Values in, values out; lengths mm, angles rad.
#include "swarf/sim/cone_fit.h"
#include "swarf/sim/measurement.h"
#include "swarf/sim/scene.h"

#include <string>
#include <vector>

namespace swarf {

/// A remaining pass of the corrected plan, as the person sets it.
struct CorrectedPass {
    int pass = 0;                ///< index into Correction::corrected.plan.passes
    int planPass = -1;           ///< the pass of the plan it comes from (−1: added)
    double crossMm = 0;          ///< cross-slide reading (mm of dial), nose-radius offset included
    double compoundAngleRad = 0; ///< the compound on its own scale for this pass
    bool finish = false;         ///< the finishing pass of the cone
};

/// The corrections after a trial cut.
struct Correction {
    ConeFit fit;       ///< the cone as measured (fit.ok false: nothing below is set)
    int afterPass = 0; ///< the pass after which it was measured (from 1)
    double drawingHalfAngleRad = 0;
    double plannedAngleRad = 0;   ///< the true angle the plan meant the compound to have
    double revealedErrorRad = 0;  ///< the compound's true angle minus the one its scale reads
    double compoundChangeRad = 0; ///< turn the compound by this (true angle, signed: + steeper)
    double oldCompoundReadingRad = 0, newCompoundReadingRad = 0; ///< on its own scale
    /// Re-setting with an indicator on a test bar parallel to the axis: over indicatorTravelMm of
    /// compound travel the indicator should move indicatorChangeMm more than it did (references
    /// R10: L sin(θ + Δθ) − L sin θ).
    double indicatorTravelMm = 0, indicatorChangeMm = 0;
    double crossOffsetMm = 0; ///< the cross-slide's zero as it really was, minus the plan's
                              ///< (on diameter); added to every remaining reading
    double stockLeftMinMm = 0, stockLeftMaxMm = 0; ///< left for the rest, normal to the cone
    bool scrap = false;              ///< metal is gone below the drawing's lower limit
    double scrapMm = 0;              ///< how far below, on diameter (scrap only)
    double scrapZMm = 0;             ///< where it is deepest
    int passesAdded = 0;             ///< passes added because a cut would be too deep
    double finishMovedInMm = 0;      ///< the finishing reading moved in to clean up (mm of dial)
    double noseOffsetDiameterMm = 0; ///< the nose-radius offset in the finishing reading
    std::vector<CorrectedPass> remaining; ///< the passes still to cut, corrected
    Scene corrected;                      ///< the whole story (scrap: the passes cut, and no more)
    std::vector<std::string> notes;       ///< what the person must know, in words (scene's units)
};

/// The least cut a finishing pass needs to cut rather than rub, normal to the cone: 0.01 mm
/// (common practice).
inline constexpr double kMinFinishCutMm = 0.01;

/// Corrects `plan` (a validated scene with passes and a main cone) from readings taken after
/// pass m.afterPass (1 ≤ afterPass < number of passes). Never throws for a bad set of readings:
/// fit.ok is false and fit.problem says why.
Correction correctPlan(const Scene& plan, const Measurements& m);

} // namespace swarf
