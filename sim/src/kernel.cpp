// The cutting kernel's entry points: profileUpTo and simulate (planMoves is in machine.cpp).
#include "swarf/sim/kernel.h"

#include "swarf/sim/between_passes.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/findings.h"
#include "swarf/sim/inside_kernel.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/surface_roughness.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include "finishing_pass.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <map>

namespace swarf {

Profile profileUpTo(const Scene& scene, const std::vector<ToolMove>& moves, std::size_t count,
                    double fraction) {
    const ToolOutline outline(scene.tool);
    count = std::min(count, moves.size());
    return sweepExact(scene, outline, moves, count, std::clamp(fraction, 0.0, 1.0), false).asCut;
}

namespace detail {

void totalFeatureVerdicts(CutResult& res) {
    res.withinTolerance = !res.features.empty();
    for (const FeatureReport& f : res.features) {
        res.withinTolerance = res.withinTolerance && f.withinTolerance;
        res.maxLeftOnMm = std::max(res.maxLeftOnMm, f.maxLeftOnMm);
        res.maxOvercutMm = std::max(res.maxOvercutMm, f.maxOvercutMm);
    }
}

// The move that leaves most of the main feature's final surface, and the longest run of
// samples within the feature that it leaves, trimmed by two feeds and a nose radius (along the
// move) at each end.
// False if no move leaves that surface.
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
    const std::size_t n = g.radiusMm.size();
    auto inside = [&](std::size_t i) {
        const double z = g.zAt(i);
        return z >= main->zStartMm - 1e-9 && z <= main->zEndMm + 1e-9;
    };
    std::map<int, std::size_t> votes;
    for (std::size_t i = 0; i < n; ++i)
        if (inside(i) && sw.finalMove[i] >= 0)
            ++votes[sw.finalMove[i]];
    if (votes.empty())
        return false;
    move = std::max_element(votes.begin(), votes.end(), [](auto& a, auto& b) {
               return a.second < b.second;
           })->first;
    // The longest run within the feature (the move may start before it: stock faced off).
    std::size_t bestLo = 0, bestLen = 0;
    for (std::size_t i = 0; i < n;) {
        if (sw.finalMove[i] != move || !inside(i)) {
            ++i;
            continue;
        }
        std::size_t j = i;
        while (j < n && sw.finalMove[j] == move && inside(j))
            ++j;
        if (j - i > bestLen)
            bestLo = i, bestLen = j - i;
        i = j;
    }
    // Along the move: two feeds and the nose at each end, in z as the move runs (a steep move
    // covers little of the axis).
    const Eigen::Vector2d d = moves[move].tipTo - moves[move].tipFrom;
    const double cosA = d.norm() > 0 ? std::abs(d.x()) / d.norm() : 1.0;
    const double trim = (2.0 * moves[move].feedMmPerRev + scene.tool.noseRadiusMm) * cosA;
    zLo = g.zAt(bestLo) + trim;
    zHi = g.zAt(bestLo + bestLen - (bestLen > 0 ? 1 : 0)) - trim;
    return true;
}

// The feed of the finishing pass against the nose radius: refused at 2r or more (a thread, not a
// turned surface), a note above r/2 (common practice: about the coarsest feed a nose finishes
// well).
void checkFinishingFeed(const Scene& scene, const ToolMove& move, const Roughness& rough,
                        std::vector<Finding>& findings) {
    const double f = move.feedMmPerRev, r = scene.tool.noseRadiusMm;
    const Units u = scene.units;
    const int p = move.pass;
    if (f >= 2 * r) {
        const bool known = p >= 0 && static_cast<std::size_t>(p) < scene.plan.passes.size();
        char value[64];
        std::snprintf(value, sizeof value, "%.6g", fromMm(f, u));
        throw InputError(known ? scene.plan.passes[static_cast<std::size_t>(p)].where
                               : SourceLoc{scene.file, 0, 0},
                         "plan.pass[" + std::to_string(p + 1) + "].feed", value,
                         "expected less than twice the nose radius (" + formatLength(2 * r, u) +
                             ") on the finishing pass: at 2r or more a revolution the nose cuts "
                             "a thread, not a turned surface (a feed per minute typed as per "
                             "revolution?)");
    }
    if (f > 0.5 * r) {
        Finding fd;
        fd.kind = FindingKind::CoarseFinish;
        fd.pass = p;
        fd.valueMm = f;
        fd.message = "the finishing pass feeds " + formatLength(f, u) + "/rev with a " +
                     formatLength(r, u) +
                     " nose radius: more than half the nose radius, about the coarsest a nose "
                     "finishes well (common practice); its marks stand " +
                     formatSmallLength(rough.rtUm / 1000.0, u) + " high (Rt)";
        findings.push_back(fd);
    }
}

} // namespace detail

