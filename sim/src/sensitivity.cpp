// What matters for a planned cone (see sensitivity.h for the closed forms).
#include "swarf/sim/sensitivity.h"

#include <cmath>

namespace swarf {

ConeSensitivity coneSensitivity(const ConePlan& plan) {
    ConeSensitivity s;
    const Scene& sc = plan.scene;
    const Setup& su = sc.setup;
    const double th = plan.halfAngleRad;
    const double cos2 = std::cos(th) * std::cos(th);
    s.checkZMm = plan.checkZMm;
    s.axialStepMm = sc.units == Units::Inch ? 0.005 * kMmPerInch : 0.1;
    s.perAxialStepMm = 2.0 * s.axialStepMm * std::tan(th);
    s.perCrossDivisionMm =
        su.crossDial == DialMode::Diameter ? su.cross.mmPerDivision : 2.0 * su.cross.mmPerDivision;
    s.pivotZMm = plan.finishPivotZMm;
    s.perCompoundMinuteMm = 2.0 * std::fabs(plan.checkZMm - s.pivotZMm) * kArcMinuteRad / cos2;
    const double radius = 0.5 * plan.checkDiameterFinishedMm;
    const double h0 = sc.tool.tipHeightMm;
    const double x = std::sqrt(std::max(0.0, radius * radius - h0 * h0));
    const double h1 = std::fabs(h0) + s.axialStepMm; // a step further off centre
    s.perToolHeightStepMm = 2.0 * (std::sqrt(x * x + h1 * h1) - radius);
    s.finishCrossMm = plan.finishCrossMm;
    s.roughDiameterMm = plan.checkDiameterRoughMm;
    s.dialPerDiameter = su.crossDial == DialMode::Diameter ? 1.0 : 0.5;
    s.rollDifferenceMm = plan.rolls.reading2Mm - plan.rolls.reading1Mm;
    s.rollSpanMm = std::fabs(plan.rolls.z2Mm - plan.rolls.z1Mm);
    s.compoundPerRollMmRad = s.rollSpanMm > 0 ? cos2 / (2.0 * s.rollSpanMm) : 0.0;
    s.indicatorTravelMm = plan.indicatorTravelMm;
    s.indicatorPerMinuteMm = plan.indicatorTravelMm * std::cos(th) * kArcMinuteRad;
    return s;
}

} // namespace swarf
