// Tests for sim/include/swarf/sim/off_centre.h.
#include "swarf/sim/off_centre.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

TEST_CASE("R7 check value", "[off_centre]") {
    // Source: references R7: D 20 mm, h 0.5 mm → diameter error +0.02498 mm (≈ 2h²/D).
    CHECK(diameterErrorOffCentreMm(20.0, 0.5) == Approx(0.02498).margin(5e-6));
    CHECK(diameterCutOffCentreMm(20.0, 0.5) - 20.0 == Approx(0.02498).margin(5e-6));
    CHECK(diameterErrorOffCentreApproxMm(20.0, 0.5) == Approx(0.025));
    // Source: references R7: a tip h above or below centre cuts sqrt(x² + h²).
    CHECK(cutRadiusOffCentreMm(3.0, 4.0) == Approx(5.0));
    CHECK(cutRadiusOffCentreMm(3.0, -4.0) == Approx(5.0));
}

TEST_CASE("off-centre properties", "[off_centre]") {
    // derived: above and below give the same error; it is never negative; small diameters
    // suffer most (a straight move cuts a hyperboloid, not a cone).
    for (double h : {0.05, 0.2, 1.0}) {
        CHECK(diameterErrorOffCentreMm(20, h) == Approx(diameterErrorOffCentreMm(20, -h)));
        CHECK(diameterErrorOffCentreMm(10, h) > diameterErrorOffCentreMm(20, h));
        CHECK(diameterErrorOffCentreMm(20, h) <= diameterErrorOffCentreApproxMm(20, h));
    }
    CHECK(diameterErrorOffCentreMm(20, 0) == 0);
    // derived: putting the tip at xForDiameterOffCentreMm cuts the wanted diameter.
    const double x = xForDiameterOffCentreMm(20, 0.5);
    CHECK(2 * cutRadiusOffCentreMm(x, 0.5) == Approx(20.0).epsilon(1e-12));
    CHECK(xForDiameterOffCentreMm(0.8, 0.5) == 0.0);
}
