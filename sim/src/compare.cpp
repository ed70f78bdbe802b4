// The as-cut part against the drawing (see compare.h).
#include "swarf/sim/compare.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf {
namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
constexpr double kEpsZ = 1e-9;

bool isRadial(const Feature& f) {
    return f.kind != FeatureKind::Face;
}

double frustum(double a, double b, double h) {
    return kPi * h / 3.0 * (a * a + a * b + b * b);
}

// Radius of the as-cut part below which a sample counts as no metal (a facing pip), mm.
double noMetalRadiusMm(double faceRadiusMm) {
    return std::max(0.05, 0.01 * faceRadiusMm);
}

} // namespace

int featureAt(const Part& part, double zMm) {
    return part.radialFeatureAt(zMm);
}

Profile nominalOnGrid(const Part& part, const Profile& grid) {
    return nominalOnGrid(part, grid, Side::Outside);
}

Profile nominalOnGrid(const Part& part, const Profile& grid, Side side) {
    Profile n = grid;
    for (std::size_t i = 0; i < n.radiusMm.size(); ++i) {
        const double z = grid.zAt(i);
        const int fi = part.radialFeatureOnSide(z, side);
        if (fi < 0) {
            n.radiusMm[i] = kNaN;
            continue;
        }
        const Feature& f = part.features[static_cast<std::size_t>(fi)];
        n.radiusMm[i] = f.radiusAt(std::clamp(z, f.zStartMm, f.zEndMm));
    }
    return n;
}

std::vector<double> normalDeviation(const Part& part, const Profile& nominal,
                                    const Profile& asCut) {
    return normalDeviation(part, nominal, asCut, Side::Outside);
}

std::vector<double> normalDeviation(const Part& part, const Profile& nominal, const Profile& asCut,
                                    Side side) {
    // Metal left on is beyond the drawn surface outside, within the drawn bore inside.
    const double leftOnSign = side == Side::Outside ? 1.0 : -1.0;
    std::vector<double> d(asCut.radiusMm.size(), kNaN);
    for (std::size_t i = 0; i < d.size(); ++i) {
        const int f = part.radialFeatureOnSide(asCut.zAt(i), side);
        if (f < 0)
            continue;
        const double cosT = std::cos(part.features[f].surfaceHalfAngleRad());
        d[i] = leftOnSign * (asCut.radiusMm[i] - nominal.radiusMm[i]) * cosT;
    }
    return d;
}

double normalDeviationAt(const Part& part, double zMm, double radiusMm) {
    const int fi = featureAt(part, zMm);
    if (fi < 0)
        return kNaN;
    const Feature& f = part.features[static_cast<std::size_t>(fi)];
    const double rn = f.radiusAt(std::clamp(zMm, f.zStartMm, f.zEndMm));
    return (radiusMm - rn) * std::cos(f.surfaceHalfAngleRad());
}

DeviationExtremes deviationExtremes(const std::vector<double>& deviationMm) {
    DeviationExtremes e;
    for (double d : deviationMm)
        if (!std::isnan(d)) {
            e.leftOnMm = std::max(e.leftOnMm, d);
            e.overcutMm = std::max(e.overcutMm, -d);
        }
    return e;
}

DeviationExtremes deviationExtremes(const std::vector<double>& deviationMm,
                                    const std::vector<bool>& mask) {
    DeviationExtremes e;
    for (std::size_t i = 0; i < deviationMm.size() && i < mask.size(); ++i)
        if (mask[i] && !std::isnan(deviationMm[i])) {
            e.leftOnMm = std::max(e.leftOnMm, deviationMm[i]);
            e.overcutMm = std::max(e.overcutMm, -deviationMm[i]);
        }
    return e;
}

std::vector<double> markedDeviation(const std::vector<double>& valleysMm,
                                    const std::vector<double>& crestsMm) {
    if (crestsMm.size() != valleysMm.size())
        return valleysMm;
    std::vector<double> out(valleysMm.size());
    for (std::size_t i = 0; i < out.size(); ++i)
        // isgreater: NaN (off the drawing) compares false without raising FE_INVALID.
        out[i] = std::isgreater(crestsMm[i], -valleysMm[i]) ? crestsMm[i] : valleysMm[i];
    return out;
}

double normalBandMm(const Feature& f) {
    if (f.kind == FeatureKind::Face)
        return f.toleranceMm;
    return 0.5 * f.toleranceMm * std::cos(f.surfaceHalfAngleRad());
}

std::vector<InternalCorner> internalCorners(const Part& part) {
    // A radial feature's end where a neighbour stands taller.
    std::vector<InternalCorner> corners;
    for (std::size_t fi = 0; fi < part.features.size(); ++fi) {
        const Feature& f = part.features[fi];
        if (!isRadial(f))
            continue;
        for (const bool atEnd : {false, true}) {
            const double ze = atEnd ? f.zEndMm : f.zStartMm;
            const double r = f.radiusAt(ze);
            bool taller = false;
            for (const Feature& g : part.features) {
                if (&g == &f || ze < g.zStartMm - kEpsZ || ze > g.zEndMm + kEpsZ)
                    continue;
                const double rg = isRadial(g) ? g.radiusAt(ze) : 0.5 * g.diameterMm;
                taller = taller || rg > r + 1e-6;
            }
            if (!taller)
                continue;
            const double other = f.radiusAt(atEnd ? f.zStartMm : f.zEndMm);
            const double theta = f.surfaceHalfAngleRad();
            corners.push_back({static_cast<int>(fi), ze, r,
                               other < r ? kPi / 2 + theta : kPi / 2 - theta, atEnd});
        }
    }
    return corners;
}

