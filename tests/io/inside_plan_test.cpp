// Planning an inside cone (issue 14, item 5): planInsideCone on the bored scenes. The plan proves
// itself through the kernel; its numbers are checked against closed forms.
#include "swarf/io/scene_reader.h"
#include "swarf/io/setup_sheet.h"
#include "swarf/sim/boring_checks.h"
#include "swarf/sim/budget.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/planner.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <string>

using namespace swarf;

namespace {

Scene scene(const std::string& name) {
    return io::readScene(std::string(SWARF_SCENES_DIR) + "/" + name);
}

const Feature& insideCone(const Scene& s) {
    return *s.part.mainInsideCone();
}

} // namespace

TEST_CASE("inside cones are planned and the plan proves itself", "[plan][inside]") {
    // The planner ignores a scene's own passes: the two finding scenes plan clean.
    for (const char* name : {"bore-collet-seat-1-10.toml", "bore-socket-no-offset.toml",
                             "finding-bar-rubs-bore.toml", "finding-past-bore-bottom.toml"}) {
        INFO(name);
        const ConePlan plan = planCone(scene(name));
        REQUIRE(plan.planned);
        CHECK(plan.inside);
        const CutResult r = simulate(plan.scene);
        CHECK(r.bored);
        CHECK(r.withinTolerance);
        for (const Finding& f : r.findings)
            FAIL_CHECK(f.message);
        // A pilot bore with saddle passes first, then the cone with the compound.
        const auto& passes = plan.scene.plan.passes;
        REQUIRE(passes.size() >= 3);
        CHECK(passes.front().kind == PassKind::Saddle);
        CHECK(passes.back().kind == PassKind::Compound);
        CHECK(plan.display.back().coneFinish);
    }
}

TEST_CASE("the inside plan's nose offset, finishing reading and checks", "[plan][inside]") {
    const Scene s = scene("bore-collet-seat-1-10.toml");
    const ConePlan plan = planCone(s);
    REQUIRE(plan.planned);
    const Feature& f = insideCone(s);
    const double th = f.cone.halfAngleRad, r = s.tool.noseRadiusMm;
    // Source: references R1 (the nose-radius offset ΔX = r(1 + tan θ − sec θ) for a cone cut
    // with the nose; inside it puts the tip outside the drawn bore, toward the wall, derived by
    // mirroring the outside case).
    const double closed = r * (1.0 + std::tan(th) - 1.0 / std::cos(th));
    CHECK(plan.noseOffsetRadialMm == Approx(closed).margin(1e-6));
    CHECK(plan.noseOffsetRadialMm > 0);

    // The finishing reading from the machine model (scenes/README.md): with the compound at 0
    // the tip sits at x = zeroD/2 − c/2 (a diameter dial), on the cone line plus the offset at
    // the pivot z. Derived.
    const Setup& su = plan.scene.setup;
    const Pass& fin = plan.scene.plan.passes[static_cast<std::size_t>(plan.finishPass)];
    const double zPivot = su.zeroZMm + fin.saddleMm;
    const double xWanted = 0.5 * f.cone.diameterAt(zPivot) + closed;
    const double exactReading = 2.0 * (0.5 * su.zeroDiameterMm - xWanted);
    CHECK(fin.crossMm == Approx(exactReading).margin(0.5 * su.cross.mmPerDivision + 1e-9));
    // On whole or half divisions.
    const double divs = fin.crossMm / su.cross.mmPerDivision;
    CHECK(std::fabs(2.0 * divs - std::round(2.0 * divs)) < 1e-6);

    // The plug gauge: a diameter error δ moves the gauge line δ / (2 tan θ) along the axis
    // (the taper's definition, common practice); the rough bore, 2a/cos θ small on diameter
    // for an allowance a normal to the cone, holds it a / sin θ out. Derived.
    REQUIRE(plan.bore.plugGauge);
    CHECK(plan.bore.bandMm == Approx(f.toleranceMm / (2.0 * std::tan(th))));
    CHECK(plan.bore.bandMm == Approx(0.1)); // 1:10 on diameter: ±0.01 → ±0.1 mm
    CHECK(plan.bore.roughStandOutMm ==
          Approx(s.planning.finishAllowanceMm / std::sin(th)).epsilon(1e-9));
    CHECK(plan.bore.gaugeLineZMm == Approx(f.cone.gaugeZMm));
    CHECK(plan.bore.mouthDiameterRoughMm ==
          Approx(plan.bore.mouthDiameterFinishedMm -
                 2.0 * s.planning.finishAllowanceMm / std::cos(th)));
    // The pilot leaves the finishing allowance at the cone's small end and lets the bar in.
    CHECK(plan.bore.pilotDiameterMm <= 23.0 - 2.0 * s.planning.finishAllowanceMm);
    CHECK(plan.bore.pilotDiameterMm >= s.tool.minBoreMm);

    // The sheet: the socket's checks, the boring cautions, readings outward.
    const std::string sheet = io::setupSheetText(plan);
    CHECK(sheet.find("Plug gauge of the drawing's cone") != std::string::npos);
    CHECK(sheet.find("inside micrometer") != std::string::npos);
    CHECK(sheet.find("Blue (common practice)") != std::string::npos);
    CHECK(sheet.find("swarf packs behind the bar") != std::string::npos);
    CHECK(sheet.find("Never put fingers") != std::string::npos);
    CHECK(sheet.find("feed the cross-slide out to") != std::string::npos);
    // No rolls inside: the outside's roll check and its correction are not on the sheet.
    CHECK(sheet.find("Over two") == std::string::npos);
    CHECK(sheet.find("If the roll readings differ") == std::string::npos);
    CHECK(sheet.find("Inside there are no rolls") != std::string::npos);
}