CutResult simulate(const Scene& scene, const ProgressFn& progress) {
    auto report = [&](double f) {
        if (progress)
            progress(f);
    };
    if (scene.tool.kind == ToolKind::BoringBar)
        return simulateInside(scene, progress); // inside work: the bore (inside_kernel.h)
    CutResult res;
    const ToolOutline outline(scene.tool);
    res.moves = planMoves(scene);
    report(0.02);
    ExactSweep sw = sweepExact(scene, outline, res.moves, res.moves.size(), 1.0, true);
    report(0.30);

    res.surface = FeedMarkSurface::build(scene, outline, res.moves, sw);
    report(0.70);

    res.stock = sw.stock;
    res.asCut = sw.asCut;
    res.crest = sw.asCut;
    if (res.surface.crestRadiusOnSamples().size() == res.crest.radiusMm.size())
        res.crest.radiusMm = res.surface.crestRadiusOnSamples();
    res.nominal = nominalOnGrid(scene.part, sw.asCut);
    res.deviationMm = normalDeviation(scene.part, res.nominal, res.asCut);
    res.crestDeviationMm = normalDeviation(scene.part, res.nominal, res.crest);
    const std::vector<bool> mask = verdictMask(scene.part, res.asCut, outline.noseRadiusMm());
    res.features = compareFeatures(scene, res.asCut, res.deviationMm, res.crestDeviationMm, mask);

    detail::totalFeatureVerdicts(res);
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

    // Volumes over the whole stick-out, as the solids are written: the samples, then the bar
    // untouched from the last sample to the jaws' face.
    const double barR = 0.5 * scene.stock.diameterMm;
    const double zLast = res.asCut.zAt(res.asCut.radiusMm.size() - 1);
    const double rest = std::max(0.0, scene.stock.jawZMm() - zLast) * kPi * barR * barR;
    res.volumeFromZMm = scene.stock.freeEndZMm();
    res.volumeToZMm = scene.stock.jawZMm();
    res.stockVolumeMm3 = res.stock.volumeMm3() + rest;
    res.asCutVolumeMm3 = res.asCut.volumeMm3() + rest;
    res.removedVolumeMm3 = res.stockVolumeMm3 - res.asCutVolumeMm3;
    res.leftoverVolumeMm3 = leftoverVolumeMm3(res.nominal, res.asCut);
    res.overcutVolumeMm3 = overcutVolumeMm3(res.nominal, res.asCut);

    res.findings = findCutFindings(scene, outline, res.moves, sw, res.nominal, res.features,
                                   res.deviationMm, res.crestDeviationMm, mask);
    for (Finding& f : cornerFilletFindings(scene, res.asCut, sw.finalMove, res.moves, res.features))
        res.findings.push_back(std::move(f));
    // The moves between passes should cut nothing (between_passes.h).
    res.between = betweenPassMoves(scene);
    for (Finding& f : findCutsBetweenPasses(scene, outline, res.between, sw))
        res.findings.push_back(std::move(f));
    std::stable_sort(res.findings.begin(), res.findings.end(),
                     [](const Finding& a, const Finding& b) { return a.pass < b.pass; });
    report(0.80);

    int fm = -1;
    double zLo = 0, zHi = 0;
    if (detail::finishingRegion(scene, sw, res.moves, fm, zLo, zHi) &&
        res.moves[static_cast<std::size_t>(fm)].feedMmPerRev > 0) {
        const Roughness rough = measureRoughness(res.surface, fm, zLo, zHi);
        res.rtUm = rough.rtUm;
        res.raUm = rough.raUm;
        res.finishingPass = res.moves[static_cast<std::size_t>(fm)].pass;
        detail::checkFinishingFeed(scene, res.moves[static_cast<std::size_t>(fm)], rough,
                                   res.findings);
    }
    std::stable_sort(res.findings.begin(), res.findings.end(),
                     [](const Finding& a, const Finding& b) { return a.pass < b.pass; });
    res.afterPass = std::move(sw.afterPass);
    report(1.0);
    return res;
}

} // namespace swarf
