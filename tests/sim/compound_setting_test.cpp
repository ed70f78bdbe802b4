// Tests for sim/include/swarf/sim/compound_setting.h.
#include "swarf/sim/compound_setting.h"
#include "swarf/sim/cone.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

TEST_CASE("R5 compound setting 60/20/80 mm", "[compound]") {
    // Source: references R5: tan θ = (D − d)/(2L); 60/20/80 mm → 14°2′.
    const double theta = halfAngleFromTwoDiameters(0.0, 20.0, 80.0, 60.0);
    const double fromAxis = compoundScaleReadingRad(theta, CompoundScale::FromAxis);
    CHECK(radToDeg(fromAxis) * 60.0 == Approx(14 * 60 + 2).margin(0.5));
    // Source: references R5: graduated from the cross-slide, set 90° − θ (75°58′).
    const double fromCross = compoundScaleReadingRad(theta, CompoundScale::FromCrossSlide);
    CHECK(radToDeg(fromCross) * 60.0 == Approx(75 * 60 + 58).margin(0.5));
    CHECK(fromAxis + fromCross == Approx(kPi / 2));
}

TEST_CASE("compound scale round trip and stroke", "[compound]") {
    for (double deg : {0.5, 1.43, 8.3, 14.04, 30.0, 45.0, 60.0, 89.0}) {
        const double theta = degToRad(deg);
        for (auto scale : {CompoundScale::FromAxis, CompoundScale::FromCrossSlide}) {
            CHECK(halfAngleFromCompoundReading(compoundScaleReadingRad(theta, scale), scale) ==
                  Approx(theta));
        }
        // derived: the stroke's axial component is the cone length; its radial component is
        // half the diameter change.
        const double stroke = compoundStrokeMm(theta, 80.0);
        CHECK(stroke * std::cos(theta) == Approx(80.0));
        CHECK(diameterChangeForCompoundTravelMm(theta, stroke) ==
              Approx(2.0 * 80.0 * std::tan(theta)));
        CHECK(compoundTravelForDiameterChangeMm(
                  theta, diameterChangeForCompoundTravelMm(theta, 7.0)) == Approx(7.0));
    }
    // derived: 60/20/80 mm cone → stroke 80 / cos 14.036° = 82.462 mm (= sqrt(80² + 20²)).
    CHECK(compoundStrokeMm(std::atan(0.25), 80.0) == Approx(std::sqrt(80.0 * 80.0 + 20.0 * 20.0)));
}
