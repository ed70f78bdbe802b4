// The instruments' common-practice uncertainties, used when a measurement file gives none
// (measurement.h, scenes/MEASURED.md).
#include "swarf/sim/measurement.h"

#include "swarf/sim/units.h"

namespace swarf {

double defaultMicrometerUncertaintyMm(bool inch) {
    return inch ? 0.0001 * kMmPerInch : 0.002;
}
double defaultRollsUncertaintyMm(bool inch) {
    return inch ? 0.00015 * kMmPerInch : 0.003;
}
double defaultStandOffUncertaintyMm(bool inch) {
    return inch ? 0.001 * kMmPerInch : 0.02;
}
double defaultIndicatorUncertaintyMm(bool inch) {
    return inch ? 0.0003 * kMmPerInch : 0.005;
}

} // namespace swarf
