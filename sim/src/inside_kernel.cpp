// The kernel for inside work (inside_kernel.h): the outside kernel run on the twin x' = C − x.
#include "swarf/sim/inside_kernel.h"

#include "swarf/sim/between_passes.h"
#include "swarf/sim/boring_findings.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/findings.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/surface_roughness.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include "finishing_pass.h"

#include <algorithm>
#include <cmath>
#include <string>

namespace swarf {
namespace {

// The twin: the same insert as a turning tool on centre, over a bar of radius C with no hole and
// no drawing (the moves' own findings only).
Scene twinScene(const Scene& scene, double c) {
    Scene t = scene;
    t.tool.kind = ToolKind::Turning;
    t.tool.tipHeightMm = 0;
    t.tool.barDiameterMm = t.tool.overhangMm = t.tool.minBoreMm = 0;
    t.stock.diameterMm = 2.0 * c;
    t.stock.boreDiameterMm = t.stock.boreDepthMm = 0;
    t.part.features.clear();
    return t;
}

ToolMove twinMove(const ToolMove& m, double c) {
    return insideTwinMove(m, c);
}

double radiusFromTwin(double twinX, double c, double h) {
    return boreRadiusFromTwin(twinX, c, h);
}

Profile fromTwin(const Profile& twin, double c, double h) {
    Profile p = twin;
    for (double& r : p.radiusMm)
        r = radiusFromTwin(r, c, h);
    return p;
}

// The hole on the twin: C − √(R² − h²) in the hole (so that it comes back as R), C where solid.
Profile holeOnTwin(const Scene& scene, const Profile& grid, double c) {
    Profile t = grid;
    const double r = 0.5 * scene.stock.boreDiameterMm, h = scene.tool.tipHeightMm;
    const double x = std::sqrt(std::max(0.0, r * r - h * h));
    const Stock& st = scene.stock;
    for (std::size_t i = 0; i < t.radiusMm.size(); ++i) {
        const double z = t.zAt(i);
        const bool inHole = st.hasBore() && z >= st.freeEndZMm() && z <= st.boreBottomZMm();
        t.radiusMm[i] = inHole ? c - x : c;
    }
    return t;
}

// The hole's volume beyond the samples, to the jaws' face (a through hole), mm³.
double holeBeyondSamplesMm3(const Scene& scene, double zLast) {
    const Stock& st = scene.stock;
    if (!st.hasBore())
        return 0.0;
    const double to = std::min(st.boreBottomZMm(), st.jawZMm());
    const double r = 0.5 * st.boreDiameterMm;
    return std::max(0.0, to - zLast) * kPi * r * r;
}

// The drilled hole over the stick-out, mm³: a cylinder to its bottom or the jaws' face.
double holeVolumeMm3(const Scene& scene) {
    const Stock& st = scene.stock;
    if (!st.hasBore())
        return 0.0;
    const double r = 0.5 * st.boreDiameterMm;
    return kPi * r * r * (std::min(st.boreBottomZMm(), st.jawZMm()) - st.freeEndZMm());
}

// A scene whose only features are the inside ones, turned outside: the finishing region
// (finishing_pass.h) looks for the main cone among the outside features and by z alone.
Scene insideAsMain(const Scene& scene) {
    Scene t = scene;
    t.part.features.clear();
    for (Feature f : scene.part.features)
        if (f.side == Side::Inside) {
            f.side = Side::Outside;
            t.part.features.push_back(f);
        }
    return t;
}

} // namespace

ToolMove insideTwinMove(const ToolMove& m, double c) {
    ToolMove t = m;
    t.tipFrom.y() = c - m.tipFrom.y();
    t.tipTo.y() = c - m.tipTo.y();
    return t;
}

double boreRadiusFromTwin(double twinX, double c, double h) {
    const double x = c - twinX;
    return x > 1e-12 ? cutRadiusMm(x, h) : 0.0;
}

std::vector<bool> insideVerdictMask(const Part& part, const Profile& grid, double noseRadiusMm) {
    std::vector<bool> mask(grid.radiusMm.size(), true);
    for (const Feature& f : part.features) {
        if (f.side != Side::Inside || f.kind != FeatureKind::Face)
            continue;
        for (std::size_t i = 0; i < mask.size(); ++i)
            if (std::abs(grid.zAt(i) - f.zStartMm) < noseRadiusMm)
                mask[i] = false;
    }
    return mask;
}

double insideTwinOffsetMm(const Scene& scene) {
    return scene.stock.diameterMm + 10.0;
}

CutResult simulateInside(const Scene& scene, const ProgressFn& progress) {
    auto report = [&](double f) {
        if (progress)
            progress(f);
    };
    CutResult res;
    res.bored = true;
    const ToolOutline outline(scene.tool);
    const double c = insideTwinOffsetMm(scene), h = scene.tool.tipHeightMm;
    res.moves = planMoves(scene);
    report(0.02);

    const Scene twin = twinScene(scene, c);
    std::vector<ToolMove> twinMoves;
    twinMoves.reserve(res.moves.size());
    for (const ToolMove& m : res.moves)
        twinMoves.push_back(twinMove(m, c));
    const Profile grid = sampleGrid(scene, outline, res.moves);
    const Profile start = holeOnTwin(scene, grid, c);
    ExactSweep sw = sweepExactFrom(twin, outline, twinMoves, twinMoves.size(), 1.0, true, start);
    report(0.30);
    const FeedMarkSurface surface = FeedMarkSurface::build(twin, outline, twinMoves, sw);
    report(0.70);

    // The outside: the bar as it was.
    res.stock = stockOnGrid(scene, grid);
    res.asCut = res.stock;
    res.crest = res.stock;
    res.nominal = nominalOnGrid(scene.part, grid);
    res.deviationMm = normalDeviation(scene.part, res.nominal, res.asCut);
    res.crestDeviationMm = res.deviationMm;
    const std::vector<bool> outMask = verdictMask(scene.part, grid, outline.noseRadiusMm());
    std::vector<FeatureReport> reports =
        compareFeatures(scene, res.asCut, res.deviationMm, res.crestDeviationMm, outMask);

    // The bore, back from the twin.
    res.boreStock = fromTwin(start, c, h);
    res.bore = fromTwin(sw.asCut, c, h);
    Profile crestTwin = sw.asCut;
    const std::vector<double>& crestOn = surface.crestRadiusOnSamples();
    if (crestOn.size() == crestTwin.radiusMm.size())
        for (std::size_t i = 0; i < crestOn.size(); ++i)
            crestTwin.radiusMm[i] = std::min(crestOn[i], start.radiusMm[i]);
    res.boreCrest = fromTwin(crestTwin, c, h);
    for (const Profile& p : sw.afterPass)
        res.boreAfterPass.push_back(fromTwin(p, c, h));
    res.boreNominal = nominalOnGrid(scene.part, grid, Side::Inside);
    res.boreDeviationMm = normalDeviation(scene.part, res.boreNominal, res.bore, Side::Inside);
    res.boreCrestDeviationMm =
        normalDeviation(scene.part, res.boreNominal, res.boreCrest, Side::Inside);
    const std::vector<bool> inMask = insideVerdictMask(scene.part, grid, outline.noseRadiusMm());
    for (FeatureReport& r : compareFeatures(scene, res.bore, res.boreDeviationMm,
                                            res.boreCrestDeviationMm, inMask, Side::Inside))
        reports.push_back(r);
    std::sort(reports.begin(), reports.end(),
              [](const FeatureReport& a, const FeatureReport& b) { return a.feature < b.feature; });
    res.features = reports;

    detail::totalFeatureVerdicts(res);
    if (const Feature* ic = scene.part.mainInsideCone()) {
        res.gaugeZMm = ic->cone.gaugeZMm;
        res.gaugeNominalDiameterMm = ic->cone.gaugeDiameterMm;
        res.gaugeAsCutDiameterMm = 2.0 * res.bore.radiusAt(res.gaugeZMm);
    } else {
        for (const Feature& f : scene.part.features)
            if (f.kind == FeatureKind::Cylinder && f.side == Side::Inside) {
                res.gaugeZMm = 0.5 * (f.zStartMm + f.zEndMm);
                res.gaugeNominalDiameterMm = f.diameterMm;
                break;
            }
        res.gaugeAsCutDiameterMm = 2.0 * res.bore.radiusAt(res.gaugeZMm);
    }

    // Volumes over the stick-out: the bar less its hole, as the solids are written.
    const double barR = 0.5 * scene.stock.diameterMm;
    const double zLast = grid.zAt(grid.radiusMm.size() - 1);
    const double barRest = std::max(0.0, scene.stock.jawZMm() - zLast) * kPi * barR * barR;
    res.volumeFromZMm = scene.stock.freeEndZMm();
    res.volumeToZMm = scene.stock.jawZMm();
    // The drilled hole in closed form (its flat bottom falls between two samples).
    res.stockVolumeMm3 = res.stock.volumeMm3() + barRest - holeVolumeMm3(scene);
    res.asCutVolumeMm3 =
        res.asCut.volumeMm3() - res.bore.volumeMm3() + barRest - holeBeyondSamplesMm3(scene, zLast);
    res.removedVolumeMm3 = res.stockVolumeMm3 - res.asCutVolumeMm3;
    // Inside, metal left on is within the drawn bore: the outside formulas with the sides swapped.
    res.leftoverVolumeMm3 =
        leftoverVolumeMm3(res.nominal, res.asCut) + overcutVolumeMm3(res.boreNominal, res.bore);
    res.overcutVolumeMm3 =
        overcutVolumeMm3(res.nominal, res.asCut) + leftoverVolumeMm3(res.boreNominal, res.bore);

    // Findings: the moves' own (on the twin, which has no drawing), then the drawing's per side.
    const std::vector<double> noDev;
    const Profile twinNominal = nominalOnGrid(twin.part, grid);
    for (Finding& f : findCutFindings(twin, outline, twinMoves, sw, twinNominal, {}, noDev, noDev,
                                      std::vector<bool>(grid.radiusMm.size(), true))) {
        if (f.kind == FindingKind::CrossesCentre)
            continue; // the twin's centre is C beyond the wall: nothing to cross inside
        if (f.kind == FindingKind::Rubbing) {
            const std::string from = "in toward the axis", to = "out toward the wall";
            if (const auto at = f.message.find(from); at != std::string::npos)
                f.message.replace(at, from.size(), to);
        }
        res.findings.push_back(std::move(f));
    }
    const std::vector<int> noMoves(grid.radiusMm.size(), -1);
    const std::vector<Profile> stockAfter(scene.plan.passes.size(), res.stock);
    for (Finding& f : sideToleranceFindings(scene, Side::Outside, res.asCut, res.nominal,
                                            res.deviationMm, res.crestDeviationMm, outMask,
                                            res.features, noMoves, res.moves, stockAfter))
        res.findings.push_back(std::move(f));
    for (Finding& f :
         sideToleranceFindings(scene, Side::Inside, res.bore, res.boreNominal, res.boreDeviationMm,
                               res.boreCrestDeviationMm, inMask, res.features, sw.finalMove,
                               res.moves, res.boreAfterPass))
        res.findings.push_back(std::move(f));
    for (Finding& f : boringFindings(scene, outline, res.moves, res.boreStock, res.boreAfterPass))
        res.findings.push_back(std::move(f));
    // The moves between passes (the bar comes off the wall toward the centre, machine.h), checked
    // on the twin against the metal as it stands, as outside.
    res.between = betweenPassMoves(scene);
    std::vector<BetweenMove> twinBetween = res.between;
    for (BetweenMove& b : twinBetween)
        b.move = twinMove(b.move, c);
    for (Finding& f : findCutsBetweenPasses(twin, outline, twinBetween, sw))
        res.findings.push_back(std::move(f));
    for (std::size_t i = 0; i < res.between.size(); ++i)
        res.between[i].cutsMm = twinBetween[i].cutsMm;
    report(0.80);

    int fm = -1;
    double zLo = 0, zHi = 0;
    if (detail::finishingRegion(insideAsMain(scene), sw, res.moves, fm, zLo, zHi) &&
        res.moves[static_cast<std::size_t>(fm)].feedMmPerRev > 0) {
        const Roughness rough = measureRoughness(surface, fm, zLo, zHi);
        res.rtUm = rough.rtUm;
        res.raUm = rough.raUm;
        res.finishingPass = res.moves[static_cast<std::size_t>(fm)].pass;
        detail::checkFinishingFeed(scene, res.moves[static_cast<std::size_t>(fm)], rough,
                                   res.findings);
    }
    std::stable_sort(res.findings.begin(), res.findings.end(),
                     [](const Finding& a, const Finding& b) { return a.pass < b.pass; });
    res.afterPass.assign(scene.plan.passes.size(), res.stock);
    report(1.0);
    return res;
}

} // namespace swarf