std::vector<bool> verdictMask(const Part& part, const Profile& grid, double noseRadiusMm) {
    const std::vector<InternalCorner> corners = internalCorners(part);
    std::vector<bool> mask(grid.radiusMm.size(), true);
    for (std::size_t i = 0; i < mask.size(); ++i) {
        const double z = grid.zAt(i);
        for (const InternalCorner& c : corners) {
            if (std::abs(z - c.zMm) < noseRadiusMm)
                mask[i] = false;
        }
    }
    return mask;
}

std::vector<FeatureReport> compareFeatures(const Scene& scene, const Profile& asCut,
                                           const std::vector<double>& dev,
                                           const std::vector<double>& crestDev,
                                           const std::vector<bool>& mask, Side side) {
    const std::vector<double>& up = crestDev.size() == dev.size() ? crestDev : dev;
    const Part& part = scene.part;
    std::vector<int> owner(asCut.radiusMm.size());
    for (std::size_t i = 0; i < owner.size(); ++i)
        owner[i] = part.radialFeatureOnSide(asCut.zAt(i), side);

    std::vector<FeatureReport> out;
    for (std::size_t fi = 0; fi < part.features.size(); ++fi) {
        const Feature& f = part.features[fi];
        if (f.side != side)
            continue;
        FeatureReport rep;
        rep.feature = static_cast<int>(fi);
        const double band = normalBandMm(f);
        if (f.kind == FeatureKind::Face) {
            rep.asCutDiameterMm = f.diameterMm;
            rep.withinTolerance = true;
            if (side == Side::Inside) { // a step or the bottom of a bore: not checked
                out.push_back(rep);
                continue;
            }
            // Only the datum end face is checked: metal standing beyond it is left on.
            if (std::abs(f.zStartMm - part.zMinMm()) < kEpsZ) {
                const double thresh = noMetalRadiusMm(0.5 * f.diameterMm);
                for (std::size_t i = 0; i < asCut.radiusMm.size(); ++i) {
                    const double z = asCut.zAt(i);
                    if (z >= f.zStartMm - kEpsZ)
                        break;
                    if (asCut.radiusMm[i] > thresh) {
                        rep.maxLeftOnMm = f.zStartMm - z;
                        break;
                    }
                }
                rep.withinTolerance = rep.maxLeftOnMm <= band + 1e-9;
            }
            out.push_back(rep);
            continue;
        }
        // Samples that count; all of the feature's samples if the corners take every one.
        std::vector<std::size_t> idx;
        for (std::size_t i = 0; i < owner.size(); ++i)
            if (owner[i] == static_cast<int>(fi) && mask[i])
                idx.push_back(i);
        if (idx.empty())
            for (std::size_t i = 0; i < owner.size(); ++i)
                if (owner[i] == static_cast<int>(fi))
                    idx.push_back(i);
        double sumR = 0, sz = 0, sr = 0, szz = 0, szr = 0;
        for (std::size_t i : idx) {
            rep.maxLeftOnMm = std::max(rep.maxLeftOnMm, up[i]);
            rep.maxOvercutMm = std::max(rep.maxOvercutMm, -dev[i]);
            const double z = asCut.zAt(i), r = asCut.radiusMm[i];
            sumR += r;
            sz += z;
            sr += r;
            szz += z * z;
            szr += z * r;
        }
        const double n = static_cast<double>(idx.size());
        bool ok = rep.maxLeftOnMm <= band + 1e-9 && rep.maxOvercutMm <= band + 1e-9;
        if (f.kind == FeatureKind::Cylinder) {
            rep.asCutDiameterMm = n > 0 ? 2.0 * sumR / n : 0.0;
        } else {
            const double den = n * szz - sz * sz;
            const double slope = n > 1 && den > 0 ? (n * szr - sz * sr) / den : 0.0;
            rep.asCutHalfAngleRad = std::atan(std::abs(slope));
            rep.asCutDiameterMm = 2.0 * asCut.radiusAt(f.cone.gaugeZMm);
            if (f.angleToleranceRad > 0)
                ok = ok && std::abs(rep.asCutHalfAngleRad - f.cone.halfAngleRad) <=
                               f.angleToleranceRad + 1e-12;
            if (f.kind == FeatureKind::Cone && f.toleranceMm > 0)
                ok = ok &&
                     std::abs(rep.asCutDiameterMm - f.cone.gaugeDiameterMm) <= f.toleranceMm + 1e-9;
        }
        rep.withinTolerance = ok;
        out.push_back(rep);
    }
    return out;
}

double overcutVolumeMm3(const Profile& nominal, const Profile& asCut) {
    double v = 0;
    for (std::size_t i = 1; i < asCut.radiusMm.size(); ++i) {
        const double n0 = nominal.radiusMm[i - 1], n1 = nominal.radiusMm[i];
        if (std::isnan(n0) || std::isnan(n1))
            continue;
        const double a0 = std::min(asCut.radiusMm[i - 1], n0), a1 = std::min(asCut.radiusMm[i], n1);
        v += frustum(n0, n1, asCut.dzMm) - frustum(a0, a1, asCut.dzMm);
    }
    return v;
}

double leftoverVolumeMm3(const Profile& nominal, const Profile& asCut) {
    double v = 0;
    for (std::size_t i = 1; i < asCut.radiusMm.size(); ++i) {
        const double n0 = nominal.radiusMm[i - 1], n1 = nominal.radiusMm[i];
        if (std::isnan(n0) || std::isnan(n1))
            continue;
        const double a0 = std::max(asCut.radiusMm[i - 1], n0), a1 = std::max(asCut.radiusMm[i], n1);
        v += frustum(a0, a1, asCut.dzMm) - frustum(n0, n1, asCut.dzMm);
    }
    return v;
}

} // namespace swarf
