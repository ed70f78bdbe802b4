// The cone planner: every planned cone, run through the kernel, is within tolerance with no
// finding; a hand-checked case matches a worked calculation; a cone the insert cannot follow is
// refused with suggestions. Scenes are built in code (made-up scenarios, like those in scenes/).
#include "swarf/sim/compound_sense.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/planner.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <optional>
#include <string>

using namespace swarf;

namespace {

// A made-up job: a cone (or chamfer) from the datum face, an optional body after it.
struct Job {
    std::string name;
    Units units = Units::Mm;
    double stockD = 30, stickOut = 80;
    FeatureKind kind = FeatureKind::Cone;
    double from = 0, to = 50, gaugeZ = 40, gaugeD = 29, halfAngleDeg = 2.862405, tol = 0.02;
    Widens widens = Widens::TowardChuck;
    std::optional<double> bodyD; // a cylinder from `to` to `to + bodyLen`
    double bodyLen = 20;
    char shape = 'D';
    double epsDeg = 55, kappaDeg = 93, noseR = 0.4, edge = 11.6;
    Hand hand = Hand::R;
    DialMode dial = DialMode::Diameter;
    double crossDiv = 0.02, compDiv = 0.02, saddleDiv = 0.1, compTravel = 90, compBacklash = 0.04;
    CompoundScale scale = CompoundScale::FromAxis;
    // The compound's sense as the reading increases (the lathe's; the planner keeps it).
    Widens advance = Widens::TowardTailstock;
    Across across = Across::In;
    PlanningOptions::Placing placing = PlanningOptions::Placing::ZeroOnDiameter;
    PlanningOptions::Roughing roughing = PlanningOptions::Roughing::Compound;
    double maxDepth = 1.0, allowance = 0.1, roughFeed = 0.12, finishFeed = 0.05;
};

// Lengths in a Job are in its units.
Scene makeScene(const Job& j) {
    const Units u = j.units;
    auto mm = [u](double v) { return toMm(v, u); };
    Scene s;
    s.name = j.name;
    s.units = u;
    s.stock.diameterMm = mm(j.stockD);
    s.stock.lengthMm = mm(j.stickOut * 2);
    s.stock.stickOutMm = mm(j.stickOut);
    Feature f;
    f.kind = j.kind;
    f.name = "cone";
    f.zStartMm = mm(j.from);
    f.zEndMm = mm(j.to);
    f.cone = Cone{mm(j.gaugeZ), mm(j.gaugeD), degToRad(j.halfAngleDeg), j.widens};
    f.diameterMm = std::max(f.cone.diameterAt(f.zStartMm), f.cone.diameterAt(f.zEndMm));
    f.toleranceMm = mm(j.tol);
    f.toleranceFromClass = false;
    f.angleToleranceRad = degToRad(0.05);
    s.part.features.push_back(f);
    if (j.bodyD) {
        Feature b;
        b.kind = FeatureKind::Cylinder;
        b.name = "body";
        b.zStartMm = mm(j.to);
        b.zEndMm = mm(j.to + j.bodyLen);
        b.diameterMm = mm(*j.bodyD);
        b.toleranceMm = mm(j.tol) * 2;
        b.toleranceFromClass = false;
        s.part.features.push_back(b);
    }
    s.tool.shape = j.shape;
    s.tool.includedAngleRad = degToRad(j.epsDeg);
    s.tool.enteringAngleRad = degToRad(j.kappaDeg);
    s.tool.noseRadiusMm = mm(j.noseR);
    s.tool.edgeLengthMm = mm(j.edge);
    s.tool.hand = j.hand;
    s.setup.compoundScale = j.scale;
    s.setup.compoundAdvanceToward = j.advance;
    s.setup.compoundAdvanceAcross = j.across;
    s.setup.compoundReadingRad = j.scale == CompoundScale::FromAxis ? 0.0 : kPi / 2;
    s.setup.compound = Slide{mm(j.compDiv), 100, mm(j.compBacklash), mm(j.compTravel)};
    s.setup.cross = Slide{mm(j.crossDiv), j.dial == DialMode::Diameter ? 100 : 200, 0, mm(150)};
    s.setup.crossDial = j.dial;
    s.setup.saddle = Slide{mm(j.saddleDiv), 200, 0, 1e9};
    s.setup.zeroDiameterMm = s.stock.diameterMm;
    s.planning.placing = j.placing;
    s.planning.roughing = j.roughing;
    s.planning.maxDepthMm = mm(j.maxDepth);
    s.planning.finishAllowanceMm = mm(j.allowance);
    s.planning.roughFeedMmPerRev = mm(j.roughFeed);
    s.planning.finishFeedMmPerRev = mm(j.finishFeed);
    s.sim.angleSamples = 36;
    return s;
}

// The planning cases; each mirrors a plan-*.toml scene (made-up numbers, demo scenarios).
std::vector<Job> cases() {
    std::vector<Job> v;
    {
        Job j; // 60° lathe centre, mm, diameter dial, zero on the finished body
        j.name = "60° centre";
        j.stockD = 20, j.stickOut = 60, j.to = 12.990381, j.gaugeZ = 12.990381, j.gaugeD = 18;
        j.halfAngleDeg = 30, j.tol = 0.05, j.bodyD = 18;
        v.push_back(j);
    }
    {
        Job j; // 45° chamfer, radius dial, C insert in L holder, stepped saddle roughing
        j.name = "45° chamfer";
        j.kind = FeatureKind::Chamfer;
        j.stockD = 30, j.stickOut = 50, j.to = 4, j.gaugeZ = 0, j.gaugeD = 22, j.halfAngleDeg = 45;
        j.tol = 0.1, j.bodyD = 30, j.shape = 'C', j.epsDeg = 80, j.kappaDeg = 95, j.noseR = 0.8;
        j.edge = 12.9, j.dial = DialMode::Radius, j.crossDiv = 0.01, j.allowance = 0.15;
        j.scale = CompoundScale::FromCrossSlide;
        j.roughing = PlanningOptions::Roughing::SaddleSteps;
        v.push_back(j);
    }
    {
        Job j; // steep 7:24, reference shoulder at the gauge plane
        j.name = "7:24";
        j.stockD = 40, j.stickOut = 90, j.to = 48, j.gaugeZ = 44, j.gaugeD = 31.75;
        j.halfAngleDeg = radToDeg(std::atan(7.0 / 48.0)), j.tol = 0.02, j.bodyD = 40;
        j.maxDepth = 1.5, j.placing = PlanningOptions::Placing::ReferenceShoulder;
        v.push_back(j);
    }
    {
        Job j; // Morse 3, inch, diameter dial, zero on the finished body
        j.name = "Morse 3 inch";
        j.units = Units::Inch;
        j.stockD = 1.0, j.stickOut = 3.5, j.to = 3.0, j.gaugeZ = 3.0, j.gaugeD = 0.938;
        j.halfAngleDeg = radToDeg(std::atan(0.5 / 19.922)), j.tol = 0.001, j.bodyD = 0.938;
        j.bodyLen = 0.25, j.noseR = 0.0156, j.edge = 0.45, j.crossDiv = 0.001, j.compDiv = 0.001;
        j.saddleDiv = 0.001, j.compTravel = 3.5, j.compBacklash = 0.002, j.maxDepth = 0.04;
        j.allowance = 0.004, j.roughFeed = 0.005, j.finishFeed = 0.002;
        v.push_back(j);
    }
    {
        Job j; // Morse 2, inch, radius dial, reference shoulder
        j.name = "Morse 2 inch";
        j.units = Units::Inch;
        j.stockD = 0.875, j.stickOut = 3.0, j.to = 2.5, j.gaugeZ = 1.5, j.gaugeD = 0.700;
        j.halfAngleDeg = radToDeg(std::atan(0.5 / 20.020)), j.tol = 0.001, j.bodyD = 0.75;
        j.bodyLen = 0.25, j.noseR = 0.0156, j.edge = 0.45, j.dial = DialMode::Radius;
        j.crossDiv = 0.0005, j.compDiv = 0.001, j.saddleDiv = 0.001, j.compTravel = 3.0;
        j.compBacklash = 0.002, j.maxDepth = 0.03, j.allowance = 0.004, j.roughFeed = 0.005;
        j.finishFeed = 0.002, j.placing = PlanningOptions::Placing::ReferenceShoulder;
        v.push_back(j);
    }
    {
        Job j; // shallow 1:50, 120 mm long: two saddle settings of a 70 mm compound
        j.name = "1:50";
        j.stockD = 22, j.stickOut = 160, j.to = 120, j.gaugeZ = 100, j.gaugeD = 20;
        j.halfAngleDeg = radToDeg(std::atan(0.01)), j.bodyD = 20.4, j.shape = 'V', j.epsDeg = 35;
        j.edge = 16.6, j.compTravel = 70, j.maxDepth = 0.8;
        v.push_back(j);
    }
    {
        Job j; // 10° flare narrowing toward the chuck: compound advances toward the chuck
        j.name = "10° flare";
        j.stockD = 25, j.stickOut = 50, j.to = 20, j.gaugeZ = 0, j.gaugeD = 24, j.halfAngleDeg = 10;
        j.tol = 0.05, j.widens = Widens::TowardTailstock, j.advance = Widens::TowardChuck;
        v.push_back(j);
    }
    {
        Job j; // 1:10 arbor with stepped saddle roughing, the bar itself as the reference
        j.name = "1:10 steps";
        j.stockD = 30, j.stickOut = 85, j.to = 50, j.gaugeZ = 40, j.gaugeD = 29;
        j.halfAngleDeg = radToDeg(std::atan(0.05)), j.bodyD = 30;
        j.roughing = PlanningOptions::Roughing::SaddleSteps;
        v.push_back(j);
    }
    {
        Job j; // 1:5 cone between a Ø12 pilot and a Ø30 body: the tool runs out over the pilot
        j.name = "1:5 between pilot and body";
        j.stockD = 32, j.stickOut = 80, j.from = 10, j.to = 40, j.gaugeZ = 40, j.gaugeD = 30;
        j.halfAngleDeg = radToDeg(std::atan(0.1)), j.tol = 0.03, j.bodyD = 30;
        v.push_back(j);
    }
    return v;
}

// The Ø12 pilot in front of the 1:5 cone (the last case).
Scene withPilot(const Job& j) {
    Scene s = makeScene(j);
    Feature p;
    p.kind = FeatureKind::Cylinder;
    p.name = "pilot";
    p.zStartMm = 0;
    p.zEndMm = 10;
    p.diameterMm = 12;
    p.toleranceMm = 0.1;
    p.toleranceFromClass = false;
    s.part.features.insert(s.part.features.begin(), p);
    return s;
}

} // namespace

