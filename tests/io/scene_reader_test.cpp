// Tests of swarf::io::readScene: every key, defaults, inch/mm equivalence, cone forms.
#include "swarf/io/scene_reader.h"
#include "swarf/io/scene_writer.h"
#include "swarf/sim/error.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <string>

using namespace swarf;

namespace {

// A scene that uses every key of scenes/README.md at least once (values invented).
const char* kEveryKey = R"(
name = "every key"
description = "uses every key"
units = "mm"

[stock]
diameter = 40
length = 200.0
stick_out = 120.0
face_allowance = 1.5
material = "brass"
tailstock = true

[part]
tolerance_class = "f"

[[part.feature]]
kind = "chamfer"
name = "edge break"
at = 0.0
length = 1.0
angle = 30
diameter = 20.0
widens_toward = "chuck"
tolerance = 0.1
angle_tolerance = 1.0

[[part.feature]]
kind = "cylinder"
name = "spigot"
from = 1.0
to = 10.0
diameter = 20.0
tolerance = 0.01

[[part.feature]]
kind = "face"
name = "shoulder"
at = 10.0
diameter = 30.0
tolerance = 0.05

[[part.feature]]
kind = "cone"
name = "seat"
from = 10.0
to = 60.0
gauge_plane = 20.0
gauge_diameter = 31.0
half_angle = "2°51′45″"
widens_toward = "chuck"
tolerance = 0.015
angle_tolerance = 0.02

[tool]
shape = "V"
nose_radius = 0.2
entering_angle = 72.5
hand = "L"
edge_length = 16.0
tip_height = -0.1
thickness = 4.76

[setup]
spindle_rpm = 900
approach = "take_up"
wind_back = 0.5

[setup.compound]
angle = 87.0
scale = "cross_slide"
error = 0.01
advance = "chuck"
across = "out"
per_division = 0.025
divisions = 80
backlash = 0.03
travel = 75

[setup.cross]
dial = "radius"
zero_diameter = 40.0
per_division = 0.01
divisions = 200
backlash = 0.02
travel = 120

[setup.saddle]
zero_z = -1.5
per_division = 0.05
divisions = 300
backlash = 0.15
travel = 500

[[plan.pass]]
kind = "saddle"
note = "turn the spigot"
cross = 10.0
compound = 0.0
from = 0.0
to = 10.0
feed = 0.12
retract_to = 8.0

[[plan.pass]]
kind = "cross"
note = "face the shoulder"
compound = 0.0
saddle = 10.0
from = 10.0
to = 0.0
feed = 0.05

[[plan.pass]]
kind = "compound"
cross = 4.0
saddle = 62
from = 0.0
to = 55.0
feed = 0.08

[[plan.pass]]
kind = "path"
note = "CNC finish"
points = [[62.0, 37.0], [10.0, 31.0], [10, 30]]
feed = 0.07

[planning]
max_depth = 0.8
finish_allowance = 0.15
rough_feed = 0.2
finish_feed = 0.06
placing = "reference_shoulder"
roughing = "saddle_steps"
roll_diameter = 4.0

[sim]
profile_step = 0.005
angle_samples = 90

[expect]
verdict = "out_of_tolerance"
findings = ["left_on", "overcut"]
no_findings = false

[gauge_blocks]
sizes = [1.0, 1.005, 2, 50.0]
)";

// The smallest scene: only required keys.
const char* kMinimal = R"(
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
shape = "C"
nose_radius = 0.8
entering_angle = 95

[setup.compound]
angle = 1.4321
advance = "tailstock"

[setup.cross]
zero_diameter = 30
)";

std::string replaced(std::string s, const std::string& from, const std::string& to) {
    const auto at = s.find(from);
    REQUIRE(at != std::string::npos);
    return s.replace(at, from.size(), to);
}

} // namespace

