// Tests for sim/io/include/swarf/io/measured_reader.h: MEASURED.toml, key by key, and the bad
// measurement files in tests/bad_measurements/ (header "# expect:", "# at:", "# key:" as for the
// bad scenes), read against the planned 1:20 arbor.
#include "swarf/io/measured_reader.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/correction.h"
#include "swarf/sim/error.h"
#include "swarf/sim/planner.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <filesystem>
#include <fstream>

namespace fs = std::filesystem;
using namespace swarf;

namespace {

const Scene& plannedArbor() {
    static const Scene s =
        planCone(io::readScene(std::string(SWARF_SCENES_DIR) + "/plan-1-20-chuck-out.toml")).scene;
    return s;
}

struct Header {
    std::string expect, at, key;
};

Header header(const fs::path& p) {
    Header h;
    std::ifstream in(p);
    std::string line;
    while (std::getline(in, line) && line.rfind("# ", 0) == 0) {
        auto take = [&](const char* tag, std::string& into) {
            const std::string t = std::string("# ") + tag + ": ";
            if (line.rfind(t, 0) == 0)
                into = line.substr(t.size());
        };
        take("expect", h.expect);
        take("at", h.at);
        take("key", h.key);
    }
    return h;
}

} // namespace

TEST_CASE("every bad measurement file is refused with its message", "[io][measured]") {
    int count = 0;
    for (const auto& e :
         fs::directory_iterator(fs::path(SWARF_TEST_DATA_DIR) / "bad_measurements")) {
        if (e.path().extension() != ".toml")
            continue;
        ++count;
        const Header h = header(e.path());
        INFO(e.path().filename().string());
        REQUIRE_FALSE(h.expect.empty());
        try {
            io::readMeasurements(e.path().string(), plannedArbor());
            FAIL("read without error");
        } catch (const InputError& err) {
            CHECK_THAT(std::string(err.what()), Catch::Contains(h.expect));
            CHECK(std::to_string(err.where().line) + ":" + std::to_string(err.where().column) ==
                  h.at);
            if (!h.key.empty())
                CHECK(err.key() == h.key);
        }
    }
    CHECK(count >= 10);
}

TEST_CASE("a measurement file with every kind of reading", "[io][measured]") {
    const std::string text = R"(after_pass = 2
[[diameter]]
at = 10.0
value = 21.8
[[over_rolls]]
roll = 8
heights = [10.0, 40.0]
reading = [42.66, 44.31]
uncertainty = 0.004
[[gauge]]
gauge_diameter = 24.0
stand_off = 0.5
from = 50
gauge_plane = 2
[[indicator]]
travel = 40
change = 1.0
angle = "0°30′"
)";
    const Measurements m = io::readMeasurementsText(text, "m.toml", plannedArbor());
    CHECK(m.afterPass == 2);
    REQUIRE(m.diameters.size() == 1);
    // common practice defaults, as scenes/MEASURED.md states them
    CHECK(m.diameters[0].uncertaintyMm == Approx(0.002));
    REQUIRE(m.rolls.size() == 1);
    // heights above the small end (z = 0 for this cone widening toward the chuck)
    CHECK(m.rolls[0].zMm == std::vector<double>{10.0, 40.0});
    CHECK(m.rolls[0].uncertaintyMm == Approx(0.004));
    REQUIRE(m.gauges.size() == 1);
    CHECK(m.gauges[0].zMm() == Approx(52.5));
    CHECK(m.gauges[0].uncertaintyMm == Approx(0.02));
    REQUIRE(m.indicators.size() == 1);
    CHECK(m.indicators[0].lineAngleRad == Approx(degToRad(0.5)));
    CHECK(m.indicators[0].uncertaintyMm == Approx(0.005));
    CHECK(m.diameters[0].where.line == 2);
}

TEST_CASE("a measurement file in inch on a mm scene", "[io][measured]") {
    const std::string text = "units = \"inch\"\nafter_pass = 1\n[[diameter]]\nat = 1.0\n"
                             "value = 0.9\n";
    const Measurements m = io::readMeasurementsText(text, "m.toml", plannedArbor());
    CHECK(m.diameters[0].zMm == Approx(25.4));
    CHECK(m.diameters[0].valueMm == Approx(22.86));
    CHECK(m.diameters[0].uncertaintyMm == Approx(0.00254)); // 0.0001 in
}

TEST_CASE("a cone measured far steeper than the plan leaves the compound as it is, with a note",
          "[io][measured][correct]") {
    // Found by fuzzing (tests/fuzz/run.sh measured): after pass 2 of the 1:20 arbor (half angle
    // 1°25′56″), Ø20.8 at z 20 and Ø24.6 at z 49 fit a cone of 3°44′55″. The error revealed is
    // larger than the angle set, and a compound swung past the axis is no correction: the
    // correction kept the reading and must not stop on it (an assert did).
    const std::string text = "after_pass = 2\n[[diameter]]\nat = 20.0\nvalue = 20.8\n"
                             "[[diameter]]\nat = 49.0\nvalue = 24.6\n";
    const Measurements m = io::readMeasurementsText(text, "steep.toml", plannedArbor());
    const Correction c = correctPlan(plannedArbor(), m);
    REQUIRE(c.fit.ok);
    CHECK(radToDeg(c.fit.halfAngleRad) ==
          Approx(std::atan(3.8 / 58.0) * 180.0 / kPi).epsilon(1e-3));
    CHECK(c.newCompoundReadingRad == c.oldCompoundReadingRad);
    bool said = false;
    for (const std::string& n : c.notes)
        said = said ||
               n.find("no setting of the compound makes up that difference") != std::string::npos;
    CHECK(said);
}
