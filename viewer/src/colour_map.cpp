// Deviation colours.
//
// Source of the map: K. Moreland, "Diverging Color Maps for Scientific Visualization",
// Advances in Visual Computing (ISVC 2009), LNCS 5876 — the "cool to warm" map, built here by
// VTK's diverging colour space (Moreland's Msh interpolation) between his published end points
// RGB (0.230, 0.299, 0.754) and (0.706, 0.016, 0.150).
#include "swarf/viewer/colour_map.h"

#include <vtkColorTransferFunction.h>
#include <vtkNew.h>

#include <algorithm>
#include <cmath>

namespace swarf::viewer {

namespace {

// One shared transfer function, built once (VTK objects are not thread-safe: the viewer uses
// this from the rendering thread only).
vtkColorTransferFunction* coolWarmFunction() {
    static vtkColorTransferFunction* f = [] {
        auto* ctf = vtkColorTransferFunction::New();
        ctf->SetColorSpaceToDiverging();
        ctf->AddRGBPoint(0.0, 0.230, 0.299, 0.754);
        ctf->AddRGBPoint(1.0, 0.706, 0.016, 0.150);
        ctf->Build();
        return ctf;
    }();
    return f;
}

} // namespace

Rgb coolWarm(double t) {
    double rgb[3];
    coolWarmFunction()->GetColor(std::clamp(t, 0.0, 1.0), rgb);
    return {rgb[0], rgb[1], rgb[2]};
}

double DeviationScale::toDisplay(double mm) const {
    return toSmallUnits(mm, units);
}

const char* DeviationScale::displayUnit() const {
    return smallUnitName(units);
}

double DeviationScale::mapPosition(double deviationMm) const {
    if (std::isnan(deviationMm))
        return 0.5;
    return std::clamp(0.5 + 0.5 * deviationMm / limitMm, 0.0, 1.0);
}

DeviationScale deviationScale(const Scene& scene, const CutResult& result) {
    DeviationScale s;
    s.units = scene.units;
    // The cone the tool cuts (Scene::workedCone: the bore's for a boring bar), else the first
    // feature.
    double tolMm = 0;
    double halfAngle = 0;
    if (const Feature* f = scene.workedCone()) {
        tolMm = f->toleranceMm;
        halfAngle = f->cone.halfAngleRad;
    } else if (!scene.part.features.empty()) {
        tolMm = scene.part.features.front().toleranceMm;
    }
    // ± on diameter is ± half of it on radius; normal to a surface at α it is cos α of that.
    s.bandMm = tolMm > 0 ? 0.5 * tolMm * std::cos(halfAngle) : 0.01;
    // One fixed scale from the band, whatever the result: the same colour means the same
    // deviation in every picture of this drawing, and beyond two bands the colour saturates
    // (the colour bar's end labels say "+").
    (void)result;
    s.limitMm = kScaleBands * s.bandMm;
    return s;
}

Rgb deviationColour(double deviationMm, const DeviationScale& scale) {
    return coolWarm(scale.mapPosition(deviationMm));
}

} // namespace swarf::viewer
