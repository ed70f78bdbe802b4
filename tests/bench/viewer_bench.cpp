// Viewer speed on the demo scene (scenes/fixture-arbor.toml), off screen with software OpenGL
// under a virtual display: moving the slider to another pass (target < 50 ms) and frames per
// second while turning the view (target ≥ 30).
#include "swarf/io/scene_reader.h"
#include "swarf/sim/kernel.h"
#include "swarf/viewer/display.h"
#include "swarf/viewer/viewer.h"

#include <benchmark/benchmark.h>

#include <ctime>
#include <memory>

namespace {

struct Demo {
    swarf::Scene scene;
    swarf::CutResult result;
    std::unique_ptr<swarf::viewer::ViewerSession> view;
};

Demo& demo() {
    static Demo d = [] {
        Demo x;
        x.scene = swarf::io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
        x.result = swarf::simulate(x.scene);
        swarf::viewer::ensureDisplay();
        swarf::viewer::ViewerOptions o;
        o.offScreen = true;
        o.widthPx = 1600;
        o.heightPx = 1000;
        x.view = std::make_unique<swarf::viewer::ViewerSession>(x.scene, x.result, o);
        x.view->render();
        return x;
    }();
    return d;
}

// The slider moved to the end of another pass, and the frame drawn.
void BM_ViewerSliderToPass(benchmark::State& state) {
    Demo& d = demo();
    const int n = d.view->passCount();
    int k = 0;
    const std::clock_t cpu0 = std::clock();  // all threads (the software rasteriser's too)
    for (auto _ : state) {
        k = k % n + 1;
        d.view->setPosition(k);
        d.view->render();
    }
    state.counters["passes"] = n;
    state.counters["process_cpu_ms"] = benchmark::Counter(
        1000.0 * static_cast<double>(std::clock() - cpu0) / CLOCKS_PER_SEC, benchmark::Counter::kAvgIterations);
}
BENCHMARK(BM_ViewerSliderToPass)->Unit(benchmark::kMillisecond)->UseRealTime();

// The slider moved half way into another pass (the profile is swept up to there), and drawn.
void BM_ViewerSliderMidPass(benchmark::State& state) {
    Demo& d = demo();
    const int n = d.view->passCount();
    int k = 0;
    const std::clock_t cpu0 = std::clock();
    for (auto _ : state) {
        k = (k + 1) % n;
        d.view->setPosition(k + 0.5);
        d.view->render();
    }
    state.counters["process_cpu_ms"] = benchmark::Counter(
        1000.0 * static_cast<double>(std::clock() - cpu0) / CLOCKS_PER_SEC, benchmark::Counter::kAvgIterations);
}
BENCHMARK(BM_ViewerSliderMidPass)->Unit(benchmark::kMillisecond)->UseRealTime();

// One frame of the finished part while the camera turns: items per second = frames per second.
void BM_ViewerFrame(benchmark::State& state) {
    Demo& d = demo();
    d.view->setPosition(d.view->passCount());
    d.view->render();
    const std::clock_t cpu0 = std::clock();
    for (auto _ : state) {
        d.view->orbit(2.0);
        d.view->render();
    }
    state.SetItemsProcessed(state.iterations());
    state.counters["process_cpu_ms"] = benchmark::Counter(
        1000.0 * static_cast<double>(std::clock() - cpu0) / CLOCKS_PER_SEC, benchmark::Counter::kAvgIterations);
}
BENCHMARK(BM_ViewerFrame)->Unit(benchmark::kMillisecond)->MinTime(3.0)->UseRealTime();

} // namespace

namespace {
// The same with the translucent ghost off (it costs a translucency pass in software OpenGL).
void BM_ViewerFrameNoGhost(benchmark::State& state) {
    Demo& d = demo();
    d.view->setPosition(d.view->passCount());
    d.view->pressKey("g");
    d.view->render();
    const std::clock_t cpu0 = std::clock();
    for (auto _ : state) {
        d.view->orbit(2.0);
        d.view->render();
    }
    d.view->pressKey("g");
    state.SetItemsProcessed(state.iterations());
    state.counters["process_cpu_ms"] = benchmark::Counter(
        1000.0 * static_cast<double>(std::clock() - cpu0) / CLOCKS_PER_SEC, benchmark::Counter::kAvgIterations);
}
BENCHMARK(BM_ViewerFrameNoGhost)->Unit(benchmark::kMillisecond)->MinTime(3.0)->UseRealTime();
} // namespace
