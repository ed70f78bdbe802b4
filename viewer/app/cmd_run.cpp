// swarf run SCENE --out DIR: simulate the scene's plan and write result.json and profile.csv.
// Prints a short summary in the scene's units; a progress bar on stderr when stderr is a
// terminal and the run takes more than a moment. Exit 0 whatever the verdict (the verdict is
// in the output); a bad scene exits 2 with nothing written.
#include "commands.h"
#include "swarf/app/display.h"
#include "swarf/app/memory.h"
#include "swarf/app/progress.h"
#include "swarf/geometry/hollow.h"
#include "swarf/geometry/reference_cut.h"
#include "swarf/geometry/run_solids.h"
#include "swarf/io/output_file.h"
#include "swarf/io/report.h"
#include "swarf/io/result_writer.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/caution.h"
#include "swarf/sim/error.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/result_figures.h"
#include "swarf/sim/run_budget.h"
#include "swarf/viewer/snapshots.h"

#include <fmt/core.h>

#include <algorithm>
#include <cstdio>
#include <filesystem>
#include <optional>
#include <string>

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
    if (r.findings.empty()) {
        fmt::print("findings: none\n");
    } else {
        fmt::print("findings:\n");
        for (const Finding& f : r.findings)
            fmt::print("  {}, {}: {}\n", findingLabel(f.kind), passName(s, f.pass), f.message);
    }
}

} // namespace

void registerRun(CLI::App& app, int& exitCode) {
    auto* cmd = app.add_subcommand("run", "Simulate a scene's pass plan and write the results");
    auto scene = std::make_shared<std::string>();
    auto outDir = std::make_shared<std::string>();
    auto noStep = std::make_shared<bool>(false);
    auto noPictures = std::make_shared<bool>(false);
    cmd->add_option("SCENE", *scene, "Scene file (.toml)")->required();
    cmd->add_option("--out", *outDir, "Folder for result.json, profile.csv and the rest")
        ->required();
    cmd->add_flag("--no-step", *noStep, "Do not export the as-cut solid as STEP");
    cmd->add_flag("--no-pictures", *noPictures, "Do not render pictures or the report");
    auto stl = std::make_shared<bool>(false);
    auto reference = std::make_shared<bool>(false);
    cmd->add_flag("--surface-stl", *stl,
                  "Also write surface.stl: the 3D surface with feed marks as triangles (large)");
    cmd->add_flag("--solid-check", *reference,
                  "Also cut the scene with the solid modeller alone and compare (slow)");
    // The old name, kept so existing commands work; not listed in the help ("reference" on the
    // sheet is the shoulder you work from).
    cmd->add_flag("--reference", *reference)->group("");
    cmd->callback([scene, outDir, noStep, noPictures, stl, reference, &exitCode] {
        // Read first: a bad scene writes nothing; nor does one the machine cannot hold.
        const Scene s = io::readScene(*scene);
        requireFits(s, {true, !*noStep, !*noPictures}, availableMemoryBytes());
        if (s.plan.passes.empty())
            fmt::print(
                "no passes: make them with `swarf plan {} --out DIR` (or write [[plan.pass]] "
                "tables); what follows is the bar as it stands against the drawing\n",
                *scene);
        CutResult result;
        {
            ProgressBar bar;
            result = simulate(s, [&bar](double f) { bar.update(f); });
        }
        std::string stepNote, referenceNote;
        namespace fs = std::filesystem;
        // The solids first: result.json reports the volumes of exactly the solids written.
        geometry::RunSolidsOptions so;
        so.writeSurfaceStl = *stl;
        std::optional<geometry::RunSolids> solids;
        if (!*noStep) {
            solids = geometry::makeRunSolids(s, result, so.fit);
            geometry::takeSolidVolumes(*solids, result);
        }
        io::makeOutputFolder(*outDir);
        const std::string json = (fs::path(*outDir) / "result.json").string();
        const std::string csv = (fs::path(*outDir) / "profile.csv").string();
        io::writeResultJson(json, s, result);
        io::writeProfileCsv(csv, result);

        std::vector<std::string> written{json, csv};
        if (solids) {
            const geometry::RunSolidsReport rep =
                geometry::writeRunSolids(*solids, result, *outDir, so);
            written.insert(written.end(), rep.files.begin(), rep.files.end());
            stepNote =
                fmt::format("as-cut solid: {} lines, {} arcs, {} B-splines; largest "
                            "distance from the kernel's profile {:.3f} µm",
                            rep.lineCount, rep.arcCount, rep.splineCount, rep.fitErrorMm * 1000.0);
        }
        std::string picturesNote;
        if (!*noPictures && result.bored) {
            // The viewer draws the outside only: pictures of a bored part would show the bar.
            written.push_back(io::writeReport(s, result, *outDir, nullptr));
            picturesNote = "pictures: none for a bored part yet (the viewer does not draw a bore); "
                           "report.html has the figures and findings";
        } else if (!*noPictures) {
            ensureDisplay();
            const viewer::SnapshotReport pics = viewer::renderSnapshots(s, result, *outDir);
            for (const std::string& f : pics.files())
                written.push_back(f);
            written.push_back(io::writeReport(s, result, *outDir, &pics));
        }
        if (*reference) {
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
            referenceNote = fmt::format(
                "reference path (solid modeller): as-cut volume {:.3f} mm³ vs kernel {:.3f} mm³ "
                "({:+.2e} relative); gauge diameter differs by {:+.3f} µm",
                ref.volumeMm3, kernelVolume, rel, gaugeDiff * 1000.0);
        }

        printSummary(s, result);
        if (!stepNote.empty())
            fmt::print("{}\n", stepNote);
        if (!referenceNote.empty())
            fmt::print("{}\n", referenceNote);
        if (!picturesNote.empty())
            fmt::print("{}\n", picturesNote);
        fmt::print("wrote:\n");
        for (const std::string& f : written)
            fmt::print("  {}\n", f);
        for (const std::string& line : wrapWords(safetyCautionShort(), 96))
            fmt::print("{}\n", line);
        exitCode = kExitOk;
    });
}

} // namespace swarf::app
