// The error budget of a set-up: a Monte Carlo over its uncertainty (see budget.h).
#include "swarf/sim/budget.h"

#include "swarf/sim/perturb.h"

#include <algorithm>
#include <atomic>
#include <cmath>
#include <exception>
#include <mutex>
#include <thread>

namespace swarf {

namespace {

int mainConeIndex(const Scene& scene) {
    const Feature* c = scene.workedCone();
    return c ? static_cast<int>(c - scene.part.features.data()) : -1;
}

// Counts the parts made over the whole budget and reports the fraction from one thread.
struct Progress {
    std::atomic<long> done{0};
    long total = 1;
    const ProgressFn* fn = nullptr;
    void report() const {
        if (fn && *fn)
            (*fn)(std::min(1.0, static_cast<double>(done.load()) / static_cast<double>(total)));
    }
};

// Makes parts 0..n−1 with `sources` drawn, on `threads` threads (the calling one among them,
// which alone reports progress). Part i depends on (seed, i) only.
// The index of a part's trial-cut micrometer draw among source Measuring's numbers: far from
// the set-up's own (index 0), so a trial cut leaves every other draw as it is.
constexpr std::uint64_t kTrialMeasureIndex = 1u << 20;

// One part: `scene` drawn as part `i`, with its trial cut if there is one.
PartOutcome onePart(const Scene& scene, int feature, const std::vector<BudgetSource>& sources,
                    std::uint64_t seed, std::uint64_t i, const TrialCut* trial) {
    Scene drawn = perturbScene(scene, seed, i, sources);
    if (trial)
        drawn = afterTrialCut(drawn, *trial,
                              trial->measureSdMm * budgetNormal(seed, i, BudgetSource::Measuring,
                                                                kTrialMeasureIndex));
    return partOutcome(drawn, feature);
}

std::vector<PartOutcome> makeParts(const Scene& scene, int feature,
                                   const std::vector<BudgetSource>& sources, std::uint64_t seed,
                                   int n, int threads, Progress& progress, const TrialCut* trial) {
    std::vector<PartOutcome> out(static_cast<std::size_t>(n));
    std::atomic<int> next{0};
    std::exception_ptr failure;
    std::mutex failureMutex;
    auto work = [&](bool reporter) {
        try {
            for (int i = next.fetch_add(1); i < n; i = next.fetch_add(1)) {
                out[static_cast<std::size_t>(i)] =
                    onePart(scene, feature, sources, seed, static_cast<std::uint64_t>(i), trial);
                progress.done.fetch_add(1);
                if (reporter)
                    progress.report();
            }
        } catch (...) {
            const std::lock_guard<std::mutex> lock(failureMutex);
            if (!failure)
                failure = std::current_exception();
            next.store(n); // the others stop at their next part
        }
    };
    std::vector<std::thread> pool;
    for (int t = 1; t < std::min(threads, n); ++t)
        pool.emplace_back(work, false);
    work(true);
    for (std::thread& t : pool)
        t.join();
    if (failure)
        std::rethrow_exception(failure);
    return out;
}

std::vector<double> diameters(const std::vector<PartOutcome>& parts) {
    std::vector<double> v;
    v.reserve(parts.size());
    for (const PartOutcome& p : parts)
        v.push_back(p.gaugeDiameterMm);
    return v;
}

std::vector<double> halfAngles(const std::vector<PartOutcome>& parts) {
    std::vector<double> v;
    v.reserve(parts.size());
    for (const PartOutcome& p : parts)
        v.push_back(p.halfAngleRad);
    return v;
}

} // namespace

Spread spreadOf(std::vector<double> v) {
    Spread s;
    if (v.empty())
        return s;
    const double n = static_cast<double>(v.size());
    // Sums about the first value: equal values give their value and a spread of exactly 0.
    const double x0 = v.front();
    double sum = 0;
    for (double x : v)
        sum += x - x0;
    const double d = sum / n;
    s.mean = x0 + d;
    double ss = 0;
    for (double x : v)
        ss += (x - x0 - d) * (x - x0 - d);
    s.sd = v.size() > 1 ? std::sqrt(ss / (n - 1)) : 0.0;
    std::sort(v.begin(), v.end());
    auto at = [&](double q) {
        const double pos = q * (n - 1);
        const auto lo = static_cast<std::size_t>(std::floor(pos));
        const std::size_t hi = std::min(lo + 1, v.size() - 1);
        return v[lo] + (pos - static_cast<double>(lo)) * (v[hi] - v[lo]);
    };
    s.p2_5 = at(0.025);
    s.p97_5 = at(0.975);
    return s;
}

std::string budgetRefusal(const Scene& scene) {
    if (!scene.workedCone())
        return scene.tool.kind == ToolKind::BoringBar
                   ? "the drawing has no inside cone for the boring bar: a budget is of a "
                     "cone's gauge diameter and half angle"
                   : "the drawing has no cone: a budget is of a cone's gauge diameter and half "
                     "angle";
    if (scene.plan.passes.empty())
        return "the scene has no passes to cut the cone with";
    return "";
}

double budgetProfileStepMm(const Scene& scene) {
    return std::max(scene.sim.profileStepMm, 0.01);
}

Budget runBudget(const Scene& scene, const BudgetOptions& options, const ProgressFn& progress) {
    Budget b;
    b.featureIndex = mainConeIndex(scene);
    const Feature& cone = scene.part.features.at(static_cast<std::size_t>(b.featureIndex));
    b.gaugeZMm = cone.cone.gaugeZMm;
    b.nominalDiameterMm = cone.cone.gaugeDiameterMm;
    b.toleranceMm = cone.toleranceMm;
    b.nominalHalfAngleRad = cone.cone.halfAngleRad;
    b.angleToleranceRad = cone.angleToleranceRad;
    b.samples = std::max(2, options.samples);
    b.seed = options.seed;

    Scene base = scene;
    base.sim.profileStepMm = budgetProfileStepMm(scene);
    b.profileStepMm = base.sim.profileStepMm;
    const std::vector<BudgetSource> active =
        activeBudgetSources(scene.uncertainty, scene.setup.cross.backlashMm,
                            scene.setup.compound.backlashMm, scene.setup.saddle.backlashMm);
    const int shareSamples = options.shareSamples > 0 ? options.shareSamples : b.samples;
    // One source alone draws as it does among all of them: its run is the main run.
    const bool oneAtATime = options.shares && active.size() > 1;
    const int threads = options.threads > 0
                            ? options.threads
                            : std::max(1, static_cast<int>(std::thread::hardware_concurrency()));

    Progress prog;
    prog.fn = &progress;
    prog.total = 1 + b.samples + (oneAtATime ? shareSamples * static_cast<long>(active.size()) : 0);

    const TrialCut* trial = options.trialCut ? &*options.trialCut : nullptr;
    b.exact = partOutcome(trial ? afterTrialCut(base, *trial, 0.0) : base, b.featureIndex);
    prog.done = 1;
    const std::vector<PartOutcome> parts =
        makeParts(base, b.featureIndex, active, b.seed, b.samples, threads, prog, trial);
    b.gaugeDiametersMm = diameters(parts);
    b.gaugeDiameterMm = spreadOf(b.gaugeDiametersMm);
    b.halfAngleRad = spreadOf(halfAngles(parts));
    int inTol = 0, gaugeIn = 0;
    for (const PartOutcome& p : parts) {
        inTol += p.withinTolerance ? 1 : 0;
        gaugeIn += std::abs(p.gaugeDiameterMm - b.nominalDiameterMm) <= b.toleranceMm + 1e-9;
    }
    b.pInTolerance = static_cast<double>(inTol) / b.samples;
    b.pGaugeInTolerance = static_cast<double>(gaugeIn) / b.samples;

    const double total = b.gaugeDiameterMm.sd * b.gaugeDiameterMm.sd;
    const double totalAngle = b.halfAngleRad.sd * b.halfAngleRad.sd;
    for (BudgetSource src : active) {
        SourceShare s;
        s.source = src;
        if (oneAtATime) {
            const std::vector<PartOutcome> alone =
                makeParts(base, b.featureIndex, {src}, b.seed, shareSamples, threads, prog, trial);
            s.sdMm = spreadOf(diameters(alone)).sd;
            s.halfAngleSdRad = spreadOf(halfAngles(alone)).sd;
        } else if (options.shares) {
            s.sdMm = b.gaugeDiameterMm.sd;
            s.halfAngleSdRad = b.halfAngleRad.sd;
        }
        s.share = total > 0 ? s.sdMm * s.sdMm / total : 0.0;
        s.halfAngleShare = totalAngle > 0 ? s.halfAngleSdRad * s.halfAngleSdRad / totalAngle : 0.0;
        b.sources.push_back(s);
    }
    prog.done = prog.total;
    prog.report();
    return b;
}

std::string chanceInWords(double p) {
    if (p >= 1.0)
        return "every part drawn";
    if (p <= 0.0)
        return "no part drawn";
    const long tens = std::lround(10.0 * p);
    const long hundreds = std::lround(100.0 * p);
    if (p >= 0.95 || p < 0.05) {
        if (hundreds >= 100)
            return "more than 99 in 100 parts";
        if (hundreds <= 0)
            return "fewer than 1 in 100 parts";
        return std::to_string(hundreds) + " in 100 parts";
    }
    return std::to_string(tens) + " in 10 parts";
}

std::string budgetSentence(const Budget& b) {
    std::string s = chanceInWords(b.pInTolerance) + " within tolerance";
    if (b.sources.empty())
        return s + "; nothing in the set-up is stated as uncertain, so every part comes out the "
                   "same";
    // Which spread sends parts out of tolerance: the gauge diameter's, or (when most of the
    // parts out have their gauge diameter within) the half angle's.
    const double out = 1.0 - b.pInTolerance, outOnDiameter = 1.0 - b.pGaugeInTolerance;
    const bool angle = out > 0 && outOnDiameter < 0.5 * out && b.halfAngleRad.sd > 0;
    auto share = [&](const SourceShare& x) { return angle ? x.halfAngleShare : x.share; };
    const SourceShare* top = &b.sources.front();
    for (const SourceShare& x : b.sources)
        if (share(x) > share(*top))
            top = &x;
    if (share(*top) <= 0)
        return s + (b.gaugeDiameterMm.sd == 0 && b.halfAngleRad.sd == 0
                        ? "; the stated uncertainties do not move the cone"
                        : "");
    const long pct = std::lround(100.0 * share(*top));
    return s + "; " + budgetSourceName(top->source) + " is " + std::to_string(pct) + " % of the " +
           (angle ? "half angle's spread: " : "spread: ") + budgetSourceAdvice(top->source);
}

} // namespace swarf
