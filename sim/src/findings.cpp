// Findings about the cut (see findings.h).
#include "swarf/sim/findings.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <limits>
#include <string>

namespace swarf {
namespace {

constexpr double kNone = std::numeric_limits<double>::quiet_NaN();

bool rightHanded(const ToolOutline& o) {
    return o.imaginaryTip().x() > 0;
}

double enteringAngle(const ToolOutline& o) {
    return rightHanded(o) ? o.leadingEdgeAngleRad() : kPi - o.leadingEdgeAngleRad();
}

double includedAngle(const ToolOutline& o) {
    return std::abs(o.trailingEdgeAngleRad() - o.leadingEdgeAngleRad());
}

std::string degText(double rad) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.1f°", radToDeg(rad));
    return buf;
}

std::string featureName(const Scene& s, int fi) {
    const Feature& f = s.part.features[fi];
    return f.name.empty() ? "feature " + std::to_string(fi + 1) : f.name;
}

} // namespace

double rampLimitRad(const ToolOutline& outline) {
    const double eps = includedAngle(outline);
    if (eps >= kPi - 1e-9)
        return kPi / 2; // a round insert follows any ramp
    return kPi - enteringAngle(outline) - eps - kRampClearanceRad;
}

std::vector<Finding>
findCutFindings(const Scene& scene, const ToolOutline& outline, const std::vector<ToolMove>& moves,
                const ExactSweep& sweep, const Profile& nominal,
                const std::vector<FeatureReport>& features, const std::vector<double>& dev,
                const std::vector<double>& crestDev, const std::vector<bool>& mask) {
    std::vector<Finding> out;
    const Units u = scene.units;
    const int nPass = static_cast<int>(scene.plan.passes.size());
    const Profile& g = sweep.asCut;
    const std::vector<double>& up = crestDev.size() == dev.size() ? crestDev : dev;
    auto add = [&](FindingKind kind, int pass, std::string msg, double z = kNone, double v = kNone,
                   double angle = kNone) {
        for (const Finding& f : out)
            if (f.kind == kind && f.pass == pass && kind != FindingKind::LeftOn &&
                kind != FindingKind::Overcut)
                return; // one of a kind per pass is enough
        Finding f;
        f.kind = kind;
        f.pass = pass;
        f.message = std::move(msg);
        f.zMm = z;
        f.valueMm = v;
        f.angleRad = angle;
        out.push_back(f);
    };

    // Left on and overcut, per feature.
    for (const FeatureReport& rep : features) {
        const Feature& f = scene.part.features[rep.feature];
        const double band = normalBandMm(f);
        const std::string name = featureName(scene, rep.feature);
        if (f.kind == FeatureKind::Face) {
            if (rep.maxLeftOnMm > band + 1e-9)
                add(FindingKind::LeftOn, nPass - 1,
                    name + ": " + formatLength(rep.maxLeftOnMm, u) +
                        " of metal stands beyond the face after the last pass",
                    f.zStartMm, rep.maxLeftOnMm);
            continue;
        }
        std::size_t iMax = 0, iMin = 0;
        double dMax = -1e300, dMin = 1e300;
        for (std::size_t i = 0; i < dev.size(); ++i) {
            if (!mask[i] || std::isnan(dev[i]) || featureAt(scene.part, g.zAt(i)) != rep.feature)
                continue;
            if (up[i] > dMax)
                dMax = up[i], iMax = i;
            if (dev[i] < dMin)
                dMin = dev[i], iMin = i;
        }
        if (rep.maxLeftOnMm > band + 1e-9) {
            const int m = sweep.finalMove[iMax];
            const int pass = m >= 0 ? moves[m].pass : nPass - 1;
            add(FindingKind::LeftOn, pass,
                name + ": " + formatSmallLength(rep.maxLeftOnMm, u) +
                    " left on at z = " + formatLength(g.zAt(iMax), u) +
                    " after the last pass, to the crests of the feed marks (band ±" +
                    formatSmallLength(band, u) + " normal to the surface)",
                g.zAt(iMax), rep.maxLeftOnMm);
        }
        if (rep.maxOvercutMm > band + 1e-9) {
            // The first pass after which this sample went below the band.
            int pass = nPass - 1;
            const double cosT = std::cos(f.surfaceHalfAngleRad());
            for (int p = 0; p < static_cast<int>(sweep.afterPass.size()); ++p) {
                const double d =
                    (sweep.afterPass[p].radiusMm[iMin] - nominal.radiusMm[iMin]) * cosT;
                if (d < -band - 1e-9) {
                    pass = p;
                    break;
                }
            }
            add(FindingKind::Overcut, pass,
                name + ": overcut " + formatSmallLength(rep.maxOvercutMm, u) +
                    " at z = " + formatLength(g.zAt(iMin), u) + " (band ±" +
                    formatSmallLength(band, u) + "): an overcut cannot be recut",
                g.zAt(iMin), rep.maxOvercutMm);
        }
    }

    const bool right = rightHanded(outline);
    const double rampLimit = rampLimitRad(outline);
    const double leadLimit = enteringAngle(outline) - kRampClearanceRad;
    const double kappa = enteringAngle(outline);
    const double jawZ = scene.stock.jawZMm();
    std::vector<double> passRemoved(nPass, 0.0);
    for (std::size_t k = 0; k < moves.size() && k < sweep.cuts.size(); ++k) {
        const ToolMove& m = moves[k];
        const MoveCut& c = sweep.cuts[k];
        const int p = m.pass;
        if (p >= 0 && p < nPass)
            passRemoved[p] = std::max(passRemoved[p], c.maxRemovedMm);
        const PassKind kind = p >= 0 && p < nPass ? scene.plan.passes[p].kind : PassKind::Path;
        const Eigen::Vector2d d = m.tipTo - m.tipFrom;
        const bool cuts = c.maxRemovedMm >= kAirCutMm;
        const bool plunge = std::abs(d.x()) <= 1e-9;

        if (cuts && !plunge && kind != PassKind::CrossSlide && d.y() < 0) {
            const double along = (right ? 1.0 : -1.0) * d.x();
            const double descent = -d.y();
            const double beta = std::atan2(descent, std::abs(along));
            const double limit = along >= 0 ? rampLimit : leadLimit;
            if (beta > limit) {
                add(FindingKind::Rubbing, p,
                    std::string(along >= 0 ? "the trailing edge" : "the leading edge") +
                        " rubs: the move runs in toward the axis at " + degText(beta) +
                        ", steeper than the insert can follow (" + degText(limit) +
                        " with clearance); the edge gouges the surface behind the nose",
                    c.zOfMaxRemovedMm, kNone, beta);
            }
        }
        const MoveSweep s = prepareMove(outline, m);
        if (s.zHiMm > jawZ - kJawClearanceMm) {
            add(FindingKind::JawCrash, p,
                "the insert reaches z = " + formatLength(s.zHiMm, u) + ", within " +
                    formatLength(kJawClearanceMm, u) +
                    " of the jaws' face at z = " + formatLength(jawZ, u) + ": stop the pass short",
                s.zHiMm, s.zHiMm - jawZ);
        }
        if (c.minXOverStockMm < -1e-6) {
            add(FindingKind::CrossesCentre, p,
                "the tool goes " + formatLength(-c.minXOverStockMm, u) +
                    " past the centre where there is metal",
                kNone, -c.minXOverStockMm);
        }
        if (cuts && !plunge) {
            const double engaged = c.maxThicknessNormalMm / std::max(std::sin(kappa), 0.05);
            if (engaged > scene.tool.edgeLengthMm) {
                add(FindingKind::DepthOfCut, p,
                    "depth of cut " + formatLength(c.maxThicknessNormalMm, u) + " engages " +
                        formatLength(engaged, u) + " of edge, longer than the " +
                        formatLength(scene.tool.edgeLengthMm, u) + " cutting edge",
                    c.zOfMaxRemovedMm, c.maxThicknessNormalMm);
            }
        }
    }
    for (int p = 0; p < nPass; ++p) {
        const Pass& ps = scene.plan.passes[p];
        std::vector<double> readings;
        if (ps.kind == PassKind::Compound) {
            readings = {ps.fromMm, ps.toMm};
        } else if (ps.kind != PassKind::Path) {
            readings = {ps.compoundMm};
        }
        for (double rd : readings) {
            if (std::abs(rd) > scene.setup.compound.travelMm + 1e-9) {
                add(FindingKind::CompoundTravel, p,
                    "compound reading " + formatLength(rd, u) + " is beyond its travel of ±" +
                        formatLength(scene.setup.compound.travelMm, u),
                    kNone, std::abs(rd));
            }
        }
        if (passRemoved[p] < kAirCutMm) {
            add(FindingKind::AirCut, p,
                "the pass cuts only air (removes less than " + formatSmallLength(kAirCutMm, u) +
                    " anywhere); a spring pass only helps where the work sprang away, which this "
                    "simulation does not model");
        }
    }
    std::stable_sort(out.begin(), out.end(),
                     [](const Finding& a, const Finding& b) { return a.pass < b.pass; });
    return out;
}

} // namespace swarf