TEST_CASE("dial settings wrap and count turns", "[planner]") {
    const Slide s{0.02, 100, 0, 100}; // 2 mm a turn (common practice for a metric dial)
    const DialSetting a = dialSetting(s, 2.53);
    CHECK(a.turns == 1);
    CHECK(a.division == Approx(26.5));
    const DialSetting b = dialSetting(s, -0.5);
    CHECK(b.turns == -1);
    CHECK(b.division == Approx(75));
    CHECK(roundToDivision(s, 0.013, 2) == Approx(0.01));
}

TEST_CASE("every planned cone proves itself in the kernel", "[planner][kernel]") {
    int planned = 0;
    for (const Job& j : cases()) {
        INFO(j.name);
        const Scene scene = j.from > 0 ? withPilot(j) : makeScene(j);
        REQUIRE_NOTHROW(scene.validate());
        const ConePlan plan = planCone(scene);
        for (const std::string& p : plan.problems)
            INFO(p);
        REQUIRE(plan.planned);
        REQUIRE_NOTHROW(plan.scene.validate());
        const CutResult r = simulate(plan.scene);
        // The nose's fillet in a corner against a shoulder is the drawing's to settle (a relief
        // groove or a corner radius), not the plan's: any other finding is a fault of the plan.
        for (const Finding& f : r.findings)
            if (f.kind != FindingKind::CornerFillet)
                FAIL_CHECK(findingKindName(f.kind) << ": " << f.message);
        CHECK(r.withinTolerance);
        const Feature& cone = plan.scene.part.features[plan.featureIndex];
        // No metal on beyond the tolerance, nothing overcut beyond it, normal to the cone.
        CHECK(r.maxLeftOnMm <= cone.toleranceMm);
        CHECK(r.maxOvercutMm <= cone.toleranceMm);
        REQUIRE(r.features.size() == plan.scene.part.features.size());
        const FeatureReport& fr = r.features[plan.featureIndex];
        CHECK(fr.withinTolerance);
        CHECK(std::fabs(fr.asCutHalfAngleRad - cone.cone.halfAngleRad) < cone.angleToleranceRad);
        ++planned;
    }
    CHECK(planned >= 8);
}

