// The scene writer: a scene written as TOML reads back to the same values, in its own units;
// planned scenes round-trip through the reader and still prove themselves in the kernel.
#include "swarf/io/scene_reader.h"
#include "swarf/io/scene_writer.h"
#include "swarf/sim/error.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/planner.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <filesystem>
#include <fstream>
#include <string>

namespace fs = std::filesystem;
using namespace swarf;

namespace {

std::string scenePath(const std::string& name) {
    return std::string(SWARF_SCENES_DIR) + "/" + name;
}

// Relative closeness for values written with 12 significant digits.
bool near(double a, double b) {
    return std::fabs(a - b) <= 1e-9 * std::max(1.0, std::fabs(a));
}

void checkSame(const Scene& a, const Scene& b) {
    CHECK(a.name == b.name);
    CHECK(a.description == b.description);
    CHECK(a.units == b.units);
    CHECK(near(a.stock.diameterMm, b.stock.diameterMm));
    CHECK(near(a.stock.stickOutMm, b.stock.stickOutMm));
    CHECK(near(a.stock.faceAllowanceMm, b.stock.faceAllowanceMm));
    CHECK(a.stock.tailstockSupport == b.stock.tailstockSupport);
    CHECK(a.stock.material == b.stock.material);
    REQUIRE(a.part.features.size() == b.part.features.size());
    CHECK(a.part.toleranceClass == b.part.toleranceClass);
    for (std::size_t i = 0; i < a.part.features.size(); ++i) {
        const Feature &x = a.part.features[i], &y = b.part.features[i];
        INFO("feature " << i);
        CHECK(x.kind == y.kind);
        CHECK(x.name == y.name);
        CHECK(near(x.zStartMm, y.zStartMm));
        CHECK(near(x.zEndMm, y.zEndMm));
        CHECK(near(x.diameterMm, y.diameterMm));
        CHECK(near(x.toleranceMm, y.toleranceMm));
        if (x.kind == FeatureKind::Cone || x.kind == FeatureKind::Chamfer) {
            CHECK(near(x.cone.gaugeZMm, y.cone.gaugeZMm));
            CHECK(near(x.cone.gaugeDiameterMm, y.cone.gaugeDiameterMm));
            CHECK(near(x.cone.halfAngleRad, y.cone.halfAngleRad));
            CHECK(x.cone.widens == y.cone.widens);
            CHECK(near(x.angleToleranceRad, y.angleToleranceRad));
        }
    }
    CHECK(a.tool.shape == b.tool.shape);
    CHECK(near(a.tool.noseRadiusMm, b.tool.noseRadiusMm));
    CHECK(near(a.tool.enteringAngleRad, b.tool.enteringAngleRad));
    CHECK(near(a.tool.includedAngleRad, b.tool.includedAngleRad));
    CHECK(a.tool.hand == b.tool.hand);
    CHECK(near(a.tool.tipHeightMm, b.tool.tipHeightMm));
    const Setup &s = a.setup, &t = b.setup;
    CHECK(near(s.compoundReadingRad, t.compoundReadingRad));
    CHECK(s.compoundScale == t.compoundScale);
    CHECK(s.compoundAdvanceToward == t.compoundAdvanceToward);
    CHECK(s.compoundAdvanceAcross == t.compoundAdvanceAcross);
    CHECK(s.approach == t.approach);
    CHECK(near(s.windBackTurns, t.windBackTurns));
    CHECK(near(s.compoundErrorRad, t.compoundErrorRad));
    CHECK(s.crossDial == t.crossDial);
    CHECK(near(s.zeroDiameterMm, t.zeroDiameterMm));
    CHECK(near(s.zeroZMm, t.zeroZMm));
    for (auto [p, q] :
         {std::pair{&s.compound, &t.compound}, {&s.cross, &t.cross}, {&s.saddle, &t.saddle}}) {
        CHECK(near(p->mmPerDivision, q->mmPerDivision));
        CHECK(p->divisionsPerTurn == q->divisionsPerTurn);
        CHECK(near(p->backlashMm, q->backlashMm));
    }
    REQUIRE(a.plan.passes.size() == b.plan.passes.size());
    for (std::size_t i = 0; i < a.plan.passes.size(); ++i) {
        const Pass &p = a.plan.passes[i], &q = b.plan.passes[i];
        INFO("pass " << i);
        CHECK(p.kind == q.kind);
        CHECK(p.note == q.note);
        CHECK(near(p.crossMm, q.crossMm));
        CHECK(near(p.compoundMm, q.compoundMm));
        CHECK(near(p.saddleMm, q.saddleMm));
        CHECK(near(p.fromMm, q.fromMm));
        CHECK(near(p.toMm, q.toMm));
        CHECK(near(p.feedMmPerRev, q.feedMmPerRev));
        CHECK(p.compoundAngleRad.has_value() == q.compoundAngleRad.has_value());
        if (p.compoundAngleRad && q.compoundAngleRad)
            CHECK(near(*p.compoundAngleRad, *q.compoundAngleRad));
        CHECK(p.compoundErrorRad.has_value() == q.compoundErrorRad.has_value());
        if (p.compoundErrorRad && q.compoundErrorRad)
            CHECK(near(*p.compoundErrorRad, *q.compoundErrorRad));
        CHECK(p.retractToMm.has_value() == q.retractToMm.has_value());
        if (p.retractToMm && q.retractToMm)
            CHECK(near(*p.retractToMm, *q.retractToMm));
    }
    CHECK(a.planning.placing == b.planning.placing);
    CHECK(a.planning.roughing == b.planning.roughing);
    CHECK(near(a.planning.maxDepthMm, b.planning.maxDepthMm));
    CHECK(a.expect.withinTolerance == b.expect.withinTolerance);
    CHECK(a.expect.noFindings == b.expect.noFindings);
}

} // namespace

