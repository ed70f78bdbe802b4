#pragma once
// The error budget of a set-up: how sure the gauge diameter and the half angle of the main cone
// are, given the scene's [uncertainty]. A Monte Carlo (references R11, JCGM 101): many parts are
// made, each from the scene drawn afresh (perturb.h), through the exact-profile kernel alone
// (machine model, exact sweep, comparison with the drawing; no feed-mark surface, no solids);
// the spread of their gauge diameters and half angles, and the share of it each source makes
// (one-at-a-time runs with the same draws), are the budget. Spread over every core with
// std::thread; the numbers depend on the seed and the sample count only.
#include "swarf/sim/kernel.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/trial_cut.h"
#include "swarf/sim/uncertainty.h"

#include <cstdint>
#include <optional>
#include <string>
#include <vector>

namespace swarf {

/// How to run a budget.
struct BudgetOptions {
    int samples = 2000;     ///< parts drawn for the spread, ≥ 2
    std::uint64_t seed = 1; ///< the random numbers' seed
    int threads = 0;        ///< threads to use; 0: one per core
    int shareSamples = 0;   ///< parts drawn per one-at-a-time run; 0: as many as `samples`
    bool shares = true;     ///< false: no one-at-a-time runs (sources then have no share)
    /// A measured trial cut before finishing (trial_cut.h): each part is cut to the trial, its
    /// diameter measured with the micrometer's error drawn (source Measuring's numbers, apart
    /// from the set-up's), and finished at the corrected reading. Empty: no trial cut.
    std::optional<TrialCut> trialCut;
};

/// A spread of values: mean, standard deviation (n − 1) and the 2.5 % and 97.5 % points
/// (linear between the sorted values).
struct Spread {
    double mean = 0, sd = 0, p2_5 = 0, p97_5 = 0;
};

/// The spread of a list of values (at least one).
Spread spreadOf(std::vector<double> values);

/// What one part comes out as.
struct PartOutcome {
    double gaugeDiameterMm = 0;   ///< exact as-cut diameter at the cone's gauge plane
    double halfAngleRad = 0;      ///< half angle fitted to the as-cut cone
    bool withinTolerance = false; ///< the cone's verdict, as `swarf run` gives it
};

/// One source's part of the spread.
struct SourceShare {
    BudgetSource source = BudgetSource::CompoundAngle;
    double sdMm = 0;  ///< sd of the gauge diameter with this source alone, mm
    double share = 0; ///< its variance over the variance with every source on (0 when that is 0)
    double halfAngleSdRad = 0; ///< sd of the half angle with this source alone, rad
    /// Its variance of the half angle over that with every source on (0 when that is 0).
    double halfAngleShare = 0;
};

/// The budget.
struct Budget {
    int featureIndex = -1;                ///< the cone budgeted (Part::mainCone)
    double gaugeZMm = 0;                  ///< its gauge plane
    double nominalDiameterMm = 0;         ///< the drawing's gauge diameter
    double toleranceMm = 0;               ///< ± on it
    double nominalHalfAngleRad = 0;       ///< the drawing's half angle
    double angleToleranceRad = 0;         ///< ± on it
    double profileStepMm = 0;             ///< axial spacing of the exact profile used
    PartOutcome exact;                    ///< the part with every source at zero
    int samples = 0;                      ///< parts drawn
    std::uint64_t seed = 0;               ///< the seed
    Spread gaugeDiameterMm;               ///< over the parts drawn, mm
    Spread halfAngleRad;                  ///< over the parts drawn, rad
    double pInTolerance = 0;              ///< fraction of parts whose cone is within tolerance
    double pGaugeInTolerance = 0;         ///< fraction whose gauge diameter alone is within ±t
    std::vector<double> gaugeDiametersMm; ///< every part's gauge diameter, in sample order
    std::vector<SourceShare> sources;     ///< the active sources, in allBudgetSources() order
};

/// Why the scene cannot be budgeted ("" if it can): no cone in the drawing, or no passes.
std::string budgetRefusal(const Scene& scene);

/// The axial spacing of the exact profile a budget uses: the scene's profile_step, or 0.01 mm
/// if that is finer (the gauge diameter is exact at a sample and the cone's line is straight
/// between; the finer step only costs time).
double budgetProfileStepMm(const Scene& scene);

/// One part: the exact-profile kernel on `scene` (its sim.profileStepMm as given), and the cone
/// feature `featureIndex` against the drawing.
PartOutcome partOutcome(const Scene& scene, int featureIndex);

/// Runs the budget of `scene` (precondition: budgetRefusal(scene) is empty). `progress` is
/// called from the calling thread only, with the fraction done.
Budget runBudget(const Scene& scene, const BudgetOptions& options, const ProgressFn& progress = {});

/// The chance of a part within tolerance in words: "9 in 10 parts", "99 in 100 parts",
/// "every part drawn", "no part drawn", "fewer than 1 in 10 parts".
std::string chanceInWords(double p);

/// The sentence a machinist needs: the chance of a part within tolerance, and the largest
/// source with what to do about it ("9 in 10 parts within tolerance; the compound setting is
/// 70 % of the spread: set it with the sine bar"). The spread named is the gauge diameter's,
/// or the half angle's when most parts out of tolerance have their gauge diameter within it.
std::string budgetSentence(const Budget& budget);

} // namespace swarf
