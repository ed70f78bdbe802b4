// Viewer speed on the demo scene (scenes/fixture-arbor.toml) with software OpenGL (llvmpipe)
// under a virtual display, at the window's default size: moving the slider to another pass
// (target < 50 ms, frame included), frames per second while turning the view (target ≥ 30),
// and the same for the close-up of the feed marks. The window is a real one on the display
// (as `swarf view` opens it), not an off-screen buffer, unless SWARF_BENCH_OFFSCREEN is set.
// Run it with no DISPLAY (it starts its own Xvfb with a 24-bit screen) or under a 24-bit one.
#include "swarf/app/display.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/kernel.h"
#include "swarf/viewer/viewer.h"

#include <benchmark/benchmark.h>

#include <cstdio>
#include <cstdlib>
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
        swarf::app::ensureDisplay();
        swarf::viewer::ViewerOptions o; // the default window size
        o.offScreen = std::getenv("SWARF_BENCH_OFFSCREEN") != nullptr;
        // SWARF_BENCH_SIZE=WxH: another window size (the default is the viewer's).
        if (const char* size = std::getenv("SWARF_BENCH_SIZE"))
            std::sscanf(size, "%dx%d", &o.widthPx, &o.heightPx);
        x.view = std::make_unique<swarf::viewer::ViewerSession>(x.scene, x.result, o);
        x.view->render();
        return x;
    }();
    return d;
}

// CPU of the whole process (the software rasteriser's threads too) per iteration, ms.
struct ProcessCpu {
    std::clock_t start = std::clock();
    void report(benchmark::State& state) const {
        state.counters["process_cpu_ms"] =
            benchmark::Counter(1000.0 * static_cast<double>(std::clock() - start) / CLOCKS_PER_SEC,
                               benchmark::Counter::kAvgIterations);
    }
};

// The slider moved to the end of another pass, and the frame drawn.
void BM_ViewerSliderToPass(benchmark::State& state) {
    Demo& d = demo();
    d.view->pressKey("r");
    const int n = d.view->passCount();
    int k = 0;
    ProcessCpu cpu;
    for (auto _ : state) {
        k = k % n + 1;
        d.view->setPosition(k);
        d.view->render();
    }
    state.counters["passes"] = n;
    cpu.report(state);
}
BENCHMARK(BM_ViewerSliderToPass)->Unit(benchmark::kMillisecond)->UseRealTime();

// The slider moved half way into another pass (the profile is swept up to there), and drawn.
void BM_ViewerSliderMidPass(benchmark::State& state) {
    Demo& d = demo();
    const int n = d.view->passCount();
    int k = 0;
    ProcessCpu cpu;
    for (auto _ : state) {
        k = (k + 1) % n;
        d.view->setPosition(k + 0.5);
        d.view->render();
    }
    cpu.report(state);
}
BENCHMARK(BM_ViewerSliderMidPass)->Unit(benchmark::kMillisecond)->UseRealTime();

// The data side of a slider step alone (no frame): what the view does before VTK draws.
void BM_ViewerSliderUpdateOnly(benchmark::State& state) {
    Demo& d = demo();
    const int n = d.view->passCount();
    int k = 0;
    for (auto _ : state) {
        k = (k + 1) % (2 * n);
        d.view->setPosition(0.5 * k);
    }
}
BENCHMARK(BM_ViewerSliderUpdateOnly)->Unit(benchmark::kMillisecond);

// One frame of the finished part while the camera turns: items per second = frames per second.
void BM_ViewerFrame(benchmark::State& state) {
    Demo& d = demo();
    d.view->setPosition(d.view->passCount());
    d.view->pressKey("r");
    d.view->render();
    ProcessCpu cpu;
    for (auto _ : state) {
        d.view->orbit(2.0);
        d.view->render();
    }
    state.SetItemsProcessed(state.iterations());
    cpu.report(state);
}
BENCHMARK(BM_ViewerFrame)->Unit(benchmark::kMillisecond)->MinTime(3.0)->UseRealTime();

// The close-up of the feed marks (key c) while the camera turns.
void BM_ViewerFrameCloseUp(benchmark::State& state) {
    Demo& d = demo();
    d.view->setPosition(d.view->passCount());
    d.view->pressKey("c");
    d.view->render();
    ProcessCpu cpu;
    for (auto _ : state) {
        d.view->orbit(0.5);
        d.view->render();
    }
    d.view->pressKey("r");
    state.SetItemsProcessed(state.iterations());
    cpu.report(state);
}
BENCHMARK(BM_ViewerFrameCloseUp)->Unit(benchmark::kMillisecond)->MinTime(3.0)->UseRealTime();

} // namespace