TEST_CASE("hand-checked readings: 60/20/80 mm cone, r = 0.8, diameter dial", "[planner]") {
    // Worked by hand (derived), from references R5 and references R1 and the machine model in
    // scenes/README.md:
    //   D = 60, d = 20, L = 80: tanθ = (D − d)/(2L) = 0.25, θ = 14°2′ (Source: references R5).
    //   Nose offset for a right-hand tool on a cone widening toward the chuck: the tip line lies
    //   ΔX = r(1 + tanθ − secθ) = 0.8 (1 + 0.25 − 1.0307764) = 0.1753789 (radius) inside the
    //   drawn cone (Source: references R1).
    //   Dials zeroed on the Ø60 bar (no cylinder to turn) and the datum face. The compound
    //   advances toward the tailstock; the pass starts beyond the large end, where the tip is
    //   ahead of the contact point by r(1 − sinθ) = 0.8 (1 − 0.2425356) = 0.6059715, plus a
    //   run-in of r + 0.5 = 1.3 (no compound backlash here): z = 80 + 0.6059715 + 1.3 = 81.9060,
    //   so the saddle is locked at the next 0.1 division up, 82.0.
    //   Tip at compound 0: z = 82.0, x = 30 + 0.25·2 − 0.1753789 = 30.3246211.
    //   Cross reading (diameter dial): c = 2 (30 − 30.3246211) = −0.6492422 → −0.64 to the
    //   nearest whole division of 0.02 (0.0092 mm on diameter from the exact reading, within
    //   the ±0.05 tolerance).
    //   Compound from p = (82.0 − 81.9060)/cosθ = 0.0969 → 0.08 (whole division below) to
    //   p = (82.0 − (0 + 0.6059715 − 1.3))/cosθ = 85.2389 → 85.24 (whole division above).
    //   On the dial: −0.64 is −1 turn + 68 divisions (100 divisions of 0.02 a turn).
    Job j;
    j.name = "hand check";
    j.stockD = 60, j.stickOut = 120, j.to = 80, j.gaugeZ = 80, j.gaugeD = 60;
    j.halfAngleDeg = radToDeg(std::atan(0.25)), j.tol = 0.05, j.bodyD = 60;
    j.noseR = 0.8, j.compTravel = 100, j.compBacklash = 0, j.maxDepth = 2.0;
    const ConePlan plan = planCone(makeScene(j));
    REQUIRE(plan.planned);
    // Source: references R5 (60/20/80 mm → 14°2′)
    CHECK(radToDeg(plan.compoundReadingRad) * 60 == Approx(14 * 60 + 2).margin(0.5));
    // Source: references R1 (ΔX = r(1 + tanθ − secθ)), derived for r = 0.8, tanθ = 0.25
    CHECK(plan.noseOffsetRadialMm == Approx(-0.1753789).margin(1e-6));
    CHECK(plan.scene.setup.compoundAdvanceToward == Widens::TowardTailstock);
    const Pass& fin = plan.scene.plan.passes.back();
    CHECK(fin.kind == PassKind::Compound);
    CHECK(fin.saddleMm == Approx(82.0)); // derived above
    CHECK(fin.crossMm == Approx(-0.64)); // derived above
    CHECK(fin.fromMm == Approx(0.08));   // derived above
    CHECK(fin.toMm == Approx(85.24));    // derived above
    const DialSetting d = dialSetting(plan.scene.setup.cross, fin.crossMm);
    CHECK(d.turns == -1);            // derived above
    CHECK(d.division == Approx(68)); // derived above
    // And the kernel agrees it cuts the drawn cone.
    const CutResult r = simulate(plan.scene);
    CHECK(r.findings.empty());
    CHECK(r.withinTolerance);
    CHECK(r.gaugeAsCutDiameterMm == Approx(60.0).margin(0.01));
}

