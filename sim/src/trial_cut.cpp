// A measured trial cut before finishing (see trial_cut.h).
#include "swarf/sim/trial_cut.h"

#include "swarf/sim/inside_kernel.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <algorithm>
#include <cmath>

namespace swarf {

double asCutOutsideDiameterMm(const Scene& scene, double zMm) {
    const ToolOutline outline(scene.tool);
    double r = 0.5 * scene.stock.diameterMm;
    for (const ToolMove& m : planMoves(scene)) {
        const MoveSweep sw = prepareMove(outline, m);
        if (zMm < sw.zLoMm || zMm > sw.zHiMm)
            continue;
        r = std::min(r, cutRadiusMm(sweptLowestX(outline, sw, zMm), scene.tool.tipHeightMm));
    }
    return 2.0 * r;
}

double asCutBoreDiameterMm(const Scene& scene, double zMm) {
    const ToolOutline outline(scene.tool);
    const double c = insideTwinOffsetMm(scene), h = scene.tool.tipHeightMm;
    const double hole = 0.5 * scene.stock.boreDiameterMm;
    double twin = c - std::sqrt(std::max(0.0, hole * hole - h * h));
    for (const ToolMove& m : planMoves(scene)) {
        const MoveSweep sw = prepareMove(outline, insideTwinMove(m, c));
        if (zMm < sw.zLoMm || zMm > sw.zHiMm)
            continue;
        twin = std::min(twin, sweptLowestX(outline, sw, zMm));
    }
    return 2.0 * boreRadiusFromTwin(twin, c, h);
}

double trialCutCorrectionMm(const Setup& setup, double offMm) {
    const double reading = setup.crossDial == DialMode::Diameter ? offMm : 0.5 * offMm;
    const double div = setup.cross.mmPerDivision;
    return div > 0 ? std::round(reading / div) * div : reading;
}

Scene afterTrialCut(const Scene& scene, const TrialCut& trial, double measurementErrorMm) {
    Scene cut = scene;
    cut.plan.passes.resize(static_cast<std::size_t>(
        std::clamp<int>(trial.trialPasses, 0, static_cast<int>(scene.plan.passes.size()))));
    // Outside a micrometer over the cone; inside an inside micrometer in the bore. Either way a
    // diameter found large takes a larger reading (outside further in, inside less far out).
    const double measured =
        (scene.tool.kind == ToolKind::BoringBar ? asCutBoreDiameterMm(cut, trial.checkZMm)
                                                : asCutOutsideDiameterMm(cut, trial.checkZMm)) +
        measurementErrorMm;
    const double change = trialCutCorrectionMm(scene.setup, measured - trial.expectedDiameterMm);
    Scene out = scene;
    for (int k : trial.finishPasses) {
        if (k < 0 || k >= static_cast<int>(out.plan.passes.size()))
            continue;
        Pass& p = out.plan.passes[static_cast<std::size_t>(k)];
        if (p.kind == PassKind::Compound || p.kind == PassKind::Saddle)
            p.crossMm += change;
    }
    return out;
}

} // namespace swarf
