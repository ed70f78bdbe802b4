// Error budget timings (Google Benchmark) on the demo scene (scenes/fixture-arbor.toml, its
// [uncertainty] with eight sources): 10,000 parts drawn for the spread alone, the whole budget
// with its one-at-a-time runs, one part through the budget's exact-profile path, and one
// `swarf run`-like kernel run (simulate: exact profile, 3D surface, findings) for the ratio.
// Target: 10,000 parts under 10 s on two cores.
#include "swarf/io/scene_reader.h"
#include "swarf/sim/budget.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/perturb.h"

#include <benchmark/benchmark.h>

namespace {

using namespace swarf;

const Scene& demo() {
    static const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    return s;
}

void BM_Budget_10000Parts(benchmark::State& state) {
    BudgetOptions o;
    o.samples = 10000;
    o.shares = false;
    for (auto _ : state) {
        const Budget b = runBudget(demo(), o);
        benchmark::DoNotOptimize(b.gaugeDiameterMm.sd);
    }
    state.counters["parts"] = 10000;
}
BENCHMARK(BM_Budget_10000Parts)->Unit(benchmark::kSecond)->Iterations(1);

void BM_Budget_WithShares2000(benchmark::State& state) {
    BudgetOptions o;
    o.samples = 2000; // and 2000 for each of the eight sources alone: 18,000 parts
    for (auto _ : state) {
        const Budget b = runBudget(demo(), o);
        benchmark::DoNotOptimize(b.sources.data());
    }
}
BENCHMARK(BM_Budget_WithShares2000)->Unit(benchmark::kSecond)->Iterations(1);

void BM_Budget_OnePart(benchmark::State& state) {
    Scene s = demo();
    s.sim.profileStepMm = budgetProfileStepMm(s);
    const int cone = static_cast<int>(s.part.mainCone() - s.part.features.data());
    std::uint64_t i = 0;
    const auto all = activeBudgetSources(s.uncertainty, s.setup.cross.backlashMm,
                                         s.setup.compound.backlashMm, s.setup.saddle.backlashMm);
    for (auto _ : state) {
        const PartOutcome p = partOutcome(perturbScene(s, 1, i++, all), cone);
        benchmark::DoNotOptimize(p.gaugeDiameterMm);
    }
}
BENCHMARK(BM_Budget_OnePart)->Unit(benchmark::kMillisecond);

void BM_Budget_OneSimulateRun(benchmark::State& state) {
    for (auto _ : state) {
        const CutResult r = simulate(demo());
        benchmark::DoNotOptimize(r.gaugeAsCutDiameterMm);
    }
}
BENCHMARK(BM_Budget_OneSimulateRun)->Unit(benchmark::kMillisecond)->Iterations(3);

} // namespace