TEST_CASE("a cone the insert cannot follow is refused with suggestions", "[planner]") {
    // A 45° seat narrowing toward the chuck with a 55° insert in a 93° holder: the trailing edge
    // limit is 180° − 93° − 55° = 32° (Source: references R8), less than 45°.
    Job j;
    j.name = "seat";
    j.stockD = 40, j.stickOut = 50, j.to = 6, j.gaugeZ = 0, j.gaugeD = 38, j.halfAngleDeg = 45;
    j.widens = Widens::TowardTailstock, j.tol = 0.1;
    const ConePlan plan = planCone(makeScene(j));
    CHECK_FALSE(plan.planned);
    CHECK(plan.scene.plan.passes.empty());
    REQUIRE_FALSE(plan.problems.empty());
    REQUIRE_FALSE(plan.suggestions.empty());
    // Every suggested pair must itself follow the cone: rebuild the first right-hand one.
    Tool t = makeScene(j).tool;
    CHECK_FALSE(toolFollowsSlope(t, -degToRad(45)));
    t.shape = 'V';
    t.includedAngleRad = degToRad(35); // Source: references R8 (V 35°)
    t.enteringAngleRad = degToRad(93); // Source: references R8 (J 93°)
    CHECK(toolFollowsSlope(t, -degToRad(45)));
    CHECK(plan.suggestions.front().find("shape V") != std::string::npos);
    // The same tool follows the cone the other way round (widening toward the chuck).
    CHECK(toolFollowsSlope(makeScene(j).tool, degToRad(45)));
}

