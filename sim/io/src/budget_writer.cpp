// budget.json and the budget's report page (see budget_writer.h; fields in sim/io/BUDGET.md).
#include "swarf/io/budget_writer.h"

#include "swarf/io/html.h"
#include "swarf/io/output_file.h"
#include "swarf/sim/caution.h"

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include <cmath>
#include <filesystem>

namespace swarf::io {

namespace {

using nlohmann::ordered_json;

ordered_json spread(const Spread& s, double scale) {
    return {{"mean", s.mean * scale},
            {"sd", s.sd * scale},
            {"p2_5", s.p2_5 * scale},
            {"p97_5", s.p97_5 * scale}};
}

const Slide& slideOf(const Setup& setup, BudgetSource s) {
    return s == BudgetSource::CrossBacklash      ? setup.cross
           : s == BudgetSource::CompoundBacklash ? setup.compound
                                                 : setup.saddle;
}

std::string minutes(double rad) {
    return fmt::format("{:.3g}′", radToDeg(rad) * 60.0);
}

} // namespace

std::string sourceStated(const Scene& scene, BudgetSource s) {
    const Uncertainty& u = scene.uncertainty;
    const Units un = scene.units;
    auto len = [&](double mm) { return formatLength(mm, un, Precision::Fine); };
    switch (s) {
    case BudgetSource::CompoundAngle:
        return "sd " + minutes(u.compoundAngleSdRad);
    case BudgetSource::CrossReading:
        return "± " + len(u.crossReadingMm) + " of dial";
    case BudgetSource::CompoundReading:
        return "± " + len(u.compoundReadingMm) + " of dial";
    case BudgetSource::SaddleReading:
        return "± " + len(u.saddleReadingMm) + " of dial";
    case BudgetSource::CrossBacklash:
    case BudgetSource::CompoundBacklash:
    case BudgetSource::SaddleBacklash:
        return "unknown, 0 to " + len(slideOf(scene.setup, s).backlashMm);
    case BudgetSource::TipHeight:
        return "sd " + len(u.tipHeightSdMm);
    case BudgetSource::NoseRadius:
        if (u.noseRadiusToleranceMm > 0)
            return std::string("ISO 1832 class ") + u.noseRadiusClass + ": ± " +
                   len(u.noseRadiusToleranceMm);
        return "sd " + len(u.noseRadiusSdMm);
    case BudgetSource::Measuring:
        return "sd " + len(u.measuringSdMm);
    }
    return "";
}

std::string sourceLine(const Scene& scene, const SourceShare& s) {
    return fmt::format("{} ({}): gauge diameter sd {} alone, {:.0f} % of the spread",
                       budgetSourceName(s.source), sourceStated(scene, s.source),
                       formatSmallLength(s.sdMm, scene.units), 100.0 * s.share);
}

std::string budgetJson(const Scene& scene, const Budget& b, bool planned) {
    ordered_json j;
    j["format"] = "swarf budget";
    j["format_version"] = 1;
    j["scene"] = {{"name", scene.name}, {"file", scene.file}, {"units", unitName(scene.units)}};
    j["passes_planned"] = planned;
    j["samples"] = b.samples;
    j["seed"] = b.seed;
    j["profile_step_mm"] = b.profileStepMm;
    const Feature& f = scene.part.features.at(static_cast<std::size_t>(b.featureIndex));
    j["cone"] = {{"index", b.featureIndex},
                 {"name", f.name},
                 {"gauge_plane_z_mm", b.gaugeZMm},
                 {"nominal_diameter_mm", b.nominalDiameterMm},
                 {"tolerance_mm", b.toleranceMm},
                 {"nominal_half_angle_deg", radToDeg(b.nominalHalfAngleRad)},
                 {"angle_tolerance_deg", radToDeg(b.angleToleranceRad)}};
    j["exact"] = {{"gauge_diameter_mm", b.exact.gaugeDiameterMm},
                  {"half_angle_deg", radToDeg(b.exact.halfAngleRad)},
                  {"within_tolerance", b.exact.withinTolerance}};
    j["gauge_diameter_mm"] = spread(b.gaugeDiameterMm, 1.0);
    j["half_angle_deg"] = spread(b.halfAngleRad, radToDeg(1.0));
    j["p_in_tolerance"] = b.pInTolerance;
    j["p_gauge_diameter_in_tolerance"] = b.pGaugeInTolerance;
    ordered_json src = ordered_json::array();
    double sum = 0;
    for (const SourceShare& s : b.sources) {
        src.push_back({{"name", budgetSourceKey(s.source)},
                       {"share", s.share},
                       {"gauge_diameter_sd_mm", s.sdMm},
                       {"half_angle_sd_deg", radToDeg(s.halfAngleSdRad)},
                       {"half_angle_share", s.halfAngleShare},
                       {"stated", sourceStated(scene, s.source)}});
        sum += s.share;
    }
    j["sources"] = src;
    j["shares_sum"] = sum;
    j["sentence"] = budgetSentence(b);
    j["caution"] = safetyCautionShort();
    return j.dump(2) + "\n";
}

void writeBudgetJson(const std::string& path, const Scene& scene, const Budget& b, bool planned) {
    writeTextFile(path, budgetJson(scene, b, planned));
}

std::string budgetHtml(const Scene& scene, const Budget& b, const std::string& histogramPng,
                       bool planned) {
    const Units u = scene.units;
    auto esc = [](const std::string& s) { return escapeHtml(s); };
    auto len = [&](double mm) { return esc(formatLength(mm, u, Precision::Fine)); };
    const std::string title = scene.name.empty() ? scene.file : scene.name;
    std::string h = "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n";
    h += "<title>swarf budget: " + esc(title) + "</title>\n<style>";
    h += "body{font-family:sans-serif;max-width:1250px;margin:1em auto;padding:0 1em;color:#222}"
         "table{border-collapse:collapse;margin:.5em 0}td,th{border:1px solid #ccc;padding:.25em "
         ".6em;text-align:left}th{background:#f0f0f0}.num{text-align:right}"
         ".say{background:#eef3fb;border:2px solid #4a6fb0;padding:.6em 1em;font-size:1.2em}"
         ".caution{background:#fff6d8;border:1px solid #d8b200;padding:.6em 1em}"
         "img{max-width:100%;border:1px solid #bbb}</style></head><body>\n";
    h += "<h1>swarf budget: " + esc(title) + "</h1>\n";
    if (!scene.file.empty())
        h += "<p>Scene file: <code>" + esc(scene.file) + "</code>" +
             (planned ? " (no passes of its own: the passes <code>swarf plan</code> makes)" : "") +
             "</p>\n";
    h += "<p class=\"say\">" + esc(budgetSentence(b)) + ".</p>\n";
    h += "<div class=\"caution\"><b>Cautions.</b><ul>\n";
    for (const std::string& c : safetyCautions())
        h += "<li>" + esc(c) + "</li>\n";
    h += "</ul></div>\n";
    h += fmt::format("<p>{} parts drawn (seed {}), each cut by the exact profile every {}; the "
                     "gauge plane at z = {}, the drawing {} ± {}.</p>\n",
                     b.samples, b.seed, len(b.profileStepMm), esc(formatLength(b.gaugeZMm, u)),
                     len(b.nominalDiameterMm), len(b.toleranceMm));
    h += "<table><tr><th></th><th>with nothing uncertain</th><th>mean</th><th>sd</th><th>2.5 "
         "%</th><th>97.5 %</th></tr>\n";
    const Spread& g = b.gaugeDiameterMm;
    h += "<tr><th>gauge diameter</th><td class=\"num\">" + len(b.exact.gaugeDiameterMm) +
         "</td><td class=\"num\">" + len(g.mean) + "</td><td class=\"num\">" +
         esc(formatSmallLength(g.sd, u)) + "</td><td class=\"num\">" + len(g.p2_5) +
         "</td><td class=\"num\">" + len(g.p97_5) + "</td></tr>\n";
    const Spread& a = b.halfAngleRad;
    h += "<tr><th>half angle</th><td class=\"num\">" + esc(formatDms(b.exact.halfAngleRad)) +
         "</td><td class=\"num\">" + esc(formatDms(a.mean)) + "</td><td class=\"num\">" +
         esc(minutes(a.sd)) + "</td><td class=\"num\">" + esc(formatDms(a.p2_5)) +
         "</td><td class=\"num\">" + esc(formatDms(a.p97_5)) + "</td></tr>\n</table>\n";
    h += fmt::format("<p>Within tolerance (the cone's verdict, as <code>swarf run</code> gives "
                     "it): {:.1f} % of the parts; gauge diameter alone within ± {}: {:.1f} "
                     "%.</p>\n",
                     100.0 * b.pInTolerance, len(b.toleranceMm), 100.0 * b.pGaugeInTolerance);
    if (!b.sources.empty()) {
        h += "<h2>Sources</h2>\n<table><tr><th>source</th><th>as stated</th><th>gauge diameter "
             "sd alone</th><th>share of the spread</th><th>to make it smaller</th></tr>\n";
        for (const SourceShare& s : b.sources)
            h += "<tr><td>" + esc(budgetSourceName(s.source)) + "</td><td>" +
                 esc(sourceStated(scene, s.source)) + "</td><td class=\"num\">" +
                 esc(formatSmallLength(s.sdMm, u)) + "</td><td class=\"num\">" +
                 fmt::format("{:.0f} %", 100.0 * s.share) + "</td><td>" +
                 esc(budgetSourceAdvice(s.source)) + "</td></tr>\n";
        h += "</table>\n<p>A share is the variance of the gauge diameter with that source alone "
             "over the variance with all of them; the shares add up to about 1 when the sources "
             "act linearly.</p>\n";
    }
    if (!histogramPng.empty())
        h += "<h2>Gauge diameters</h2>\n<img src=\"" + esc(histogramPng) +
             "\" alt=\"histogram of the gauge diameters, the tolerance band marked\">\n";
    h += "<p><small>" + esc(safetyCautionShort()) + "</small></p>\n</body></html>\n";
    return h;
}

std::string writeBudgetReport(const Scene& scene, const Budget& b, const std::string& outDir,
                              const std::string& histogramPng, bool planned) {
    makeOutputFolder(outDir);
    const std::string path = (std::filesystem::path(outDir) / "report.html").string();
    writeTextFile(path, budgetHtml(scene, b, histogramPng, planned));
    return path;
}

} // namespace swarf::io
