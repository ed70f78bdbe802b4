// Measuring a cone over rolls (references R6).
#include "swarf/sim/roll_check.h"

#include <cassert>
#include <cmath>

namespace swarf {

double readingOverRollsMm(double diameterMm, double rollDiameterMm, double halfAngleRad) {
    // Each roll's centre sits d/2 · sec θ out from the cone's surface measured square to the
    // axis, and its far side another d/2 beyond.
    return diameterMm + rollDiameterMm * (1.0 + 1.0 / std::cos(halfAngleRad));
}

double diameterFromRollReadingMm(double readingMm, double rollDiameterMm, double halfAngleRad) {
    return readingMm - rollDiameterMm * (1.0 + 1.0 / std::cos(halfAngleRad));
}

double halfAngleFromRollReadings(double reading1Mm, double height1Mm, double reading2Mm,
                                 double height2Mm) {
    assert(height1Mm != height2Mm);
    return std::atan((reading2Mm - reading1Mm) / (2.0 * (height2Mm - height1Mm)));
}

double diameterChangeOverLengthMm(double halfAngleRad, double lengthMm) {
    return 2.0 * lengthMm * std::tan(halfAngleRad);
}

RollReadings rollReadingsForCone(double smallEndDiameterMm, double halfAngleRad,
                                 double rollDiameterMm, double stack1Mm, double stack2Mm) {
    RollReadings r;
    r.centreHeight1Mm = stack1Mm + rollDiameterMm / 2.0;
    r.centreHeight2Mm = stack2Mm + rollDiameterMm / 2.0;
    r.diameter1Mm =
        smallEndDiameterMm + diameterChangeOverLengthMm(halfAngleRad, r.centreHeight1Mm);
    r.diameter2Mm =
        smallEndDiameterMm + diameterChangeOverLengthMm(halfAngleRad, r.centreHeight2Mm);
    r.reading1Mm = readingOverRollsMm(r.diameter1Mm, rollDiameterMm, halfAngleRad);
    r.reading2Mm = readingOverRollsMm(r.diameter2Mm, rollDiameterMm, halfAngleRad);
    return r;
}

double highestRollStackMm(double coneLengthMm, double rollDiameterMm, double stepMm) {
    return std::floor((coneLengthMm - rollDiameterMm) / stepMm) * stepMm;
}

} // namespace swarf
