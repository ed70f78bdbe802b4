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
    Profile n = grid;
    for (std::size_t i = 0; i < n.radiusMm.size(); ++i)
        n.radiusMm[i] = part.nominalRadiusAt(grid.zAt(i)).value_or(kNaN);
    return n;
}

std::vector<double> normalDeviation(const Part& part, const Profile& nominal,
                                    const Profile& asCut) {
    std::vector<double> d(asCut.radiusMm.size(), kNaN);
    for (std::size_t i = 0; i < d.size(); ++i) {
        const int f = featureAt(part, asCut.zAt(i));
        if (f < 0)
            continue;
        const double cosT = std::cos(part.features[f].surfaceHalfAngleRad());
        d[i] = (asCut.radiusMm[i] - nominal.radiusMm[i]) * cosT;
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

double normalBandMm(const Feature& f) {
    if (f.kind == FeatureKind::Face)
        return f.toleranceMm;
    return 0.5 * f.toleranceMm * std::cos(f.surfaceHalfAngleRad());
}

std::vector<bool> verdictMask(const Part& part, const Profile& grid, double noseRadiusMm) {
    // Internal corners: a radial feature's end where a neighbour stands taller.
    std::vector<double> corners;
    for (const Feature& f : part.features) {
        if (!isRadial(f))
            continue;
        for (double ze : {f.zStartMm, f.zEndMm}) {
            const double r = f.radiusAt(ze);
            for (const Feature& g : part.features) {
                if (&g == &f || ze < g.zStartMm - kEpsZ || ze > g.zEndMm + kEpsZ)
                    continue;
                const double rg = isRadial(g) ? g.radiusAt(ze) : 0.5 * g.diameterMm;
                if (rg > r + 1e-6)
                    corners.push_back(ze);
            }
        }
    }
    std::vector<bool> mask(grid.radiusMm.size(), true);
    for (std::size_t i = 0; i < mask.size(); ++i) {
        const double z = grid.zAt(i);
        for (double c : corners) {
            if (std::abs(z - c) < noseRadiusMm)
                mask[i] = false;
        }
    }
    return mask;
}

std::vector<FeatureReport> compareFeatures(const Scene& scene, const Profile& asCut,
                                           const std::vector<double>& dev,
                                           const std::vector<bool>& mask) {
    const Part& part = scene.part;
    std::vector<int> owner(asCut.radiusMm.size());
    for (std::size_t i = 0; i < owner.size(); ++i)
        owner[i] = featureAt(part, asCut.zAt(i));

    std::vector<FeatureReport> out;
    for (std::size_t fi = 0; fi < part.features.size(); ++fi) {
        const Feature& f = part.features[fi];
        FeatureReport rep;
        rep.feature = static_cast<int>(fi);
        const double band = normalBandMm(f);
        if (f.kind == FeatureKind::Face) {
            rep.asCutDiameterMm = f.diameterMm;
            rep.withinTolerance = true;
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
            const double d = dev[i];
            rep.maxLeftOnMm = std::max(rep.maxLeftOnMm, d);
            rep.maxOvercutMm = std::max(rep.maxOvercutMm, -d);
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
