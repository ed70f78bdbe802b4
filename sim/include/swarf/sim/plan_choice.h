#pragma once
// Choosing how to work from the error budget: with the scene's [uncertainty] and a target chance
// of a part within tolerance (PlanningOptions::inToleranceTarget), `swarf plan` plans the cone
// each way it knows, runs a budget of each (budget.h, with the trial cut of trial_cut.h where the
// way has one), and keeps the first that reaches the target, in order of the least work:
//   1. zero on the diameter, no trial cut;  2. a reference shoulder, no trial cut;
//   3. zero on the diameter, trial cut;     4. a reference shoulder, trial cut.
// A `placing` or `trial_cut` the scene states is kept (only the ways with it are tried). When
// none reaches the target, the way with the best chance is kept and the plan says so. The kept
// way's budget is run again with its sources one at a time, and their shares name the steps
// that matter most.
#include "swarf/sim/budget.h"
#include "swarf/sim/planner.h"

#include <string>
#include <vector>

namespace swarf {

/// One way of working tried.
struct PlanCandidate {
    PlanningOptions::Placing placing = PlanningOptions::Placing::ZeroOnDiameter;
    bool trialCut = false;
    bool planned = false;    ///< false: the planner could not plan it this way
    double pInTolerance = 0; ///< from its budget (0 when not planned)
};

/// What the choice found.
struct PlanChoice {
    ConePlan plan;                         ///< the kept way's plan, choiceLines filled in
    std::vector<PlanCandidate> candidates; ///< in the order tried
    int chosen = -1;      ///< index into candidates; −1: nothing could be planned
    bool reached = false; ///< the kept way reaches the target
    double target = 0;
    Budget budget; ///< the kept way's budget, with shares
};

/// The trial cut a plan makes (its passes before the first finishing pass, the check plane and
/// the diameter expected there), measured with `measureSdMm`.
TrialCut trialCutOf(const ConePlan& plan, double measureSdMm);

/// "zero on the diameter, no trial cut", "a reference shoulder, with a trial cut", ...
std::string candidateWords(const PlanCandidate& c);

/// Plans `scene` each way, as the file comment says, with budgets of `options` (its trialCut is
/// set per way; shares are run for the kept way only). Precondition: a validated scene with an
/// [uncertainty] and a cone. `progress` gets the fraction of ways done.
PlanChoice choosePlan(const Scene& scene, double target, const BudgetOptions& options,
                      const ProgressFn& progress = {});

} // namespace swarf
