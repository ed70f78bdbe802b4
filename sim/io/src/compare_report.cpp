// compare.html (see compare_report.h): two runs side by side, one self-contained page.
#include "swarf/io/compare_report.h"

#include "report_style.h"
#include "swarf/io/html.h"
#include "swarf/io/output_file.h"
#include "swarf/sim/caution.h"
#include "swarf/sim/result_figures.h"
#include "swarf/sim/twin_difference.h"

#include <fmt/format.h>

#include <cmath>
#include <filesystem>

namespace swarf::io {

namespace {

std::string esc(const std::string& s) {
    return escapeHtml(s);
}

std::string titleOf(const Scene& s) {
    return s.name.empty() ? s.file : s.name;
}

// A picture of one side, by its path relative to the page: "<folder>/<file name>".
std::string figure(const CompareSide& side, const std::string& path, const std::string& caption) {
    if (path.empty())
        return "<p>(no picture)</p>";
    const std::string rel = side.folder + "/" + std::filesystem::path(path).filename().string();
    return "<figure><img src=\"" + esc(rel) + "\" alt=\"" + esc(caption) + "\"><figcaption>" +
           esc(caption) + "</figcaption></figure>";
}

} // namespace

std::string compareReportHtml(const CompareSide& a, const CompareSide& b) {
    const Scene& sa = *a.scene;
    const Scene& sb = *b.scene;
    const CutResult& ra = *a.result;
    const CutResult& rb = *b.result;
    const Units u = sa.units; // the page speaks in the first scene's units
    const ResultFigures fa = resultFigures(sa, ra), fb = resultFigures(sb, rb);
    const TwinDifference d = twinDifference(sa, ra, sb, rb);
    auto len = [&](double mm) { return esc(formatLength(mm, u, Precision::Fine)); };

    std::string h;
    const std::string title = titleOf(sa) + " compared with " + titleOf(sb);
    h += "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n";
    h += "<title>swarf comparison: " + esc(title) + "</title>\n<style>" +
         std::string(detail::kReportStyle) +
         "\n.side{display:inline-block;width:48%;vertical-align:top;margin-right:1%}"
         "\n.diff{background:#efeaf6;border:2px solid #8a6fb0;padding:.6em 1em;font-size:1.3em}"
         "</style>"
         "</head><body>\n";
    h += "<h1>swarf comparison</h1>\n";
    h += fmt::format("<p>Left: <b>{}</b> (<code>{}</code>). Right: <b>{}</b> (<code>{}</code>). "
                     "Differences are left less right. Each run's own files are in its folder: "
                     "<a href=\"{}/report.html\">{}/</a> and <a href=\"{}/report.html\">{}/</a>."
                     "</p>\n",
                     esc(titleOf(sa)), esc(sa.file), esc(titleOf(sb)), esc(sb.file), esc(a.folder),
                     esc(a.folder), esc(b.folder), esc(b.folder));

    // The gauge plane first: the difference a newcomer is to see.
    const std::string change = formatDiameterChange(d.gaugeDiameterChangeMm, u);
    h += "<p class=\"diff\"><b>Gauge diameter: left " +
         (d.gaugeDiameterChangeMm == 0
              ? std::string("the same as right")
              : esc(formatSmallLength(std::abs(d.gaugeDiameterChangeMm), u)) +
                    (d.gaugeDiameterChangeMm > 0 ? " larger" : " smaller") + " than right") +
         ".</b> Left " + esc(verdictWords(d.withinThis)) + ", right " +
         esc(verdictWords(d.withinTwin)) + ".</p>\n";

    h += "<div class=\"caution\"><b>Cautions.</b><ul>\n";
    for (const std::string& c : safetyCautions())
        h += "<li>" + esc(c) + "</li>\n";
    h += "</ul></div>\n";

    h += "<h2>Side by side</h2>\n<table><tr><th></th><th>Left</th><th>Right</th>"
         "<th>Difference (left less right)</th></tr>\n";
    auto row = [&](const std::string& what, const std::string& left, const std::string& right,
                   const std::string& diff) {
        h += "<tr><th>" + esc(what) + "</th><td>" + left + "</td><td>" + right + "</td>" + diff +
             "</tr>\n";
    };
    row("Verdict", esc(verdictWords(fa.within)), esc(verdictWords(fb.within)), "<td></td>");
    row("Gauge plane", "z = " + esc(fa.gaugePlane), "z = " + esc(fb.gaugePlane),
        d.sameGaugePlane ? "<td>the same</td>" : "<td><b>not the same plane</b></td>");
    row("Gauge diameter as cut", len(d.gaugeDiameterThisMm), len(d.gaugeDiameterTwinMm),
        fmt::format("<td class=\"num\" id=\"gauge-diameter-change\" data-mm=\"{:.9g}\"><b>{}</b>"
                    "</td>",
                    d.gaugeDiameterChangeMm, esc(change)));
    row("Drawing there", esc(fa.gaugeDrawing), esc(fb.gaugeDrawing), "<td></td>");
    row("As cut less drawing", esc(fa.gaugeError), esc(fb.gaugeError), "<td></td>");
    if (d.halfAngleChangeRad)
        row("Main cone's half angle as cut (drawing)",
            esc(formatDms(d.coneThis->halfAngleRad)) + " (" +
                esc(formatDms(d.coneThis->drawnHalfAngleRad)) + ")",
            esc(formatDms(d.coneTwin->halfAngleRad)) + " (" +
                esc(formatDms(d.coneTwin->drawnHalfAngleRad)) + ")",
            fmt::format("<td class=\"num\" id=\"half-angle-change\" data-deg=\"{:.9g}\">{}</td>",
                        *d.halfAngleChangeRad * 180.0 / kPi,
                        esc(formatAngleChange(*d.halfAngleChangeRad))));
    row("Most metal left on (crests included)", esc(fa.leftOn), esc(fb.leftOn), "<td></td>");
    row("Most overcut", esc(fa.overcut), esc(fb.overcut), "<td></td>");
    row("Feed marks of the finishing pass", "Rt " + esc(fa.rt) + ", Ra " + esc(fa.ra),
        "Rt " + esc(fb.rt) + ", Ra " + esc(fb.ra), "<td></td>");
    row("Findings", std::to_string(ra.findings.size()), std::to_string(rb.findings.size()),
        "<td></td>");
    h += "</table>\n";

    // The charts, on one scale: the same height is the same deviation on both.
    const CompareChartRange range = compareChartRange(a, b, u);
    h += "<h2>Deviation along the cone, on one scale</h2>\n";
    h += "<div class=\"side\"><figure>" + compareChartSvg(a, range, u, "chart-left") +
         "<figcaption>Left: deviation along the main cone.</figcaption></figure></div>";
    h += "<div class=\"side\"><figure>" + compareChartSvg(b, range, u, "chart-right") +
         "<figcaption>Right: deviation along the main cone.</figcaption></figure></div>\n";

    if (a.pictures && b.pictures) {
        h += "<h2>Pictures</h2>\n";
        const std::pair<std::string ReportPictures::*, const char*> figs[] = {
            {&ReportPictures::part, "The part as cut, coloured by deviation from the drawing (red: "
                                    "metal left on, blue: overcut)."},
            {&ReportPictures::cone, "The cone filling the picture: the same colours."},
            {&ReportPictures::section, "Section through the axis with the deviation magnified."}};
        for (const auto& [member, caption] : figs) {
            h += "<div class=\"side\">" +
                 figure(a, a.pictures->*member, "Left: " + std::string(caption)) + "</div>";
            h += "<div class=\"side\">" +
                 figure(b, b.pictures->*member, "Right: " + std::string(caption)) + "</div>\n";
        }
    }
    h += "<p style=\"color:#666;font-size:.9em\">Made by swarf; the cautions at the top of this "
         "page apply.</p>\n</body></html>\n";
    return h;
}

std::string writeCompareReport(const CompareSide& first, const CompareSide& second,
                               const std::string& outDir) {
    makeOutputFolder(outDir);
    const std::string path = (std::filesystem::path(outDir) / kCompareReportName).string();
    writeTextFile(path, compareReportHtml(first, second));
    return path;
}

} // namespace swarf::io