TEST_CASE("every key of the scene format is read", "[io][scene]") {
    const Scene s = io::readSceneText(kEveryKey, "every.toml");
    CHECK(s.name == "every key");
    CHECK(s.description == "uses every key");
    CHECK(s.units == Units::Mm);
    CHECK(s.file == "every.toml");

    CHECK(s.stock.diameterMm == 40);
    CHECK(s.stock.lengthMm == 200);
    CHECK(s.stock.stickOutMm == 120);
    CHECK(s.stock.faceAllowanceMm == 1.5);
    CHECK(s.stock.material == "brass");
    CHECK(s.stock.tailstockSupport);
    CHECK(s.stock.where.line == 6);

    CHECK(s.part.toleranceClass == Iso2768::f);
    REQUIRE(s.part.features.size() == 4);
    const Feature& ch = s.part.features[0];
    CHECK(ch.kind == FeatureKind::Chamfer);
    CHECK(ch.name == "edge break");
    CHECK(ch.zStartMm == 0);
    CHECK(ch.zEndMm == 1);
    CHECK(ch.cone.halfAngleRad == Approx(degToRad(30)));
    // derived: a 30° chamfer 1 long takes tan 30° off the radius
    CHECK(ch.cone.diameterAt(1.0) == Approx(20.0));
    CHECK(ch.cone.diameterAt(0.0) == Approx(20.0 - 2 * std::tan(degToRad(30))));
    CHECK(ch.toleranceMm == 0.1);
    CHECK(ch.angleToleranceRad == Approx(degToRad(1)));
    CHECK_FALSE(ch.toleranceFromClass);
    CHECK_FALSE(ch.angleToleranceFromClass);

    const Feature& cyl = s.part.features[1];
    CHECK(cyl.kind == FeatureKind::Cylinder);
    CHECK(cyl.diameterMm == 20);
    CHECK(cyl.toleranceMm == 0.01);
    const Feature& face = s.part.features[2];
    CHECK(face.kind == FeatureKind::Face);
    CHECK(face.zStartMm == 10);
    CHECK(face.zEndMm == 10);
    CHECK(face.diameterMm == 30);
    const Feature& cone = s.part.features[3];
    CHECK(cone.kind == FeatureKind::Cone);
    CHECK(cone.cone.gaugeZMm == 20);
    CHECK(cone.cone.gaugeDiameterMm == 31);
    CHECK(cone.cone.halfAngleRad == Approx(degToRad(2 + 51 / 60.0 + 45 / 3600.0)));
    CHECK(cone.cone.widens == Widens::TowardChuck);
    CHECK(cone.toleranceMm == 0.015);
    CHECK(cone.angleToleranceRad == Approx(degToRad(0.02)));
    CHECK(cone.coneGivenAs == "half angle");

    CHECK(s.tool.shape == 'V');
    CHECK(s.tool.includedAngleRad == Approx(degToRad(35))); // Source: references R8
    CHECK(s.tool.noseRadiusMm == 0.2);
    CHECK(s.tool.enteringAngleRad == Approx(degToRad(72.5)));
    CHECK(s.tool.hand == Hand::L);
    CHECK(s.tool.edgeLengthMm == 16);
    CHECK(s.tool.tipHeightMm == -0.1);
    CHECK(s.tool.thicknessMm == 4.76);

    CHECK(s.setup.spindleRpm.value() == 900);
    CHECK(s.setup.approach == Approach::TakeUp);
    CHECK(s.setup.compoundReadingRad == Approx(degToRad(87)));
    CHECK(s.setup.compoundScale == CompoundScale::FromCrossSlide);
    CHECK(s.setup.compoundErrorRad == Approx(degToRad(0.01)));
    CHECK(s.setup.compoundAdvanceToward == Widens::TowardChuck);
    CHECK(s.setup.compoundAdvanceAcross == Across::Out);
    CHECK(s.setup.windBackTurns == 0.5);
    // Source: references R5 (a scale graduated from the cross-slide reads 90° − θ)
    CHECK(s.setup.compoundAxisAngleRad() == Approx(degToRad(3.01)));
    CHECK(s.setup.compound.mmPerDivision == 0.025);
    CHECK(s.setup.compound.divisionsPerTurn == 80);
    CHECK(s.setup.compound.backlashMm == 0.03);
    CHECK(s.setup.compound.travelMm == 75);
    CHECK(s.setup.crossDial == DialMode::Radius);
    CHECK(s.setup.zeroDiameterMm == 40);
    CHECK(s.setup.cross.mmPerDivision == 0.01);
    CHECK(s.setup.cross.divisionsPerTurn == 200);
    CHECK(s.setup.cross.backlashMm == 0.02);
    CHECK(s.setup.cross.travelMm == 120);
    CHECK(s.setup.zeroZMm == -1.5);
    CHECK(s.setup.saddle.mmPerDivision == 0.05);
    CHECK(s.setup.saddle.divisionsPerTurn == 300);
    CHECK(s.setup.saddle.backlashMm == 0.15);
    CHECK(s.setup.saddle.travelMm == 500);

    REQUIRE(s.plan.passes.size() == 4);
    const Pass& p0 = s.plan.passes[0];
    CHECK(p0.kind == PassKind::Saddle);
    CHECK(p0.note == "turn the spigot");
    CHECK(p0.crossMm == 10);
    CHECK(p0.compoundMm == 0);
    CHECK(p0.fromMm == 0);
    CHECK(p0.toMm == 10);
    CHECK(p0.feedMmPerRev == 0.12);
    CHECK(p0.retractToMm == std::optional<double>(8.0));
    CHECK_FALSE(s.plan.passes[1].retractToMm.has_value());
    CHECK(s.plan.passes[1].kind == PassKind::CrossSlide);
    CHECK(s.plan.passes[1].saddleMm == 10);
    CHECK(s.plan.passes[2].kind == PassKind::Compound);
    CHECK(s.plan.passes[2].saddleMm == 62);
    const Pass& path = s.plan.passes[3];
    CHECK(path.kind == PassKind::Path);
    REQUIRE(path.pathZX.size() == 3);
    CHECK(path.pathZX[0].first == 62);
    CHECK(path.pathZX[0].second == 18.5); // diameter 37 → radius
    CHECK(path.pathZX[2].second == 15);
    CHECK(path.feedMmPerRev == 0.07);

    CHECK(s.planning.maxDepthMm == 0.8);
    CHECK(s.planning.finishAllowanceMm == 0.15);
    CHECK(s.planning.roughFeedMmPerRev == 0.2);
    CHECK(s.planning.finishFeedMmPerRev == 0.06);
    CHECK(s.planning.placing == PlanningOptions::Placing::ReferenceShoulder);
    CHECK(s.planning.roughing == PlanningOptions::Roughing::SaddleSteps);
    CHECK(s.planning.rollDiameterMm == 4);
    CHECK(s.sim.profileStepMm == 0.005);
    CHECK(s.sim.angleSamples == 90);
    CHECK(s.expect.withinTolerance == std::optional<bool>(false));
    CHECK(s.expect.findings == std::vector<std::string>{"left_on", "overcut"});
    CHECK_FALSE(s.expect.noFindings);
    CHECK(s.gaugeBlocksMm == std::vector<double>{1.0, 1.005, 2.0, 50.0});
}

