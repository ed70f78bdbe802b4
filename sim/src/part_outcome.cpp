// One part of a budget: the cone's gauge diameter, half angle and verdict from the exact sweep
// over the cone alone (see budget.h, partOutcome), outside or bored.
#include "swarf/sim/budget.h"

#include "swarf/sim/compare.h"
#include "swarf/sim/inside_kernel.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <algorithm>
#include <cmath>
#include <vector>

namespace swarf {

namespace {

// The cone's samples on the scene's grid (z0 at the free end, every profile_step), each the
// least of `start` and every move's swept envelope there (sweep.h) seen through `radiusOf`: so
// these samples are those sweepExact makes, without the rest of the bar.
template <class RadiusOf>
Profile sweptOverCone(const Scene& scene, const Feature& cone, const std::vector<ToolMove>& moves,
                      double start, RadiusOf radiusOf) {
    const ToolOutline outline(scene.tool);
    Profile p;
    p.dzMm = scene.sim.profileStepMm;
    const double z0 = scene.stock.freeEndZMm();
    const double first = std::ceil((cone.zStartMm - z0) / p.dzMm - 1e-9);
    const double last = std::floor((cone.zEndMm - z0) / p.dzMm + 1e-9);
    p.z0Mm = z0 + first * p.dzMm;
    const auto n = static_cast<std::size_t>(std::max(1.0, last - first + 1));
    p.radiusMm.assign(n, start);
    for (const ToolMove& m : moves) {
        const MoveSweep sw = prepareMove(outline, m);
        const double lo = std::max(0.0, std::ceil((sw.zLoMm - p.z0Mm) / p.dzMm));
        const double hi =
            std::min(static_cast<double>(n), std::floor((sw.zHiMm - p.z0Mm) / p.dzMm) + 1);
        for (auto i = static_cast<std::size_t>(lo); static_cast<double>(i) < hi; ++i)
            p.radiusMm[i] = std::min(p.radiusMm[i], radiusOf(sweptLowestX(outline, sw, p.zAt(i))));
    }
    return p;
}

// partOutcome for a bored cone: the same exact sweep on the twin x' = C − x (inside_kernel.h),
// the hole as the twin's stock, each sample brought back to the bore's radius.
PartOutcome boredOutcome(const Scene& scene, const Feature& cone, int featureIndex) {
    const ToolOutline outline(scene.tool);
    const double c = insideTwinOffsetMm(scene), h = scene.tool.tipHeightMm;
    std::vector<ToolMove> moves = planMoves(scene);
    for (ToolMove& m : moves)
        m = insideTwinMove(m, c);
    const double hole = 0.5 * scene.stock.boreDiameterMm;
    const Profile twin =
        sweptOverCone(scene, cone, moves, c - std::sqrt(std::max(0.0, hole * hole - h * h)),
                      [](double x) { return x; });
    Profile bore = twin;
    for (double& r : bore.radiusMm)
        r = boreRadiusFromTwin(r, c, h);
    const Profile nominal = nominalOnGrid(scene.part, bore, Side::Inside);
    const std::vector<double> dev = normalDeviation(scene.part, nominal, bore, Side::Inside);
    const std::vector<bool> mask = insideVerdictMask(scene.part, bore, outline.noseRadiusMm());
    for (const FeatureReport& r : compareFeatures(scene, bore, dev, {}, mask, Side::Inside))
        if (r.feature == featureIndex)
            return {r.asCutDiameterMm, r.asCutHalfAngleRad, r.withinTolerance};
    return {};
}

} // namespace

PartOutcome partOutcome(const Scene& scene, int featureIndex) {
    const Feature& cone = scene.part.features.at(static_cast<std::size_t>(featureIndex));
    if (scene.tool.kind == ToolKind::BoringBar)
        return boredOutcome(scene, cone, featureIndex);
    const ToolOutline outline(scene.tool);
    const double h = scene.tool.tipHeightMm;
    const Profile asCut = sweptOverCone(scene, cone, planMoves(scene), 0.5 * scene.stock.diameterMm,
                                        [h](double x) { return cutRadiusMm(x, h); });
    const Profile nominal = nominalOnGrid(scene.part, asCut);
    const std::vector<double> dev = normalDeviation(scene.part, nominal, asCut);
    const std::vector<bool> mask = verdictMask(scene.part, asCut, outline.noseRadiusMm());
    // The valleys only: the crests of the feed marks (well under a micron at a finishing feed)
    // need the feed-mark surface, which a budget of thousands of parts does not build.
    const std::vector<FeatureReport> reps = compareFeatures(scene, asCut, dev, {}, mask);
    const FeatureReport& r = reps.at(static_cast<std::size_t>(featureIndex));
    return {r.asCutDiameterMm, r.asCutHalfAngleRad, r.withinTolerance};
}

} // namespace swarf
