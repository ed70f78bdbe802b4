// swarf correct SCENE --measured MEASURED.toml --out DIR: after the trial cut. Reads the plan
// that was being followed and what was measured after one of its passes, fits the cone as it is,
// and writes the corrections for the rest of the job: corrected.toml (the whole story, passes
// already cut as they really were, the rest at the corrected settings), correction.json and the
// set-up sheet for the rest (setup-sheet.txt, .html). A scene without passes is planned first,
// as `swarf plan` plans it. Bad input, and a set of readings that cannot come from one cone,
// exit 2 with nothing written.
#include "commands.h"
#include "swarf/app/memory.h"
#include "swarf/io/correction_writer.h"
#include "swarf/io/measured_reader.h"
#include "swarf/io/output_file.h"
#include "swarf/io/scene_reader.h"
#include "swarf/io/scene_writer.h"
#include "swarf/io/setup_sheet.h"
#include "swarf/sim/caution.h"
#include "swarf/sim/correction.h"
#include "swarf/sim/error.h"
#include "swarf/sim/inside_work.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/planner.h"
#include "swarf/sim/run_budget.h"

#include <fmt/core.h>

#include <cmath>
#include <filesystem>
#include <memory>
#include <string>

namespace swarf::app {
namespace {

struct CorrectArgs {
    std::string scene, measured, outDir;
};

int runCorrect(const CorrectArgs& a) {
    Scene scene = io::readScene(a.scene); // bad input throws before anything is written
    refuseInsideWork(scene, "correct");   // the correction fits an outside cone only, so far
    bool planned = false;
    if (scene.part.mainCone() && scene.plan.passes.empty()) {
        const ConePlan plan = planCone(scene);
        if (!plan.planned)
            throw InputError(SourceLoc{scene.file, 0, 0}, "", "",
                             "nothing to correct: the scene has no passes and swarf plan cannot "
                             "plan its cone");
        scene = plan.scene;
        planned = true;
    }
    if (!scene.part.mainCone())
        throw InputError(SourceLoc{scene.file, 0, 0}, "", "",
                         "nothing to correct: the scene's drawing has no cone");
    const Measurements m = io::readMeasurements(a.measured, scene);
    const Units u = scene.units;
    const Correction c = correctPlan(scene, m);
    if (!c.fit.ok) {
        // Refused with the residuals shown, at the reading furthest off (or the file's start).
        SourceLoc where = m.where;
        double worst = -1;
        for (const FitResidual& r : c.fit.residuals)
            if (std::fabs(r.normalised()) > worst) {
                worst = std::fabs(r.normalised());
                where = r.where;
            }
        std::string msg = c.fit.problem;
        if (!c.fit.residuals.empty()) {
            msg += fmt::format(". Fitted Ø{} at z {}, half angle {}; residuals (reading minus "
                               "the fitted cone):",
                               formatLength(c.fit.gaugeDiameterMm, u, Precision::Fine),
                               formatLength(c.fit.gaugeZMm, u), formatDms(c.fit.halfAngleRad));
            for (const std::string& l : io::residualLines(c.fit, u))
                msg += "\n  " + l;
        }
        throw InputError(where, "", "", msg);
    }
    requireFits(c.corrected, {false, false, false}, availableMemoryBytes());
    const CutResult after = simulate(c.corrected);

    namespace fs = std::filesystem;
    io::makeOutputFolder(a.outDir);
    std::vector<std::string> header = {
        "Written by `swarf correct` from " + a.scene + " and " + a.measured + ".",
        "The story of the job: passes 1.." + std::to_string(c.afterPass) +
            " as they were really cut (the compound and the cross-slide's zero as measured),",
        c.scrap ? "and no more: the part is scrap." : "the rest at the corrected settings.",
        "Run it with `swarf run`.", ""};
    for (const std::string& line : wrapWords(safetyCautionShort(), 94))
        header.push_back(line);
    const std::string toml = (fs::path(a.outDir) / "corrected.toml").string();
    const std::string json = (fs::path(a.outDir) / "correction.json").string();
    const std::string txt = (fs::path(a.outDir) / "setup-sheet.txt").string();
    const std::string html = (fs::path(a.outDir) / "setup-sheet.html").string();
    io::writeScene(c.corrected, toml, header);
    io::writeTextFile(json, io::correctionJson(scene, m, c, after));
    const auto sheet = io::correctionSheet(scene, m, c, after);
    const std::string title =
        scene.name + ": the rest of the job after pass " + std::to_string(c.afterPass);
    io::writeTextFile(txt, io::correctionSheetText(sheet, title));
    io::writeTextFile(
        html, io::correctionSheetHtml(sheet, title, io::correctionChartSvg(scene, c, after)));

    auto L = [u](double mm) { return formatLength(mm, u, Precision::Fine); };
    const Feature& cone = *scene.part.mainCone();
    fmt::print("scene: {}{}\n", scene.name, planned ? " (passes planned by swarf plan)" : "");
    fmt::print("measured after pass {}: Ø{} ± {} at z {} (drawing Ø{} ± {}), half angle {} ± "
               "{:.2g}′ (drawing {})\n",
               c.afterPass, L(c.fit.gaugeDiameterMm), formatSmallLength(c.fit.gaugeDiameterSdMm, u),
               formatLength(c.fit.gaugeZMm, u), L(cone.cone.gaugeDiameterMm), L(cone.toleranceMm),
               formatDms(c.fit.halfAngleRad), radToDeg(c.fit.halfAngleSdRad) * 60.0,
               formatDms(c.drawingHalfAngleRad));
    for (const std::string& l : io::residualLines(c.fit, u))
        fmt::print("  {}\n", l);
    if (c.scrap) {
        fmt::print("SCRAP: {} under the lower limit on diameter at z {}; no correction can "
                   "recover it.\n",
                   formatSmallLength(c.scrapMm, u), formatLength(c.scrapZMm, u));
    } else {
        fmt::print("compound: turn it by {}{} (true angle), scale {} → {}; over {} of travel an "
                   "indicator on a test bar moves {} {}\n",
                   c.compoundChangeRad < 0 ? "−" : "+", formatDms(std::fabs(c.compoundChangeRad)),
                   formatDms(c.oldCompoundReadingRad), formatDms(c.newCompoundReadingRad),
                   formatLength(c.indicatorTravelMm, u),
                   formatSmallLength(std::fabs(c.indicatorChangeMm), u),
                   c.indicatorChangeMm >= 0 ? "more" : "less");
        fmt::print("cross-slide zero off by {}{} on diameter; stock left {} to {} normal to the "
                   "cone\n",
                   c.crossOffsetMm < 0 ? "−" : "+",
                   formatSmallLength(std::fabs(c.crossOffsetMm), u),
                   formatSmallLength(c.stockLeftMinMm, u), formatSmallLength(c.stockLeftMaxMm, u));
        for (const CorrectedPass& p : c.remaining)
            fmt::print("  pass {}{}: cross-slide {}\n", p.pass + 1,
                       p.finish         ? " (finish)"
                       : p.planPass < 0 ? " (added)"
                                        : "",
                       io::dialReadingText(scene.setup.cross, p.crossMm, u));
        for (const std::string& n : c.notes)
            fmt::print("note: {}\n", n);
        fmt::print("after correction: {} (gauge diameter Ø{}), {} pass{} added\n",
                   after.withinTolerance ? "within tolerance" : "OUT OF TOLERANCE",
                   L(after.gaugeAsCutDiameterMm), c.passesAdded, c.passesAdded == 1 ? "" : "es");
    }
    fmt::print("wrote:\n  {}\n  {}\n  {}\n  {}\n", toml, json, txt, html);
    for (const std::string& line : wrapWords(safetyCautionShort(), 96))
        fmt::print("{}\n", line);
    return kExitOk;
}

} // namespace

void registerCorrect(CLI::App& app, int& exitCode) {
    auto args = std::make_shared<CorrectArgs>();
    auto* cmd = app.add_subcommand(
        "correct", "after a trial cut: fit the cone from what was measured and correct the rest "
                   "of the plan in handwheel numbers");
    cmd->add_option("scene", args->scene, "the scene whose plan was being followed (TOML)")
        ->required();
    cmd->add_option("--measured,-m", args->measured, "what was measured (MEASURED.toml)")
        ->required();
    cmd->add_option("--out,-o", args->outDir,
                    "folder for corrected.toml, correction.json, setup-sheet.txt/.html")
        ->required();
    cmd->callback([args, &exitCode] { exitCode = runCorrect(*args); });
}

} // namespace swarf::app
