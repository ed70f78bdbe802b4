// swarf view SCENE: reads the scene, runs the simulation and opens the 3D window.
#include "commands.h"
#include "swarf/app/display.h"
#include "swarf/app/memory.h"
#include "swarf/app/twin.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/causes.h"
#include "swarf/sim/error.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/run_budget.h"
#include "swarf/viewer/viewer.h"

#include <fmt/core.h>

#include <cctype>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <map>
#include <memory>
#include <optional>
#include <string>

namespace swarf::app {

void registerView(CLI::App& app, int& exitCode) {
    auto* cmd = app.add_subcommand(
        "view", "Open the 3D window: the part as cut, coloured by deviation, pass by pass "
                "(keys: press h in the window; w shows the scene's twin)");
    struct Args {
        std::string scene;
        std::string screenshot;
        std::string size;
        std::string camera;
        std::string twin;
        bool showTwin = false;
        viewer::ViewerOptions options;
    };
    auto args = std::make_shared<Args>();
    cmd->add_option("SCENE", args->scene, "Scene file (.toml)")->required();
    cmd->add_option("--magnify", args->options.magnification,
                    "Magnification of the deviation in the section view")
        ->check(CLI::Range(1.0, 1e6))
        ->capture_default_str();
    cmd->add_option("--pass", args->options.startPosition,
                    "Open at this point of the plan: 0 before the first pass, k after pass k, "
                    "k.5 half way through pass k+1 (default: the finished part)");
    // The old name, kept so existing commands work; not listed in the help (`swarf taper --at`
    // is a distance: one word, one meaning).
    cmd->add_option("--at", args->options.startPosition)->group("");
    cmd->add_option("--size", args->size,
                    "Window size in pixels, WIDTHxHEIGHT (default 1280x800; larger windows draw "
                    "more slowly with software OpenGL)")
        ->check([](const std::string& v) -> std::string {
            int w = 0, h = 0;
            char tail = 0;
            if (std::sscanf(v.c_str(), "%dx%d%c", &w, &h, &tail) != 2 || w < 320 || h < 240 ||
                w > 8192 || h > 8192)
                return "expected WIDTHxHEIGHT in pixels, each from 320x240 to 8192x8192, e.g. "
                       "1600x1000; got '" +
                       v + "'";
            return "";
        });
    cmd->add_option("--twin", args->twin,
                    "The scene's twin, shown as a ghost with the differences by key w (and from "
                    "the start when given here); without it, " +
                        twinRuleText());
    cmd->add_flag("--show-twin", args->showTwin,
                  "Open with the twin shown (as pressing w), e.g. for --screenshot");
    cmd->add_option("--screenshot", args->screenshot,
                    "Render the window once off screen into this PNG and exit (no window)");
    // The views of keys 1-5 and c (viewer/KEYS.md), by name.
    static const std::map<std::string, std::string> cameras = {{"front", "1"}, {"top", "2"},
                                                               {"end", "3"},   {"oblique", "4"},
                                                               {"cone", "5"},  {"close-up", "c"}};
    cmd->add_option("--camera", args->camera,
                    "Open on this view: front (operator's side, chuck on the left), top, end "
                    "(from the tailstock), oblique (the default), cone (the main cone filling "
                    "the view) or close-up (the feed marks at the gauge plane); with "
                    "--screenshot, the view the picture is taken from")
        ->check([](const std::string& v) -> std::string {
            if (cameras.count(v))
                return "";
            return "expected front, top, end, oblique, cone or close-up; got '" + v + "'";
        });
    cmd->callback([args, &exitCode] {
        if (!args->size.empty())
            std::sscanf(args->size.c_str(), "%dx%d", &args->options.widthPx,
                        &args->options.heightPx);
        if (!args->camera.empty())
            args->options.startKeys = {cameras.at(args->camera)};
        const Scene scene = io::readScene(args->scene);
        // A slider position past the plan is said, with the range, before any work.
        const double passes = static_cast<double>(scene.plan.passes.size());
        const double at = args->options.startPosition;
        if (at >= 0 && at > passes) // negative: the finished part (the default)
            throw InputError(
                SourceLoc{"command line", 0, 0}, "--pass", fmt::format("{:g}", at),
                fmt::format("expected a position from 0 (before the first pass) to {:g} (the "
                            "end of the last): the plan has {:g} passes",
                            passes, passes));
        requireFits(scene, {false, false, true}, availableMemoryBytes());
        // The twin is read before any work, so a bad one is said at once (exit 2).
        std::optional<viewer::TwinView> twin;
        if (const auto twinFile = findTwin(args->scene, args->twin)) {
            twin.emplace();
            twin->scene = io::readScene(*twinFile);
            // Both are held at once: the twin gets what the scene leaves.
            requireFits(twin->scene, {false, false, true},
                        availableMemoryBytes() - estimateRun(scene, {false, false, true}).bytes);
            twin->name = std::filesystem::path(*twinFile).filename().string();
            twin->shownAtStart = !args->twin.empty() || args->showTwin;
        }
        std::string rule = twinRuleText();
        rule[0] = static_cast<char>(std::toupper(static_cast<unsigned char>(rule[0])));
        args->options.noTwinNote = rule + ".";
        const auto result = std::make_shared<const CutResult>([&scene] {
            CutResult r = simulate(scene);
            // The panel names them at their pass; measured on the cone the tool cuts, outside or
            // bored, as `swarf run` (causes.h).
            r.causes = findCauses(scene, r);
            return r;
        }());
        if (twin)
            twin->result = std::make_shared<const CutResult>(simulate(twin->scene));
        const bool showTwinAlone = args->showTwin && !twin;
        if (!args->screenshot.empty()) {
            viewer::ViewerOptions o = args->options;
            o.offScreen = true;
            ensureDisplay();
            viewer::ViewerSession session(scene, result, o);
            if (twin)
                session.setTwin(*twin);
            else if (showTwinAlone)
                session.pressKey("w"); // the panel says there is no twin, and how to give one
            session.render();
            session.saveSnapshot(args->screenshot);
            exitCode = kExitOk;
            return;
        }
        const char* display = std::getenv("DISPLAY");
        if (!display || !*display)
            throw RenderError(
                "'swarf view' needs a screen and DISPLAY is not set; "
                "'swarf run' writes the pictures and report.html without one, and "
                "'swarf view SCENE --screenshot FILE.png' renders the window to a file");
        viewer::runViewer(scene, result, args->options, twin ? &*twin : nullptr);
        exitCode = kExitOk;
    });
}

} // namespace swarf::app
