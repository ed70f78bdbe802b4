// Two results of the same job side by side (see twin_difference.h).
#include "swarf/sim/twin_difference.h"

#include "swarf/sim/units.h"

#include <cmath>

namespace swarf {

std::optional<MainConeFigures> mainConeFigures(const Scene& scene, const CutResult& result) {
    const Feature* cone = scene.part.mainCone();
    if (!cone)
        return std::nullopt;
    const auto index = static_cast<int>(cone - scene.part.features.data());
    for (const FeatureReport& fr : result.features)
        if (fr.feature == index)
            return MainConeFigures{fr.asCutHalfAngleRad, cone->cone.halfAngleRad,
                                   fr.withinTolerance};
    return std::nullopt;
}

TwinDifference twinDifference(const Scene& scene, const CutResult& result, const Scene& twin,
                              const CutResult& twinResult) {
    TwinDifference d;
    d.gaugeDiameterThisMm = result.gaugeAsCutDiameterMm;
    d.gaugeDiameterTwinMm = twinResult.gaugeAsCutDiameterMm;
    d.gaugeDiameterChangeMm = d.gaugeDiameterThisMm - d.gaugeDiameterTwinMm;
    d.sameGaugePlane = std::abs(result.gaugeZMm - twinResult.gaugeZMm) < 1e-6;
    d.coneThis = mainConeFigures(scene, result);
    d.coneTwin = mainConeFigures(twin, twinResult);
    if (d.coneThis && d.coneTwin)
        d.halfAngleChangeRad = d.coneThis->halfAngleRad - d.coneTwin->halfAngleRad;
    d.withinThis = result.withinTolerance;
    d.withinTwin = twinResult.withinTolerance;
    return d;
}

std::string formatDiameterChange(double mm, Units units) {
    return (mm >= 0 ? "+" : "−") + formatSmallLength(std::abs(mm), units);
}

std::string formatAngleChange(double rad) {
    return (rad >= 0 ? "+" : "−") + formatDms(std::abs(rad));
}

std::string twinDifferenceText(const Scene& scene, const TwinDifference& d,
                               const std::string& heading, const std::string& thisWord,
                               const std::string& twinWord) {
    const Units u = scene.units;
    std::string t = heading + "\n";
    t += "gauge diameter: " + thisWord + " " +
         formatLength(d.gaugeDiameterThisMm, u, Precision::Fine) + ", " + twinWord + " " +
         formatLength(d.gaugeDiameterTwinMm, u, Precision::Fine) + ", difference " +
         formatDiameterChange(d.gaugeDiameterChangeMm, u);
    if (!d.sameGaugePlane)
        t += " (not at the same gauge plane)";
    t += "\n";
    if (d.halfAngleChangeRad)
        t += "half angle: " + thisWord + " " + formatDms(d.coneThis->halfAngleRad) + ", " +
             twinWord + " " + formatDms(d.coneTwin->halfAngleRad) + ", difference " +
             formatAngleChange(*d.halfAngleChangeRad) + "\n";
    else
        t += "half angle: no cone to compare in both drawings\n";
    t += "verdict: " + thisWord + " " + verdictWords(d.withinThis) + ", " + twinWord + " " +
         verdictWords(d.withinTwin);
    return t;
}

} // namespace swarf
