// A result's headline figures (see result_figures.h).
#include "swarf/sim/result_figures.h"

#include <cmath>

namespace swarf {

ResultFigures resultFigures(const Scene& scene, const CutResult& r) {
    const Units u = scene.units;
    ResultFigures f;
    f.within = r.withinTolerance;
    f.gaugePlane = formatLength(r.gaugeZMm, u);
    f.gaugeAsCut = formatLength(r.gaugeAsCutDiameterMm, u, Precision::Fine);
    f.gaugeDrawing = formatLength(r.gaugeNominalDiameterMm, u, Precision::Fine);
    const double err = r.gaugeAsCutDiameterMm - r.gaugeNominalDiameterMm;
    f.gaugeError = (err >= 0 ? "+" : "−") + formatSmallLength(std::abs(err), u);
    f.leftOn = formatSmallLength(r.maxLeftOnMm, u);
    f.overcut = formatSmallLength(r.maxOvercutMm, u);
    f.rt = formatRoughness(r.rtUm, u);
    f.ra = formatRoughness(r.raUm, u);
    for (const FeatureReport& fr : r.features) {
        if (fr.feature < 0 || static_cast<std::size_t>(fr.feature) >= scene.part.features.size())
            continue;
        const Feature& ft = scene.part.features[static_cast<std::size_t>(fr.feature)];
        FeatureFigures ff;
        ff.name = ft.name.empty() ? "feature " + std::to_string(fr.feature + 1) : ft.name;
        ff.within = fr.withinTolerance;
        ff.leftOn = formatSmallLength(fr.maxLeftOnMm, u);
        ff.overcut = formatSmallLength(fr.maxOvercutMm, u);
        if (ft.kind == FeatureKind::Cone || ft.kind == FeatureKind::Chamfer) {
            ff.halfAngle = formatDms(fr.asCutHalfAngleRad);
            ff.drawnAngle = formatDms(ft.cone.halfAngleRad);
        }
        f.features.push_back(ff);
    }
    return f;
}

} // namespace swarf