TEST_CASE("an inside cone from a reference bore at the gauge plane", "[plan][inside]") {
    Scene s = scene("bore-collet-seat-1-10.toml");
    s.planning.placing = PlanningOptions::Placing::ReferenceShoulder;
    const ConePlan plan = planCone(s);
    REQUIRE(plan.planned);
    CHECK(plan.scene.planning.placing == PlanningOptions::Placing::ReferenceShoulder);
    // The socket's gauge plane is its mouth: the reference is bored to a plane inside the cone,
    // at the cone's own diameter there, so its corner lies on the finished cone.
    const Feature& f = insideCone(s);
    CHECK(plan.referenceZMm > f.zStartMm);
    CHECK(plan.referenceZMm < f.zEndMm);
    CHECK(plan.referenceDiameterMm == Approx(f.cone.diameterAt(plan.referenceZMm)));
    const CutResult r = simulate(plan.scene);
    CHECK(r.withinTolerance);
    CHECK(r.findings.empty());
}

TEST_CASE("between passes a boring bar comes off the wall toward the centre", "[plan][inside]") {
    const ConePlan plan = planCone(scene("bore-collet-seat-1-10.toml"));
    REQUIRE(plan.planned);
    const Scene& s = plan.scene;
    int backOffs = 0;
    for (const BetweenMove& m : betweenPassMoves(s)) {
        if (m.step != ReturnStep::BackOut)
            continue;
        ++backOffs;
        // A larger reading is nearer the centre; the tip moves toward the axis.
        CHECK(m.move.crossTo > m.move.crossFrom);
        CHECK(m.move.tipTo.y() < m.move.tipFrom.y());
        // The back of the shank stays off the far wall of the drilled hole.
        CHECK(barWallClearanceMm(s.tool, m.move.tipTo.y(), 0.5 * s.stock.boreDiameterMm) > 0);
    }
    CHECK(backOffs >= static_cast<int>(s.plan.passes.size()));
}

