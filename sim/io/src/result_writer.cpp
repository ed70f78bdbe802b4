// result.json and profile.csv (format documented in sim/io/RESULTS.md).
#include "swarf/io/result_writer.h"

#include "swarf/io/output_file.h"
#include "swarf/sim/between_passes.h"
#include "swarf/sim/iso2768.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <vector>

namespace swarf::io {
namespace {

using nlohmann::ordered_json;

// NaN and infinities become null.
ordered_json num(double v) {
    // -0 (a negated zero, e.g. no face allowance) is written as 0.
    return std::isfinite(v) ? ordered_json(v == 0 ? 0.0 : v) : ordered_json(nullptr);
}

ordered_json point(const Eigen::Vector2d& p) {
    return {{"z_mm", p.x()}, {"x_mm", p.y()}};
}

} // namespace

std::vector<PassSummary> summarisePasses(const CutResult& r) {
    std::vector<PassSummary> out(r.afterPass.size());
    const Profile* before = &r.stock;
    double vBefore = r.stock.volumeMm3();
    for (std::size_t p = 0; p < r.afterPass.size(); ++p) {
        const Profile& after = r.afterPass[p];
        const double vAfter = after.volumeMm3();
        out[p].removedMm3 = vBefore - vAfter;
        for (std::size_t i = 0; i < after.radiusMm.size() && i < before->radiusMm.size(); ++i)
            out[p].maxRadialDepthMm =
                std::max(out[p].maxRadialDepthMm, before->radiusMm[i] - after.radiusMm[i]);
        before = &after;
        vBefore = vAfter;
    }
    return out;
}

std::string resultJson(const Scene& scene, const CutResult& r) {
    ordered_json j;
    j["format"] = "swarf result";
    j["format_version"] = 1;
    j["scene"] = {{"name", scene.name}, {"file", scene.file}, {"units", unitName(scene.units)}};
    j["verdict"] = r.withinTolerance ? "in_tolerance" : "out_of_tolerance";
    j["gauge"] = {{"plane_z_mm", num(r.gaugeZMm)},
                  {"nominal_diameter_mm", num(r.gaugeNominalDiameterMm)},
                  {"as_cut_diameter_mm", num(r.gaugeAsCutDiameterMm)},
                  {"error_mm", num(r.gaugeAsCutDiameterMm - r.gaugeNominalDiameterMm)}};
    j["deviation"] = {{"max_left_on_mm", num(r.maxLeftOnMm)},
                      {"max_overcut_mm", num(r.maxOvercutMm)}};
    const bool drawn = !scene.part.features.empty();
    j["volume"] = {{"from_z_mm", num(r.volumeFromZMm)},
                   {"to_z_mm", num(r.volumeToZMm)},
                   {"stock_mm3", num(r.stockVolumeMm3)},
                   {"as_cut_mm3", num(r.asCutVolumeMm3)},
                   {"removed_mm3", num(r.removedVolumeMm3)},
                   {"drawing_from_z_mm", drawn ? num(scene.part.zMinMm()) : num(NAN)},
                   {"drawing_to_z_mm", drawn ? num(scene.part.zMaxMm()) : num(NAN)},
                   {"left_on_mm3", num(r.leftoverVolumeMm3)},
                   {"overcut_mm3", num(r.overcutVolumeMm3)}};
    j["roughness"] = {{"rt_um", num(r.rtUm)}, {"ra_um", num(r.raUm)}, {"pass", r.finishingPass}};
    ordered_json findings = ordered_json::array();
    for (const Finding& f : r.findings) {
        ordered_json o = {
            {"kind", findingKindName(f.kind)},
            {"pass", f.pass},
            {"pass_number", f.pass >= 0 ? ordered_json(f.pass + 1) : ordered_json(nullptr)},
            {"message", f.message}};
        // Each figure under its own key and unit; a figure the finding has not is left out.
        if (std::isfinite(f.zMm))
            o["z_mm"] = f.zMm;
        if (std::isfinite(f.valueMm))
            o["value_mm"] = f.valueMm;
        if (std::isfinite(f.angleRad))
            o["angle_deg"] = radToDeg(f.angleRad);
        findings.push_back(o);
    }
    j["findings"] = findings;
    ordered_json causes = ordered_json::array();
    for (const Cause& c : r.causes)
        causes.push_back(
            {{"source", c.source},
             {"gauge_diameter_change_mm", num(c.gaugeDiameterChangeMm)},
             {"half_angle_change_deg", num(radToDeg(c.halfAngleChangeRad))},
             {"pass", c.pass},
             {"pass_number", c.pass >= 0 ? ordered_json(c.pass + 1) : ordered_json(nullptr)},
             {"message", c.message}});
    j["causes"] = causes;

    ordered_json features = ordered_json::array();
    for (const FeatureReport& fr : r.features) {
        const Feature& f = scene.part.features.at(static_cast<std::size_t>(fr.feature));
        const bool conic = f.kind == FeatureKind::Cone || f.kind == FeatureKind::Chamfer;
        ordered_json o = {{"index", fr.feature},
                          {"name", f.name},
                          {"kind", featureKindName(f.kind)},
                          {"from_mm", f.zStartMm},
                          {"to_mm", f.zEndMm},
                          {"within_tolerance", fr.withinTolerance},
                          {"max_left_on_mm", num(fr.maxLeftOnMm)},
                          {"max_overcut_mm", num(fr.maxOvercutMm)},
                          {"tolerance_mm", num(f.toleranceMm)}};
        if (f.side == Side::Inside)
            o["side"] = sideName(f.side); // outside features keep the layout they always had
        if (f.kind == FeatureKind::Cylinder) {
            o["nominal_diameter_mm"] = f.diameterMm;
            o["as_cut_diameter_mm"] = num(fr.asCutDiameterMm);
        } else if (conic) {
            o["gauge_plane_z_mm"] = f.cone.gaugeZMm;
            o["nominal_diameter_mm"] = f.cone.gaugeDiameterMm;
            o["as_cut_diameter_mm"] = num(fr.asCutDiameterMm);
            o["nominal_half_angle_deg"] = radToDeg(f.cone.halfAngleRad);
            o["as_cut_half_angle_deg"] = num(radToDeg(fr.asCutHalfAngleRad));
            o["angle_tolerance_deg"] = radToDeg(f.angleToleranceRad);
        } else {
            o["face_z_mm"] = f.zStartMm;
        }
        features.push_back(o);
    }
    j["features"] = features;

    const std::vector<PassSummary> sums = summarisePasses(r);
    ordered_json passes = ordered_json::array();
    for (std::size_t p = 0; p < scene.plan.passes.size(); ++p) {
        const Pass& ps = scene.plan.passes[p];
        ordered_json o = {{"index", p},
                          {"kind", passKindKey(ps.kind)},
                          {"note", ps.note},
                          {"feed_mm_per_rev", ps.feedMmPerRev}};
        ordered_json mv = ordered_json::array();
        for (const ToolMove& m : r.moves) {
            if (m.pass != static_cast<int>(p))
                continue;
            mv.push_back({{"tip_from", point(m.tipFrom)},
                          {"tip_to", point(m.tipTo)},
                          {"cross_from_mm", m.crossFrom},
                          {"cross_to_mm", m.crossTo},
                          {"compound_from_mm", m.compoundFrom},
                          {"compound_to_mm", m.compoundTo},
                          {"saddle_from_mm", m.saddleFrom},
                          {"saddle_to_mm", m.saddleTo}});
        }
        o["moves"] = mv;
        if (p < sums.size()) {
            o["removed_mm3"] = num(sums[p].removedMm3);
            o["max_radial_depth_mm"] = num(sums[p].maxRadialDepthMm);
        }
        int nFind = 0;
        for (const Finding& f : r.findings)
            nFind += f.pass == static_cast<int>(p);
        o["findings"] = nFind;
        passes.push_back(o);
    }
    j["passes"] = passes;
    ordered_json between = ordered_json::array();
    for (const BetweenMove& b : r.between) {
        const ToolMove& m = b.move;
        between.push_back({{"after_pass", b.afterPass},
                           {"before_pass", b.beforePass},
                           {"step", returnStepKey(b.step)},
                           {"slide", slideKey(b.slide)},
                           {"tip_from", point(m.tipFrom)},
                           {"tip_to", point(m.tipTo)},
                           {"cross_from_mm", m.crossFrom},
                           {"cross_to_mm", m.crossTo},
                           {"compound_from_mm", m.compoundFrom},
                           {"compound_to_mm", m.compoundTo},
                           {"saddle_from_mm", m.saddleFrom},
                           {"saddle_to_mm", m.saddleTo},
                           {"cuts_mm", num(b.cutsMm)}});
    }
    j["between_passes"] = between;
    j["profile"] = {{"samples", r.asCut.radiusMm.size()},
                    {"z0_mm", num(r.asCut.z0Mm)},
                    {"step_mm", r.asCut.dzMm}};
    if (r.bored) {
        // Inside work: the hole, as profile.csv's bore columns give it sample by sample.
        double holeMm = 0, boreLeftOn = 0, boreOvercut = 0;
        for (double x : r.boreStock.radiusMm)
            holeMm = std::max(holeMm, 2.0 * x);
        for (const FeatureReport& fr : r.features) {
            if (scene.part.features.at(static_cast<std::size_t>(fr.feature)).side != Side::Inside)
                continue;
            boreLeftOn = std::max(boreLeftOn, fr.maxLeftOnMm);
            boreOvercut = std::max(boreOvercut, fr.maxOvercutMm);
        }
        j["bore"] = {{"stock_diameter_mm", num(holeMm)},
                     {"stock_depth_mm", num(scene.stock.boreDepthMm)},
                     {"through", scene.stock.boreThrough()},
                     {"max_left_on_mm", num(boreLeftOn)},
                     {"max_overcut_mm", num(boreOvercut)}};
    }
    j["surface"] = {{"marked_moves", r.surface.markedMoveCount()},
                    {"samples_per_feed", kFeedMarkProfileSamples},
                    {"angle_samples", scene.sim.angleSamples}};
    j["caution"] = "A simulation of the tool path only: it does not model cutting forces, "
                   "deflection of the work or tool, chatter or tool wear. Check every reading "
                   "on the machine and take a trial cut before trusting a number here.";
    return j.dump(2) + "\n";
}

namespace {

// The bore's five columns of sample i (inside work): a number, or empty where there is none.
void appendBoreColumns(std::string& out, const CutResult& r, std::size_t i) {
    auto at = [i](const std::vector<double>& v) { return i < v.size() ? v[i] : NAN; };
    const double cols[] = {at(r.boreNominal.radiusMm), at(r.bore.radiusMm), at(r.boreDeviationMm),
                           at(r.boreCrest.radiusMm), at(r.boreCrestDeviationMm)};
    char buf[32];
    for (double v : cols) {
        out += ',';
        if (std::isfinite(v)) {
            const int len = std::snprintf(buf, sizeof buf, "%.7f", v);
            out.append(buf, static_cast<std::size_t>(len));
        }
    }
}

} // namespace

std::string profileCsv(const CutResult& r) {
    std::string out =
        "z_mm,nominal_radius_mm,as_cut_radius_mm,deviation_mm,crest_radius_mm,crest_deviation_mm";
    out += r.bored ? ",bore_nominal_radius_mm,bore_radius_mm,bore_deviation_mm,"
                     "bore_crest_radius_mm,bore_crest_deviation_mm\n"
                   : "\n";
    out.reserve(out.size() + r.asCut.radiusMm.size() * 72);
    char buf[128];
    for (std::size_t i = 0; i < r.asCut.radiusMm.size(); ++i) {
        const double n = i < r.nominal.radiusMm.size() ? r.nominal.radiusMm[i] : NAN;
        const double d = i < r.deviationMm.size() ? r.deviationMm[i] : NAN;
        int len = std::snprintf(buf, sizeof buf, "%.6f,", r.asCut.zAt(i));
        out.append(buf, static_cast<std::size_t>(len));
        if (std::isfinite(n)) {
            len = std::snprintf(buf, sizeof buf, "%.7f", n);
            out.append(buf, static_cast<std::size_t>(len));
        }
        len = std::snprintf(buf, sizeof buf, ",%.7f,", r.asCut.radiusMm[i]);
        out.append(buf, static_cast<std::size_t>(len));
        if (std::isfinite(d)) {
            len = std::snprintf(buf, sizeof buf, "%.7f", d);
            out.append(buf, static_cast<std::size_t>(len));
        }
        const double c = i < r.crest.radiusMm.size() ? r.crest.radiusMm[i] : r.asCut.radiusMm[i];
        const double cd = i < r.crestDeviationMm.size() ? r.crestDeviationMm[i] : NAN;
        len = std::snprintf(buf, sizeof buf, ",%.7f,", c);
        out.append(buf, static_cast<std::size_t>(len));
        if (std::isfinite(cd)) {
            len = std::snprintf(buf, sizeof buf, "%.7f", cd);
            out.append(buf, static_cast<std::size_t>(len));
        }
        if (r.bored)
            appendBoreColumns(out, r, i);
        out += '\n';
    }
    return out;
}

void writeResultJson(const std::string& path, const Scene& scene, const CutResult& result) {
    writeTextFile(path, resultJson(scene, result));
}

void writeProfileCsv(const std::string& path, const CutResult& result) {
    writeTextFile(path, profileCsv(result));
}

} // namespace swarf::io
