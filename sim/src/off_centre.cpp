// Diameters cut by a tip off the spindle centre height (references R7).
#include "swarf/sim/off_centre.h"

#include <cassert>
#include <cmath>

namespace swarf {

double cutRadiusOffCentreMm(double xMm, double tipHeightMm) {
    return std::hypot(xMm, tipHeightMm);
}

double diameterCutOffCentreMm(double nominalDiameterMm, double tipHeightMm) {
    return 2.0 * cutRadiusOffCentreMm(nominalDiameterMm / 2.0, tipHeightMm);
}

double diameterErrorOffCentreMm(double nominalDiameterMm, double tipHeightMm) {
    assert(nominalDiameterMm > 0);
    const double x = nominalDiameterMm / 2.0;
    const double h2 = tipHeightMm * tipHeightMm;
    // 2 (sqrt(x² + h²) − x) = 2 h² / (sqrt(x² + h²) + x): no cancellation for small h.
    return 2.0 * h2 / (std::sqrt(x * x + h2) + x);
}

double diameterErrorOffCentreApproxMm(double nominalDiameterMm, double tipHeightMm) {
    assert(nominalDiameterMm > 0);
    return 2.0 * tipHeightMm * tipHeightMm / nominalDiameterMm;
}

double xForDiameterOffCentreMm(double wantedDiameterMm, double tipHeightMm) {
    const double r = wantedDiameterMm / 2.0;
    const double d = r * r - tipHeightMm * tipHeightMm;
    return d > 0 ? std::sqrt(d) : 0.0;
}

} // namespace swarf
