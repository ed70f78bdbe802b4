// The cutting kernel's entry points: profileUpTo and simulate (planMoves is in machine.cpp).
#include "swarf/sim/kernel.h"

#include "swarf/sim/between_passes.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/findings.h"
#include "swarf/sim/height_map.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <algorithm>
#include <cmath>
#include <map>

namespace swarf {

Profile profileUpTo(const Scene& scene, const std::vector<ToolMove>& moves, std::size_t count,
                    double fraction) {
    const ToolOutline outline(scene.tool);
    count = std::min(count, moves.size());
    return sweepExact(scene, outline, moves, count, std::clamp(fraction, 0.0, 1.0), false).asCut;
}

namespace {

// The move that leaves most of the main feature's final surface, and the longest run of
// samples it leaves there, trimmed by two feeds at each end. Returns false if none.
bool finishingRegion(const Scene& scene, const ExactSweep& sw, const std::vector<ToolMove>& moves,
                     int& move, double& zLo, double& zHi) {
    const Feature* main = scene.part.mainCone();
    if (!main) {
        for (const Feature& f : scene.part.features)
            if (f.kind != FeatureKind::Face) {
                main = &f;
                break;
            }
    }
    if (!main)
        return false;
    const Profile& g = sw.asCut;
    std::map<int, std::size_t> votes;
    for (std::size_t i = 0; i < g.radiusMm.size(); ++i) {
        const double z = g.zAt(i);
        if (z >= main->zStartMm && z <= main->zEndMm && sw.finalMove[i] >= 0)
            ++votes[sw.finalMove[i]];
    }
    if (votes.empty())
        return false;
    move = std::max_element(votes.begin(), votes.end(), [](auto& a, auto& b) {
               return a.second < b.second;
           })->first;
    if (moves[move].feedMmPerRev <= 0)
        return false;
    std::size_t bestLo = 0, bestLen = 0;
    for (std::size_t i = 0; i < g.radiusMm.size();) {
        if (sw.finalMove[i] != move) {
            ++i;
            continue;
        }
        std::size_t j = i;
        while (j < g.radiusMm.size() && sw.finalMove[j] == move && g.zAt(j) <= main->zEndMm)
            ++j;
        if (g.zAt(i) >= main->zStartMm - 1e-9 && j - i > bestLen)
            bestLo = i, bestLen = j - i;
        i = j + (j == i ? 1 : 0);
    }
    const double trim = 2.0 * moves[move].feedMmPerRev + scene.tool.noseRadiusMm;
    zLo = g.zAt(bestLo) + trim;
    zHi = g.zAt(bestLo + bestLen - (bestLen > 0 ? 1 : 0)) - trim;
    return zHi - zLo > 4.0 * moves[move].feedMmPerRev;
}

} // namespace

CutResult simulate(const Scene& scene, const ProgressFn& progress) {
    auto report = [&](double f) {
        if (progress)
            progress(f);
    };
    CutResult res;
    const ToolOutline outline(scene.tool);
    res.moves = planMoves(scene);
    report(0.02);
    ExactSweep sw = sweepExact(scene, outline, res.moves, res.moves.size(), 1.0, true);
    report(0.10);

    res.stock = sw.stock;
    res.asCut = sw.asCut;
    res.afterPass = sw.afterPass;
    res.nominal = nominalOnGrid(scene.part, sw.asCut);
    res.deviationMm = normalDeviation(scene.part, res.nominal, res.asCut);
    const std::vector<bool> mask = verdictMask(scene.part, res.asCut, outline.noseRadiusMm());
    res.features = compareFeatures(scene, res.asCut, res.deviationMm, mask);

    res.withinTolerance = !res.features.empty();
    for (const FeatureReport& f : res.features) {
        res.withinTolerance = res.withinTolerance && f.withinTolerance;
        res.maxLeftOnMm = std::max(res.maxLeftOnMm, f.maxLeftOnMm);
        res.maxOvercutMm = std::max(res.maxOvercutMm, f.maxOvercutMm);
    }
    if (const Feature* c = scene.part.mainCone()) {
        res.gaugeZMm = c->cone.gaugeZMm;
        res.gaugeNominalDiameterMm = c->cone.gaugeDiameterMm;
    } else {
        for (const Feature& f : scene.part.features)
            if (f.kind == FeatureKind::Cylinder) {
                res.gaugeZMm = 0.5 * (f.zStartMm + f.zEndMm);
                res.gaugeNominalDiameterMm = f.diameterMm;
                break;
            }
    }
    res.gaugeAsCutDiameterMm = 2.0 * res.asCut.radiusAt(res.gaugeZMm);

    res.stockVolumeMm3 = res.stock.volumeMm3();
    res.asCutVolumeMm3 = res.asCut.volumeMm3();
    res.removedVolumeMm3 = res.stockVolumeMm3 - res.asCutVolumeMm3;
    res.leftoverVolumeMm3 = leftoverVolumeMm3(res.nominal, res.asCut);

    res.findings = findCutFindings(scene, outline, res.moves, sw, res.nominal, res.features,
                                   res.deviationMm, mask);
    // The moves between passes should cut nothing (between_passes.h).
    res.between = betweenPassMoves(scene);
    for (Finding& f : findCutsBetweenPasses(scene, outline, res.between, sw))
        res.findings.push_back(std::move(f));
    std::stable_sort(res.findings.begin(), res.findings.end(),
                     [](const Finding& a, const Finding& b) { return a.pass < b.pass; });
    report(0.15);

    res.surface =
        buildHeightMap(scene, outline, res.moves, sw, [&](double f) { report(0.15 + 0.8 * f); });

    int fm = -1;
    double zLo = 0, zHi = 0;
    if (finishingRegion(scene, sw, res.moves, fm, zLo, zHi)) {
        const MoveSweep s = prepareMove(outline, res.moves[fm]);
        const Roughness rough =
            measureRoughness(res.surface, outline, s, scene.tool.tipHeightMm, zLo, zHi);
        res.rtUm = rough.rtUm;
        res.raUm = rough.raUm;
    }
    report(1.0);
    return res;
}

} // namespace swarf
