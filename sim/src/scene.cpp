// Scene geometry helpers and the format-independent checks of a scene.
#include "swarf/sim/scene.h"

#include "swarf/sim/machine.h"

#include "swarf/sim/inside_work.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <utility>

namespace swarf {

const char* passKindName(PassKind kind) {
    switch (kind) {
    case PassKind::Compound:
        return "compound";
    case PassKind::Saddle:
        return "saddle";
    case PassKind::CrossSlide:
        return "cross-slide";
    case PassKind::Path:
        return "path";
    }
    return "?";
}

const char* passKindKey(PassKind kind) {
    return kind == PassKind::CrossSlide ? "cross" : passKindName(kind);
}

const char* sideName(Side side) {
    return side == Side::Inside ? "inside" : "outside";
}

const char* featureKindName(FeatureKind kind) {
    switch (kind) {
    case FeatureKind::Cylinder:
        return "cylinder";
    case FeatureKind::Cone:
        return "cone";
    case FeatureKind::Chamfer:
        return "chamfer";
    case FeatureKind::Face:
        return "face";
    }
    return "?";
}

double Feature::radiusAt(double zMm) const {
    switch (kind) {
    case FeatureKind::Cone:
    case FeatureKind::Chamfer:
        return cone.diameterAt(zMm) / 2.0;
    case FeatureKind::Cylinder:
    case FeatureKind::Face:
        return diameterMm / 2.0;
    }
    return diameterMm / 2.0;
}

double Feature::surfaceHalfAngleRad() const {
    switch (kind) {
    case FeatureKind::Cone:
    case FeatureKind::Chamfer:
        return cone.halfAngleRad;
    case FeatureKind::Face:
        return kPi / 2.0;
    case FeatureKind::Cylinder:
        return 0.0;
    }
    return 0.0;
}

int Part::radialFeatureAt(double zMm) const {
    return radialFeatureOnSide(zMm, Side::Outside);
}

int Part::radialFeatureOnSide(double zMm, Side side) const {
    constexpr double eps = 1e-9;
    int best = -1;
    double bestR = -1;
    for (std::size_t i = 0; i < features.size(); ++i) {
        const Feature& f = features[i];
        if (f.side != side || f.kind == FeatureKind::Face || zMm < f.zStartMm - eps ||
            zMm > f.zEndMm + eps)
            continue;
        const double r = f.radiusAt(std::clamp(zMm, f.zStartMm, f.zEndMm));
        const bool better = best < 0 || (side == Side::Outside ? r > bestR : r < bestR);
        if (better) {
            bestR = r;
            best = static_cast<int>(i);
        }
    }
    return best;
}

bool Part::hasInside() const {
    return std::any_of(features.begin(), features.end(),
                       [](const Feature& f) { return f.side == Side::Inside; });
}

std::optional<double> Part::nominalRadiusAt(double zMm) const {
    const int i = radialFeatureAt(zMm);
    if (i < 0)
        return std::nullopt;
    const Feature& f = features[static_cast<std::size_t>(i)];
    return f.radiusAt(std::clamp(zMm, f.zStartMm, f.zEndMm));
}

const Feature* Part::mainCone() const {
    for (const Feature& f : features)
        if (f.kind == FeatureKind::Cone && f.side == Side::Outside)
            return &f;
    return nullptr;
}

const Feature* Part::mainInsideCone() const {
    for (const Feature& f : features)
        if (f.kind == FeatureKind::Cone && f.side == Side::Inside)
            return &f;
    return nullptr;
}

double Part::zMinMm() const {
    double z = features.empty() ? 0.0 : features.front().zStartMm;
    for (const Feature& f : features)
        z = std::min(z, f.zStartMm);
    return z;
}

double Part::zMaxMm() const {
    double z = features.empty() ? 0.0 : features.front().zEndMm;
    for (const Feature& f : features)
        z = std::max(z, f.zEndMm);
    return z;
}

double Setup::compoundAxisAngleRad() const {
    // A scale graduated from the cross-slide reads ψ = 90° − θ.
    const double intended = compoundScale == CompoundScale::FromAxis
                                ? compoundReadingRad
                                : kPi / 2.0 - compoundReadingRad;
    return intended + compoundErrorRad;
}

namespace {

// Throws InputError at `where` for `key` when ok is false; values shown in the scene's units.
struct Checker {
    Units units;
    void len(bool ok, const SourceLoc& where, const std::string& key, double mm,
             const std::string& expected) const {
        if (ok)
            return;
        char buf[64];
        std::snprintf(buf, sizeof buf, "%.6g", fromMm(mm, units));
        throw InputError(where, key, buf, expected);
    }
    void num(bool ok, const SourceLoc& where, const std::string& key, double v,
             const std::string& expected) const {
        if (ok)
            return;
        char buf[64];
        std::snprintf(buf, sizeof buf, "%.6g", v);
        throw InputError(where, key, buf, expected);
    }
    void deg(bool ok, const SourceLoc& where, const std::string& key, double rad,
             const std::string& expected) const {
        num(ok, where, key, radToDeg(rad), expected);
    }
};

void checkSlide(const Checker& c, const SourceLoc& w, const std::string& name, const Slide& s) {
    c.len(s.mmPerDivision > 0, w, name + ".per_division", s.mmPerDivision, "expected more than 0");
    c.num(s.divisionsPerTurn > 0, w, name + ".divisions", s.divisionsPerTurn,
          "expected more than 0");
    c.len(s.backlashMm >= 0, w, name + ".backlash", s.backlashMm, "expected 0 or more");
    c.len(s.travelMm > 0, w, name + ".travel", s.travelMm, "expected more than 0");
}

} // namespace

void Scene::validate() const {
    const Checker c{units};
    const std::string u = unitName(units);

    const SourceLoc& sw = stock.where;
    c.len(stock.diameterMm > 0, sw, "stock.diameter", stock.diameterMm, "expected more than 0");
    c.len(stock.lengthMm > 0, sw, "stock.length", stock.lengthMm, "expected more than 0");
    c.len(stock.stickOutMm > 0 && stock.stickOutMm <= stock.lengthMm + 1e-9, sw, "stock.stick_out",
          stock.stickOutMm, "expected more than 0 and at most the bar length");
    c.len(stock.faceAllowanceMm >= 0 && stock.faceAllowanceMm < stock.stickOutMm, sw,
          "stock.face_allowance", stock.faceAllowanceMm,
          "expected 0 or more, less than the stick-out");

    c.num(!part.features.empty(), part.where, "part.feature", 0, "expected at least one feature");
    for (std::size_t i = 0; i < part.features.size(); ++i) {
        const Feature& f = part.features[i];
        const std::string k = "part.feature[" + std::to_string(i + 1) + "]";
        const SourceLoc& w = f.where;
        const bool face = f.kind == FeatureKind::Face;
        c.len(f.zStartMm >= -1e-9, w, k + ".from", f.zStartMm,
              "expected 0 or more (from the datum face)");
        c.len(face ? f.zEndMm == f.zStartMm : f.zEndMm > f.zStartMm, w, k + ".to", f.zEndMm,
              "expected more than from");
        // In order along the axis, not overlapping, on each side: an inside feature lies under
        // the outside ones.
        for (std::size_t j = i; j-- > 0;) {
            if (part.features[j].side != f.side)
                continue;
            c.len(f.zStartMm >= part.features[j].zEndMm - 1e-9, w, k + ".from", f.zStartMm,
                  "expected features in order along the axis, not overlapping");
            break;
        }
        c.len(f.zEndMm <= stock.jawZMm() + 1e-9, sw, "stock.stick_out", stock.stickOutMm,
              "expected the part to end outside the jaws: " + k + " ends past them");
        c.len(f.toleranceMm > 0, w, k + ".tolerance", f.toleranceMm, "expected more than 0");
        if (f.kind == FeatureKind::Cone || f.kind == FeatureKind::Chamfer) {
            const Cone& cone = f.cone;
            c.deg(cone.halfAngleRad > 0 && cone.halfAngleRad < kPi / 2, w, k + ".half_angle",
                  cone.halfAngleRad, "expected more than 0 and less than 90 degrees");
            c.len(cone.gaugeDiameterMm > 0, w, k + ".gauge_diameter", cone.gaugeDiameterMm,
                  "expected more than 0");
            c.deg(f.angleToleranceRad > 0, w, k + ".angle_tolerance", f.angleToleranceRad,
                  "expected more than 0");
            if (f.kind == FeatureKind::Cone)
                c.len(cone.gaugeZMm >= f.zStartMm - 1e-9 && cone.gaugeZMm <= f.zEndMm + 1e-9, w,
                      k + ".gauge_plane", cone.gaugeZMm,
                      "expected a plane within the cone's from and to");
            const double dMin = std::min(cone.diameterAt(f.zStartMm), cone.diameterAt(f.zEndMm));
            const double dMax = std::max(cone.diameterAt(f.zStartMm), cone.diameterAt(f.zEndMm));
            c.len(dMin > 0, w, k + ".from", f.zStartMm,
                  "expected the cone to keep a diameter over its length");
            c.len(dMax <= stock.diameterMm + 1e-9, w, k, dMax,
                  "expected the part no larger than the bar (" + u + ")");
        } else {
            c.len(f.diameterMm > 0, w, k + ".diameter", f.diameterMm, "expected more than 0");
            c.len(f.diameterMm <= stock.diameterMm + 1e-9, w, k + ".diameter", f.diameterMm,
                  "expected the part no larger than the bar");
        }
    }

    const SourceLoc& tw = tool.where;
    const bool round = tool.shape == 'R';
    c.deg(tool.includedAngleRad > 0 && tool.includedAngleRad <= kPi, tw, "tool.included_angle",
          tool.includedAngleRad, "expected more than 0 and at most 180 degrees");
    c.len(tool.noseRadiusMm > 0, tw, "tool.nose_radius", tool.noseRadiusMm, "expected more than 0");
    c.len(tool.edgeLengthMm > 0 && tool.noseRadiusMm <= tool.edgeLengthMm, tw, "tool.edge_length",
          tool.edgeLengthMm, "expected more than 0 and at least the nose radius");
    c.deg(tool.enteringAngleRad > 0 && tool.enteringAngleRad < kPi, tw, "tool.entering_angle",
          tool.enteringAngleRad, "expected more than 0 and less than 180 degrees");
    if (!round)
        c.deg(tool.enteringAngleRad + tool.includedAngleRad < kPi, tw, "tool.entering_angle",
              tool.enteringAngleRad, "expected entering angle + insert angle below 180 degrees");
    c.len(tool.thicknessMm > 0, tw, "tool.thickness", tool.thicknessMm, "expected more than 0");
    c.len(std::fabs(tool.tipHeightMm) < stock.diameterMm / 2, tw, "tool.tip_height",
          tool.tipHeightMm, "expected less than the bar radius off centre");

    const SourceLoc& uw = setup.where;
    const double alpha = setup.compoundAxisAngleRad();
    c.deg(alpha >= 0 && alpha < kPi / 2, uw, "setup.compound.angle", alpha,
          "expected a true compound angle from 0 to less than 90 degrees from the spindle axis");
    checkSlide(c, uw, "setup.compound", setup.compound);
    checkSlide(c, uw, "setup.cross", setup.cross);
    checkSlide(c, uw, "setup.saddle", setup.saddle);
    c.len(setup.zeroDiameterMm >= 0, uw, "setup.cross.zero_diameter", setup.zeroDiameterMm,
          "expected 0 or more");
    c.num(setup.windBackTurns > 0 && setup.windBackTurns <= 10, uw, "setup.wind_back",
          setup.windBackTurns, "expected more than 0 and at most 10 turns");
    if (setup.approach == Approach::TakeUp) {
        // Winding back less than the backlash would not take it up.
        for (const auto& [slideName, sl] :
             {std::pair<const char*, const Slide*>{"compound", &setup.compound},
              {"saddle", &setup.saddle}})
            c.num(setup.windBackTurns * sl->mmPerDivision * sl->divisionsPerTurn > sl->backlashMm,
                  uw, "setup.wind_back", setup.windBackTurns,
                  std::string("expected a wind-back longer than the ") + slideName +
                      "'s backlash, or it is not taken up");
    }

    if (plan.passes.size() > kMaxPasses)
        throw InputError(
            plan.passes[kMaxPasses].where, "plan.pass[" + std::to_string(kMaxPasses + 1) + "]", "",
            "expected at most " + std::to_string(kMaxPasses) + " passes in a plan (this one has " +
                std::to_string(plan.passes.size()) + "): split the job into scenes");
    for (std::size_t i = 0; i < plan.passes.size(); ++i) {
        const Pass& p = plan.passes[i];
        const std::string k = "plan.pass[" + std::to_string(i + 1) + "]";
        c.len(p.feedMmPerRev > 0, p.where, k + ".feed", p.feedMmPerRev, "expected more than 0");
        if (p.kind == PassKind::Path) {
            c.num(p.pathZX.size() >= 2, p.where, k + ".points",
                  static_cast<double>(p.pathZX.size()), "expected at least two points");
            if (p.pathZX.size() > kMaxPathPoints)
                throw InputError(p.where, k + ".points", "",
                                 "expected at most " + std::to_string(kMaxPathPoints) +
                                     " points in a path pass (this one has " +
                                     std::to_string(p.pathZX.size()) + "): split it into passes");
            for (const auto& [z, x] : p.pathZX)
                c.len(x >= 0, p.where, k + ".points", 2 * x, "expected diameters of 0 or more");
        } else {
            c.len(p.toMm != p.fromMm, p.where, k + ".to", p.toMm,
                  "expected a reading other than from");
            if (p.compoundAngleRad || p.compoundErrorRad) {
                Setup ps = setup;
                if (p.compoundAngleRad)
                    ps.compoundReadingRad = *p.compoundAngleRad;
                if (p.compoundErrorRad)
                    ps.compoundErrorRad = *p.compoundErrorRad;
                c.deg(std::fabs(ps.compoundErrorRad) < degToRad(5), p.where, k + ".compound_error",
                      ps.compoundErrorRad, "expected less than 5 degrees either way");
                const double a = ps.compoundAxisAngleRad();
                c.deg(a >= 0 && a < kPi / 2, p.where, k + ".compound_angle", a,
                      "expected a true compound angle from 0 to less than 90 degrees from the "
                      "spindle axis");
            }
            if (p.retractToMm) {
                // Backed out (a boring bar: off the wall) from the pass's end and the next start.
                const RetractLimit lim = retractLimit(plan, i, tool.kind == ToolKind::BoringBar);
                char buf[64];
                std::snprintf(buf, sizeof buf, "%.6g", fromMm(lim.limitMm, units));
                c.len(lim.allows(*p.retractToMm), p.where, k + ".retract_to", *p.retractToMm,
                      lim.expected(std::string(buf) + " " + u));
            }
        }
    }

    const SourceLoc& pw = planning.where;
    c.len(planning.maxDepthMm >= kMinMaxDepthMm - 1e-12, pw, "planning.max_depth",
          planning.maxDepthMm, "expected at least 0.01 mm");
    c.len(planning.finishAllowanceMm >= 0 && planning.finishAllowanceMm < planning.maxDepthMm, pw,
          "planning.finish_allowance", planning.finishAllowanceMm,
          "expected 0 or more, less than max_depth");
    c.len(planning.roughFeedMmPerRev > 0, pw, "planning.rough_feed", planning.roughFeedMmPerRev,
          "expected more than 0");
    c.len(planning.finishFeedMmPerRev > 0, pw, "planning.finish_feed", planning.finishFeedMmPerRev,
          "expected more than 0");
    c.len(planning.rollDiameterMm >= 0, pw, "planning.roll_diameter", planning.rollDiameterMm,
          "expected 0 or more");

    c.len(sim.profileStepMm > 0, {file, 0, 0}, "sim.profile_step", sim.profileStepMm,
          "expected more than 0");
    validateInsideWork(*this);

    c.num(sim.angleSamples >= 8, {file, 0, 0}, "sim.angle_samples", sim.angleSamples,
          "expected 8 or more");
    c.num(!(expect.noFindings && !expect.findings.empty()), expect.where, "expect.no_findings", 1,
          "expected false when findings are listed");
    for (double b : gaugeBlocksMm)
        c.len(b > 0, {file, 0, 0}, "gauge_blocks.sizes", b, "expected block sizes more than 0");
}

} // namespace swarf
