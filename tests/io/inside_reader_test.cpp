// Reading inside work (issue 14): the stock's hole, side = "inside" on every kind of feature and
// in every cone form, the boring bar's keys, written back; the inside scenes in
// tests/inside_scenes/.
#include "swarf/io/scene_reader.h"
#include "swarf/io/scene_writer.h"
#include "swarf/sim/error.h"
#include "swarf/sim/inside_work.h"
#include "swarf/sim/scene_notes.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <string>

using namespace swarf;

namespace {

std::string insideScene(const std::string& name) {
    return std::string(SWARF_TEST_DATA_DIR) + "/inside_scenes/" + name;
}

// A sleeve with a 1:10 socket: the cone's taper form is replaced by each test.
const char* kSocket = R"(
units = "mm"
[stock]
diameter = 40.0
length = 150.0
stick_out = 80.0
bore_diameter = 16.0
bore_depth = 50.0
[part]
[[part.feature]]
kind = "cylinder"
from = 0.0
to = 60.0
diameter = 38.0
[[part.feature]]
kind = "cone"
side = "inside"
from = 0.0
to = 40.0
gauge_plane = 0.0
gauge_diameter = 24.0
ratio = 10.0
widens_toward = "tailstock"
[tool]
kind = "boring_bar"
bar_diameter = 12.0
overhang = 50.0
min_bore = 16.0
shape = "C"
nose_radius = 0.4
entering_angle = 95
[setup.compound]
angle = 2.8624
advance = "chuck"
[setup.cross]
zero_diameter = 16.0
)";

std::string replaced(std::string text, const std::string& from, const std::string& to) {
    const auto at = text.find(from);
    REQUIRE(at != std::string::npos);
    return text.replace(at, from.size(), to);
}

} // namespace

TEST_CASE("a Morse 2 socket in a sleeve, in inch: the hole, the inside cone, the boring bar",
          "[io][inside]") {
    const Scene s = io::readScene(insideScene("morse-2-socket-sleeve-inch.toml"));
    constexpr double in = 25.4;
    CHECK(s.stock.hasBore());
    CHECK(s.stock.boreDiameterMm == Approx(0.5625 * in));
    CHECK(s.stock.boreDepthMm == Approx(3.5 * in));
    CHECK(s.stock.boreThrough()); // the hole reaches the jaws' face
    REQUIRE(s.part.features.size() == 2);
    CHECK(s.part.features[0].side == Side::Outside);
    const Feature& socket = s.part.features[1];
    CHECK(socket.side == Side::Inside);
    CHECK(socket.kind == FeatureKind::Cone);
    CHECK(s.part.mainInsideCone() == &socket);
    CHECK(s.part.mainCone() == nullptr); // the outside has no cone
    // Source: references R12 (ISO 296): a socket has the shank's gauge diameter at its mouth;
    // references R3 (Machinery's Handbook): Morse 2 gauge diameter 0.700 in; GOST 25307-82:
    // Morse 2 taper 1:20.020.
    CHECK(socket.cone.gaugeZMm == Approx(0.0).margin(1e-12));
    CHECK(socket.cone.gaugeDiameterMm == Approx(0.700 * in).margin(1e-9));
    CHECK(socket.cone.taperRate() == Approx(1.0 / 20.020).epsilon(1e-9));
    CHECK(socket.cone.widens == Widens::TowardTailstock);
    // derived: 0.700 − 2.6 / 20.020 in at the socket's bottom.
    CHECK(socket.cone.diameterAt(2.6 * in) / in == Approx(0.700 - 2.6 / 20.020).margin(1e-9));
    const Tool& t = s.tool;
    CHECK(t.kind == ToolKind::BoringBar);
    CHECK(t.barDiameterMm == Approx(0.375 * in));
    CHECK(t.overhangMm == Approx(3.0 * in));
    CHECK(t.minBoreMm == Approx(0.5 * in));
    CHECK(t.tipHeightMm == 0.0);          // on centre unless stated
    CHECK(t.noseRadiusMm == Approx(0.4)); // CCMT 060204: corner code 04
    // 8 bar diameters of overhang: the note says what a steel bar takes (common practice).
    bool overhangNote = false;
    for (const std::string& n : sceneNotes(s))
        overhangNote = overhangNote || n.find("8.0 bar diameters") != std::string::npos;
    CHECK(overhangNote);
}

