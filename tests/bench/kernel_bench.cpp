// Kernel timings (Google Benchmark): a plan of 21 passes over a 60 mm cone (20 compound
// roughing passes at 0.2 mm/rev and a finishing pass at 0.1 mm/rev), 0.002 mm profile step,
// 180 angle samples. Targets: exact profile under 20 ms, 3D map with the feed marks resolved
// under 1 s, peak memory under 500 MB (measure with /usr/bin/time -v). The OCCT reference path
// on the same moves runs once, for the speed ratio.
#include "swarf/geometry/reference_cut.h"
#include "swarf/sim/height_map.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <benchmark/benchmark.h>

#include <cmath>

namespace {

using namespace swarf;

// A 60 mm cone, 20 mm across at the datum and 8° half angle, from a 40 mm bar.
Scene benchScene() {
    Scene s;
    s.name = "bench: 60 mm cone, 21 passes";
    s.stock.diameterMm = 40;
    s.stock.lengthMm = 200;
    s.stock.stickOutMm = 100;
    const double th = degToRad(8);
    Feature f;
    f.kind = FeatureKind::Cone;
    f.zStartMm = 0;
    f.zEndMm = 60;
    f.cone = {30.0, 20 + 2 * 30 * std::tan(th), th, Widens::TowardChuck};
    f.toleranceMm = 0.02;
    f.angleToleranceRad = degToRad(0.1);
    s.part.features.push_back(f);
    s.tool.shape = 'D';
    s.tool.includedAngleRad = degToRad(55);
    s.tool.enteringAngleRad = degToRad(93);
    s.tool.noseRadiusMm = 0.8;
    s.tool.edgeLengthMm = 15;
    s.setup.compoundReadingRad = th;
    s.setup.compoundAdvanceToward = Widens::TowardTailstock;
    s.setup.zeroDiameterMm = 40;
    s.setup.compound.travelMm = 100;
    // Tip on the cone's line at compound 0: x0 = 10 + 62 tanθ; nose offset ΔX (references R1).
    const double r = 0.8, dX = r * (1 + std::tan(th) - 1 / std::cos(th));
    const double cFinish = 2 * (20 - (10 + 62 * std::tan(th) - dX));
    for (int k = 20; k >= 0; --k) {
        Pass p;
        p.kind = PassKind::Compound;
        p.crossMm = cFinish - (k == 0 ? 0.0 : 0.2 + 0.9 * (k - 1));
        p.saddleMm = 62;
        p.fromMm = 0;
        p.toMm = 64;
        p.feedMmPerRev = k == 0 ? 0.1 : 0.2;
        s.plan.passes.push_back(p);
    }
    s.sim.profileStepMm = 0.002;
    s.sim.angleSamples = 180;
    return s;
}

const Scene& scene() {
    static const Scene s = benchScene();
    return s;
}

void BM_Kernel_ExactProfile(benchmark::State& state) {
    const auto moves = planMoves(scene());
    for (auto _ : state) {
        Profile p = profileUpTo(scene(), moves, moves.size());
        benchmark::DoNotOptimize(p.radiusMm.data());
    }
    state.counters["samples"] =
        static_cast<double>(profileUpTo(scene(), moves, moves.size()).radiusMm.size());
    state.counters["passes"] = static_cast<double>(scene().plan.passes.size());
}
BENCHMARK(BM_Kernel_ExactProfile)->Unit(benchmark::kMillisecond);

void BM_Kernel_HeightMap(benchmark::State& state) {
    const auto moves = planMoves(scene());
    const ToolOutline o(scene().tool);
    const ExactSweep sw = sweepExact(scene(), o, moves, moves.size(), 1.0, false);
    HeightMap m;
    for (auto _ : state) {
        m = buildHeightMap(scene(), o, moves, sw);
        benchmark::DoNotOptimize(m.radiusMm.data());
    }
    state.counters["rows"] = m.nz;
    state.counters["angles"] = m.nPhi;
    state.counters["MB"] = static_cast<double>(m.radiusMm.size() * sizeof(float)) / 1e6;
}
BENCHMARK(BM_Kernel_HeightMap)->Unit(benchmark::kMillisecond);

void BM_Kernel_Simulate(benchmark::State& state) {
    for (auto _ : state) {
        CutResult r = simulate(scene());
        benchmark::DoNotOptimize(r.asCut.radiusMm.data());
    }
}
BENCHMARK(BM_Kernel_Simulate)->Unit(benchmark::kMillisecond);

// The OCCT reference path on the same moves, once: compare with BM_Kernel_ExactProfile.
void BM_Kernel_ReferencePathOnce(benchmark::State& state) {
    const auto moves = planMoves(scene());
    for (auto _ : state) {
        auto r = geometry::referenceCut(scene(), moves);
        benchmark::DoNotOptimize(r.volumeMm3);
    }
}
BENCHMARK(BM_Kernel_ReferencePathOnce)->Unit(benchmark::kMillisecond)->Iterations(1);

} // namespace
