#pragma once
// Made-up scenes and hand-built results for the viewer tests: a 1:10 cone cut in a few compound
// passes, with the as-cut profile chosen by the test (left on, within tolerance, ...). Invented
// numbers (demo values), not published ones.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <cmath>
#include <functional>
#include <limits>

namespace swarf::test {

inline Scene syntheticScene(int passes = 3) {
    Scene s;
    s.name = "synthetic cone";
    s.units = Units::Mm;
    s.stock.diameterMm = 30;
    s.stock.lengthMm = 100;
    s.stock.stickOutMm = 60;
    s.stock.faceAllowanceMm = 1;
    s.stock.material = "free-cutting steel";
    Feature cone;
    cone.kind = FeatureKind::Cone;
    cone.name = "cone";
    cone.zStartMm = 0;
    cone.zEndMm = 40;
    cone.cone.gaugeZMm = 0;
    cone.cone.gaugeDiameterMm = 20;
    cone.cone.halfAngleRad = std::atan(0.05); // 1:10 on diameter
    cone.cone.widens = Widens::TowardChuck;
    cone.toleranceMm = 0.05;
    s.part.features.push_back(cone);
    s.tool.shape = 'D';
    s.tool.includedAngleRad = degToRad(55);
    s.tool.noseRadiusMm = 0.4;
    s.tool.enteringAngleRad = degToRad(93);
    s.tool.hand = Hand::R;
    s.tool.edgeLengthMm = 15;
    s.tool.thicknessMm = 4.76;
    s.setup.zeroDiameterMm = 30;
    for (int k = 0; k < passes; ++k) {
        Pass p;
        p.kind = PassKind::Compound;
        p.note = "Pass " + std::to_string(k + 1) + ": wind the compound in";
        p.crossMm = 2.0 * k;
        p.fromMm = 0;
        p.toMm = 40;
        p.feedMmPerRev = 0.1;
        s.plan.passes.push_back(p);
    }
    return s;
}

/// Nominal radius of the synthetic cone, mm (NaN off the cone).
inline double syntheticNominal(double z) {
    if (z < 0 || z > 40)
        return std::numeric_limits<double>::quiet_NaN();
    return 10 + 0.05 * z;
}

/// A result on a 0.01 mm grid from z = −1 to 60: after pass k (0-based) of n the cone is
/// `leftOnAfter(k)` mm (radially) above the drawing; the final deviation adds `ripple(z)`.
inline CutResult syntheticResult(const Scene& s, const std::function<double(int)>& leftOnAfter,
                                 const std::function<double(double)>& ripple = {}) {
    CutResult r;
    const int n = static_cast<int>(s.plan.passes.size());
    auto grid = [](Profile& p) {
        p.z0Mm = -1;
        p.dzMm = 0.01;
        p.radiusMm.assign(6101, 0);
    };
    grid(r.stock);
    grid(r.nominal);
    for (std::size_t i = 0; i < r.stock.radiusMm.size(); ++i) {
        r.stock.radiusMm[i] = 15;
        r.nominal.radiusMm[i] = syntheticNominal(r.stock.zAt(i));
    }
    for (int k = 0; k < n; ++k) {
        Profile p = r.stock;
        for (std::size_t i = 0; i < p.radiusMm.size(); ++i) {
            const double z = p.zAt(i);
            if (z < 0 || z > 40)
                continue;
            double rr = syntheticNominal(z) + leftOnAfter(k);
            if (k == n - 1 && ripple)
                rr += ripple(z);
            p.radiusMm[i] = std::min(15.0, rr);
        }
        r.afterPass.push_back(p);
        // One compound move along the cone per pass, ending on its surface plus the depth left.
        ToolMove m;
        m.pass = k;
        m.tipFrom = {0, 10 + leftOnAfter(k)};
        m.tipTo = {40, 12 + leftOnAfter(k)};
        m.crossFrom = m.crossTo = 2.0 * k;
        m.compoundFrom = 0;
        m.compoundTo = 40;
        m.feedMmPerRev = 0.1;
        r.moves.push_back(m);
    }
    r.asCut = r.afterPass.back();
    r.deviationMm.resize(r.asCut.radiusMm.size());
    const double cosA = std::cos(std::atan(0.05));
    for (std::size_t i = 0; i < r.asCut.radiusMm.size(); ++i) {
        const double rn = r.nominal.radiusMm[i];
        r.deviationMm[i] = std::isnan(rn) ? rn : (r.asCut.radiusMm[i] - rn) * cosA;
    }
    double worstLeft = 0, worstOver = 0;
    for (double d : r.deviationMm)
        if (!std::isnan(d)) {
            worstLeft = std::max(worstLeft, d);
            worstOver = std::max(worstOver, -d);
        }
    r.maxLeftOnMm = worstLeft;
    r.maxOvercutMm = worstOver;
    r.withinTolerance = worstLeft < 0.025 && worstOver < 0.025;
    if (!r.withinTolerance) {
        Finding f;
        f.kind = FindingKind::LeftOn;
        f.pass = n - 1;
        f.message = "metal left on the cone";
        f.valueMm = worstLeft;
        r.findings.push_back(f);
    }
    r.gaugeZMm = 0;
    r.gaugeNominalDiameterMm = 20;
    r.gaugeAsCutDiameterMm = 2 * r.asCut.radiusMm[100]; // z = 0
    return r;
}

} // namespace swarf::test
