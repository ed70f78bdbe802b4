#pragma once
// A measured trial cut before finishing, as a budget part makes it: the passes before the finish
// are cut on the machine as it really is (the perturbed scene), the spindle is stopped, the
// diameter at the plan's check plane is measured with a micrometer (its own error drawn), and
// every finishing cross-slide reading is moved by what the measurement is off from the plan, to
// the nearest division (the sheet's trial-cut step says the same words). The compound's angle is
// not corrected by it: a diameter at one plane says nothing of the angle.
#include "swarf/sim/scene.h"

#include <vector>

namespace swarf {

/// What the plan says of its trial cut (plan_choice.h makes it from a ConePlan).
struct TrialCut {
    int trialPasses = 0;           ///< passes cut before the measurement
    std::vector<int> finishPasses; ///< passes whose cross-slide reading is corrected
    double checkZMm = 0;           ///< the plane measured, part z
    double expectedDiameterMm = 0; ///< what the plan expects there after the trial passes
    double measureSdMm = 0;        ///< standard uncertainty of the micrometer reading, mm
};

/// The exact as-cut diameter of the outside at part z `zMm` after every pass of `scene`: the
/// bar's, less every move's swept envelope there (sweep.h), with the tip's height (off_centre).
double asCutOutsideDiameterMm(const Scene& scene, double zMm);

/// The same for a bore cut with a boring bar: the hole's diameter, or the largest every move's
/// swept envelope opens it to at `zMm` (inside_kernel.h's twin), with the tip's height.
double asCutBoreDiameterMm(const Scene& scene, double zMm);

/// The cross-slide reading change (mm of dial) a measured diameter `offMm` (measured minus
/// expected, on diameter) calls for on `setup`'s dial: the difference on a diameter dial, half
/// of it on a radius dial, rounded to the nearest whole division.
double trialCutCorrectionMm(const Setup& setup, double offMm);

/// `scene` (the machine as it is) after the trial cut: its finishing passes' cross-slide
/// readings moved by the correction for a measurement `measurementErrorMm` off the true
/// diameter. Only compound and saddle passes (a fixed cross-slide reading) are moved.
Scene afterTrialCut(const Scene& scene, const TrialCut& trial, double measurementErrorMm);

} // namespace swarf
