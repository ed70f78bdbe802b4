// swarf run SCENE --out DIR: simulate the scene's plan and write result.json and profile.csv.
// Prints a short summary in the scene's units; a progress bar on stderr when stderr is a
// terminal and the run takes more than a moment. Exit 0 whatever the verdict (the verdict is
// in the output); a bad scene exits 2 with nothing written. With --compare OTHER both scenes run
// in full, each into its subfolder, and compare.html sets them side by side.
#include "commands.h"
#include "swarf/app/display.h"
#include "swarf/app/memory.h"
#include "swarf/app/progress.h"
#include "swarf/geometry/hollow.h"
#include "swarf/geometry/reference_cut.h"
#include "swarf/geometry/run_solids.h"
#include "swarf/io/compare_report.h"
#include "swarf/io/output_file.h"
#include "swarf/io/report.h"
#include "swarf/io/result_writer.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/causes.h"
#include "swarf/sim/caution.h"
#include "swarf/sim/error.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/result_figures.h"
#include "swarf/sim/run_budget.h"
#include "swarf/sim/twin_difference.h"
#include "swarf/viewer/snapshots.h"

#include <fmt/core.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <optional>
#include <string>
#include <vector>

namespace swarf::app {

namespace {

std::string passName(const Scene& s, int pass) {
    if (pass < 0 || pass >= static_cast<int>(s.plan.passes.size()))
        return "the plan";
    const Pass& p = s.plan.passes[static_cast<std::size_t>(pass)];
    return fmt::format("pass {}{}", pass + 1, p.note.empty() ? "" : " (" + p.note + ")");
}

void printSummary(const Scene& s, const CutResult& r) {
    // The figures as every other place shows them (result_figures.h).
    const ResultFigures fig = resultFigures(s, r);
    fmt::print("scene: {}\n", s.name);
    fmt::print("verdict: {}\n", verdictWords(fig.within));
    fmt::print("gauge plane z = {}: diameter as cut {}, drawing {} ({})\n", fig.gaugePlane,
               fig.gaugeAsCut, fig.gaugeDrawing, fig.gaugeError);
    fmt::print("largest metal left on: {}   largest overcut: {}   (normal to the surface; left on "
               "to the crests of the feed marks)\n",
               fig.leftOn, fig.overcut);
    fmt::print("feed marks of the finishing pass: Rt {}, Ra {}\n", fig.rt, fig.ra);
    for (const FeatureFigures& f : fig.features) {
        std::string extra;
        if (!f.halfAngle.empty())
            extra = fmt::format(", half angle {} (drawing {})", f.halfAngle, f.drawnAngle);
        fmt::print("  {} {}: left on {}, overcut {}{}\n", f.within ? "ok " : "OUT", f.name,
                   f.leftOn, f.overcut, extra);
    }
    if (!r.causes.empty()) {
        fmt::print("what moved the cone (largest first):\n");
        // The three largest, and only those that matter beside the largest (5 % of it or more,
        // in tolerances): the readings' rounding stays in result.json.
        auto size = [&](const Cause& c) {
            const Feature* cone = s.workedCone();
            return std::fabs(c.gaugeDiameterChangeMm) / cone->toleranceMm +
                   std::fabs(c.halfAngleChangeRad) / cone->angleToleranceRad;
        };
        for (std::size_t i = 0; i < std::min<std::size_t>(r.causes.size(), 3); ++i) {
            if (i > 0 && size(r.causes[i]) < 0.05 * size(r.causes.front()))
                break;
            const std::vector<std::string> lines = wrapWords(r.causes[i].message, 92);
            for (std::size_t k = 0; k < lines.size(); ++k)
                fmt::print("{}{}\n", k == 0 ? "  - " : "    ", lines[k]);
        }
    }
    if (r.findings.empty()) {
        fmt::print("findings: none\n");
    } else {
        fmt::print("findings:\n");
        for (const Finding& f : r.findings)
            fmt::print("  {}, {}: {}\n", findingLabel(f.kind), passName(s, f.pass), f.message);
    }
}

// The flags of a run that shape what it writes.
struct RunFlags {
    bool noStep = false, noPictures = false, stl = false, reference = false;
};

// One scene's run: read and checked before anything is written.
struct SceneRun {
    Scene scene;
    CutResult result;
    std::optional<geometry::RunSolids> solids;
    viewer::SnapshotReport pictures;
    std::vector<std::string> written;
    std::string stepNote, referenceNote;
};

// Simulates, and makes the solids (result.json reports their volumes): everything that can
// fail on the scene itself, before a file is written.
void simulateRun(SceneRun& run, const RunFlags& flags) {
    {
        ProgressBar bar;
        run.result = simulate(run.scene, [&bar](double f) { bar.update(f); });
    }
    // Causes are measured on the main cone, outside or bored (causes.h).
    run.result.causes = findCauses(run.scene, run.result);
    if (!flags.noStep) {
        run.solids =
            geometry::makeRunSolids(run.scene, run.result, geometry::RunSolidsOptions{}.fit);
        geometry::takeSolidVolumes(*run.solids, run.result);
    }
}

// Writes one run's files into outDir: result.json, profile.csv, the solids, the pictures and
// report.html; with flags.reference the solid modeller's own cut is compared.
void writeRun(SceneRun& run, const RunFlags& flags, const std::string& outDir) {
    namespace fs = std::filesystem;
    const Scene& s = run.scene;
    CutResult& result = run.result;
    geometry::RunSolidsOptions so;
    so.writeSurfaceStl = flags.stl;
    io::makeOutputFolder(outDir);
    const std::string json = (fs::path(outDir) / "result.json").string();
    const std::string csv = (fs::path(outDir) / "profile.csv").string();
    io::writeResultJson(json, s, result);
    io::writeProfileCsv(csv, result);
    run.written = {json, csv};
    if (run.solids) {
        const geometry::RunSolidsReport rep =
            geometry::writeRunSolids(*run.solids, result, outDir, so);
        run.written.insert(run.written.end(), rep.files.begin(), rep.files.end());
        run.stepNote =
            fmt::format("as-cut solid: {} lines, {} arcs, {} B-splines; largest "
                        "distance from the kernel's profile {:.3f} µm",
                        rep.lineCount, rep.arcCount, rep.splineCount, rep.fitErrorMm * 1000.0);
    }
    if (!flags.noPictures) {
        ensureDisplay();
        run.pictures = viewer::renderSnapshots(s, result, outDir);
        for (const std::string& f : run.pictures.files())
            run.written.push_back(f);
        run.written.push_back(io::writeReport(s, result, outDir, &run.pictures));
    }
    if (flags.reference) {
        // The solid modeller's own cut, independent of the kernel: slow, for checking.
        const geometry::ReferenceResult ref = geometry::referenceCut(s, result.moves);
        // Both volumes cover the whole stick-out, free end to the jaws' face.
        const double kernelVolume = result.asCutVolumeMm3;
        const double rel = (ref.volumeMm3 - kernelVolume) / std::max(1e-12, ref.volumeMm3);
        double gaugeDiff = 0;
        // Inside work: the bore's radius at the gauge plane (the solid's inner radius).
        const auto rr = result.bored ? geometry::innerRadiusAtZ(ref.asCut, result.gaugeZMm)
                                     : ref.asCut.radiusAtZ(result.gaugeZMm);
        if (rr)
            gaugeDiff = 2.0 * *rr - result.gaugeAsCutDiameterMm;
        run.referenceNote = fmt::format(
            "reference path (solid modeller): as-cut volume {:.3f} mm³ vs kernel {:.3f} mm³ "
            "({:+.2e} relative); gauge diameter differs by {:+.3f} µm",
            ref.volumeMm3, kernelVolume, rel, gaugeDiff * 1000.0);
    }
}

// The terminal's account of one run.
void printRun(const SceneRun& run) {
    printSummary(run.scene, run.result);
    if (!run.stepNote.empty())
        fmt::print("{}\n", run.stepNote);
    if (!run.referenceNote.empty())
        fmt::print("{}\n", run.referenceNote);
}

} // namespace

void registerRun(CLI::App& app, int& exitCode) {
    auto* cmd = app.add_subcommand("run", "Simulate a scene's pass plan and write the results");
    auto scene = std::make_shared<std::string>();
    auto outDir = std::make_shared<std::string>();
    auto compare = std::make_shared<std::string>();
    auto flags = std::make_shared<RunFlags>();
    cmd->add_option("SCENE", *scene, "Scene file (.toml)")->required();
    cmd->add_option("--out", *outDir, "Folder for result.json, profile.csv and the rest")
        ->required();
    cmd->add_flag("--no-step", flags->noStep, "Do not export the as-cut solid as STEP");
    cmd->add_flag("--no-pictures", flags->noPictures, "Do not render pictures or the report");
    cmd->add_flag("--surface-stl", flags->stl,
                  "Also write surface.stl: the 3D surface with feed marks as triangles (large)");
    cmd->add_flag("--solid-check", flags->reference,
                  "Also cut the scene with the solid modeller alone and compare (slow)");
    // The old name, kept so existing commands work; not listed in the help ("reference" on the
    // sheet is the shoulder you work from).
    cmd->add_flag("--reference", flags->reference)->group("");
    cmd->add_option("--compare", *compare,
                    "Also run OTHER.toml (e.g. the scene's twin: the mistake or its correction) "
                    "and set the two side by side in DIR/compare.html; each run's files go to "
                    "DIR/scene/ and DIR/other/");
    cmd->callback([scene, outDir, compare, flags, &exitCode] {
        namespace fs = std::filesystem;
        // Read first: a bad scene writes nothing; nor does one the machine cannot hold. With
        // --compare, both scenes are read and checked before anything is written.
        SceneRun first;
        first.scene = io::readScene(*scene);
        const RunOutputs outputs{true, !flags->noStep, !flags->noPictures};
        requireFits(first.scene, outputs, availableMemoryBytes());
        std::optional<SceneRun> second;
        if (!compare->empty()) {
            second.emplace();
            second->scene = io::readScene(*compare);
            // Both results are held at once: the second gets what the first leaves.
            requireFits(second->scene, outputs,
                        availableMemoryBytes() - estimateRun(first.scene, outputs).bytes);
        }
        if (first.scene.plan.passes.empty())
            fmt::print(
                "no passes: make them with `swarf plan {} --out DIR` (or write [[plan.pass]] "
                "tables); what follows is the bar as it stands against the drawing\n",
                *scene);
        simulateRun(first, *flags);
        if (second)
            simulateRun(*second, *flags);

        std::vector<std::string> written;
        if (!second) {
            writeRun(first, *flags, *outDir);
            written = first.written;
            printRun(first);
        } else {
            const std::string dirA = (fs::path(*outDir) / io::kCompareSceneFolder).string();
            const std::string dirB = (fs::path(*outDir) / io::kCompareOtherFolder).string();
            writeRun(first, *flags, dirA);
            writeRun(*second, *flags, dirB);
            io::CompareSide a{&first.scene, &first.result, io::kCompareSceneFolder,
                              flags->noPictures ? nullptr : &first.pictures};
            io::CompareSide b{&second->scene, &second->result, io::kCompareOtherFolder,
                              flags->noPictures ? nullptr : &second->pictures};
            written = first.written;
            written.insert(written.end(), second->written.begin(), second->written.end());
            written.push_back(io::writeCompareReport(a, b, *outDir));
            printRun(first);
            fmt::print("\ncompared with:\n");
            printRun(*second);
            const TwinDifference d =
                twinDifference(first.scene, first.result, second->scene, second->result);
            fmt::print("\n{}\n",
                       twinDifferenceText(first.scene, d, "difference from " + *compare + ":",
                                          "scene", "other"));
        }
        fmt::print("wrote:\n");
        for (const std::string& f : written)
            fmt::print("  {}\n", f);
        for (const std::string& line : wrapWords(safetyCautionShort(), 96))
            fmt::print("{}\n", line);
        exitCode = kExitOk;
    });
}

} // namespace swarf::app
