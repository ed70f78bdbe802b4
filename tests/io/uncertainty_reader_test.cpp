// Reading [uncertainty] (sim/io/src/uncertainty_reader.cpp): every key, defaults to exact, the
// ISO class as a ready choice for the nose radius, refusals at the key, and the table written
// back by the scene writer.
#include "swarf/io/insert_codes.h"
#include "swarf/io/scene_reader.h"
#include "swarf/io/scene_writer.h"
#include "swarf/sim/error.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <string>

using namespace swarf;

namespace {

// A small scene (values invented) to which an [uncertainty] table is added.
const char* kScene = R"(units = "mm"

[stock]
diameter = 30
length = 100
stick_out = 60

[[part.feature]]
kind = "cone"
from = 0
to = 30
gauge_plane = 30
gauge_diameter = 28
ratio = 20
widens_toward = "chuck"

[tool]
insert = "CNMG 120408"
entering_angle = 95

[setup.compound]
angle = 1.4321
advance = "tailstock"
backlash = 0.03

[setup.cross]
zero_diameter = 30
)";

Scene read(const std::string& table) {
    return io::readSceneText(std::string(kScene) + "\n[uncertainty]\n" + table, "u.toml");
}

// The line of [uncertainty]'s first key in read()'s text.
int firstKeyLine() {
    int lines = 0;
    for (const char* c = kScene; *c; ++c)
        lines += *c == '\n';
    return lines + 3;
}

void refused(const std::string& table, const std::string& key, const std::string& expected,
             int line) {
    try {
        read(table);
        FAIL("accepted: " << table);
    } catch (const InputError& e) {
        INFO(e.what());
        CHECK(e.key() == key);
        CHECK(e.expected().find(expected) != std::string::npos);
        CHECK(e.where().file == "u.toml");
        CHECK(e.where().line == line);
        CHECK(e.where().column > 0);
    }
}

} // namespace

TEST_CASE("uncertainty: no table, or an empty one, is exact", "[io][uncertainty]") {
    CHECK(io::readSceneText(kScene, "u.toml").uncertainty.exact());
    CHECK(read("").uncertainty.exact());
}

TEST_CASE("uncertainty: every key is read, in the scene's units", "[io][uncertainty]") {
    const Scene s = read(R"(compound_angle_sd = "0°1′30″"
cross_reading = 0.01
compound_reading = 0.005
saddle_reading = 0.05
cross_backlash = "known"
compound_backlash = "unknown"
saddle_backlash = "unknown"
tip_height_sd = 0.05
nose_radius_sd = 0.02
measuring_sd = 0.002
)");
    const Uncertainty& u = s.uncertainty;
    CHECK(u.compoundAngleSdRad == Approx(degToRad(1.5 / 60)));
    CHECK(u.crossReadingMm == 0.01);
    CHECK(u.compoundReadingMm == 0.005);
    CHECK(u.saddleReadingMm == 0.05);
    CHECK(u.crossBacklash == BacklashKnowledge::Known);
    CHECK(u.compoundBacklash == BacklashKnowledge::Unknown);
    CHECK(u.saddleBacklash == BacklashKnowledge::Unknown);
    CHECK(u.tipHeightSdMm == 0.05);
    CHECK(u.noseRadiusSdMm == 0.02);
    CHECK(u.noseRadiusToleranceMm == 0);
    CHECK(u.measuringSdMm == 0.002);
    CHECK_FALSE(u.exact());
    // Active: every source but the cross-slide's backlash (known) and the saddle's (no backlash
    // stated, so nothing to be unsure of).
    const auto active = activeBudgetSources(u, s.setup.cross.backlashMm,
                                            s.setup.compound.backlashMm, s.setup.saddle.backlashMm);
    CHECK(active.size() == 8);

    const Scene inch = io::readSceneText(
        "units = \"inch\"\n[stock]\ndiameter = 1.2\nlength = 4\nstick_out = 2.4\n"
        "[[part.feature]]\nkind = \"cylinder\"\nfrom = 0\nto = 1\ndiameter = 1\n"
        "[tool]\nshape = \"C\"\nnose_radius = 0.03\nentering_angle = 95\n"
        "[setup.compound]\nangle = 1\nadvance = \"tailstock\"\n[setup.cross]\n"
        "zero_diameter = 1.2\n[uncertainty]\ncross_reading = 0.0005\nmeasuring_sd = 0.0001\n",
        "i.toml");
    CHECK(inch.uncertainty.crossReadingMm == Approx(0.0127));
    CHECK(inch.uncertainty.measuringSdMm == Approx(0.00254));
}