TEST_CASE("the demo scene round-trips through the writer", "[io][writer]") {
    const Scene a = io::readScene(scenePath("fixture-arbor.toml"));
    const std::string text = io::sceneToToml(a, {"a comment", "with \"quotes\""});
    CHECK(text.rfind("# a comment\n", 0) == 0);
    const Scene b = io::readSceneText(text, "round-trip.toml");
    checkSame(a, b);
}

TEST_CASE("passes with compound settings of their own round-trip", "[io][writer]") {
    Scene a = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    REQUIRE(a.plan.passes.size() >= 2);
    a.plan.passes[1].compoundAngleRad = a.setup.compoundReadingRad + degToRad(0.03);
    a.plan.passes[1].compoundErrorRad = degToRad(-0.01);
    const std::string text = io::sceneToToml(a);
    CHECK_THAT(text, Catch::Contains("compound_angle = "));
    CHECK_THAT(text, Catch::Contains("compound_error = "));
    checkSame(a, io::readSceneText(text, "two-settings.toml"));
}

TEST_CASE("strings with quotes, backslashes and newlines survive", "[io][writer]") {
    Scene a = io::readScene(scenePath("plan-lathe-centre.toml"));
    a.description = "a \"quoted\" C:\\path\nsecond line\ttab";
    const Scene b = io::readSceneText(io::sceneToToml(a), "x.toml");
    CHECK(b.description == a.description);
}

TEST_CASE("planned scenes round-trip and still prove themselves", "[io][writer][planner]") {
    int count = 0;
    for (const auto& e : fs::directory_iterator(SWARF_SCENES_DIR)) {
        const std::string name = e.path().filename().string();
        if (name.rfind("plan-", 0) != 0 || e.path().extension() != ".toml")
            continue;
        INFO(name);
        const Scene scene = io::readScene(e.path().string());
        const ConePlan plan = planCone(scene);
        if (!plan.planned) {
            // Only the flank-rub scene may be refused, and then with suggestions.
            CHECK(name == "plan-valve-seat-rub.toml");
            CHECK_FALSE(plan.suggestions.empty());
            continue;
        }
        const Scene back = io::readSceneText(io::sceneToToml(plan.scene), name);
        checkSame(plan.scene, back);
        const CutResult r = simulate(back);
        // A fillet in a corner against a shoulder is the drawing's to settle, not the plan's.
        for (const Finding& f : r.findings)
            if (f.kind != FindingKind::CornerFillet)
                FAIL_CHECK(findingKindName(f.kind) << ": " << f.message);
        CHECK(r.withinTolerance);
        ++count;
    }
    CHECK(count >= 11);
}

TEST_CASE("an inch scene is written back in inch", "[io][writer][units]") {
    const Scene a = io::readScene(scenePath("plan-morse-3-inch.toml"));
    const std::string text = io::sceneToToml(a);
    CHECK(text.find("units = \"inch\"") != std::string::npos);
    CHECK(text.find("diameter = 1.0\n") != std::string::npos); // the 1 in bar, not 25.4
    checkSame(a, io::readSceneText(text, "inch.toml"));
}

TEST_CASE("writing is atomic and fails cleanly", "[io][writer]") {
    const fs::path dir = fs::temp_directory_path() / "swarf-writer-test";
    fs::remove_all(dir);
    fs::create_directories(dir);
    const Scene a = io::readScene(scenePath("fixture-arbor.toml"));
    const std::string path = (dir / "out.toml").string();
    io::writeScene(a, path);
    CHECK(fs::exists(path));
    CHECK_FALSE(fs::exists(path + ".tmp"));
    checkSame(a, io::readScene(path));
    const std::string bad = (dir / "no-such-folder" / "out.toml").string();
    CHECK_THROWS_AS(io::writeScene(a, bad), OutputError);
    CHECK_FALSE(fs::exists(bad));
    CHECK_FALSE(fs::exists(bad + ".tmp"));
    fs::remove_all(dir);
}