TEST_CASE("defaults of an omitted key", "[io][scene]") {
    const Scene s = io::readSceneText(kMinimal, "dir/minimal.toml");
    CHECK(s.name == "minimal.toml");
    CHECK(s.units == Units::Mm);
    CHECK(s.stock.faceAllowanceMm == 0);
    CHECK_FALSE(s.stock.tailstockSupport);
    CHECK(s.part.toleranceClass == Iso2768::m);
    const Feature& f = s.part.features.at(0);
    CHECK(f.name == "feature 1");
    CHECK(f.toleranceFromClass);
    CHECK(f.angleToleranceFromClass);
    // Source: references R9 (ISO 2768-1 class m, over 6 up to 30 mm: ±0.2)
    CHECK(f.toleranceMm == Approx(0.2));
    // Source: references R9 (ISO 2768-1 class m, shorter leg 10–50 mm: ±30′)
    CHECK(f.angleToleranceRad == Approx(degToRad(0.5)));
    CHECK(s.tool.hand == Hand::R);
    CHECK(s.tool.tipHeightMm == 0);
    CHECK(s.tool.includedAngleRad == Approx(degToRad(80))); // Source: references R8
    CHECK(s.setup.compoundScale == CompoundScale::FromAxis);
    CHECK(s.setup.compoundErrorRad == 0);
    CHECK(s.setup.crossDial == DialMode::Diameter);
    CHECK(s.setup.compound.mmPerDivision == 0.02);
    CHECK(s.setup.cross.backlashMm == 0);
    CHECK(s.setup.zeroZMm == 0);
    CHECK(s.setup.approach == Approach::InOrder);
    CHECK(s.setup.windBackTurns == 0.25);
    // A scene written before `across` existed: the compound goes in as its reading grows.
    CHECK(s.setup.compoundAdvanceAcross == Across::In);
    CHECK(s.plan.passes.empty());
    CHECK(s.planning.maxDepthMm == 1.0);
    CHECK(s.sim.profileStepMm == 0.002);
    CHECK(s.sim.angleSamples == 180);
    CHECK_FALSE(s.expect.withinTolerance.has_value());
    CHECK(s.gaugeBlocksMm.empty());
}