TEST_CASE("inside plans that cannot be made say why", "[plan][inside]") {
    Scene big = scene("bore-collet-seat-1-10.toml");
    big.stock.boreDiameterMm = 23.0; // the cone's small end
    ConePlan p = planCone(big);
    CHECK_FALSE(p.planned);
    REQUIRE_FALSE(p.problems.empty());
    CHECK(p.problems.front().find("leaves nothing to bore") != std::string::npos);

    Scene shallow = scene("bore-collet-seat-1-10.toml");
    shallow.stock.boreDepthMm = 30.0; // the hole ends where the cone does
    p = planCone(shallow);
    CHECK_FALSE(p.planned);
    REQUIRE_FALSE(p.problems.empty());
    CHECK(p.problems.front().find("drill deeper") != std::string::npos);
}

TEST_CASE("a boring bar's moves between passes are checked against the metal", "[plan][inside]") {
    // The collet seat's own plan: every move between passes stays off the metal.
    Scene s = scene("bore-collet-seat-1-10.toml");
    CutResult r = simulate(s);
    REQUIRE_FALSE(r.between.empty());
    for (const BetweenMove& m : r.between)
        CHECK(m.cutsMm < 1e-6);
    // A second pilot pass that starts 10 mm inside the bore: its reading is dialled there, so the
    // insert is fed out into the wall between the passes (2 mm on diameter: 1 mm of radius).
    REQUIRE(s.plan.passes[1].kind == PassKind::Saddle);
    s.plan.passes[1].fromMm = 10.0;
    s.plan.passes[1].crossMm = -3.0;
    r = simulate(s);
    bool found = false;
    for (const Finding& f : r.findings)
        found = found || (f.kind == FindingKind::CutBetweenPasses && f.pass == 1);
    CHECK(found);
    double deepest = 0;
    for (const BetweenMove& m : r.between)
        deepest = std::max(deepest, m.cutsMm);
    // Derived: the bore stands at Ø21 after pass 1; the reading −3 puts the tip at Ø23.
    CHECK(deepest == Approx(1.0).margin(0.01));
}

namespace {

// The standard error of a sample sd from n draws (derived: the delta method on the variance).
double sdError(double sigma, double excessKurtosis, int n) {
    return sigma * std::sqrt((2.0 + excessKurtosis) / (4.0 * n));
}

BudgetOptions budgetOptions(int samples) {
    BudgetOptions o;
    o.samples = samples;
    o.threads = 2;
    o.shareSamples = samples;
    return o;
}

} // namespace

TEST_CASE("a bored socket's error budget: exact without uncertainty, the dial law with it",
          "[budget][inside]") {
    Scene s = scene("bore-collet-seat-1-10.toml");
    REQUIRE(budgetRefusal(s).empty());
    const CutResult r = simulate(s);
    Budget b = runBudget(s, budgetOptions(2));
    // The budget's part is the kernel's bore: the same gauge diameter, angle and verdict.
    CHECK(b.exact.gaugeDiameterMm == Approx(r.gaugeAsCutDiameterMm).margin(1e-9));
    CHECK(b.exact.halfAngleRad == Approx(r.features[0].asCutHalfAngleRad).margin(1e-6));
    CHECK(b.exact.withinTolerance == r.features[0].withinTolerance);
    CHECK(b.gaugeDiameterMm.sd == 0.0);

    // Source: references R11 (JCGM 100: a rectangular distribution of half-width a has u =
    // a/√3); the finishing reading of a diameter dial places the bore's gauge diameter one for
    // one, inside as outside (derived).
    const double e = 0.01;
    s.uncertainty.crossReadingMm = e;
    const int n = 2000;
    b = runBudget(s, budgetOptions(n));
    const double sigma = 2 * e / std::sqrt(12.0);
    CHECK(std::abs(b.gaugeDiameterMm.sd - sigma) < 3 * sdError(sigma, -1.2, n));
    CHECK(std::abs(b.gaugeDiameterMm.mean - b.exact.gaugeDiameterMm) < 3 * sigma / std::sqrt(n));
}