TEST_CASE("a metric 1:10 collet seat: inside chamfer, cone, relief and bottom face",
          "[io][inside]") {
    const Scene s = io::readScene(insideScene("collet-seat-1-10-bore.toml"));
    REQUIRE(s.part.features.size() == 6);
    const Feature& mouth = s.part.features[2];
    CHECK(mouth.side == Side::Inside);
    CHECK(mouth.kind == FeatureKind::Chamfer);
    // An inside chamfer narrows from its face to the bore's diameter (derived: 26 + 2·1·tan 45°).
    CHECK(mouth.zStartMm == Approx(0.0).margin(1e-12));
    CHECK(mouth.zEndMm == Approx(1.0));
    CHECK(mouth.cone.diameterAt(0.0) == Approx(28.0));
    CHECK(mouth.cone.diameterAt(1.0) == Approx(26.0));
    const Feature& seat = s.part.features[3];
    // Source: references R3 (ISO 1119): 1:10 is 5°43′29.3176″ included.
    CHECK(seat.cone.includedAngleRad() ==
          Approx(degToRad(5.0 + 43.0 / 60.0 + 29.3176 / 3600.0))
              .margin(degToRad(0.00005 / 3600.0)));    // the table's last digit
    CHECK(seat.cone.diameterAt(31.0) == Approx(23.0)); // derived: 26 − 30/10
    CHECK(s.part.features[5].kind == FeatureKind::Face);
    CHECK(s.part.features[5].side == Side::Inside);
    CHECK_FALSE(s.stock.boreThrough()); // 40 mm deep in 70 mm of stick-out
    CHECK(s.stock.boreBottomZMm() == Approx(40.0));
    // The drawing at z: outside features only; the inside ones on their own side, the smaller
    // where two meet (at 31 mm the 22 mm relief, not the cone's 23 mm end).
    CHECK(*s.part.nominalRadiusAt(10.0) == Approx(24.0));
    CHECK(s.part.radialFeatureOnSide(10.0, Side::Inside) == 3);
    CHECK(s.part.radialFeatureOnSide(31.0, Side::Inside) == 4);
    CHECK(s.part.radialFeatureOnSide(35.0, Side::Inside) == 4);
    CHECK(s.part.radialFeatureOnSide(45.0, Side::Inside) == -1);
    // 60 mm on a 16 mm bar is 3.75 diameters: no overhang note.
    for (const std::string& n : sceneNotes(s))
        CHECK(n.find("overhangs") == std::string::npos);
}

TEST_CASE("every form of an inside cone gives the same cone", "[io][inside][cone]") {
    const Scene base = io::readSceneText(kSocket, "socket.toml");
    const Cone& want = base.part.features[1].cone;
    // 1:10 in every form the reader knows (derived from the ratio; ISO 1119 for the standard).
    const char* forms[] = {"half_angle = 2.862405226",
                           "included_angle = \"5°43′29.3176″\"",
                           "ratio = \"1:10\"",
                           "taper_per_foot = 1.2",
                           "second_plane = 40.0\nsecond_diameter = 20.0",
                           "standard = \"1:10\""};
    for (const char* form : forms) {
        INFO(form);
        const Scene s = io::readSceneText(replaced(kSocket, "ratio = 10.0", form), "form.toml");
        const Feature& f = s.part.features[1];
        CHECK(f.side == Side::Inside);
        CHECK(f.cone.halfAngleRad == Approx(want.halfAngleRad).epsilon(1e-8));
        CHECK(f.cone.gaugeDiameterMm == Approx(24.0));
        CHECK(f.cone.widens == Widens::TowardTailstock);
    }
}

TEST_CASE("inside work is written back and reads the same", "[io][inside][writer]") {
    for (const char* name : {"morse-2-socket-sleeve-inch.toml", "collet-seat-1-10-bore.toml"}) {
        INFO(name);
        const Scene a = io::readScene(insideScene(name));
        const Scene b = io::readSceneText(io::sceneToToml(a), "written.toml");
        CHECK(b.stock.boreDiameterMm == Approx(a.stock.boreDiameterMm));
        CHECK(b.stock.boreDepthMm == Approx(a.stock.boreDepthMm));
        REQUIRE(b.part.features.size() == a.part.features.size());
        for (std::size_t i = 0; i < a.part.features.size(); ++i) {
            const Feature& fa = a.part.features[i];
            const Feature& fb = b.part.features[i];
            CHECK(fb.side == fa.side);
            CHECK(fb.kind == fa.kind);
            CHECK(fb.zStartMm == Approx(fa.zStartMm).margin(1e-9));
            CHECK(fb.zEndMm == Approx(fa.zEndMm).margin(1e-9));
            CHECK(fb.radiusAt(fb.zStartMm) == Approx(fa.radiusAt(fa.zStartMm)));
            CHECK(fb.radiusAt(fb.zEndMm) == Approx(fa.radiusAt(fa.zEndMm)));
        }
        CHECK(b.tool.kind == ToolKind::BoringBar);
        CHECK(b.tool.barDiameterMm == Approx(a.tool.barDiameterMm));
        CHECK(b.tool.overhangMm == Approx(a.tool.overhangMm));
        CHECK(b.tool.minBoreMm == Approx(a.tool.minBoreMm));
        CHECK(b.tool.tipHeightMm == Approx(a.tool.tipHeightMm));
    }
}

TEST_CASE("a boring bar's axis height is its tip height; a solid bar has no hole", "[io][inside]") {
    const Scene high = io::readSceneText(replaced(kSocket, "entering_angle = 95",
                                                  "entering_angle = 95\n"
                                                  "axis_height = -0.2"),
                                         "h.toml");
    CHECK(high.tool.tipHeightMm == Approx(-0.2));
    const Scene solid = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    CHECK_FALSE(solid.stock.hasBore());
    CHECK_FALSE(solid.part.hasInside());
    CHECK(solid.tool.kind == ToolKind::Turning);
    CHECK_FALSE(hasInsideWork(solid));
    CHECK_NOTHROW(refuseInsideWork(solid, "run"));
}

TEST_CASE("commands that do not simulate inside work refuse it at its first piece",
          "[io][inside]") {
    const Scene s = io::readScene(insideScene("collet-seat-1-10-bore.toml"));
    CHECK(hasInsideWork(s));
    try {
        refuseInsideWork(s, "run");
        FAIL("inside work was not refused");
    } catch (const InputError& e) {
        CHECK(e.key() == "part.feature[3].side");
        CHECK(e.where().line > 0);
        CHECK(std::string(e.what()).find("swarf run does not simulate") != std::string::npos);
        CHECK(e.exitCode() == kExitBadInput);
    }
}
