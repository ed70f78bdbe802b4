// The measured trial cut (sim/trial_cut.h) and choosing the way of working from the error budget
// (sim/plan_choice.h): the correction is the measured error in whole divisions; a trial cut
// takes out an error of the dial's zero; what it leaves has the spread of the micrometer and the
// rounding to a division (derived below); the choice keeps the least work that reaches the
// target, and keeps what the scene states.
#include "kernel_scenes.h"
#include "swarf/sim/budget.h"
#include "swarf/sim/plan_choice.h"
#include "swarf/sim/planner.h"
#include "swarf/sim/trial_cut.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace swarf;

namespace {

// A 1:10 arbor on a Ø30 bar (numbers made up for the test, as the demo scene): cone 0..50 with
// Ø29.000 at the gauge plane z = 40, ±0.02; the compound winds toward the tailstock and in; a
// diameter dial of 0.02 mm divisions zeroed on the bar. No passes: the planner makes them.
Scene arbor() {
    Scene s = testing::barScene(30.0, 85.0);
    const double th = std::atan(0.05);
    Feature c = testing::coneFeature(0, 50, 29.0 - 2 * 40 * 0.05, th, 0.02);
    c.cone.gaugeZMm = 40;
    c.cone.gaugeDiameterMm = 29.0;
    c.angleToleranceRad = degToRad(0.05);
    s.part.features.push_back(c);
    s.part.features.push_back(testing::cylinderFeature(50, 80, 30, 0.1));
    s.tool.noseRadiusMm = 0.4;
    s.setup.compoundReadingRad = th;
    s.setup.compoundAdvanceToward = Widens::TowardTailstock;
    s.setup.zeroDiameterMm = 30;
    s.setup.compound = {0.02, 100, 0, 90};
    s.setup.cross = {0.02, 100, 0, 150};
    s.setup.saddle = {0.1, 200, 0, 1e9};
    s.sim.profileStepMm = 0.01;
    return s;
}

ConePlan planned(Scene s, bool trial) {
    s.planning.trialCut = trial;
    ConePlan p = planCone(s);
    REQUIRE(p.planned);
    return p;
}

double gaugeDiameter(const Scene& s) {
    const int cone = static_cast<int>(s.part.mainCone() - s.part.features.data());
    return partOutcome(s, cone).gaugeDiameterMm;
}

} // namespace

TEST_CASE("trial cut: the correction is the measured error in whole divisions", "[trial]") {
    Setup su;
    su.cross.mmPerDivision = 0.02;
    su.crossDial = DialMode::Diameter;
    // Common practice: a cone 0.047 large on diameter takes 0.047 more on a diameter dial,
    // dialled as 2 divisions of 0.02 (0.04); on a radius dial half of it, 1 division.
    CHECK(trialCutCorrectionMm(su, 0.047) == Approx(0.04).margin(1e-12));
    CHECK(trialCutCorrectionMm(su, -0.047) == Approx(-0.04).margin(1e-12));
    CHECK(trialCutCorrectionMm(su, 0.009) == Approx(0.0).margin(1e-12));
    su.crossDial = DialMode::Radius;
    CHECK(trialCutCorrectionMm(su, 0.047) == Approx(0.02).margin(1e-12));
}

TEST_CASE("trial cut: a dial zeroed on a misread bar is put right before finishing", "[trial]") {
    const ConePlan plan = planned(arbor(), true);
    const double exact = gaugeDiameter(plan.scene);
    CHECK(exact == Approx(29.0).margin(0.02));
    // The diameter the dial was zeroed on misread 0.06 large: the tool sits 0.03 further out
    // than the dial says at every pass, and the cone comes out 0.06 large on diameter.
    Scene off = plan.scene;
    off.setup.zeroDiameterMm += 0.06;
    CHECK(gaugeDiameter(off) - exact == Approx(0.06).margin(1e-4));
    const TrialCut t = trialCutOf(plan, 0.0);
    REQUIRE_FALSE(t.finishPasses.empty());
    CHECK(t.trialPasses == t.finishPasses.front());
    // The measurement at the check plane sees the 0.06 (over what the exact plan leaves there:
    // the sheet's figure is the drawing's plus the allowance, and the readings are rounded to
    // whole divisions, so the two differ by a few µm) and the finish takes it off.
    auto trialOnly = [&](Scene s) {
        s.plan.passes.resize(static_cast<std::size_t>(t.trialPasses));
        return s;
    };
    const double planLeaves = asCutOutsideDiameterMm(trialOnly(plan.scene), t.checkZMm);
    CHECK(std::fabs(planLeaves - t.expectedDiameterMm) < 0.01);
    CHECK(asCutOutsideDiameterMm(trialOnly(off), t.checkZMm) - planLeaves ==
          Approx(0.06).margin(1e-4));
    CHECK(gaugeDiameter(afterTrialCut(off, t, 0.0)) - exact == Approx(0.0).margin(0.002));
    // A micrometer that reads 0.02 large puts the finish 0.02 small (one division).
    CHECK(gaugeDiameter(afterTrialCut(off, t, 0.02)) - exact == Approx(-0.02).margin(0.002));
}