TEST_CASE("inch and mm scenes give the same scene", "[io][scene][units]") {
    const char* inch = R"(
units = "inch"
[stock]
diameter = 1.25
length = 6
stick_out = 3.5
face_allowance = 0.05
[[part.feature]]
kind = "cone"
from = 0.0
to = 2.0
gauge_plane = 2.0
gauge_diameter = 1.0
taper_per_foot = 0.6
widens_toward = "chuck"
tolerance = 0.001
[tool]
shape = "T"
nose_radius = 0.015625
holder = "L"
edge_length = 0.5
tip_height = 0.002
[setup.compound]
angle = 1.5
advance = "tailstock"
per_division = 0.001
backlash = 0.002
travel = 3
[setup.cross]
dial = "radius"
zero_diameter = 1.25
per_division = 0.001
[setup.saddle]
zero_z = 0.1
[[plan.pass]]
kind = "compound"
cross = 0.01
saddle = 2.1
from = 0
to = 2.2
feed = 0.003
[[plan.pass]]
kind = "path"
points = [[2.1, 1.0], [0.0, 0.8]]
feed = 0.002
[planning]
max_depth = 0.04
finish_allowance = 0.004
rough_feed = 0.006
finish_feed = 0.002
roll_diameter = 0.25
[sim]
profile_step = 0.0001
[gauge_blocks]
sizes = [0.1, 0.1001, 1.0]
)";
    const char* mm = R"(
