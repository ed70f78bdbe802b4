// Compound slide settings for a cone (references R5).
#include "swarf/sim/compound_setting.h"

#include <cassert>
#include <cmath>

namespace swarf {

double compoundScaleReadingRad(double halfAngleRad, CompoundScale scale) {
    assert(halfAngleRad >= 0 && halfAngleRad <= kPi / 2);
    return scale == CompoundScale::FromAxis ? halfAngleRad : kPi / 2 - halfAngleRad;
}

double halfAngleFromCompoundReading(double readingRad, CompoundScale scale) {
    // The map θ ↔ reading is its own inverse in both graduations.
    return scale == CompoundScale::FromAxis ? readingRad : kPi / 2 - readingRad;
}

double compoundStrokeMm(double halfAngleRad, double coneLengthMm) {
    assert(halfAngleRad >= 0 && halfAngleRad < kPi / 2 && coneLengthMm >= 0);
    return coneLengthMm / std::cos(halfAngleRad);
}

double diameterChangeForCompoundTravelMm(double halfAngleRad, double travelMm) {
    return 2.0 * travelMm * std::sin(halfAngleRad);
}

double compoundTravelForDiameterChangeMm(double halfAngleRad, double diameterChangeMm) {
    assert(halfAngleRad > 0);
    return diameterChangeMm / (2.0 * std::sin(halfAngleRad));
}

} // namespace swarf
