// report.html (see report.h): one self-contained page, no scripts, fonts or anything from the
// network; inline CSS only.
#include "swarf/io/report.h"

#include "report_style.h"
#include "swarf/io/html.h"
#include "swarf/io/output_file.h"
#include "swarf/sim/causes.h"
#include "swarf/sim/caution.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/result_figures.h"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <filesystem>

namespace swarf::io {

namespace {

// An angle change in arc seconds, signed, to 0.1″; a change under 0.05″ is 0.0″ (no "−0.0").
std::string signedSeconds(double seconds) {
    if (std::fabs(seconds) < 0.05)
        return "0.0″";
    return fmt::format("{}{:.1f}″", seconds > 0 ? "+" : "−", std::fabs(seconds));
}

std::string esc(const std::string& s) {
    return escapeHtml(s);
}

using detail::kReportStyle;

} // namespace

std::string reportHtml(const Scene& scene, const CutResult& result,
                       const ReportPictures* pictures) {
    const Units u = scene.units;
    auto len = [&](double mm) { return esc(formatLength(mm, u)); };
    auto small = [&](double mm) { return esc(formatSmallLength(mm, u)); };
    std::string h;
    const std::string title = scene.name.empty() ? scene.file : scene.name;
    h += "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n";
    h += "<title>swarf report: " + esc(title) + "</title>\n<style>" + std::string(kReportStyle) +
         "</style></head><body>\n";
    h += "<h1>swarf report: " + esc(title) + "</h1>\n";
    if (!scene.description.empty())
        h += "<p>" + esc(scene.description) + "</p>\n";
    if (!scene.file.empty())
        h += "<p>Scene file: <code>" + esc(scene.file) + "</code></p>\n";

    // Verdict.
    const ResultFigures fig = resultFigures(scene, result);
    h += std::string(fig.within ? "<p class=\"ok\">" : "<p class=\"bad\">") +
         "<b>Verdict: " + verdictWords(fig.within) + ".</b>";
    h += fmt::format(" Most metal left on: {} (to the crests of the feed marks); most overcut: "
                     "{}.</p>\n",
                     esc(fig.leftOn), esc(fig.overcut));

    h += "<div class=\"caution\"><b>Cautions.</b><ul>\n";
    for (const std::string& c : safetyCautions())
        h += "<li>" + esc(c) + "</li>\n";
    h += "</ul></div>\n";

    // Set-up figures.
    h += "<h2>Set-up</h2>\n<table>\n";
    auto row = [&](const std::string& k, const std::string& v) {
        h += "<tr><th>" + esc(k) + "</th><td>" + v + "</td></tr>\n";
    };
    row("Stock",
        fmt::format("{} diameter, {} sticking out of the jaws, {}", len(scene.stock.diameterMm),
                    len(scene.stock.stickOutMm), esc(scene.stock.material)));
    row("Compound set to", esc(formatDms(scene.setup.compoundReadingRad)) +
                               (scene.setup.compoundScale == CompoundScale::FromAxis
                                    ? " on a scale read from the spindle axis"
                                    : " on a scale read from the cross-slide"));
    row("Cross-slide zero",
        fmt::format("at {} diameter ({} dial)", len(scene.setup.zeroDiameterMm),
                    scene.setup.crossDial == DialMode::Diameter ? "diameter" : "radius"));
    row("Saddle zero", fmt::format("at z = {} from the datum face", len(scene.setup.zeroZMm)));
    {
        std::string tool = fmt::format("nose radius {}", len(scene.tool.noseRadiusMm));
        if (scene.tool.shape)
            tool = fmt::format("shape {}, ", scene.tool.shape) + tool;
        tool += fmt::format(", tip {} centre",
                            scene.tool.tipHeightMm == 0
                                ? std::string("on")
                                : len(std::fabs(scene.tool.tipHeightMm)) +
                                      (scene.tool.tipHeightMm > 0 ? " above" : " below"));
        row("Insert", tool);
    }
    if (scene.setup.spindleRpm)
        row("Spindle", fmt::format("{:.0f} rev/min", *scene.setup.spindleRpm));
    row("Gauge plane",
        fmt::format("z = {}: drawing {} diameter, as cut {} (difference {})", esc(fig.gaugePlane),
                    esc(fig.gaugeDrawing), esc(fig.gaugeAsCut), esc(fig.gaugeError)));
    row("Finish (feed marks of the finishing pass)",
        fmt::format("Rt {}, Ra {}", esc(fig.rt), esc(fig.ra)));
    // Volumes in the scene's units: cubic inches for an inch scene (25.4³ mm³ each).
    const bool inch = scene.units == Units::Inch;
    const auto vol = [inch](double mm3, bool fine) {
        const double v = inch ? mm3 / (25.4 * 25.4 * 25.4) : mm3;
        const int decimals = inch ? (fine ? 4 : 2) : (fine ? 1 : 0);
        return fmt::format("{:.{}f} {}", v, decimals, inch ? "in³" : "mm³");
    };
    row("Volumes",
        fmt::format("stock {}, as cut {}, removed {} (z = {} to {}, the solids written); left on "
                    "{}, overcut {} (within the drawing)",
                    vol(result.stockVolumeMm3, false), vol(result.asCutVolumeMm3, false),
                    vol(result.removedVolumeMm3, false), len(result.volumeFromZMm),
                    len(result.volumeToZMm), vol(result.leftoverVolumeMm3, true),
                    vol(result.overcutVolumeMm3, true)));
    h += "</table>\n";

    // Features against the drawing.
    if (!result.features.empty()) {
        h += "<h2>Against the drawing</h2>\n<table><tr><th>Feature</th><th>Tolerance</th>"
             "<th>Most left on</th><th>Most overcut</th><th>As cut</th><th>Result</th></tr>\n";
        std::size_t k = 0;
        for (const FeatureReport& fr : result.features) {
            if (fr.feature < 0 ||
                static_cast<std::size_t>(fr.feature) >= scene.part.features.size())
                continue;
            const Feature& f = scene.part.features[static_cast<std::size_t>(fr.feature)];
            const FeatureFigures& ff = fig.features[k++];
            std::string asCut = fmt::format("diameter {}", len(fr.asCutDiameterMm));
            if (!ff.halfAngle.empty())
                asCut += fmt::format(", half angle {} (drawing {})", esc(ff.halfAngle),
                                     esc(ff.drawnAngle));
            h += fmt::format("<tr><td>{} ({})</td><td>&plusmn;{}</td><td class=\"num\">{}</td><td "
                             "class=\"num\">{}</td><td>{}</td><td>{}</td></tr>\n",
                             esc(ff.name), featureKindName(f.kind), len(f.toleranceMm),
                             esc(ff.leftOn), esc(ff.overcut), asCut,
                             ff.within ? "within" : "<b>outside</b>");
        }
        h += "</table>\n";
    }

    // Findings.
    h += "<h2>Findings</h2>\n";
    if (result.findings.empty()) {
        h += "<p>None.</p>\n";
    } else {
        h += "<table><tr><th>What</th><th>Pass</th><th>Where</th><th>Details</th></tr>\n";
        for (const Finding& f : result.findings)
            h += fmt::format(
                "<tr><td>{}</td><td>{}</td><td>{}</td><td>{}</td></tr>\n", findingLabel(f.kind),
                f.pass >= 0 ? std::to_string(f.pass + 1) : std::string("—"),
                std::isfinite(f.zMm) ? "z = " + len(f.zMm) : std::string("—"), esc(f.message));
        h += "</table>\n";
    }

    // Causes (causes.h): each source with its size and the fix, largest first.
    if (!result.causes.empty()) {
        h += "<h2>What moved the cone, and how to fix it</h2>\n";
        h += "<p>Each line is a counterfactual run: the scene again with that one source taken "
             "away (or the mistake mended), and how far the cone moved.</p>\n";
        h += "<table><tr><th>Source</th><th>Pass</th><th>Gauge diameter</th><th>Half "
             "angle</th><th>What happened, and the fix</th></tr>\n";
        for (const Cause& c : result.causes)
            h += fmt::format(
                "<tr><td>{}</td><td>{}</td><td>{}</td><td>{}</td><td>{}</td>"
                "</tr>\n",
                esc(causeLabel(c.source)),
                c.pass >= 0 ? std::to_string(c.pass + 1) : std::string("—"),
                esc((c.gaugeDiameterChangeMm >= 0 ? "+" : "−") +
                    formatLength(std::fabs(c.gaugeDiameterChangeMm), scene.units, Precision::Fine)),
                signedSeconds(radToDeg(c.halfAngleChangeRad) * 3600.0), esc(c.message));
        h += "</table>\n";
    }

    // Pictures.
    if (pictures) {
        namespace fs = std::filesystem;
        h += "<h2>Pictures</h2>\n";
        const std::pair<std::string, const char*> figs[] = {
            {pictures->part,
             "The part as cut, coloured by deviation from the drawing (red: metal "
             "left on, blue: overcut, grey: within a small fraction of the tolerance). "
             "Amber in the cut-away: metal above the drawing."},
            {pictures->cone, "The cone filling the picture: the same colours."},
            {pictures->section, "Section through the axis with the deviation magnified."},
            {pictures->chart, "Deviation along the cone with the tolerance lines."},
            {pictures->marks, "Close-up at the gauge plane: the feed marks of the finishing pass, "
                              "drawn higher than they are (the factor is written on the picture); "
                              "the colours are true to scale."},
            {pictures->marksSection, "Section of the same stretch, deviation magnified: the feed "
                                     "marks on the operator's side."}};
        for (const auto& [path, caption] : figs) {
            if (path.empty())
                continue;
            const std::string name = fs::path(path).filename().string();
            h += "<figure><img src=\"" + esc(name) + "\" alt=\"" + esc(caption) +
                 "\"><figcaption>" + esc(caption) + "</figcaption></figure>\n";
        }
    }

    // Per-pass table.
    h +=
        "<h2>Passes</h2>\n<table><tr><th>#</th><th>Kind</th><th>What to do</th><th>Cross-slide</th>"
        "<th>Compound</th><th>Saddle</th><th>Feed /rev</th><th>After the pass: most left on</th>"
        "<th>most overcut</th><th>Findings</th></tr>\n";
    const std::vector<bool> mask = verdictMask(scene.part, result.asCut, scene.tool.noseRadiusMm);
    for (std::size_t k = 0; k < scene.plan.passes.size(); ++k) {
        const Pass& p = scene.plan.passes[k];
        auto reading = [&](PassKind moving, double fixed) {
            return p.kind == moving ? len(p.fromMm) + " &rarr; " + len(p.toMm) : len(fixed);
        };
        std::string after = "-", over = "-";
        if (k + 1 == result.afterPass.size()) {
            // After the last pass: the result's own figures (feed marks' crests included).
            after = esc(fig.leftOn);
            over = esc(fig.overcut);
        } else if (k < result.afterPass.size()) {
            // Counted as the verdict counts (not within a nose radius of an inside corner).
            const DeviationExtremes e = deviationExtremes(
                normalDeviation(scene.part, result.nominal, result.afterPass[k]), mask);
            after = small(e.leftOnMm);
            over = small(e.overcutMm);
        }
        std::string finds;
        for (const Finding& f : result.findings)
            if (f.pass == static_cast<int>(k))
                finds += std::string(finds.empty() ? "" : "; ") + findingLabel(f.kind);
        h += fmt::format(
            "<tr><td class=\"num\">{}</td><td>{}</td><td>{}</td><td>{}</td><td>{}</td><td>{}</td>"
            "<td class=\"num\">{}</td><td class=\"num\">{}</td><td "
            "class=\"num\">{}</td><td>{}</td></tr>\n",
            k + 1, passKindName(p.kind), esc(p.note), reading(PassKind::CrossSlide, p.crossMm),
            reading(PassKind::Compound, p.compoundMm), reading(PassKind::Saddle, p.saddleMm),
            len(p.feedMmPerRev), after, over, esc(finds));
    }
    h += "</table>\n<p>Dial readings are in " + std::string(unitName(u)) +
         " of dial travel (the cross-slide on " +
         (scene.setup.crossDial == DialMode::Diameter ? "diameter" : "radius") +
         "). Deviations are measured normal to the drawn surface: + metal left on, &minus; "
         "overcut.</p>\n";
    h += "<p style=\"color:#666;font-size:.9em\">Made by swarf; the cautions at the top of this "
         "page apply.</p>\n</body></html>\n";
    return h;
}

std::string writeReport(const Scene& scene, const CutResult& result, const std::string& outDir,
                        const ReportPictures* pictures) {
    makeOutputFolder(outDir);
    const std::string path = (std::filesystem::path(outDir) / "report.html").string();
    writeTextFile(path, reportHtml(scene, result, pictures));
    return path;
}

} // namespace swarf::io
