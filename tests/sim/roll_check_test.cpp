// Tests for sim/include/swarf/sim/roll_check.h.
#include "swarf/sim/cone.h"
#include "swarf/sim/roll_check.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

TEST_CASE("R6 check value", "[roll_check]") {
    // Source: references R6: 1:20 taper, 10 mm rolls → M − D = 20.003125 mm.
    const double theta = halfAngleFromRatio(20.0);
    CHECK(readingOverRollsMm(0.0, 10.0, theta) == Approx(20.003125).margin(5e-7));
    CHECK(readingOverRollsMm(30.0, 10.0, theta) - 30.0 == Approx(20.003125).margin(5e-7));
    CHECK(diameterFromRollReadingMm(50.003125, 10.0, theta) == Approx(30.0).margin(5e-7));
}

TEST_CASE("R6 two heights give the taper back", "[roll_check]") {
    // Source: references R6: tan θ = (M2 − M1) / (2 (h2 − h1)); D = M − d(1 + sec θ).
    for (double deg : {0.5, 1.4321, 2.8624, 8.29714, 15.0, 30.0}) {
        const double theta = degToRad(deg);
        const auto rr = rollReadingsForCone(25.0, theta, 6.0, 0.0, 40.0);
        INFO(deg << "°");
        CHECK(rr.centreHeight1Mm == Approx(3.0));
        CHECK(rr.centreHeight2Mm == Approx(43.0));
        CHECK(halfAngleFromRollReadings(rr.reading1Mm, 0.0, rr.reading2Mm, 40.0) ==
              Approx(theta).epsilon(1e-12));
        CHECK(diameterFromRollReadingMm(rr.reading1Mm, 6.0, theta) == Approx(rr.diameter1Mm));
        // derived: diameter change per length is 2 tan θ = C.
        CHECK(rr.diameter2Mm - rr.diameter1Mm == Approx(diameterChangeOverLengthMm(theta, 40.0)));
    }
}

TEST_CASE("diameter change per unit length", "[roll_check]") {
    // Source: references R3 and references R9 (ISO 3040): C = 2 tan θ; 1:20 → 0.05 mm per mm,
    // 1.27 mm per inch.
    const double theta = halfAngleFromRatio(20.0);
    CHECK(diameterChangeOverLengthMm(theta, 1.0) == Approx(0.05));
    CHECK(diameterChangeOverLengthMm(theta, kMmPerInch) == Approx(1.27));
    // Source: references R3: Jarno 0.600 in/ft → 0.6 in of diameter per 12 in.
    CHECK(diameterChangeOverLengthMm(halfAngleFromTaperPerFoot(0.6), 12 * kMmPerInch) /
              kMmPerInch ==
          Approx(0.6));
}