TEST_CASE("trial cut in a budget: what is left is the micrometer and the division",
          "[trial][budget]") {
    // Derived: with the dial's zero off by N(0, s0) on diameter, s0 = 0.03 mm, the trial cut
    // measures that error with the micrometer's N(0, sm) and dials it out to the nearest
    // division d = 0.02 mm (diameter dial). What is left on the gauge diameter is the
    // micrometer's error plus the rounding, uniform over one division while s0 ≫ d:
    //   sd = √(sm² + d²/12);  sm = 0.002 mm (measurement.h's micrometer, common practice).
    Scene s = arbor();
    s.uncertainty.measuringSdMm = 0.03;
    const ConePlan plan = planned(s, true);
    BudgetOptions o;
    o.samples = 1000;
    o.seed = 3;
    o.shares = false;
    const Budget without = runBudget(plan.scene, o);
    o.trialCut = trialCutOf(plan, 0.002);
    const Budget with = runBudget(plan.scene, o);
    const double expected = std::sqrt(0.002 * 0.002 + 0.02 * 0.02 / 12.0);
    INFO("sd without " << without.gaugeDiameterMm.sd << ", with " << with.gaugeDiameterMm.sd);
    CHECK(without.gaugeDiameterMm.sd == Approx(0.03).epsilon(0.08));
    // se of a sample sd of 1000 values, kurtosis of a near-uniform −1.2: σ √(0.8 / 4000) ≈ 1.4 %.
    CHECK(with.gaugeDiameterMm.sd == Approx(expected).epsilon(0.08));
    CHECK(with.pInTolerance > without.pInTolerance + 0.3);
}

TEST_CASE("choosing the way of working: the least work that reaches the target", "[choice]") {
    Scene s = arbor();
    s.uncertainty.measuringSdMm = 0.03;
    BudgetOptions o;
    o.samples = 200;
    o.seed = 5;
    SECTION("a low target keeps the first way") {
        const PlanChoice c = choosePlan(s, 0.2, o);
        REQUIRE(c.chosen == 0);
        CHECK(c.reached);
        CHECK_FALSE(c.plan.trialCut);
        CHECK(c.candidates.size() == 4);
        CHECK_FALSE(c.plan.choiceLines.empty());
    }
    SECTION("a high target needs the trial cut") {
        const PlanChoice c = choosePlan(s, 0.9, o);
        REQUIRE(c.chosen >= 0);
        CHECK(c.reached);
        CHECK(c.plan.trialCut);
        CHECK(c.candidates[static_cast<std::size_t>(c.chosen)].pInTolerance >= 0.9);
        for (int i = 0; i < c.chosen; ++i)
            CHECK(c.candidates[static_cast<std::size_t>(i)].pInTolerance < 0.9);
        // The one source is the whole spread, and its step is named.
        REQUIRE_FALSE(c.plan.stepsThatMatter.empty());
        CHECK_THAT(c.plan.stepsThatMatter.front(), Catch::Contains("step"));
    }
    SECTION("a placing the scene states is kept") {
        s.planning.placing = PlanningOptions::Placing::ZeroOnDiameter;
        s.planning.placingStated = true;
        const PlanChoice c = choosePlan(s, 0.9, o);
        CHECK(c.candidates.size() == 2);
        for (const PlanCandidate& k : c.candidates)
            CHECK(k.placing == PlanningOptions::Placing::ZeroOnDiameter);
    }
    SECTION("a target no way reaches keeps the best and says so") {
        s.uncertainty.compoundAngleSdRad = degToRad(1.0); // far off any tolerance
        const PlanChoice c = choosePlan(s, 0.999, o);
        REQUIRE(c.chosen >= 0);
        CHECK_FALSE(c.reached);
        bool said = false;
        for (const std::string& l : c.plan.choiceLines)
            said = said || l.find("short of the target") != std::string::npos;
        CHECK(said);
    }
}
