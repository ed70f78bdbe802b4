// correction.json and the set-up sheet for the rest of the job (correction_writer.h; fields in
// sim/io/CORRECTION.md).
#include "swarf/io/correction_writer.h"

#include "swarf/io/html.h"
#include "swarf/io/setup_sheet.h"
#include "swarf/sim/caution.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/units.h"

#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include <cmath>

namespace swarf::io {

namespace {

using nlohmann::ordered_json;

int mainConeIndex(const Scene& s) {
    for (std::size_t i = 0; i < s.part.features.size(); ++i)
        if (&s.part.features[i] == s.part.mainCone())
            return static_cast<int>(i);
    return -1;
}

std::string signedDms(double rad) {
    return (rad < 0 ? "−" : "+") + formatDms(std::fabs(rad));
}

std::string signedSmall(double mm, Units u) {
    return (mm < 0 ? "−" : "+") + formatSmallLength(std::fabs(mm), u);
}

} // namespace

std::vector<std::string> residualLines(const ConeFit& fit, Units u) {
    std::vector<std::string> out;
    for (const FitResidual& r : fit.residuals) {
        const bool angleOnly = r.what.rfind("indicator", 0) == 0;
        out.push_back(fmt::format(
            "{}{}: {} (uncertainty {}, {}{:.1f} u){}", r.what,
            angleOnly ? "" : " at z " + formatLength(r.zMm, u), signedSmall(r.residualMm, u),
            formatSmallLength(r.uncertaintyMm, u), r.normalised() < 0 ? "−" : "",
            std::fabs(r.normalised()),
            std::fabs(r.normalised()) > kMaxNormalisedResidual ? "  <-- off the others" : ""));
    }
    return out;
}

std::string correctionJson(const Scene& plan, const Measurements& m, const Correction& c,
                           const CutResult& after) {
    ordered_json residuals = ordered_json::array();
    for (const FitResidual& r : c.fit.residuals)
        residuals.push_back({{"reading", r.what},
                             {"z_mm", r.zMm},
                             {"residual_mm", r.residualMm},
                             {"uncertainty_mm", r.uncertaintyMm},
                             {"line", r.where.line}});
    ordered_json remaining = ordered_json::array();
    for (const CorrectedPass& p : c.remaining)
        remaining.push_back(
            {{"pass", p.pass + 1},
             {"plan_pass", p.planPass >= 0 ? ordered_json(p.planPass + 1) : ordered_json(nullptr)},
             {"cross_reading", fromMm(p.crossMm, plan.units)},
             {"compound_angle_deg", radToDeg(p.compoundAngleRad)},
             {"finish", p.finish}});
    const CorrectedPass* fin = nullptr;
    for (const CorrectedPass& p : c.remaining)
        if (p.finish)
            fin = &p;
    ordered_json j;
    j["format"] = "swarf correct";
    j["version"] = 1;
    j["scene"] = plan.file;
    j["measured_file"] = m.file;
    j["units"] = plan.units == Units::Inch ? "inch" : "mm";
    j["after_pass"] = c.afterPass;
    j["measured"] = {{"gauge_z_mm", c.fit.gaugeZMm},
                     {"gauge_diameter_mm", c.fit.gaugeDiameterMm},
                     {"gauge_diameter_sd_mm", c.fit.gaugeDiameterSdMm},
                     {"half_angle_deg", radToDeg(c.fit.halfAngleRad)},
                     {"half_angle_sd_deg", radToDeg(c.fit.halfAngleSdRad)},
                     {"readings", c.fit.readings},
                     {"chi_square", c.fit.chiSquare}};
    j["residuals"] = residuals;
    j["drawing_half_angle_deg"] = radToDeg(c.drawingHalfAngleRad);
    j["revealed_compound_error_deg"] = radToDeg(c.revealedErrorRad);
    j["revealed_cross_offset_mm"] = c.crossOffsetMm;
    j["compound_change_deg"] = radToDeg(c.compoundChangeRad);
    j["compound_reading_before_deg"] = radToDeg(c.oldCompoundReadingRad);
    j["compound_reading_after_deg"] = radToDeg(c.newCompoundReadingRad);
    j["indicator"] = {{"travel_mm", c.indicatorTravelMm}, {"change_mm", c.indicatorChangeMm}};
    j["stock_left_mm"] = {{"min", c.stockLeftMinMm}, {"max", c.stockLeftMaxMm}};
    j["finish"] = {{"pass", fin ? ordered_json(fin->pass + 1) : ordered_json(nullptr)},
                   {"cross_reading",
                    fin ? ordered_json(fromMm(fin->crossMm, plan.units)) : ordered_json(nullptr)},
                   {"moved_in", fromMm(c.finishMovedInMm, plan.units)},
                   {"nose_offset_diameter_mm", c.noseOffsetDiameterMm}};
    j["remaining"] = remaining;
    j["passes_added"] = c.passesAdded;
    j["verdict_after"] = c.scrap                 ? "scrap"
                         : after.withinTolerance ? "in_tolerance"
                                                 : "out_of_tolerance";
    j["after"] = {{"gauge_diameter_mm", after.gaugeAsCutDiameterMm}};
    const int f = mainConeIndex(c.corrected);
    if (f >= 0)
        for (const FeatureReport& fr : after.features)
            if (fr.feature == f)
                j["after"]["half_angle_deg"] = radToDeg(fr.asCutHalfAngleRad);
    j["scrap"] = {{"scrap", c.scrap}, {"amount_mm", c.scrapMm}, {"z_mm", c.scrapZMm}};
    j["notes"] = c.notes;
    return j.dump(2) + "\n";
}

std::vector<SheetPart> correctionSheet(const Scene& plan, const Measurements& m,
                                       const Correction& c, const CutResult& after) {
    const Units u = plan.units;
    auto L = [u](double mm) { return formatLength(mm, u, Precision::Fine); };
    std::vector<SheetPart> out;
    const Feature& cone = *plan.part.mainCone();

    // Before and after: the drawing, the plan after the pass measured, the cone measured, and
    // the corrected job's end.
    Scene planCut = plan;
    planCut.plan.passes.resize(static_cast<std::size_t>(c.afterPass));
    const std::vector<ToolMove> mv = planMoves(planCut);
    const Profile planned = profileUpTo(planCut, mv, mv.size());
    SheetPart cmp{"The cone: drawing, plan, measured, after correction", {}};
    std::vector<double> planes = {cone.zStartMm};
    for (double z : {cone.cone.gaugeZMm, cone.zEndMm})
        if (std::fabs(z - planes.back()) > 1e-9 && std::fabs(z - planes.front()) > 1e-9)
            planes.push_back(z);
    for (double z : planes) {
        cmp.lines.push_back(fmt::format(
            "z {}: drawing Ø{} ± {}; plan after pass {} Ø{}; measured Ø{}; after correction Ø{}",
            formatLength(z, u), L(cone.cone.diameterAt(z)), L(cone.toleranceMm), c.afterPass,
            L(2 * planned.radiusAt(z)), L(c.fit.diameterAt(z, cone.cone)),
            c.scrap ? std::string("(scrap)") : L(2 * after.asCut.radiusAt(z))));
    }
    cmp.lines.push_back("Half angle: drawing " + formatDms(c.drawingHalfAngleRad) + "; measured " +
                        formatDms(c.fit.halfAngleRad) + " ± " + formatDms(c.fit.halfAngleSdRad) +
                        " (the compound " + signedDms(c.revealedErrorRad) +
                        " off its scale); the cross-slide's zero " +
                        signedSmall(c.crossOffsetMm, u) + " on diameter.");
    out.push_back(cmp);

    if (c.scrap) {
        out.push_back({"Scrap",
                       {"The part is scrap: " + formatSmallLength(c.scrapMm, u) +
                            " under the drawing's lower limit on diameter at z " +
                            formatLength(c.scrapZMm, u) + ".",
                        "No correction can put the metal back; no readings are given for the "
                        "rest. Start a new part, with the compound and the cross-slide's zero "
                        "corrected as above."}});
    } else {
        SheetPart cp{"Re-set the compound (spindle stopped, tool backed out)", {}};
        cp.lines.push_back("Turn the compound by " + signedDms(c.compoundChangeRad) +
                           " (true angle; + steeper): its scale from " +
                           formatDms(c.oldCompoundReadingRad) + " to " +
                           formatDms(c.newCompoundReadingRad) + ".");
        cp.lines.push_back("With an indicator on a test bar parallel to the axis, over " +
                           formatLength(c.indicatorTravelMm, u) +
                           " of compound travel the indicator moves " +
                           formatSmallLength(std::fabs(c.indicatorChangeMm), u) +
                           (c.indicatorChangeMm >= 0 ? " more" : " less") + " than before.");
        cp.lines.push_back("The dials keep their zero; the cross-slide readings below include the "
                           "zero's offset (" +
                           signedSmall(c.crossOffsetMm, u) +
                           " on diameter) and the nose-radius "
                           "offset of the finishing pass (" +
                           formatSmallLength(c.noseOffsetDiameterMm, u) +
                           " on diameter, as planned).");
        out.push_back(cp);
        SheetPart rest{"The rest of the job", {}};
        rest.lines.push_back(
            "Stock left on the cone, normal to it: " + formatSmallLength(c.stockLeftMinMm, u) +
            " to " + formatSmallLength(c.stockLeftMaxMm, u) + ".");
        for (const CorrectedPass& p : c.remaining) {
            const Pass& ps = c.corrected.plan.passes[static_cast<std::size_t>(p.pass)];
            std::string what = p.finish ? "finishing pass" : p.planPass < 0 ? "added pass" : "pass";
            std::string line = fmt::format(
                "Pass {} ({}{}): cross-slide {}", p.pass + 1, what,
                p.planPass >= 0 ? ", plan's pass " + std::to_string(p.planPass + 1) : "",
                dialReadingText(plan.setup.cross, p.crossMm, u));
            if (ps.kind == PassKind::Compound)
                line += ", compound from " + formatLength(ps.fromMm, u) + " to " +
                        formatLength(ps.toMm, u);
            rest.lines.push_back(line + ".");
        }
        if (const Feature* drawn = plan.part.mainCone())
            rest.lines.push_back("Then stop the spindle and measure the finished cone (spindle "
                                 "stopped, tool backed out): Ø" +
                                 L(drawn->cone.gaugeDiameterMm) + " ± " + L(drawn->toleranceMm) +
                                 " at the gauge plane, " + L(drawn->cone.gaugeZMm) +
                                 " from the datum face.");
        for (const std::string& n : c.notes)
            rest.lines.push_back(n + ".");
        rest.lines.push_back(std::string("swarf run on corrected.toml: ") +
                             (after.withinTolerance ? "within tolerance" : "out of tolerance") +
                             ", gauge diameter Ø" + L(after.gaugeAsCutDiameterMm) + ".");
        out.push_back(rest);
    }
    SheetPart res{"Readings and residuals (" + m.file + ")", residualLines(c.fit, u)};
    out.push_back(res);
    SheetPart cautions{"Cautions", safetyCautions()};
    cautions.lines.push_back(safetyCautionShort());
    out.push_back(cautions);
    return out;
}

std::string correctionSheetText(const std::vector<SheetPart>& sheet, const std::string& title) {
    std::string t = title + "\n" + std::string(title.size() > 100 ? 100 : title.size(), '=') + "\n";
    for (const SheetPart& p : sheet) {
        t += "\n" + p.heading + "\n";
        for (const std::string& l : p.lines) {
            bool first = true;
            for (const std::string& w : wrapWords(l, 96)) {
                t += (first ? "- " : "  ") + w + "\n";
                first = false;
            }
        }
    }
    return t;
}

std::string correctionSheetHtml(const std::vector<SheetPart>& sheet, const std::string& title,
                                const std::string& chartSvg) {
    std::string h = "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>" +
                    escapeHtml(title) +
                    "</title>\n<style>body{font-family:sans-serif;max-width:50em;margin:2em auto;"
                    "line-height:1.4}h2{border-bottom:1px solid #888}@media print{body{margin:"
                    "0}}</style></head>\n<body>\n<h1>" +
                    escapeHtml(title) + "</h1>\n";
    for (std::size_t i = 0; i < sheet.size(); ++i) {
        const SheetPart& p = sheet[i];
        h += "<h2>" + escapeHtml(p.heading) + "</h2>\n<ul>\n";
        for (const std::string& l : p.lines)
            h += "<li>" + escapeHtml(l) + "</li>\n";
        h += "</ul>\n";
        if (i == 0 && !chartSvg.empty())
            h += "<figure>\n" + chartSvg + "</figure>\n";
    }
    return h + "</body></html>\n";
}

} // namespace swarf::io
