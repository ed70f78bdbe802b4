// Tests for sim/include/swarf/sim/angle_text.h.
#include "swarf/sim/angle_text.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>

using namespace swarf;

TEST_CASE("angles as people write them", "[angle_text]") {
    // Source: references R3, 7:24 steep taper: 8.29714° = 8°17′49.72″ (within 0.005″).
    const double steep = degToRad(8.29714);
    for (const char* t : {"8°17′49.72″", "8°17'49.72\"", "8d17m49.72s", "8 17 49.72", "8:17:49.72",
                          " 8° 17′ 49.72″ ", "8°17'49.72''"}) {
        INFO(t);
        auto a = parseAngleText(t);
        REQUIRE(a);
        CHECK(*a == Approx(steep).margin(degToRad(0.005 / 3600)));
    }
    CHECK(*parseAngleText("8.29714") == Approx(steep));
    CHECK(*parseAngleText("8.29714°") == Approx(steep));
    CHECK(*parseAngleText("8.29714deg") == Approx(steep));
    CHECK(*parseAngleText("30") == Approx(degToRad(30)));
    CHECK(*parseAngleText("14°2′") == Approx(degToRad(14 + 2 / 60.0)));
    CHECK(*parseAngleText("45′") == Approx(degToRad(0.75)));
    CHECK(*parseAngleText("-1°30′") == Approx(degToRad(-1.5)));
    // derived: formatDms and parseAngleText are inverses to the shown precision.
    for (double deg : {0.5, 1.43210, 2.8624, 14.036, 59.99999}) {
        CHECK(*parseAngleText(formatDms(degToRad(deg), 3)) == Approx(degToRad(deg)).margin(1e-8));
    }
}

TEST_CASE("bad angles are rejected", "[angle_text]") {
    for (const char* t : {"", "abc", "8°60′", "8°10′60″", "8.5°10′", "1 2 3 4", "°", "8°°", "5′3°",
                          "1e400", "inf", "nan", "0x10", "8°x"}) {
        INFO(t);
        CHECK_FALSE(parseAngleText(t));
    }
}

TEST_CASE("ratios and numbers", "[angle_text]") {
    CHECK(*parseRatioText("1:20") == 20.0);
    CHECK(*parseRatioText("1/19.922") == Approx(19.922));
    CHECK(*parseRatioText("16") == 16.0);
    for (const char* t : {"", "1:", "1:0", "1:-3", "0", "2:20", "abc", "1:20x"}) {
        INFO(t);
        CHECK_FALSE(parseRatioText(t));
    }
    CHECK(*parseNumberText(" 2.5 ") == 2.5);
    CHECK(*parseNumberText("1e-3") == 0.001);
    CHECK_FALSE(parseNumberText("2.5mm"));
    CHECK_FALSE(parseNumberText("inf"));
}
