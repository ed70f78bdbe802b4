// Every scene in scenes/ reads and validates without error, and states what it expects.
#include "swarf/io/scene_reader.h"
#include "swarf/sim/error.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <filesystem>
#include <string>

namespace fs = std::filesystem;

TEST_CASE("every scene in scenes/ reads without error", "[io][scenes]") {
    int count = 0;
    for (const auto& e : fs::directory_iterator(SWARF_SCENES_DIR)) {
        if (e.path().extension() != ".toml")
            continue;
        ++count;
        const std::string file = e.path().string();
        INFO(file);
        swarf::Scene s;
        try {
            s = swarf::io::readScene(file);
        } catch (const swarf::InputError& err) {
            FAIL(err.what());
        }
        CHECK_FALSE(s.name.empty());
        CHECK_FALSE(s.part.features.empty());
    }
    CHECK(count >= 2);
}

TEST_CASE("the demo scene reads as written", "[io][scenes]") {
    const swarf::Scene s =
        swarf::io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    CHECK(s.units == swarf::Units::Mm);
    const swarf::Feature* cone = s.part.mainCone();
    REQUIRE(cone != nullptr);
    // derived: 1:10 on diameter is a half angle of atan(1/20)
    CHECK(cone->cone.halfAngleRad == Approx(std::atan(0.05)));
    CHECK(cone->cone.diameterAt(0) == Approx(25.0));
    CHECK(cone->cone.diameterAt(50) == Approx(30.0));
    CHECK(s.tool.enteringAngleRad == Approx(swarf::degToRad(93))); // Source: references R8 (J)
    CHECK(s.tool.includedAngleRad == Approx(swarf::degToRad(55))); // Source: references R8 (D)
    CHECK(s.plan.passes.size() == 4);
}

TEST_CASE("the inch scene converts to mm once", "[io][scenes][units]") {
    const swarf::Scene s =
        swarf::io::readScene(std::string(SWARF_SCENES_DIR) + "/taper-shank-morse.toml");
    CHECK(s.units == swarf::Units::Inch);
    CHECK(s.stock.diameterMm == Approx(0.75 * 25.4));
    const swarf::Feature* cone = s.part.mainCone();
    REQUIRE(cone != nullptr);
    // Source: references R3 (Morse 2: gauge diameter 0.700 in, ratio 1:20.020)
    CHECK(cone->cone.gaugeDiameterMm == Approx(0.700 * 25.4));
    CHECK(cone->cone.ratioK() == Approx(20.020).epsilon(1e-4));
    // Source: references R5 (a scale read from the cross-slide is set to 90° − θ)
    CHECK(s.setup.compoundAxisAngleRad() == Approx(swarf::degToRad(90 - 88.5693)));
    CHECK(s.setup.crossDial == swarf::DialMode::Radius);
    CHECK(s.plan.passes.at(3).crossMm == Approx(-0.002 * 25.4));
}
