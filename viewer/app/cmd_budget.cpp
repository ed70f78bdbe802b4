// swarf budget SCENE --out DIR [--samples N] [--seed S]: the error budget of a set-up. Draws N
// parts from the scene's [uncertainty] through the exact-profile kernel on every core, and
// writes budget.json, the histogram of the gauge diameters (budget.png) and report.html. A scene
// without passes is planned first (as `swarf plan` plans it). Prints one line per source and
// the sentence a machinist needs. Bad input exits 2 with nothing written; a scene with nothing
// to budget (no cone, or no plan) is refused the same way.
#include "commands.h"
#include "swarf/app/display.h"
#include "swarf/app/progress.h"
#include "swarf/io/budget_writer.h"
#include "swarf/io/output_file.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/budget.h"
#include "swarf/sim/caution.h"
#include "swarf/sim/error.h"
#include "swarf/sim/inside_work.h"
#include "swarf/sim/measurement.h"
#include "swarf/sim/plan_choice.h"
#include "swarf/sim/planner.h"
#include "swarf/viewer/histogram.h"

#include <fmt/core.h>

#include <cmath>
#include <filesystem>
#include <memory>
#include <optional>
#include <string>

namespace swarf::app {
namespace {

struct BudgetArgs {
    std::string scene, outDir;
    long long samples = 2000;
    long long seed = 1;
    bool noPictures = false;
};

[[noreturn]] void badOption(const std::string& option, long long value,
                            const std::string& expected) {
    throw InputError(SourceLoc{"command line", 0, 0}, option, std::to_string(value), expected);
}

// The same passes, reading for reading (a planned scene read back: to the file's precision).
bool samePasses(const Plan& a, const Plan& b) {
    if (a.passes.size() != b.passes.size())
        return false;
    auto near = [](double x, double y) { return std::fabs(x - y) < 1e-6; };
    for (std::size_t k = 0; k < a.passes.size(); ++k) {
        const Pass& p = a.passes[k];
        const Pass& q = b.passes[k];
        if (p.kind != q.kind || !near(p.crossMm, q.crossMm) || !near(p.compoundMm, q.compoundMm) ||
            !near(p.saddleMm, q.saddleMm) || !near(p.fromMm, q.fromMm) || !near(p.toMm, q.toMm))
            return false;
    }
    return true;
}

int runBudgetCommand(const BudgetArgs& a) {
    if (a.samples < 2 || a.samples > 1000000)
        badOption("--samples", a.samples, "expected a whole number of parts from 2 to 1000000");
    if (a.seed < 0)
        badOption("--seed", a.seed, "expected a whole number 0 or more");
    Scene scene = io::readScene(a.scene); // bad input throws before anything is written
    const bool boring = scene.tool.kind == ToolKind::BoringBar;
    if (!boring) // a boring bar budgets its inside cone
        refuseInsideWork(scene, "budget");
    bool planned = false;
    std::optional<TrialCut> trial;
    std::string trialNote;
    if ((boring ? scene.part.mainInsideCone() : scene.part.mainCone()) &&
        scene.plan.passes.empty()) {
        // No passes of its own: budget the plan `swarf plan` would make.
        const ConePlan plan = planCone(scene);
        if (!plan.planned) {
            std::string why;
            for (const std::string& p : plan.problems)
                why += (why.empty() ? "" : "; ") + p;
            throw InputError(SourceLoc{scene.file, 0, 0}, "", "",
                             "nothing to budget: the scene has no passes and swarf plan cannot "
                             "plan its cone (" +
                                 why + ")");
        }
        scene = plan.scene;
        planned = true;
        if (plan.trialCut)
            trial = trialCutOf(plan, defaultMicrometerUncertaintyMm(scene.units == Units::Inch));
    } else if (scene.planning.trialCut) {
        // A scene planned with a trial cut (planned.toml): the cut is budgeted when its passes
        // are still the plan's, so that the plan says which passes finish and what to measure.
        const ConePlan plan = planCone(scene);
        if (plan.planned && plan.trialCut && samePasses(plan.scene.plan, scene.plan))
            trial = trialCutOf(plan, defaultMicrometerUncertaintyMm(scene.units == Units::Inch));
        else
            trialNote = "the scene asks for a trial cut, but its passes are not those swarf plan "
                        "makes: budgeted without it";
    }
    if (const std::string why = budgetRefusal(scene); !why.empty())
        throw InputError(SourceLoc{scene.file, 0, 0}, "", "", "nothing to budget: " + why);

    BudgetOptions opt;
    opt.samples = static_cast<int>(a.samples);
    opt.seed = static_cast<std::uint64_t>(a.seed);
    opt.trialCut = trial;
    Budget b;
    {
        ProgressBar bar("drawing parts");
        b = runBudget(scene, opt, [&bar](double f) { bar.update(f); });
    }

    namespace fs = std::filesystem;
    io::makeOutputFolder(a.outDir);
    const std::string json = (fs::path(a.outDir) / "budget.json").string();
    io::writeBudgetJson(json, scene, b, planned);
    std::vector<std::string> written{json};
    std::string png;
    if (!a.noPictures) {
        ensureDisplay();
        png = (fs::path(a.outDir) / "budget.png").string();
        viewer::renderBudgetHistogram(scene, b, png);
        written.push_back(png);
    }
    written.push_back(io::writeBudgetReport(
        scene, b, a.outDir, png.empty() ? "" : fs::path(png).filename().string(), planned));

    const Units u = scene.units;
    fmt::print("scene: {}{}{}\n", scene.name, planned ? " (passes planned by swarf plan)" : "",
               trial ? ", with the plan's measured trial cut before finishing" : "");
    if (!trialNote.empty())
        fmt::print("note: {}\n", trialNote);
    fmt::print("{} parts drawn (seed {}); gauge plane z = {}, drawing {} ± {}\n", b.samples, b.seed,
               formatLength(b.gaugeZMm, u), formatLength(b.nominalDiameterMm, u, Precision::Fine),
               formatLength(b.toleranceMm, u, Precision::Fine));
    fmt::print("gauge diameter: mean {}, sd {}, 95 % between {} and {} (nothing uncertain: {})\n",
               formatLength(b.gaugeDiameterMm.mean, u, Precision::Fine),
               formatSmallLength(b.gaugeDiameterMm.sd, u),
               formatLength(b.gaugeDiameterMm.p2_5, u, Precision::Fine),
               formatLength(b.gaugeDiameterMm.p97_5, u, Precision::Fine),
               formatLength(b.exact.gaugeDiameterMm, u, Precision::Fine));
    fmt::print("half angle: mean {}, sd {:.3g}′ (drawing {} ± {:.3g}′)\n",
               formatDms(b.halfAngleRad.mean),
               // Below a thousandth of a minute (0.06″) the spread is the fit's rounding: 0.
               radToDeg(b.halfAngleRad.sd) * 60.0 < 1e-3 ? 0.0 : radToDeg(b.halfAngleRad.sd) * 60.0,
               formatDms(b.nominalHalfAngleRad), radToDeg(b.angleToleranceRad) * 60.0);
    fmt::print("within tolerance: the whole cone {:.1f} % of the parts (gauge diameter, half "
               "angle and form, as swarf run judges it); the gauge diameter alone {:.1f} %\n",
               100.0 * b.pInTolerance, 100.0 * b.pGaugeInTolerance);
    if (b.sources.empty())
        fmt::print("sources: none ([uncertainty] states nothing uncertain)\n");
    for (const SourceShare& s : b.sources)
        fmt::print("  {}\n", io::sourceLine(scene, s));
    fmt::print("{}.\n", budgetSentence(b));
    fmt::print("wrote:\n");
    for (const std::string& f : written)
        fmt::print("  {}\n", f);
    for (const std::string& line : wrapWords(safetyCautionShort(), 96))
        fmt::print("{}\n", line);
    return kExitOk;
}

} // namespace

void registerBudget(CLI::App& app, int& exitCode) {
    auto args = std::make_shared<BudgetArgs>();
    auto* cmd = app.add_subcommand(
        "budget", "Error budget of the set-up: how sure the gauge diameter is, from the scene's "
                  "[uncertainty], and which source matters most");
    cmd->add_option("SCENE", args->scene, "Scene file (.toml)")->required();
    cmd->add_option("--out,-o", args->outDir, "Folder for budget.json, budget.png and report.html")
        ->required();
    cmd->add_option("--samples", args->samples, "Parts to draw (default 2000)");
    cmd->add_option("--seed", args->seed, "Seed of the random numbers (default 1)");
    cmd->add_flag("--no-pictures", args->noPictures, "Do not render the histogram");
    cmd->callback([args, &exitCode] { exitCode = runBudgetCommand(*args); });
}

} // namespace swarf::app
