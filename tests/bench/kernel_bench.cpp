// Kernel timings (Google Benchmark).
//
// BM_Kernel_*: a plan of 21 passes over a 60 mm cone (20 compound roughing passes at 0.2 mm/rev
// and a finishing pass at 0.1 mm/rev), 0.002 mm profile step, 180 angle samples. Targets: exact
// profile under 20 ms; the OCCT reference path on the same moves runs once, for the speed ratio.
//
// BM_Demo_*: the demo scene (scenes/fixture-arbor.toml), read from the file. The feed-mark
// surface (sim/feed_marks.h) against the exact profile and against the dense height map swarf
// built before it (dense_map_reference.h, a copy kept here), all in one run: targets at least
// 10 times faster than the dense map and no slower than 20 times the exact profile.
//
// BM_SurfaceFill / BM_MemoryCopy: a grid of the demo's cone filled from the surface, 2000 rows
// by 1440 columns of floats, against a plain copy of as many floats (the memory bandwidth of one
// thread), both into buffers made once: bytes written per second; the fill aims at 25 % of the
// copy.
// Peak memory is measured with /usr/bin/time -v on `swarf run` (see DEVELOPERS.md).
#include "dense_map_reference.h"

#include "swarf/geometry/reference_cut.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/feed_marks.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/surface_roughness.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <benchmark/benchmark.h>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <string>
#include <vector>

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

void BM_Kernel_FeedMarkSurface(benchmark::State& state) {
    const auto moves = planMoves(scene());
    const ToolOutline o(scene().tool);
    const ExactSweep sw = sweepExact(scene(), o, moves, moves.size(), 1.0, false);
    for (auto _ : state) {
        FeedMarkSurface m = FeedMarkSurface::build(scene(), o, moves, sw);
        benchmark::DoNotOptimize(m.crestRadiusOnSamples().data());
    }
}
BENCHMARK(BM_Kernel_FeedMarkSurface)->Unit(benchmark::kMillisecond);

const Scene& demo() {
    static const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    return s;
}

void BM_Demo_ExactProfile(benchmark::State& state) {
    const auto moves = planMoves(demo());
    const ToolOutline o(demo().tool);
    for (auto _ : state) {
        ExactSweep sw = sweepExact(demo(), o, moves, moves.size(), 1.0, false);
        benchmark::DoNotOptimize(sw.asCut.radiusMm.data());
    }
}
BENCHMARK(BM_Demo_ExactProfile)->Unit(benchmark::kMillisecond);

// Today's surface: the crests on every sample of the profile, and the finishing pass's
// roughness measured on the surface.
void BM_Demo_FeedMarkSurface(benchmark::State& state) {
    const auto moves = planMoves(demo());
    const ToolOutline o(demo().tool);
    const ExactSweep sw = sweepExact(demo(), o, moves, moves.size(), 1.0, false);
    const int finish = static_cast<int>(moves.size()) - 1;
    for (auto _ : state) {
        FeedMarkSurface m = FeedMarkSurface::build(demo(), o, moves, sw);
        const Roughness r = measureRoughness(m, finish, 2, 48);
        benchmark::DoNotOptimize(r.rtUm);
    }
}
BENCHMARK(BM_Demo_FeedMarkSurface)->Unit(benchmark::kMillisecond);

// The dense map swarf built before, and its roughness, on the same sweep.
void BM_Demo_DenseMapBefore(benchmark::State& state) {
    const auto moves = planMoves(demo());
    const ToolOutline o(demo().tool);
    const ExactSweep sw = sweepExact(demo(), o, moves, moves.size(), 1.0, false);
    const MoveSweep finish = prepareMove(o, moves.back());
    bench::DenseMap m;
    for (auto _ : state) {
        m = bench::buildDenseMap(demo(), o, moves, sw);
        const auto r = bench::measureDenseRoughness(m, o, finish, 0, 2, 48);
        benchmark::DoNotOptimize(r.rtUm);
    }
    state.counters["MB"] = static_cast<double>(m.radiusMm.size() * sizeof(float)) / 1e6;
}
BENCHMARK(BM_Demo_DenseMapBefore)->Unit(benchmark::kMillisecond);

void BM_Demo_Simulate(benchmark::State& state) {
    for (auto _ : state) {
        CutResult r = simulate(demo());
        benchmark::DoNotOptimize(r.asCut.radiusMm.data());
    }
}
BENCHMARK(BM_Demo_Simulate)->Unit(benchmark::kMillisecond);

// The grid's size in the two benchmarks below: 2000 rows by 1440 columns of floats (11.5 MB).
constexpr std::size_t kFillRows = 2000, kFillColumns = 1440;

// A grid over the demo's cone, as a picture would ask for one, written into a buffer made once:
// bytes of floats written a second (one thread).
void BM_SurfaceFill(benchmark::State& state) {
    static const CutResult r = simulate(demo());
    std::vector<double> rows(kFillRows);
    for (std::size_t i = 0; i < kFillRows; ++i)
        rows[i] = 50.0 * static_cast<double>(i) / (kFillRows - 1);
    std::vector<float> grid(kFillRows * kFillColumns);
    for (auto _ : state) {
        r.surface.fillGrid(rows, static_cast<int>(kFillColumns), 0.0, grid.data());
        benchmark::DoNotOptimize(grid.data());
        benchmark::ClobberMemory();
    }
    state.SetBytesProcessed(
        static_cast<std::int64_t>(state.iterations() * grid.size() * sizeof(float)));
}
BENCHMARK(BM_SurfaceFill)->Unit(benchmark::kMillisecond);

// The memory-bandwidth probe: a plain copy of an array of floats the grid's size into another
// made once (one thread): bytes written a second.
void BM_MemoryCopy(benchmark::State& state) {
    const std::vector<float> from(kFillRows * kFillColumns, 1.5f);
    std::vector<float> to(from.size(), 0.0f);
    for (auto _ : state) {
        std::copy(from.begin(), from.end(), to.begin());
        benchmark::DoNotOptimize(to.data());
        benchmark::ClobberMemory();
    }
    state.SetBytesProcessed(
        static_cast<std::int64_t>(state.iterations() * to.size() * sizeof(float)));
}
BENCHMARK(BM_MemoryCopy)->Unit(benchmark::kMillisecond);

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
