// Conversions between the ways a drawing gives a cone.
#include "swarf/sim/cone.h"

#include <cassert>
#include <cmath>

namespace swarf {

double Cone::diameterAt(double zMm) const {
    return gaugeDiameterMm + growthSign() * taperRate() * (zMm - gaugeZMm);
}

double Cone::zAtDiameter(double diameterMm) const {
    return gaugeZMm + growthSign() * (diameterMm - gaugeDiameterMm) / taperRate();
}

double Cone::taperRate() const {
    return 2.0 * std::tan(halfAngleRad);
}

double halfAngleFromIncluded(double includedRad) {
    return includedRad / 2.0;
}

double halfAngleFromTaperRate(double c) {
    assert(c > 0);
    return std::atan(c / 2.0);
}

double halfAngleFromRatio(double k) {
    assert(k > 0);
    return halfAngleFromTaperRate(1.0 / k);
}

double halfAngleFromTaperPerFoot(double inchesPerFoot) {
    return halfAngleFromTaperRate(inchesPerFoot / 12.0);
}

double halfAngleFromTwoDiameters(double z1Mm, double d1Mm, double z2Mm, double d2Mm) {
    assert(z1Mm != z2Mm);
    return std::atan(std::fabs(d2Mm - d1Mm) / (2.0 * std::fabs(z2Mm - z1Mm)));
}

double otherEndDiameterMm(double gaugeDiameterMm, double halfAngleRad, double lengthMm,
                          bool gaugeAtLargeEnd) {
    const double c = 2 * std::tan(halfAngleRad);
    return gaugeDiameterMm + (gaugeAtLargeEnd ? -1 : 1) * c * lengthMm;
}

double lengthBetweenDiameters(const Cone& cone, double d1Mm, double d2Mm) {
    return std::fabs(d2Mm - d1Mm) / cone.taperRate();
}

} // namespace swarf