units = "mm"
[stock]
diameter = 31.75
length = 152.4
stick_out = 88.9
face_allowance = 1.27
[[part.feature]]
kind = "cone"
from = 0.0
to = 50.8
gauge_plane = 50.8
gauge_diameter = 25.4
taper_per_foot = 0.6
widens_toward = "chuck"
tolerance = 0.0254
[tool]
shape = "T"
nose_radius = 0.396875
holder = "L"
edge_length = 12.7
tip_height = 0.0508
[setup.compound]
angle = 1.5
advance = "tailstock"
per_division = 0.0254
backlash = 0.0508
travel = 76.2
[setup.cross]
dial = "radius"
zero_diameter = 31.75
per_division = 0.0254
[setup.saddle]
zero_z = 2.54
[[plan.pass]]
kind = "compound"
cross = 0.254
saddle = 53.34
from = 0
to = 55.88
feed = 0.0762
[[plan.pass]]
kind = "path"
points = [[53.34, 25.4], [0.0, 20.32]]
feed = 0.0508
[planning]
max_depth = 1.016
finish_allowance = 0.1016
rough_feed = 0.1524
finish_feed = 0.0508
roll_diameter = 6.35
[sim]
profile_step = 0.00254
[gauge_blocks]
sizes = [2.54, 2.54254, 25.4]
)";
    const Scene a = io::readSceneText(inch, "inch.toml");
    const Scene b = io::readSceneText(mm, "mm.toml");
    CHECK(a.units == Units::Inch);
    CHECK(b.units == Units::Mm);
    auto same = [](double x, double y) { CHECK(x == Approx(y).margin(1e-9)); };
    same(a.stock.diameterMm, b.stock.diameterMm);
    same(a.stock.lengthMm, b.stock.lengthMm);
    same(a.stock.stickOutMm, b.stock.stickOutMm);
    same(a.stock.faceAllowanceMm, b.stock.faceAllowanceMm);
    const Feature& fa = a.part.features[0];
    const Feature& fb = b.part.features[0];
    same(fa.zStartMm, fb.zStartMm);
    same(fa.zEndMm, fb.zEndMm);
    same(fa.cone.gaugeZMm, fb.cone.gaugeZMm);
    same(fa.cone.gaugeDiameterMm, fb.cone.gaugeDiameterMm);
    same(fa.cone.halfAngleRad, fb.cone.halfAngleRad); // taper per foot is in/ft in both
    same(fa.toleranceMm, fb.toleranceMm);
    same(fa.angleToleranceRad, fb.angleToleranceRad);
    same(a.tool.noseRadiusMm, b.tool.noseRadiusMm);
    same(a.tool.edgeLengthMm, b.tool.edgeLengthMm);
    same(a.tool.tipHeightMm, b.tool.tipHeightMm);
    same(a.tool.enteringAngleRad, degToRad(95)); // Source: references R8 (holder L, 95°)
    same(a.setup.compoundAxisAngleRad(), b.setup.compoundAxisAngleRad());
    same(a.setup.compound.mmPerDivision, b.setup.compound.mmPerDivision);
    same(a.setup.compound.backlashMm, b.setup.compound.backlashMm);
    same(a.setup.compound.travelMm, b.setup.compound.travelMm);
    same(a.setup.cross.mmPerDivision, b.setup.cross.mmPerDivision);
    same(a.setup.zeroDiameterMm, b.setup.zeroDiameterMm);
    same(a.setup.zeroZMm, b.setup.zeroZMm);
    REQUIRE(a.plan.passes.size() == 2);
    for (int i = 0; i < 2; ++i) {
        const Pass& pa = a.plan.passes[i];
        const Pass& pb = b.plan.passes[i];
        same(pa.crossMm, pb.crossMm);
        same(pa.saddleMm, pb.saddleMm);
        same(pa.fromMm, pb.fromMm);
        same(pa.toMm, pb.toMm);
        same(pa.feedMmPerRev, pb.feedMmPerRev);
        REQUIRE(pa.pathZX.size() == pb.pathZX.size());
        for (std::size_t j = 0; j < pa.pathZX.size(); ++j) {
            same(pa.pathZX[j].first, pb.pathZX[j].first);
            same(pa.pathZX[j].second, pb.pathZX[j].second);
        }
    }
    same(a.planning.maxDepthMm, b.planning.maxDepthMm);
    same(a.planning.finishAllowanceMm, b.planning.finishAllowanceMm);
    same(a.planning.roughFeedMmPerRev, b.planning.roughFeedMmPerRev);
    same(a.planning.finishFeedMmPerRev, b.planning.finishFeedMmPerRev);
    same(a.planning.rollDiameterMm, b.planning.rollDiameterMm);
    same(a.sim.profileStepMm, b.sim.profileStepMm);
    REQUIRE(a.gaugeBlocksMm.size() == 3);
    for (int i = 0; i < 3; ++i)
        same(a.gaugeBlocksMm[i], b.gaugeBlocksMm[i]);
    // Defaults follow the scene's units: a 0.001 in dial division when none is given.
    const Scene c =
        io::readSceneText(replaced(inch, "per_division = 0.001\nbacklash", "backlash"), "c.toml");
    same(c.setup.compound.mmPerDivision, 0.0254);
}

