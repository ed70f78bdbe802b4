// swarf plan SCENE --out DIR: plan the drawing's cone on the scene's lathe, write the planned
// scene and the set-up sheet, then run the planned scene (as written) through the kernel and
// print its verdict, so the plan proves itself.
#include "commands.h"
#include "swarf/app/memory.h"
#include "swarf/app/progress.h"
#include "swarf/io/output_file.h"
#include "swarf/io/scene_reader.h"
#include "swarf/io/scene_writer.h"
#include "swarf/io/setup_sheet.h"
#include "swarf/sim/caution.h"
#include "swarf/sim/compound_sense.h"
#include "swarf/sim/error.h"
#include "swarf/sim/inside_work.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/plan_choice.h"
#include "swarf/sim/planner.h"
#include "swarf/sim/run_budget.h"

#include <fmt/core.h>

#include <filesystem>
#include <memory>
#include <optional>
#include <string>

namespace swarf::app {
namespace {

struct PlanArgs {
    std::string scene;
    std::string outDir;
    double target = -1;      ///< < 0: the scene's in_tolerance_target, if any
    long long samples = 400; ///< parts per budget when choosing the way of working
    long long seed = 1;
};

// The plan as told, or, with a target and an [uncertainty], the way of working that reaches the
// target (plan_choice.h), said on the console.
ConePlan planOrChoose(const Scene& scene, const PlanArgs& a) {
    const std::optional<double> target =
        a.target >= 0 ? std::optional<double>(a.target) : scene.planning.inToleranceTarget;
    if (!target)
        return planCone(scene);
    const SourceLoc where = a.target >= 0 ? SourceLoc{"command line", 0, 0} : scene.planning.where;
    const std::string key = a.target >= 0 ? "--target" : "planning.in_tolerance_target";
    if (activeBudgetSources(scene.uncertainty, scene.setup.cross.backlashMm,
                            scene.setup.compound.backlashMm, scene.setup.saddle.backlashMm)
            .empty())
        throw InputError(where, key, fmt::format("{:g}", *target),
                         "expected an [uncertainty] table in the scene to go with it: without "
                         "one every part comes out the same, and there is nothing to choose by");
    BudgetOptions opt;
    opt.samples = static_cast<int>(a.samples);
    opt.seed = static_cast<std::uint64_t>(a.seed);
    PlanChoice choice;
    {
        ProgressBar bar("trying each way of working");
        choice = choosePlan(scene, *target, opt, [&bar](double f) { bar.update(f); });
    }
    if (choice.chosen >= 0) {
        fmt::print("chosen from the error budget:\n");
        for (const std::string& l : choice.plan.choiceLines)
            fmt::print("  {}\n", l);
        for (const std::string& l : choice.plan.stepsThatMatter)
            fmt::print("  matters: {}\n", l);
    }
    return choice.plan;
}

std::vector<std::string> headerFor(const ConePlan& plan, const std::string& from) {
    std::vector<std::string> h = {
        "Planned by `swarf plan` from " + from + ". Run it with `swarf run`.",
        "The passes follow the set-up sheet written beside this file; readings are approached",
        "from below (wind back past each, then forward to it).",
        "",
    };
    for (const std::string& line : wrapWords(safetyCautionShort(), 94))
        h.push_back(line);
    for (const std::string& c : plan.cautions)
        h.push_back("Note: " + c);
    return h;
}

int runPlan(const PlanArgs& a) {
    const Scene scene = io::readScene(a.scene); // bad input throws before anything is written
    if (scene.tool.kind != ToolKind::BoringBar) // a boring bar plans the inside cone
        refuseInsideWork(scene, "plan");
    if (a.target >= 0 && !(a.target > 0 && a.target < 1))
        throw InputError(SourceLoc{"command line", 0, 0}, "--target", fmt::format("{:g}", a.target),
                         "expected a chance between 0 and 1, e.g. 0.95 for 19 parts in 20");
    if (a.samples < 20 || a.samples > 100000)
        throw InputError(SourceLoc{"command line", 0, 0}, "--samples", std::to_string(a.samples),
                         "expected a whole number of parts from 20 to 100000");
    if (a.seed < 0)
        throw InputError(SourceLoc{"command line", 0, 0}, "--seed", std::to_string(a.seed),
                         "expected a whole number 0 or more");
    const ConePlan plan = planOrChoose(scene, a);
    if (plan.planned) // the plan is simulated below: refuse now one the machine cannot hold
        requireFits(plan.scene, {false, false, false}, availableMemoryBytes());
    io::makeOutputFolder(a.outDir);
    const std::filesystem::path dir(a.outDir);
    const Units u = scene.units;

    if (!plan.planned) {
        io::writeTextFile((dir / "setup-sheet.txt").string(), io::setupSheetText(plan));
        io::writeTextFile((dir / "setup-sheet.html").string(), io::setupSheetHtml(plan));
        fmt::print("{}: NOT PLANNED\n", scene.name);
        for (const std::string& p : plan.problems)
            fmt::print("  {}\n", p);
        if (!plan.suggestions.empty()) {
            fmt::print("  Inserts and holders that can follow this cone:\n");
            for (const std::string& s : plan.suggestions)
                fmt::print("  - {}\n", s);
        }
        fmt::print("wrote {} and {}\n", (dir / "setup-sheet.txt").string(),
                   (dir / "setup-sheet.html").string());
        for (const std::string& line : wrapWords(safetyCautionShort(), 96))
            fmt::print("{}\n", line);
        return kExitOk;
    }

    const std::string plannedPath = (dir / "planned.toml").string();
    io::writeScene(plan.scene, plannedPath, headerFor(plan, a.scene));
    // Prove the plan as written: read the file back and simulate it.
    const Scene written = io::readScene(plannedPath);
    const CutResult result = simulate(written);
    io::writeTextFile((dir / "setup-sheet.txt").string(), io::setupSheetText(plan, &result));
    io::writeTextFile((dir / "setup-sheet.html").string(), io::setupSheetHtml(plan, &result));

    fmt::print("{}: {} passes ({} cone roughing, {} stepped saddle, compound in {} setting{})\n",
               scene.name, plan.scene.plan.passes.size(), plan.roughingPasses,
               plan.saddleStepPasses, plan.compoundSettings, plan.compoundSettings == 1 ? "" : "s");
    fmt::print("  compound {} on its scale, winding in moves the tool {}; finishing pass offset {} "
               "on radius for the nose\n",
               formatDms(plan.compoundReadingRad, 0), compoundSenseWords(plan.scene.setup),
               formatLength(plan.noseOffsetRadialMm, u));
    for (const std::string& c : plan.cautions)
        fmt::print("  note: {}\n", c);
    fmt::print("simulated: {}\n", verdictWords(result.withinTolerance));
    if (!result.withinTolerance || !result.findings.empty())
        fmt::print(
            "  WARNING: the plan does not prove itself; do not cut from it before the findings "
            "below are understood\n");
    fmt::print("  gauge diameter as cut {} (drawing {}), left on at most {}, overcut at most {}\n",
               formatLength(result.gaugeAsCutDiameterMm, u),
               formatLength(result.gaugeNominalDiameterMm, u),
               formatSmallLength(result.maxLeftOnMm, u), formatSmallLength(result.maxOvercutMm, u));
    for (const Finding& f : result.findings)
        fmt::print("  finding: {}{}: {}\n", findingLabel(f.kind),
                   f.pass >= 0 ? fmt::format(" (pass {})", f.pass + 1) : std::string(), f.message);
    if (result.findings.empty())
        fmt::print("  no findings\n");
    fmt::print("wrote {}, {}, {}\n", plannedPath, (dir / "setup-sheet.txt").string(),
               (dir / "setup-sheet.html").string());
    for (const std::string& line : wrapWords(safetyCautionShort(), 96))
        fmt::print("{}\n", line);
    return kExitOk;
}

} // namespace

void registerPlan(CLI::App& app, int& exitCode) {
    auto args = std::make_shared<PlanArgs>();
    auto* cmd = app.add_subcommand(
        "plan", "Plan the drawing's cone in handwheel readings, write the planned scene and the "
                "set-up sheet, and simulate the plan");
    cmd->add_option("SCENE", args->scene, "Scene file (.toml) with drawing, stock, tool, set-up")
        ->required();
    cmd->add_option("--out,-o", args->outDir, "Folder for planned.toml and setup-sheet.txt/.html")
        ->required();
    cmd->add_option(
        "--target", args->target,
        "Chance of a part within tolerance the plan must reach, e.g. 0.95: with the "
        "scene's [uncertainty], choose the placing and a trial cut from the error "
        "budget (default: the scene's planning.in_tolerance_target, else plan as told)");
    cmd->add_option("--samples", args->samples,
                    "Parts drawn per budget when choosing (default 400)");
    cmd->add_option("--seed", args->seed, "Seed of the random numbers when choosing (default 1)");
    cmd->callback([args, &exitCode] { exitCode = runPlan(*args); });
}

} // namespace swarf::app
