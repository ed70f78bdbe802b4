// Choosing how to work from the error budget (see plan_choice.h).
#include "swarf/sim/plan_choice.h"

#include "swarf/sim/measurement.h"
#include "swarf/sim/uncertainty.h"
#include "swarf/sim/units.h"

#include <algorithm>
#include <cmath>

namespace swarf {

namespace {

using Placing = PlanningOptions::Placing;

// The first step of `kind` in the plan, counting from 1 as the sheet does; 0 if none.
int stepNumber(const ConePlan& plan, PlanStep::Kind kind) {
    for (std::size_t i = 0; i < plan.steps.size(); ++i)
        if (plan.steps[i].kind == kind)
            return static_cast<int>(i) + 1;
    return 0;
}

// Where in the plan a source is made or kept small.
std::string whereInPlan(const ConePlan& plan, BudgetSource s) {
    auto at = [&](PlanStep::Kind kind) {
        const int n = stepNumber(plan, kind);
        return n > 0 ? " (step " + std::to_string(n) + ")" : std::string();
    };
    switch (s) {
    case BudgetSource::CompoundAngle:
        return at(PlanStep::Kind::SetCompound);
    case BudgetSource::TipHeight:
        return at(PlanStep::Kind::CentreHeight);
    case BudgetSource::Measuring:
        return at(PlanStep::Kind::TouchOff);
    case BudgetSource::NoseRadius:
        return " (the insert)";
    default:
        return " (every pass)";
    }
}

} // namespace

TrialCut trialCutOf(const ConePlan& plan, double measureSdMm) {
    TrialCut t;
    for (std::size_t k = 0; k < plan.display.size(); ++k)
        if (plan.display[k].coneFinish)
            t.finishPasses.push_back(static_cast<int>(k));
    t.trialPasses = t.finishPasses.empty() ? static_cast<int>(plan.scene.plan.passes.size())
                                           : t.finishPasses.front();
    t.checkZMm = plan.checkZMm;
    t.expectedDiameterMm = plan.checkDiameterRoughMm;
    t.measureSdMm = measureSdMm;
    return t;
}

std::string candidateWords(const PlanCandidate& c) {
    return std::string(c.placing == Placing::ZeroOnDiameter ? "zero on the diameter"
                                                            : "a reference shoulder") +
           (c.trialCut ? ", with a trial cut" : ", no trial cut");
}

PlanChoice choosePlan(const Scene& scene, double target, const BudgetOptions& options,
                      const ProgressFn& progress) {
    PlanChoice out;
    out.target = target;
    const PlanningOptions& asked = scene.planning;
    const double micrometerSdMm = defaultMicrometerUncertaintyMm(scene.units == Units::Inch);
    std::vector<ConePlan> plans;
    for (bool trial : {false, true})
        for (Placing placing : {Placing::ZeroOnDiameter, Placing::ReferenceShoulder}) {
            if ((asked.placingStated && placing != asked.placing) ||
                (asked.trialCutStated && trial != asked.trialCut))
                continue;
            out.candidates.push_back({placing, trial, false, 0});
        }
    for (std::size_t i = 0; i < out.candidates.size(); ++i) {
        PlanCandidate& c = out.candidates[i];
        Scene s = scene;
        s.planning.placing = c.placing;
        s.planning.trialCut = c.trialCut;
        plans.push_back(planCone(s));
        const ConePlan& p = plans.back();
        c.planned = p.planned;
        if (p.planned) {
            BudgetOptions o = options;
            o.shares = false;
            if (c.trialCut)
                o.trialCut = trialCutOf(p, micrometerSdMm);
            c.pInTolerance = runBudget(p.scene, o).pInTolerance;
        }
        if (progress)
            progress(static_cast<double>(i + 1) / static_cast<double>(out.candidates.size() + 1));
    }
    // The first way that reaches the target; else the best.
    for (std::size_t i = 0; i < out.candidates.size() && out.chosen < 0; ++i)
        if (out.candidates[i].planned && out.candidates[i].pInTolerance >= target)
            out.chosen = static_cast<int>(i), out.reached = true;
    for (std::size_t i = 0; i < out.candidates.size() && !out.reached; ++i)
        if (out.candidates[i].planned &&
            (out.chosen < 0 ||
             out.candidates[i].pInTolerance >
                 out.candidates[static_cast<std::size_t>(out.chosen)].pInTolerance))
            out.chosen = static_cast<int>(i);
    if (out.chosen < 0) {
        out.plan = plans.empty() ? planCone(scene) : plans.front();
        return out;
    }
    const PlanCandidate& kept = out.candidates[static_cast<std::size_t>(out.chosen)];
    out.plan = plans[static_cast<std::size_t>(out.chosen)];
    BudgetOptions o = options;
    o.shares = true;
    if (kept.trialCut)
        o.trialCut = trialCutOf(out.plan, micrometerSdMm);
    out.budget = runBudget(out.plan.scene, o);
    if (progress)
        progress(1.0);

    ConePlan& p = out.plan;
    p.choiceLines.push_back("Target: " + chanceInWords(target) +
                            " within tolerance, from a budget of " +
                            std::to_string(out.budget.samples) + " parts for each way (seed " +
                            std::to_string(out.budget.seed) + ").");
    for (std::size_t i = 0; i < out.candidates.size(); ++i) {
        const PlanCandidate& c = out.candidates[i];
        std::string line = candidateWords(c) + ": ";
        line +=
            c.planned ? chanceInWords(c.pInTolerance) + " within tolerance" : "cannot be planned";
        if (static_cast<int>(i) == out.chosen)
            line += out.reached ? "  <- kept: the first that reaches the target"
                                : "  <- kept: the best, but short of the target";
        p.choiceLines.push_back(line);
    }
    if (kept.trialCut)
        p.choiceLines.push_back(
            "The trial cut corrects the size, measured to about ±" +
            formatSmallLength(2 * micrometerSdMm, scene.units) +
            "; it leaves the compound's angle as set: the rolls check is for that.");
    // The steps that matter, the largest spread of the gauge diameter first: each source's
    // spread alone (two standard deviations, as a ± a person reads), since with a trial cut the
    // sources do not add (it takes out what they share up to the measurement).
    std::vector<SourceShare> shares = out.budget.sources;
    std::sort(shares.begin(), shares.end(),
              [](const SourceShare& a, const SourceShare& b) { return a.sdMm > b.sdMm; });
    const double total = out.budget.gaugeDiameterMm.sd;
    for (const SourceShare& s : shares) {
        if (s.sdMm < 0.2 * total && p.stepsThatMatter.size() >= 2)
            break;
        const std::string advice =
            kept.trialCut && s.source == BudgetSource::CrossReading
                ? "read the dial to the division, the corrected finishing reading most of all"
                : budgetSourceAdvice(s.source);
        p.stepsThatMatter.push_back(
            std::string(budgetSourceName(s.source)) + whereInPlan(p, s.source) + ": alone ±" +
            formatSmallLength(2 * s.sdMm, scene.units) +
            " on the gauge diameter (two standard deviations); " + advice + ".");
    }
    return out;
}

} // namespace swarf
