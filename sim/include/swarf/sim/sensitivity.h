#pragma once
// What matters for a planned cone: how much the diameter at the check plane changes for a small
// error in each thing a person sets or measures, and the corrections a trial cut calls for.
// Closed forms (derived; references R10 for the compound and the indicator):
//   measuring at z + δz instead of z:      ΔD = 2 δz tan θ
//   one division of the cross-slide:       ΔD = one division (diameter dial), two (radius dial)
//   compound angle off by δθ:              ΔD = 2 |z − z0| δθ / cos²θ, where z0 is the plane where
//                                          the finishing pass's compound reads 0 (the cut's line
//                                          pivots there)
//   tool tip δh off centre (planned h0):   ΔD = 2 (√(x² + (h0 + δh)²) − √(x² + h0²)), x the tip's
//                                          distance from the axis at the check plane
//   roll readings' difference Δ over an axial span s: dΔ/dθ = 2 s / cos²θ, so a difference off
//   by Δ′ − Δ calls for turning the compound by (Δ′ − Δ) cos²θ / (2 s); over a compound travel L
//   an indicator on a bar parallel to the axis then moves L cos θ δθ more (references R10).
#include "swarf/sim/planner.h"

namespace swarf {

/// The sensitivities and corrections of a planned cone (ConePlan::planned), in mm and radians.
struct ConeSensitivity {
    double checkZMm = 0;            ///< the check plane
    double axialStepMm = 0;         ///< the step used for measuring position and tool height:
                                    ///< 0.1 mm, or 0.005 in in an inch scene
    double perAxialStepMm = 0;      ///< ΔD for measuring axialStepMm off along the axis
    double perCrossDivisionMm = 0;  ///< ΔD for one division of the cross-slide
    double perCompoundMinuteMm = 0; ///< ΔD for 1′ of compound angle
    double pivotZMm = 0;            ///< where the finishing pass's line pivots
    double perToolHeightStepMm = 0; ///< ΔD for the tip axialStepMm further off centre
    /// Correction from the diameter at the check plane before finishing: finish at reading
    /// finishCrossMm + (D′ − roughDiameterMm) · dialPerDiameter.
    double finishCrossMm = 0, roughDiameterMm = 0, dialPerDiameter = 1;
    /// Correction from the rolls: the readings should differ by rollDifferenceMm over an axial
    /// span rollSpanMm; turn the compound by compoundPerRollMmRad per mm of (Δ′ − Δ), toward
    /// the axis when Δ′ > Δ (the cone is too steep).
    double rollDifferenceMm = 0, rollSpanMm = 0, compoundPerRollMmRad = 0;
    /// The same correction as the indicator sees it: over indicatorTravelMm of compound travel,
    /// indicatorPerMinuteMm more (or less) movement per 1′.
    double indicatorTravelMm = 0, indicatorPerMinuteMm = 0;
};

/// One minute of arc, rad.
inline constexpr double kArcMinuteRad = kPi / 10800.0;

/// The sensitivities of a planned cone at its check plane (plan.planned must be true).
ConeSensitivity coneSensitivity(const ConePlan& plan);

} // namespace swarf