TEST_CASE("a cone longer than the compound's travel is split into saddle settings", "[planner]") {
    Job j = cases()[5]; // the 1:50 cone, 120 mm against a 70 mm compound
    const ConePlan plan = planCone(makeScene(j));
    REQUIRE(plan.planned);
    CHECK(plan.compoundSettings == 2);
    CHECK(plan.compoundRunMm > toMm(j.compTravel, j.units));
    bool said = false;
    for (const std::string& c : plan.cautions)
        said = said || c.find("taper attachment") != std::string::npos;
    CHECK(said);
    int compoundPasses = 0;
    for (const Pass& p : plan.scene.plan.passes)
        if (p.kind == PassKind::Compound) {
            CHECK(p.fromMm >= 0);
            CHECK(p.toMm <= 70.0 + 1e-9);
            ++compoundPasses;
        }
    CHECK(compoundPasses >= 2); // at least one at each saddle setting
}

TEST_CASE("the sine bar stack is built from the block set, on a base when too short", "[planner]") {
    // Morse 3 in inch: H = 5 in · sin θ ≈ 0.1254 in, shorter than any two blocks of a common
    // 81-piece set can make (Source: references R4 for H = L sin θ; the set: common practice).
    const ConePlan plan = planCone(makeScene(cases()[3]));
    REQUIRE(plan.planned);
    CHECK(plan.sineBar.stackMm == Approx(5 * 25.4 * std::sin(plan.halfAngleRad)));
    REQUIRE_FALSE(plan.sineBar.blocksMm.empty());
    double hi = 0, lo = 0;
    for (double b : plan.sineBar.blocksMm)
        hi += b;
    for (double b : plan.sineBar.baseBlocksMm)
        lo += b;
    // The difference of the two stacks is the wanted height to the set's 0.0001 in step.
    CHECK(std::fabs((hi - lo) - plan.sineBar.stackMm) <= 0.00005 * 25.4 + 1e-9);
    // A 30° centre on a 100 mm bar: one 50 mm block (Source: references R4, sin 30° = 0.5).
    const ConePlan centre = planCone(makeScene(cases()[0]));
    REQUIRE(centre.sineBar.blocksMm.size() == 1);
    CHECK(centre.sineBar.blocksMm[0] == Approx(50.0));
    CHECK(centre.sineBar.baseBlocksMm.empty());
}