TEST_CASE("uncertainty: \"iso\" takes the nose radius's tolerance from the insert's class",
          "[io][uncertainty]") {
    // CNMG 120408: class M, inscribed circle 12.7 mm (size code 12), in the step up to 12.7 mm:
    // ± 0.13 (from memory, the class table; see insert_codes.h).
    const Scene s = read("nose_radius_sd = \"iso\"\n");
    CHECK(s.uncertainty.noseRadiusClass == 'M');
    CHECK(s.uncertainty.noseRadiusToleranceMm == Approx(0.13));
    CHECK(s.uncertainty.noseRadiusSdMm == 0);
    CHECK(io::iso1832CornerToleranceMm('G', 9.525) == Approx(0.025));
    CHECK(io::iso1832CornerToleranceMm('M', 6.35) == Approx(0.08));
    CHECK(io::iso1832CornerToleranceMm('M', 9.525) == Approx(0.08));
    CHECK(io::iso1832CornerToleranceMm('M', 12.7) == Approx(0.13));
    CHECK(io::iso1832CornerToleranceMm('M', 15.875) == Approx(0.15));
    CHECK_FALSE(io::iso1832CornerToleranceMm('X', 6.35).has_value());
}

TEST_CASE("uncertainty: bad values are refused at the key", "[io][uncertainty]") {
    const int l = firstKeyLine();
    refused("compound_angle_sd = -0.1\n", "uncertainty.compound_angle_sd", "from 0 to 5", l);
    refused("compound_angle_sd = \"lots\"\n", "uncertainty.compound_angle_sd", "an angle", l);
    refused("cross_reading = -0.01\n", "uncertainty.cross_reading", "0 or more", l);
    refused("saddle_reading = 25\n", "uncertainty.saddle_reading", "less than one turn", l);
    refused("cross_backlash = \"unknwon\"\n", "uncertainty.cross_backlash", "unknown", l);
    refused("tip_height_sd = 2\n", "uncertainty.tip_height_sd", "less than 1 mm", l);
    refused("nose_radius_sd = 0.5\n", "uncertainty.nose_radius_sd", "less than half", l);
    refused("nose_radius_sd = \"ISO\"\n", "uncertainty.nose_radius_sd", "\"iso\"", l);
    refused("measuring_sd = \"2 µm\"\n", "uncertainty.measuring_sd", "a number", l);
    refused("tip_height = 0.1\n", "uncertainty.tip_height", "did you mean 'tip_height_sd'", l);
}

TEST_CASE("uncertainty: written back by the scene writer, read back the same",
          "[io][uncertainty]") {
    const Scene s = read(R"(compound_angle_sd = 0.03
cross_reading = 0.01
saddle_backlash = "unknown"
tip_height_sd = 0.05
nose_radius_sd = "iso"
measuring_sd = 0.002
)");
    const Scene back = io::readSceneText(io::sceneToToml(s), "back.toml");
    const Uncertainty& u = back.uncertainty;
    CHECK(u.compoundAngleSdRad == Approx(degToRad(0.03)));
    CHECK(u.crossReadingMm == Approx(0.01));
    CHECK(u.saddleBacklash == BacklashKnowledge::Unknown);
    CHECK(u.tipHeightSdMm == Approx(0.05));
    // The class's ±0.13 (uniform) comes back as its sd, 0.13/√3 (references R11).
    CHECK(u.noseRadiusSdMm == Approx(0.13 / std::sqrt(3.0)));
    CHECK(u.measuringSdMm == Approx(0.002));
}
