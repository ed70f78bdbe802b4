// Geometry layer timings on the demo scene (scenes/fixture-arbor.toml): the as-cut STEP export
// (target under 1 s), all of `swarf run`'s solids and files, and the reference path, with the
// kernel's exact profile on the same moves so the kernel's speed ratio to it can be quoted.
#include "swarf/geometry/reference_cut.h"
#include "swarf/geometry/revolve.h"
#include "swarf/geometry/run_solids.h"
#include "swarf/geometry/step_file.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/kernel.h"

#include <benchmark/benchmark.h>

#include <filesystem>

namespace {

struct Demo {
    swarf::Scene scene;
    swarf::CutResult result;
    std::filesystem::path outDir;
};

const Demo& demo() {
    static const Demo d = [] {
        Demo x;
        x.scene = swarf::io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
        x.result = swarf::simulate(x.scene);
        x.outDir = std::filesystem::temp_directory_path() / "swarf-geometry-bench";
        std::filesystem::create_directories(x.outDir);
        return x;
    }();
    return d;
}

// The as-cut part from the kernel's profile to a STEP file: fit, revolve, translate, write.
void BM_Geometry_StepExportDemo(benchmark::State& state) {
    const Demo& d = demo();
    const std::string path = (d.outDir / "as-cut.step").string();
    for (auto _ : state) {
        const auto solid = swarf::geometry::asCutSolid(d.scene.stock, d.result.asCut);
        swarf::geometry::writeStep(path, {{"as-cut", solid.solid}});
        benchmark::DoNotOptimize(solid.maxFitErrorMm);
    }
    state.counters["samples"] = static_cast<double>(d.result.asCut.radiusMm.size());
}
BENCHMARK(BM_Geometry_StepExportDemo)->Unit(benchmark::kMillisecond)->Iterations(5);

// Everything `swarf run` asks of the geometry layer by default: stock, nominal, as-cut,
// leftover and overcut solids with volumes, and their STEP files.
void BM_Geometry_RunSolidsDemo(benchmark::State& state) {
    const Demo& d = demo();
    for (auto _ : state) {
        const auto report = swarf::geometry::writeRunSolids(d.scene, d.result, d.outDir.string());
        benchmark::DoNotOptimize(report.asCutVolumeMm3);
    }
}
BENCHMARK(BM_Geometry_RunSolidsDemo)->Unit(benchmark::kMillisecond)->Iterations(3);

// The reference path: the stock solid cut by every move's swept tool with solid booleans.
void BM_Geometry_ReferenceCutDemo(benchmark::State& state) {
    const Demo& d = demo();
    for (auto _ : state) {
        const auto ref = swarf::geometry::referenceCut(d.scene, d.result.moves);
        benchmark::DoNotOptimize(ref.volumeMm3);
    }
    state.counters["moves"] = static_cast<double>(d.result.moves.size());
}
BENCHMARK(BM_Geometry_ReferenceCutDemo)->Unit(benchmark::kMillisecond)->Iterations(3);

// The kernel's exact profile on the same moves (what the reference path computes), for the
// ratio of the two.
void BM_Geometry_KernelProfileDemo(benchmark::State& state) {
    const Demo& d = demo();
    for (auto _ : state) {
        const auto p = swarf::profileUpTo(d.scene, d.result.moves, d.result.moves.size());
        benchmark::DoNotOptimize(p.radiusMm.data());
    }
}
BENCHMARK(BM_Geometry_KernelProfileDemo)->Unit(benchmark::kMillisecond)->Iterations(3);

} // namespace