TEST_CASE("setup approach: in_order or take_up, written back, anything else refused",
          "[io][scene]") {
    const std::string takeUp = replaced(kMinimal, "[setup.compound]",
                                        "[setup]\napproach = \"take_up\"\n\n[setup.compound]");
    const Scene s = io::readSceneText(takeUp, "t.toml");
    CHECK(s.setup.approach == Approach::TakeUp);
    // The writer keeps it, and the default comes back as the default.
    CHECK(io::readSceneText(io::sceneToToml(s), "w.toml").setup.approach == Approach::TakeUp);
    const Scene d = io::readSceneText(kMinimal, "d.toml");
    CHECK(io::readSceneText(io::sceneToToml(d), "w.toml").setup.approach == Approach::InOrder);

    const std::string bad =
        replaced(kMinimal, "[setup.compound]", "[setup]\napproach = \"below\"\n\n[setup.compound]");
    try {
        io::readSceneText(bad, "bad.toml");
        FAIL("an unknown approach was accepted");
    } catch (const InputError& e) {
        CHECK(e.key() == "setup.approach");
        CHECK(e.where().line == 22); // kMinimal's [setup.compound] was on line 21
        CHECK(e.expected().find("in_order") != std::string::npos);
        CHECK(e.expected().find("take_up") != std::string::npos);
    }
}

TEST_CASE("the compound's sense across, the wind-back and the back-out: read, refused when wrong",
          "[io][scene]") {
    const Scene out = io::readSceneText(
        replaced(kMinimal, "advance = \"tailstock\"", "advance = \"chuck\"\nacross = \"out\""),
        "o.toml");
    CHECK(out.setup.compoundAdvanceToward == Widens::TowardChuck);
    CHECK(out.setup.compoundAdvanceAcross == Across::Out);
    CHECK(io::readSceneText(io::sceneToToml(out), "w.toml").setup.compoundAdvanceAcross ==
          Across::Out);
    auto refused = [](const std::string& text, const std::string& key, const std::string& part) {
        try {
            io::readSceneText(text, "bad.toml");
            FAIL("accepted: " << key);
        } catch (const InputError& e) {
            CHECK(e.key() == key);
            CHECK(e.expected().find(part) != std::string::npos);
        }
    };
    refused(
        replaced(kMinimal, "advance = \"tailstock\"", "advance = \"tailstock\"\nacross = \"up\""),
        "setup.compound.across", "in");
    // A wind-back of a tenth of a turn (0.2 mm) does not take up 0.3 mm of backlash.
    refused(replaced(kMinimal, "[setup.compound]",
                     "[setup]\napproach = \"take_up\"\nwind_back = 0.1\n\n[setup.compound]\n"
                     "backlash = 0.3"),
            "setup.wind_back", "backlash");
    // Backed out to 1.0 after a pass at 0.5: that is further in, not out.
    const std::string pass = "\n[[plan.pass]]\nkind = \"compound\"\ncross = 0.5\nfrom = 0\n"
                             "to = 10\nfeed = 0.1\nretract_to = 1.0\n";
    refused(std::string(kMinimal) + pass, "plan.pass[1].retract_to", "at most 0.5");
}