TEST_CASE("hand-checked readings: 1:10 cone cut toward the chuck and out", "[planner]") {
    // Worked by hand (derived), from references R3, references R1 and the machine model in
    // scenes/README.md. A 1:10 cone from z = 0 to 50, Ø30 at its large end (z = 50), on a Ø32
    // bar held 80 out; r = 0.4 (D insert, J holder, hand R); compound winding toward the chuck
    // and out (advance = "chuck", across = "out"), no backlash; dials zeroed on the Ø32 bar and
    // the datum face; a diameter dial of 0.02 a division.
    //   tan θ = 1/20 = 0.05, θ = 2°51′44.7″ (Source: references R3, ISO 1119 1:10 →
    //   5°43′29.3176″ included); the compound is set to θ on a scale from the axis.
    //   Winding in moves the tip along (cos θ, + sin θ): up the cone's line toward the chuck,
    //   feeding toward a right-hand tool's leading side: main edge cutting.
    //   Nose offset: the tip line lies r(1 + tan θ − sec θ) = 0.4 (1 + 0.05 − 1.0012492)
    //   = 0.0195003 inside the drawn line (Source: references R1).
    //   The pass starts in the air before the free end: the tip is ahead of the nose's contact
    //   point by r(1 − sin θ) = 0.4 (1 − 0.0499376) = 0.3800250, and runs in r + 0.5 = 0.9:
    //   z = 0 + 0.3800250 − 0.9 = −0.5199750; the saddle is locked a whole division below,
    //   at −0.6, where the compound reads 0.
    //   Tip line at z = −0.6: the cone's radius 15 − 0.05 (50 + 0.6) = 12.47, less 0.0195003:
    //   x = 12.4504997. Cross reading (diameter dial): c = 2 (16 − 12.4504997) = 7.0990006 →
    //   7.10 to the nearest whole division (0.001 on diameter off, within ±0.02).
    //   Compound from p = (−0.5199750 + 0.6)/cos θ = 0.0801250 → 0.08 (a whole division below)
    //   to the far end: the tip past the large end by 0.3800250 + 0.9, z = 51.2800250,
    //   p = (51.2800250 + 0.6)/cos θ = 51.9448298 → 51.96 (a whole division above).
    //   On the dial: 7.10 is 3 turns + 55 divisions (100 divisions of 0.02 a turn).
    Job j;
    j.name = "1:10 toward the chuck and out";
    j.stockD = 32, j.stickOut = 80, j.to = 50, j.gaugeZ = 50, j.gaugeD = 30;
    j.halfAngleDeg = radToDeg(std::atan(0.05)), j.tol = 0.02;
    j.compBacklash = 0, j.compTravel = 100;
    j.advance = Widens::TowardChuck, j.across = Across::Out;
    const ConePlan plan = planCone(makeScene(j));
    for (const std::string& p : plan.problems)
        INFO(p);
    REQUIRE(plan.planned);
    // The planner keeps the compound as the scene gives it.
    CHECK(plan.scene.setup.compoundAdvanceToward == Widens::TowardChuck);
    CHECK(plan.scene.setup.compoundAdvanceAcross == Across::Out);
    CHECK_FALSE(plan.trailingEdge);
    // Source: references R3 (ISO 1119 1:10: 5°43′29.3176″ included, half of it)
    CHECK(radToDeg(plan.compoundReadingRad) * 3600 ==
          Approx((5 * 3600 + 43 * 60 + 29.3176) / 2).margin(0.01));
    // Source: references R1 (ΔX = r(1 + tanθ − secθ)), derived for r = 0.4, tanθ = 0.05
    CHECK(plan.noseOffsetRadialMm == Approx(-0.0195003).margin(1e-6));
    const Pass& fin = plan.scene.plan.passes.back();
    REQUIRE(fin.kind == PassKind::Compound);
    CHECK(passFeedDirection(plan.scene, fin).edge == FeedDirection::Edge::Main);
    CHECK(fin.saddleMm == Approx(-0.6)); // derived above
    CHECK(fin.crossMm == Approx(7.10));  // derived above
    CHECK(fin.fromMm == Approx(0.08));   // derived above
    CHECK(fin.toMm == Approx(51.96));    // derived above
    const DialSetting d = dialSetting(plan.scene.setup.cross, fin.crossMm);
    CHECK(d.turns == 3);             // derived above
    CHECK(d.division == Approx(55)); // derived above
    // And the kernel agrees, the moves between passes included.
    const CutResult r = simulate(plan.scene);
    for (const Finding& f : r.findings)
        UNSCOPED_INFO(f.message);
    CHECK(r.findings.empty());
    CHECK(r.withinTolerance);
    // The cross reading 0.001 off on diameter (derived above).
    CHECK(r.gaugeAsCutDiameterMm == Approx(30.0 + 2 * (7.0990006 - 7.10) / 2).margin(0.002));
}

