// Findings of a boring bar in its hole (boring_findings.h).
#include "swarf/sim/boring_findings.h"

#include "swarf/sim/bore_sweep.h"
#include "swarf/sim/boring_checks.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/inside_work.h"
#include "swarf/sim/sweep.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <cstdio>
#include <limits>
#include <string>

namespace swarf {
namespace {

bool hasKind(const std::vector<Finding>& out, FindingKind kind, int pass) {
    return std::any_of(out.begin(), out.end(),
                       [&](const Finding& f) { return f.kind == kind && f.pass == pass; });
}

Finding make(FindingKind kind, int pass, std::string message, double zMm, double valueMm) {
    Finding f;
    f.kind = kind;
    f.pass = pass;
    f.message = std::move(message);
    f.zMm = zMm;
    f.valueMm = valueMm;
    return f;
}

// The smallest radius of the hole as it stands from the free end to z (samples in the hole
// only); +inf if none.
std::pair<double, double> narrowestUpTo(const Scene& scene, const Profile& bore, double zMm) {
    double least = std::numeric_limits<double>::infinity(), where = zMm;
    for (std::size_t i = 0; i < bore.radiusMm.size(); ++i) {
        const double z = bore.zAt(i);
        if (z < scene.stock.freeEndZMm())
            continue;
        if (z > zMm)
            break;
        const double r = bore.radiusMm[i];
        if (r > 0 && r < least)
            least = r, where = z;
    }
    return {least, where};
}

std::string diametersText(double n) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.1f", n);
    return buf;
}

std::string featureName(const Scene& s, int fi) {
    const Feature& f = s.part.features[static_cast<std::size_t>(fi)];
    return f.name.empty() ? "feature " + std::to_string(fi + 1) : f.name;
}

} // namespace

std::vector<Finding> boringFindings(const Scene& scene, const ToolOutline& outline,
                                    const std::vector<ToolMove>& moves, const Profile& boreStock,
                                    const std::vector<Profile>& boreAfterPass) {
    assert(scene.tool.kind == ToolKind::BoringBar);
    const Tool& tool = scene.tool;
    const Units u = scene.units;
    std::vector<Finding> out;
    if (tool.overhangMm > kSteelBarOverhangDiameters * tool.barDiameterMm) {
        out.push_back(
            make(FindingKind::LongOverhang, -1,
                 "the bar overhangs " + formatLength(tool.overhangMm, u) + ", " +
                     diametersText(tool.overhangMm / tool.barDiameterMm) + " bar diameters of " +
                     formatLength(tool.barDiameterMm, u) +
                     ": a steel bar chatters past about 4 (common practice); shorten it, or use a "
                     "carbide or damped bar (the simulation does not model chatter)",
                 std::numeric_limits<double>::quiet_NaN(), tool.overhangMm));
    }
    const int nPass = static_cast<int>(scene.plan.passes.size());
    const Stock& st = scene.stock;
    for (const ToolMove& m : moves) {
        const int p = m.pass;
        if (p < 0 || p >= nPass)
            continue;
        const Profile& before = p == 0 || boreAfterPass.size() < static_cast<std::size_t>(p)
                                    ? boreStock
                                    : boreAfterPass[static_cast<std::size_t>(p - 1)];
        const Profile& after = boreAfterPass.size() > static_cast<std::size_t>(p)
                                   ? boreAfterPass[static_cast<std::size_t>(p)]
                                   : before;
        // The insert's deepest reach, into the chuck side (the mirror of the outside sweep).
        const MoveSweep s = prepareMove(outline, mirroredMove(m));
        if (st.hasBore() && !st.boreThrough() && s.zHiMm > st.boreBottomZMm() + 1e-6 &&
            !hasKind(out, FindingKind::PastBoreBottom, p)) {
            const double past = s.zHiMm - st.boreBottomZMm();
            out.push_back(make(FindingKind::PastBoreBottom, p,
                               "the insert reaches z = " + formatLength(s.zHiMm, u) + ", " +
                                   formatLength(past, u) + " past the bottom of the hole at z = " +
                                   formatLength(st.boreBottomZMm(), u) +
                                   ": it runs into solid metal; stop the pass short of the bottom",
                               s.zHiMm, past));
        }
        const std::pair<const Eigen::Vector2d*, const Profile*> ends[] = {{&m.tipFrom, &before},
                                                                          {&m.tipTo, &after}};
        for (const auto& [tip, bore] : ends) {
            const double tipZ = tip->x(), tipX = tip->y();
            const auto [narrowR, narrowZ] = narrowestUpTo(scene, *bore, tipZ);
            if (std::isfinite(narrowR) && 2.0 * narrowR < tool.minBoreMm - 1e-9) {
                if (!hasKind(out, FindingKind::BarTooBig, p))
                    out.push_back(make(
                        FindingKind::BarTooBig, p,
                        "the hole measures " + formatLength(2.0 * narrowR, u) +
                            " at z = " + formatLength(narrowZ, u) +
                            " as it stands, less than the " + formatLength(tool.minBoreMm, u) +
                            " the bar enters (min_bore): open it first with a smaller bar or a "
                            "drill",
                        narrowZ, tool.minBoreMm - 2.0 * narrowR));
                continue;
            }
            const BarClearance c = barClearanceAlongBore(scene, *bore, tipZ, tipX);
            if (std::isfinite(c.clearanceMm) && c.clearanceMm < -1e-6 &&
                !hasKind(out, FindingKind::BarRubsBore, p)) {
                out.push_back(make(FindingKind::BarRubsBore, p,
                                   "the bar's shank behind the insert is " +
                                       formatSmallLength(-c.clearanceMm, u) +
                                       " into the bore wall at z = " + formatLength(c.zMm, u) +
                                       " with the tip at diameter " + formatLength(2.0 * tipX, u) +
                                       " (no clearance left: it rubs); a smaller bar, or keep the "
                                       "tip further from the far wall",
                                   c.zMm, -c.clearanceMm));
            }
        }
    }
    std::stable_sort(out.begin(), out.end(),
                     [](const Finding& a, const Finding& b) { return a.pass < b.pass; });
    return out;
}

