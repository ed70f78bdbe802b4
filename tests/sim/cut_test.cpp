// Tests of swarf/sim/cut.h: the profile's lookup and volume.
#include "swarf/sim/cut.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <limits>

using namespace swarf;

TEST_CASE("Profile::radiusAt interpolates, clamps and keeps NaN to its own sample", "[sim][cut]") {
    Profile p;
    p.z0Mm = 1;
    p.dzMm = 0.5;
    p.radiusMm = {2, 4, 8};
    CHECK(p.radiusAt(1.25) == Approx(3));
    CHECK(p.radiusAt(0) == 2);
    CHECK(p.radiusAt(9) == 8);
    CHECK(std::isnan(Profile{}.radiusAt(1)));
    // The drawing's edge: a sample next to a NaN reads as itself, between them as NaN.
    p.radiusMm = {2, 4, std::numeric_limits<double>::quiet_NaN()};
    CHECK(p.radiusAt(1.5) == 4);
    CHECK(std::isnan(p.radiusAt(1.75)));
}

TEST_CASE("Profile::volumeMm3 of a cylinder and a cone", "[sim][cut]") {
    // Derived: π r² L for a cylinder; π L (R² + R r + r²) / 3 for a frustum.
    Profile c;
    c.z0Mm = 0;
    c.dzMm = 0.1;
    c.radiusMm.assign(101, 5.0);
    CHECK(c.volumeMm3() == Approx(kPi * 25 * 10).epsilon(1e-12));
    Profile k = c;
    for (std::size_t i = 0; i < k.radiusMm.size(); ++i)
        k.radiusMm[i] = 5.0 + 0.1 * k.zAt(i);
    CHECK(k.volumeMm3() == Approx(kPi * 10 * (36 + 30 + 25) / 3).epsilon(1e-12));
}
