// Writing a scene as TOML in its own units (the inverse of the scene reader).
#include "swarf/io/scene_writer.h"

#include "swarf/io/output_file.h"

#include "swarf/sim/error.h"
#include "swarf/sim/iso2768.h"

#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <sstream>

namespace swarf::io {
namespace {

// A TOML basic string with the escapes TOML requires.
std::string quoted(const std::string& s) {
    std::string out = "\"";
    for (unsigned char c : s) {
        switch (c) {
        case '"':
            out += "\\\"";
            break;
        case '\\':
            out += "\\\\";
            break;
        case '\n':
            out += "\\n";
            break;
        case '\t':
            out += "\\t";
            break;
        case '\r':
            out += "\\r";
            break;
        default:
            if (c < 0x20 || c == 0x7f) {
                char buf[8];
                std::snprintf(buf, sizeof buf, "\\u%04x", c);
                out += buf;
            } else {
                out += static_cast<char>(c);
            }
        }
    }
    return out + "\"";
}

// A number as TOML: always with a decimal point or exponent so it reads as a float.
std::string num(double v) {
    if (v == 0)
        return "0.0";
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.12g", v);
    std::string s = buf;
    if (s.find_first_of(".eEn") == std::string::npos)
        s += ".0";
    return s;
}

class Out {
  public:
    explicit Out(Units u) : u_(u) {}
    void line(const std::string& s) { os_ << s << '\n'; }
    void len(const char* key, double mm) { os_ << key << " = " << num(fromMm(mm, u_)) << '\n'; }
    void deg(const char* key, double rad) { os_ << key << " = " << num(radToDeg(rad)) << '\n'; }
    void str(const char* key, const std::string& v) { os_ << key << " = " << quoted(v) << '\n'; }
    void raw(const char* key, const std::string& v) { os_ << key << " = " << v << '\n'; }
    void slide(const Slide& s, bool writeTravel) {
        len("per_division", s.mmPerDivision);
        raw("divisions", std::to_string(s.divisionsPerTurn));
        len("backlash", s.backlashMm);
        if (writeTravel)
            len("travel", s.travelMm);
    }
    std::string text() const { return os_.str(); }