TEST_CASE("every form of a cone gives the same cone", "[io][scene][cone]") {
    // derived: 1:20 on diameter ⇔ C = 0.05 ⇔ θ = atan(0.025); 0.6 in/ft = 0.05 C.
    const double theta = std::atan(0.025);
    const char* forms[] = {
        "ratio = 20",
        "ratio = \"1:20\"",
        "taper_per_foot = 0.6",
        "half_angle = 1.4320961841646465",
        "included_angle = 2.864192368329293",
        "second_plane = 10.0\nsecond_diameter = 27.0",
    };
    for (const char* form : forms) {
        INFO(form);
        const Scene s = io::readSceneText(replaced(kMinimal, "ratio = 20", form), "form.toml");
        const Cone& c = s.part.features[0].cone;
        CHECK(c.halfAngleRad == Approx(theta).epsilon(1e-12));
        CHECK(c.gaugeDiameterMm == 28);
        CHECK(c.widens == Widens::TowardChuck);
        CHECK(c.diameterAt(10) == Approx(27));
    }
    // Two diameters fix the direction too: larger toward the tailstock here.
    const Scene t = io::readSceneText(
        replaced(replaced(kMinimal, "ratio = 20", "second_plane = 10.0\nsecond_diameter = 29.0"),
                 "widens_toward = \"chuck\"", ""),
        "t.toml");
    CHECK(t.part.features[0].cone.widens == Widens::TowardTailstock);
}

TEST_CASE("a standard taper fills in the taper and its gauge diameter", "[io][scene][cone]") {
    const std::string text = replaced(replaced(kMinimal, "ratio = 20", "standard = \"Morse 3\""),
                                      "gauge_diameter = 28", "");
    const Scene s = io::readSceneText(text, "morse.toml");
    const Feature& f = s.part.features[0];
    // Source: references R3 (Morse 3: 1:19.922, gauge diameter 0.938 in)
    CHECK(f.cone.gaugeDiameterMm == Approx(0.938 * 25.4));
    CHECK(f.cone.ratioK() == Approx(19.922).epsilon(1e-4));
    CHECK(f.coneGivenAs.find("Morse 3") != std::string::npos);
}

TEST_CASE("an ISO 1832 insert code gives shape, nose radius and size", "[io][scene][tool]") {
    const std::string text =
        replaced(kMinimal, "shape = \"C\"\nnose_radius = 0.8", "insert = \"CNMG 120408\"");
    const Scene s = io::readSceneText(text, "insert.toml");
    CHECK(s.tool.shape == 'C');
    CHECK(s.tool.noseRadiusMm == Approx(0.8)); // Source: references R8 (code 08 → 0.8 mm)
    // derived: a C (80°) rhombus's edge from its inscribed circle, 12.7 mm (size code 12).
    CHECK(s.tool.edgeLengthMm == Approx(12.7 / std::sin(80 * std::numbers::pi / 180)));
    CHECK(s.tool.thicknessMm == Approx(4.76));
    // A code and a nose radius that disagree are an error.
    const std::string bad = replaced(kMinimal, "shape = \"C\"", "insert = \"CNMG 120404\"");
    CHECK_THROWS_AS(io::readSceneText(bad, "bad.toml"), InputError);
}

TEST_CASE("part geometry helpers", "[sim][scene]") {
    const Scene s = io::readSceneText(kEveryKey, "every.toml");
    const Part& p = s.part;
    CHECK(p.zMinMm() == 0);
    CHECK(p.zMaxMm() == 60);
    REQUIRE(p.mainCone() != nullptr);
    CHECK(p.mainCone()->name == "seat");
    CHECK(p.nominalRadiusAt(5.0).value() == Approx(10));
    // At the shoulder the cylinder (20), the face (30) and the cone (about 30) meet: the
    // largest is kept.
    CHECK(p.nominalRadiusAt(10.0).value() ==
          Approx(std::max(15.0, p.features[3].cone.diameterAt(10) / 2)));
    CHECK_FALSE(p.nominalRadiusAt(61.0).has_value());
    CHECK(p.features[1].surfaceHalfAngleRad() == 0);
    CHECK(p.features[3].surfaceHalfAngleRad() == Approx(p.features[3].cone.halfAngleRad));
    CHECK(p.features[3].radiusAt(20.0) == Approx(15.5));
}