std::vector<Finding>
sideToleranceFindings(const Scene& scene, Side side, const Profile& profile, const Profile& nominal,
                      const std::vector<double>& dev, const std::vector<double>& crestDev,
                      const std::vector<bool>& mask, const std::vector<FeatureReport>& reports,
                      const std::vector<int>& finalMove, const std::vector<ToolMove>& moves,
                      const std::vector<Profile>& afterPass) {
    std::vector<Finding> out;
    const Units u = scene.units;
    const int nPass = static_cast<int>(scene.plan.passes.size());
    const std::vector<double>& up = crestDev.size() == dev.size() ? crestDev : dev;
    const double leftOnSign = side == Side::Outside ? 1.0 : -1.0;
    const std::string where = side == Side::Inside ? " (the bore smaller than drawn: a plug gauge "
                                                     "goes in short)"
                                                   : "";
    for (const FeatureReport& rep : reports) {
        const Feature& f = scene.part.features[static_cast<std::size_t>(rep.feature)];
        if (f.side != side || f.kind == FeatureKind::Face)
            continue;
        const double band = normalBandMm(f);
        const std::string name = featureName(scene, rep.feature);
        std::size_t iMax = 0, iMin = 0;
        double dMax = -1e300, dMin = 1e300;
        for (std::size_t i = 0; i < dev.size(); ++i) {
            if (!mask[i] || std::isnan(dev[i]) ||
                scene.part.radialFeatureOnSide(profile.zAt(i), side) != rep.feature)
                continue;
            if (up[i] > dMax)
                dMax = up[i], iMax = i;
            if (dev[i] < dMin)
                dMin = dev[i], iMin = i;
        }
        if (rep.maxLeftOnMm > band + 1e-9) {
            const int m = iMax < finalMove.size() ? finalMove[iMax] : -1;
            const int pass = m >= 0 ? moves[static_cast<std::size_t>(m)].pass : nPass - 1;
            out.push_back(make(FindingKind::LeftOn, pass,
                               name + ": " + formatSmallLength(rep.maxLeftOnMm, u) +
                                   " left on at z = " + formatLength(profile.zAt(iMax), u) +
                                   " after the last pass, to the crests of the feed marks (band ±" +
                                   formatSmallLength(band, u) + " normal to the surface)" + where,
                               profile.zAt(iMax), rep.maxLeftOnMm));
        }
        if (rep.maxOvercutMm > band + 1e-9) {
            int pass = nPass - 1;
            const double cosT = std::cos(f.surfaceHalfAngleRad());
            for (int p = 0; p < static_cast<int>(afterPass.size()); ++p) {
                const double d = leftOnSign *
                                 (afterPass[static_cast<std::size_t>(p)].radiusMm[iMin] -
                                  nominal.radiusMm[iMin]) *
                                 cosT;
                if (d < -band - 1e-9) {
                    pass = p;
                    break;
                }
            }
            out.push_back(make(FindingKind::Overcut, pass,
                               name + ": overcut " + formatSmallLength(rep.maxOvercutMm, u) +
                                   " at z = " + formatLength(profile.zAt(iMin), u) + " (band ±" +
                                   formatSmallLength(band, u) + "): an overcut cannot be recut",
                               profile.zAt(iMin), rep.maxOvercutMm));
        }
    }
    return out;
}

} // namespace swarf