TEST_CASE("the planner keeps the compound's sense, and refuses one that cannot cut", "[planner]") {
    // derived (compound_sense.h): on a cone widening toward the chuck the compound follows the
    // line winding toward the chuck and out or toward the tailstock and in; the other two
    // senses run across it.
    const Widens alongs[] = {Widens::TowardChuck, Widens::TowardTailstock};
    const Across acrosses[] = {Across::In, Across::Out};
    for (Widens widens : alongs)
        for (Widens along : alongs)
            for (Across across : acrosses) {
                Job j = cases()[6]; // the 10° flare, Ø25 bar
                if (widens == Widens::TowardChuck) {
                    j.widens = widens;
                    j.gaugeZ = 20; // Ø24 at its large end, toward the chuck now
                }
                j.advance = along, j.across = across;
                const Scene scene = makeScene(j);
                const ConePlan plan = planCone(scene);
                const bool fits = (along == Widens::TowardChuck) == (across == Across::Out) ==
                                  (widens == Widens::TowardChuck);
                INFO("widens toward " << (widens == Widens::TowardChuck ? "chuck" : "tailstock")
                                      << ", compound " << compoundSenseWords(scene.setup));
                CHECK(plan.planned == fits);
                if (fits) {
                    CHECK(plan.scene.setup.compoundAdvanceToward == along);
                    CHECK(plan.scene.setup.compoundAdvanceAcross == across);
                    // Toward the tailstock, a right-hand tool cuts with its trailing edge: said.
                    const bool trailing = along == Widens::TowardTailstock;
                    CHECK(plan.trailingEdge == trailing);
                    bool said = false;
                    for (const std::string& c : plan.cautions)
                        said = said || c.find("trailing edge") != std::string::npos;
                    CHECK(said == trailing);
                    const CutResult r = simulate(plan.scene);
                    for (const Finding& f : r.findings)
                        UNSCOPED_INFO(f.message);
                    CHECK(r.findings.empty());
                    CHECK(r.withinTolerance);
                } else {
                    REQUIRE_FALSE(plan.problems.empty());
                    CHECK(plan.problems.front().find("cannot cut this cone") != std::string::npos);
                    CHECK(plan.problems.front().find("across = ") != std::string::npos);
                    CHECK(plan.scene.plan.passes.empty());
                }
            }
}

TEST_CASE("readings go on whole divisions, half a division only when none holds", "[planner]") {
    // The 1:10 cone of the hand check above, its gauge diameter nudged so that the exact
    // finishing reading falls on a half division (derived: a diameter dial's reading moves the
    // diameter by as much, so +0.0090006 on the drawing moves 7.0990006 to 7.0900000).
    Job j;
    j.name = "1:10, tight";
    j.stockD = 32, j.stickOut = 80, j.to = 50, j.gaugeZ = 50, j.gaugeD = 30.0090006;
    j.halfAngleDeg = radToDeg(std::atan(0.05));
    j.compBacklash = 0, j.compTravel = 100;
    j.advance = Widens::TowardChuck, j.across = Across::Out;
    SECTION("±0.02: a whole division (0.01 off on diameter) holds it") {
        j.tol = 0.02;
        const ConePlan plan = planCone(makeScene(j));
        REQUIRE(plan.planned);
        CHECK(plan.halfDivisionPasses.empty());
        const double divs = plan.scene.plan.passes.back().crossMm / 0.02;
        CHECK(divs == Approx(std::round(divs)).margin(1e-9));
        CHECK(simulate(plan.scene).withinTolerance);
    }
    SECTION("±0.006: neither whole division does; half a division, and the plan says so") {
        j.tol = 0.006; // a band of ±0.003 normal to the cone: 0.005 on radius is outside it
        const ConePlan plan = planCone(makeScene(j));
        REQUIRE(plan.planned);
        REQUIRE(plan.halfDivisionPasses.size() == 1);
        const Pass& fin =
            plan.scene.plan.passes[static_cast<std::size_t>(plan.halfDivisionPasses.front())];
        CHECK(fin.crossMm == Approx(7.09).margin(1e-9));
        bool said = false;
        for (const std::string& c : plan.cautions)
            said = said || c.find("half a division") != std::string::npos;
        CHECK(said);
        CHECK(simulate(plan.scene).withinTolerance);
    }
}

TEST_CASE("the plan winds back far enough to take up the backlash", "[planner]") {
    // derived: a quarter turn of a 0.02 × 100 compound dial is 0.5 mm, less than 0.6 mm of
    // backlash; half a turn (1.0 mm) takes it up.
    Job j = cases()[0];
    j.compBacklash = 0.6;
    const ConePlan plan = planCone(makeScene(j));
    REQUIRE(plan.planned);
    CHECK(plan.scene.setup.windBackTurns == Approx(0.5));
    CHECK_NOTHROW(plan.scene.validate());
}