  private:
    Units u_;
    std::ostringstream os_;
};

const char* widens(Widens w) {
    return w == Widens::TowardChuck ? "chuck" : "tailstock";
}

// [uncertainty], only the keys that are not exact. An insert's ISO class tolerance (±t,
// uniform) is written as its standard deviation t/√3: the written scene names no insert code.
void writeUncertainty(Out& o, const Uncertainty& u) {
    if (u.exact())
        return;
    o.line("");
    o.line("[uncertainty]");
    if (u.compoundAngleSdRad > 0)
        o.deg("compound_angle_sd", u.compoundAngleSdRad);
    if (u.crossReadingMm > 0)
        o.len("cross_reading", u.crossReadingMm);
    if (u.compoundReadingMm > 0)
        o.len("compound_reading", u.compoundReadingMm);
    if (u.saddleReadingMm > 0)
        o.len("saddle_reading", u.saddleReadingMm);
    const auto backlash = [&](const char* key, BacklashKnowledge k) {
        if (k == BacklashKnowledge::Unknown)
            o.str(key, "unknown");
    };
    backlash("cross_backlash", u.crossBacklash);
    backlash("compound_backlash", u.compoundBacklash);
    backlash("saddle_backlash", u.saddleBacklash);
    if (u.tipHeightSdMm > 0)
        o.len("tip_height_sd", u.tipHeightSdMm);
    if (u.noseRadiusToleranceMm > 0) {
        o.line(std::string("# the insert's ISO 1832 class ") + u.noseRadiusClass + " (uniform, ± " +
               num(u.noseRadiusToleranceMm) + " mm) as its sd");
        o.len("nose_radius_sd", u.noseRadiusToleranceMm / std::sqrt(3.0));
    } else if (u.noseRadiusSdMm > 0) {
        o.len("nose_radius_sd", u.noseRadiusSdMm);
    }
    if (u.measuringSdMm > 0)
        o.len("measuring_sd", u.measuringSdMm);
}

void writeFeature(Out& o, const Feature& f) {
    o.line("");
    o.line("[[part.feature]]");
    switch (f.kind) {
    case FeatureKind::Cylinder:
        o.str("kind", "cylinder");
        o.str("name", f.name);
        o.len("from", f.zStartMm);
        o.len("to", f.zEndMm);
        o.len("diameter", f.diameterMm);
        break;
    case FeatureKind::Face:
        o.str("kind", "face");
        o.str("name", f.name);
        o.len("at", f.zStartMm);
        o.len("diameter", f.diameterMm);
        break;
    case FeatureKind::Chamfer:
        o.str("kind", "chamfer");
        o.str("name", f.name);
        o.len("at", f.cone.gaugeZMm);
        o.len("length", f.zEndMm - f.zStartMm);
        o.deg("angle", f.cone.halfAngleRad);
        o.len("diameter", f.diameterMm);
        o.str("widens_toward", widens(f.cone.widens));
        break;
    case FeatureKind::Cone:
        o.str("kind", "cone");
        o.str("name", f.name);
        o.len("from", f.zStartMm);
        o.len("to", f.zEndMm);
        o.len("gauge_plane", f.cone.gaugeZMm);
        o.len("gauge_diameter", f.cone.gaugeDiameterMm);
        if (f.coneGivenAs.rfind("standard ", 0) == 0)
            o.str("standard", f.coneGivenAs.substr(9));
        else
            o.deg("half_angle", f.cone.halfAngleRad);
        o.str("widens_toward", widens(f.cone.widens));
        break;
    }
    if (f.side == Side::Inside)
        o.str("side", sideName(f.side));
    if (!f.toleranceFromClass)
        o.len("tolerance", f.toleranceMm);
    if ((f.kind == FeatureKind::Cone || f.kind == FeatureKind::Chamfer) &&
        !f.angleToleranceFromClass)
        o.deg("angle_tolerance", f.angleToleranceRad);
}

void writePass(Out& o, const Pass& p) {
    o.line("");
    o.line("[[plan.pass]]");
    switch (p.kind) {
    case PassKind::Compound:
        o.str("kind", passKindKey(p.kind));
        if (!p.note.empty())
            o.str("note", p.note);
        o.len("cross", p.crossMm);
        o.len("saddle", p.saddleMm);
        break;
    case PassKind::Saddle:
        o.str("kind", passKindKey(p.kind));
        if (!p.note.empty())
            o.str("note", p.note);
        o.len("cross", p.crossMm);
        o.len("compound", p.compoundMm);
        break;
    case PassKind::CrossSlide:
        o.str("kind", passKindKey(p.kind));
        if (!p.note.empty())
            o.str("note", p.note);
        o.len("compound", p.compoundMm);
        o.len("saddle", p.saddleMm);
        break;
    case PassKind::Path:
        // Its points follow the feed (written by the caller, in the scene's units).
        o.str("kind", passKindKey(p.kind));
        if (!p.note.empty())
            o.str("note", p.note);
        break;
    }
    if (p.kind != PassKind::Path) {
        o.len("from", p.fromMm);
        o.len("to", p.toMm);
    }
    o.len("feed", p.feedMmPerRev);
    if (p.retractToMm && p.kind != PassKind::Path)
        o.len("retract_to", *p.retractToMm);
    if (p.compoundAngleRad && p.kind != PassKind::Path)
        o.deg("compound_angle", *p.compoundAngleRad);
    if (p.compoundErrorRad && p.kind != PassKind::Path)
        o.deg("compound_error", *p.compoundErrorRad);
}

} // namespace

std::string sceneToToml(const Scene& sc, const std::vector<std::string>& headerComments) {
    const Units u = sc.units;
    Out o(u);
    for (const std::string& c : headerComments)
        o.line(c.empty() ? "#" : "# " + c);
    o.str("name", sc.name);
    o.str("description", sc.description);
    o.str("units", unitWord(u));

    o.line("");
    o.line("[stock]");
    o.len("diameter", sc.stock.diameterMm);
    o.len("length", sc.stock.lengthMm);
    o.len("stick_out", sc.stock.stickOutMm);
    o.len("face_allowance", sc.stock.faceAllowanceMm);
    o.str("material", sc.stock.material);
    o.raw("tailstock", sc.stock.tailstockSupport ? "true" : "false");
    if (sc.stock.hasBore()) {
        o.len("bore_diameter", sc.stock.boreDiameterMm);
        o.len("bore_depth", sc.stock.boreDepthMm);
    }

    o.line("");
    o.line("[part]");
    o.str("tolerance_class", iso2768Name(sc.part.toleranceClass));
    for (const Feature& f : sc.part.features)
        writeFeature(o, f);

    const Tool& t = sc.tool;
    o.line("");
    o.line("[tool]");
    const bool bar = t.kind == ToolKind::BoringBar;
    if (bar) {
        o.str("kind", "boring_bar");
        o.len("bar_diameter", t.barDiameterMm);
        o.len("overhang", t.overhangMm);
        o.len("min_bore", t.minBoreMm);
    }
    if (t.shape != 0)
        o.str("shape", std::string(1, t.shape));
    else
        o.deg("included_angle", t.includedAngleRad);
    o.len("nose_radius", t.noseRadiusMm);
    if (t.holderCode.size() == 1)
        o.str("holder", t.holderCode);
    else
        o.deg("entering_angle", t.enteringAngleRad);
    o.str("hand", t.hand == Hand::R ? "R" : t.hand == Hand::L ? "L" : "N");
    o.len("edge_length", t.edgeLengthMm);
    o.len(bar ? "axis_height" : "tip_height", t.tipHeightMm);
    o.len("thickness", t.thicknessMm);

    const Setup& s = sc.setup;
    o.line("");
    o.line("[setup]");
    if (s.spindleRpm)
        o.raw("spindle_rpm", num(*s.spindleRpm));
    o.str("approach", s.approach == Approach::TakeUp ? "take_up" : "in_order");
    o.raw("wind_back", num(s.windBackTurns));
    o.line("");
    o.line("[setup.compound]");
    o.deg("angle", s.compoundReadingRad);
    o.str("scale", s.compoundScale == CompoundScale::FromAxis ? "axis" : "cross_slide");
    o.deg("error", s.compoundErrorRad);
    o.str("advance", s.compoundAdvanceToward == Widens::TowardChuck ? "chuck" : "tailstock");
    o.str("across", s.compoundAdvanceAcross == Across::In ? "in" : "out");
    o.slide(s.compound, true);
    o.line("");
    o.line("[setup.cross]");
    o.str("dial", s.crossDial == DialMode::Diameter ? "diameter" : "radius");
    o.len("zero_diameter", s.zeroDiameterMm);
    o.slide(s.cross, true);
    o.line("");
    o.line("[setup.saddle]");
    o.len("zero_z", s.zeroZMm);
    o.slide(s.saddle, s.saddle.travelMm < 1e8);

    for (const Pass& p : sc.plan.passes) {
        writePass(o, p);
        if (p.kind == PassKind::Path) {
            std::string pts = "[";
            for (std::size_t i = 0; i < p.pathZX.size(); ++i)
                pts += (i ? ", [" : "[") + num(fromMm(p.pathZX[i].first, u)) + ", " +
                       num(fromMm(2.0 * p.pathZX[i].second, u)) + "]";
            o.raw("points", pts + "]");
        }
    }

    const PlanningOptions& pl = sc.planning;
    o.line("");
    o.line("[planning]");
    o.len("max_depth", pl.maxDepthMm);
    o.len("finish_allowance", pl.finishAllowanceMm);
    o.len("rough_feed", pl.roughFeedMmPerRev);
    o.len("finish_feed", pl.finishFeedMmPerRev);
    o.str("placing", pl.placing == PlanningOptions::Placing::ZeroOnDiameter ? "zero_on_diameter"
                                                                            : "reference_shoulder");
    o.str("roughing",
          pl.roughing == PlanningOptions::Roughing::Compound ? "compound" : "saddle_steps");
    o.len("roll_diameter", pl.rollDiameterMm);
    if (pl.trialCut)
        o.raw("trial_cut", "true");

    o.line("");
    o.line("[sim]");
    o.len("profile_step", sc.sim.profileStepMm);
    o.raw("angle_samples", std::to_string(sc.sim.angleSamples));

    const Expect& e = sc.expect;
    if (e.withinTolerance || !e.findings.empty() || e.noFindings || !e.cause.empty()) {
        o.line("");
        o.line("[expect]");
        if (e.withinTolerance)
            o.str("verdict", *e.withinTolerance ? "in_tolerance" : "out_of_tolerance");
        if (!e.findings.empty()) {
            std::string list = "[";
            for (std::size_t i = 0; i < e.findings.size(); ++i)
                list += (i ? ", " : "") + quoted(e.findings[i]);
            o.raw("findings", list + "]");
        }
        if (e.noFindings)
            o.raw("no_findings", "true");
        if (!e.cause.empty())
            o.str("cause", e.cause);
    }
    writeUncertainty(o, sc.uncertainty);
    if (!sc.gaugeBlocksMm.empty()) {
        o.line("");
        o.line("[gauge_blocks]");
        std::string list = "[";
        for (std::size_t i = 0; i < sc.gaugeBlocksMm.size(); ++i)
            list += (i ? ", " : "") + num(fromMm(sc.gaugeBlocksMm[i], u));
        o.raw("sizes", list + "]");
    }
    return o.text();
}

void writeScene(const Scene& scene, const std::string& path,
                const std::vector<std::string>& headerComments) {
    writeTextFile(path, sceneToToml(scene, headerComments));
}

} // namespace swarf::io
