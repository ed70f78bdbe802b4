#pragma once
// Setting the compound slide to cut a cone by hand (references R5): the angle to set on its
// scale in either graduation, and how far the compound must travel.
#include "swarf/sim/scene.h"

namespace swarf {

/// The reading to set on the compound's angle scale for a cone of half angle θ (rad):
/// θ on a scale graduated from the spindle axis, 90° − θ on one graduated from the
/// cross-slide. Returns radians. Precondition 0 ≤ θ ≤ π/2.
double compoundScaleReadingRad(double halfAngleRad, CompoundScale scale);

/// The half angle (rad) a compound cuts when its scale reads readingRad (rad) in the given
/// graduation; the inverse of compoundScaleReadingRad.
double halfAngleFromCompoundReading(double readingRad, CompoundScale scale);

/// Travel of the compound along its ways (mm) that covers a cone of axial length
/// coneLengthMm (mm) at half angle θ (rad): L / cos θ. Precondition 0 ≤ θ < π/2, L ≥ 0.
double compoundStrokeMm(double halfAngleRad, double coneLengthMm);

/// Change of diameter (mm) when the compound, set at half angle θ (rad), travels
/// travelMm (mm) along its ways: 2 · travel · sin θ.
double diameterChangeForCompoundTravelMm(double halfAngleRad, double travelMm);

/// Compound travel (mm) that changes the diameter by diameterChangeMm (mm) at half angle θ:
/// Δd / (2 sin θ). Precondition θ > 0.
double compoundTravelForDiameterChangeMm(double halfAngleRad, double diameterChangeMm);

} // namespace swarf
