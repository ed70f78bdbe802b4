// Tests for sim/include/swarf/sim/cone.h.
#include "swarf/sim/cone.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

TEST_CASE("metric 1:20 half angle", "[cone]") {
    // Source: references R3, ISO 296 metric taper 1:20: half angle 1.43210°.
    CHECK(radToDeg(halfAngleFromRatio(20.0)) == Approx(1.43210).margin(5e-6));
}

TEST_CASE("diameter and plane round trip", "[cone]") {
    Cone c{10.0, 20.0, degToRad(5.0), Widens::TowardChuck};
    CHECK(c.diameterAt(c.zAtDiameter(23.0)) == Approx(23.0));
    CHECK(c.diameterAt(20.0) > 20.0);
    c.widens = Widens::TowardTailstock;
    CHECK(c.diameterAt(20.0) < 20.0);
}
