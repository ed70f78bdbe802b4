// Corrections after a trial cut (correction.h): the fit, the error it reveals, the story scene,
// scrap, clean-up of the finishing pass, and passes added where a cut would be too deep.
#include "swarf/sim/correction.h"

#include "swarf/sim/compound_setting.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/nose_offset.h"
#include "swarf/sim/planner.h"
#include "swarf/sim/units.h"

#include <algorithm>
#include <cmath>

namespace swarf {

namespace {

// The true angle a pass's compound reading means, without any error.
double intendedAngleRad(const Setup& setup, const Pass& pass) {
    const Setup s = setupForPass(setup, pass);
    return halfAngleFromCompoundReading(s.compoundReadingRad, s.compoundScale);
}

// The profile after the first `passes` passes of `scene`.
Profile profileAfter(const Scene& scene, int passes) {
    const std::vector<ToolMove> moves = planMoves(scene);
    std::size_t count = 0;
    while (count < moves.size() && moves[count].pass < passes)
        ++count;
    return profileUpTo(scene, moves, count);
}

// Dial units per mm of diameter on the cross-slide.
double dialPerDiameter(const Setup& s) {
    return s.crossDial == DialMode::Diameter ? 1.0 : 0.5;
}

// Samples along the cone where pass `cut` has cut (radius below the bar's).
std::vector<double> cutPlanes(const Feature& f, const Profile& p, double stockRadiusMm) {
    std::vector<double> zs;
    const int n = 400;
    for (int i = 0; i <= n; ++i) {
        const double z = f.zStartMm + (f.zEndMm - f.zStartMm) * i / n;
        const double r = p.radiusAt(z);
        if (!std::isnan(r) && r < stockRadiusMm - 1e-6)
            zs.push_back(z);
    }
    return zs;
}

void shiftCross(Pass& p, double dialMm) {
    p.crossMm += dialMm;
    if (p.kind == PassKind::CrossSlide) {
        p.fromMm += dialMm;
        p.toMm += dialMm;
    }
    if (p.retractToMm)
        *p.retractToMm += dialMm;
}

// A pass backs out no further in than it ends or the next pass starts (Scene::validate), also
// after readings moved and passes added.
void keepRetractsOut(Scene& s) {
    auto& ps = s.plan.passes;
    for (std::size_t i = 0; i < ps.size(); ++i) {
        if (!ps[i].retractToMm || ps[i].kind == PassKind::Path)
            continue;
        double limit = passEndCrossMm(ps[i]);
        if (i + 1 < ps.size() && ps[i + 1].kind != PassKind::Path)
            limit = std::min(limit, passStartCrossMm(ps[i + 1]));
        ps[i].retractToMm = std::min(*ps[i].retractToMm, limit);
    }
}

} // namespace

Correction correctPlan(const Scene& plan, const Measurements& m) {
    Correction c;
    c.afterPass = m.afterPass;
    const Feature* cone = plan.part.mainCone();
    if (!cone || m.afterPass < 1 || m.afterPass >= static_cast<int>(plan.plan.passes.size())) {
        c.fit.problem = "nothing to correct: the scene needs a cone and passes left after the "
                        "one measured";
        return c;
    }
    c.fit = fitCone(cone->cone, m);
    if (!c.fit.ok)
        return c;
    const Units u = plan.units;
    const int n = m.afterPass;
    const double thDraw = cone->cone.halfAngleRad;
    const double cosTh = std::cos(thDraw);
    const double thFit = c.fit.halfAngleRad;
    c.drawingHalfAngleRad = thDraw;
    const Pass& last = plan.plan.passes[static_cast<std::size_t>(n - 1)];
    const Setup lastSetup = setupForPass(plan.setup, last);
    c.plannedAngleRad = lastSetup.compoundAxisAngleRad();
    c.revealedErrorRad = thFit - intendedAngleRad(plan.setup, last);
    c.compoundChangeRad = c.plannedAngleRad - thFit;
    c.oldCompoundReadingRad = lastSetup.compoundReadingRad;
    // The angle to set: the planned one less the error the cut revealed. An error larger than
    // the angle itself (or one that would stand the compound past square) is no error of
    // setting: the compound is left as it is and the note says why (found by fuzzing).
    const double toSetRad = c.plannedAngleRad - c.revealedErrorRad;
    if (toSetRad >= 0 && toSetRad <= kPi / 2) {
        c.newCompoundReadingRad = compoundScaleReadingRad(toSetRad, lastSetup.compoundScale);
    } else {
        c.newCompoundReadingRad = c.oldCompoundReadingRad;
        c.notes.push_back("the cone measures " + formatDms(thFit) + " against the " +
                          formatDms(c.plannedAngleRad) +
                          " the compound was set to: no setting of the compound makes up that "
                          "difference, so it is left as it is; measure again, and check the "
                          "readings against the set-up sheet");
    }
    c.indicatorTravelMm =
        std::min(plan.setup.compound.travelMm, u == Units::Inch ? 2 * kMmPerInch : 50.0);
    c.indicatorChangeMm = c.indicatorTravelMm * (std::sin(c.plannedAngleRad) - std::sin(thFit));
    if (last.kind != PassKind::Compound)
        c.notes.push_back("pass " + std::to_string(n) +
                          " is not a compound pass: the angle measured is the cone's, which "
                          "the compound did not cut alone");

    // The story so far: the passes cut with the compound at the angle the cone shows.
    Scene story = plan;
    for (int k = 0; k < n; ++k) {
        Pass& p = story.plan.passes[static_cast<std::size_t>(k)];
        p.compoundAngleRad = setupForPass(plan.setup, p).compoundReadingRad;
        p.compoundErrorRad = thFit - intendedAngleRad(plan.setup, p);
    }
    story.name += " (as measured after pass " + std::to_string(n) + ", corrected)";
    story.expect = Expect{};
    Scene cut = story;
    cut.plan.passes.resize(static_cast<std::size_t>(n));
    // The cross-slide's zero: the measured cone against the one these passes make from it, on
    // the feed marks' crests, which a micrometer's anvils, rolls and gauges touch.
    {
        const Profile p = simulate(cut).crest;
        std::vector<double> zs;
        for (const auto& d : m.diameters)
            zs.push_back(d.zMm);
        for (const auto& r : m.rolls)
            zs.insert(zs.end(), r.zMm.begin(), r.zMm.end());
        for (const auto& g : m.gauges)
            zs.push_back(g.zMm());
        double sum = 0;
        int count = 0;
        for (double z : zs) {
            z = std::clamp(z, cone->zStartMm, cone->zEndMm);
            const double r = p.radiusAt(z);
            if (std::isnan(r) || r >= 0.5 * plan.stock.diameterMm - 1e-6)
                continue;
            sum += c.fit.diameterAt(z, cone->cone) - 2.0 * r;
            ++count;
        }
        if (count == 0)
            c.notes.push_back("no reading is where the passes cut: the cross-slide's zero is "
                              "taken as the plan's");
        c.crossOffsetMm = count > 0 ? sum / count : 0.0;
    }
    story.setup.zeroDiameterMm += c.crossOffsetMm;
    cut.setup.zeroDiameterMm += c.crossOffsetMm;

    // What is there now, against the drawing: scrap, and the stock left.
    const Profile now = profileAfter(cut, n);
    const std::vector<double> zs = cutPlanes(*cone, now, 0.5 * plan.stock.diameterMm);
    c.stockLeftMinMm = 1e9;
    c.stockLeftMaxMm = -1e9;
    for (double z : zs) {
        const double dNow = 2.0 * now.radiusAt(z), dDraw = cone->cone.diameterAt(z);
        const double below = dDraw - cone->toleranceMm - dNow;
        if (below > c.scrapMm) {
            c.scrapMm = below;
            c.scrapZMm = z;
        }
        const double left = 0.5 * (dNow - dDraw) * cosTh;
        c.stockLeftMinMm = std::min(c.stockLeftMinMm, left);
        c.stockLeftMaxMm = std::max(c.stockLeftMaxMm, left);
    }
    if (zs.empty())
        c.stockLeftMinMm = c.stockLeftMaxMm = 0;
    c.scrap = c.scrapMm > 1e-9;
    if (c.scrap) {
        c.corrected = cut;
        c.notes.push_back("scrap: the cone is already " + formatSmallLength(c.scrapMm, u) +
                          " under its lower limit on diameter at z = " +
                          formatLength(c.scrapZMm, u) + "; no correction can put the metal back");
        return c;
    }

    // The rest of the plan at the corrected settings.
    const double dial = dialPerDiameter(plan.setup);
    int finish = -1;
    for (int k = n; k < static_cast<int>(story.plan.passes.size()); ++k) {
        Pass& p = story.plan.passes[static_cast<std::size_t>(k)];
        const Setup s = setupForPass(plan.setup, p);
        p.compoundAngleRad =
            compoundScaleReadingRad(s.compoundAxisAngleRad() - c.revealedErrorRad, s.compoundScale);
        p.compoundErrorRad = c.revealedErrorRad;
        // Moved by the zero's offset, and set as a person sets it: to half a division.
        const double half = 0.5 * plan.setup.cross.mmPerDivision;
        const double start = passStartCrossMm(p) + c.crossOffsetMm * dial;
        shiftCross(p, std::round(start / half) * half - passStartCrossMm(p));
        if (p.kind == PassKind::Compound)
            finish = k;
    }
    c.noseOffsetDiameterMm =
        noseRadiusOffsets(plan.tool.noseRadiusMm, thDraw, cone->cone.widens).dxDiameterMm;

    // The finishing pass should cut everywhere: where the cone is already near the drawing,
    // move it in, as far as the tolerance leaves room (the kernel's finished profile says how
    // much); else say where the trial cut's surface stays.
    if (finish >= 0 && !zs.empty() && c.stockLeftMinMm < kMinFinishCutMm) {
        const double needDiameter = 2.0 * (kMinFinishCutMm - c.stockLeftMinMm) / cosTh;
        const Profile done = profileAfter(story, static_cast<int>(story.plan.passes.size()));
        double room = 1e9;
        for (double z : cutPlanes(*cone, done, 0.5 * plan.stock.diameterMm))
            room = std::min(room, 2.0 * done.radiusAt(z) -
                                      (cone->cone.diameterAt(z) - cone->toleranceMm));
        Pass& f = story.plan.passes[static_cast<std::size_t>(finish)];
        const double half = 0.5 * plan.setup.cross.mmPerDivision;
        const double target = std::ceil((f.crossMm + needDiameter * dial) / half - 1e-9) * half;
        if ((target - f.crossMm) / dial <= 0.8 * room) {
            c.finishMovedInMm = target - f.crossMm;
            f.crossMm = target;
            c.notes.push_back("the finishing pass moved in by " +
                              formatSmallLength(c.finishMovedInMm / dial, u) +
                              " on diameter so that it cuts the whole cone");
        } else {
            c.notes.push_back(
                "the finishing pass does not clean up the whole cone: where the trial cut went "
                "deepest the finishing pass cuts " +
                std::string(c.stockLeftMinMm < 0
                                ? "nothing (the surface is " +
                                      formatSmallLength(-c.stockLeftMinMm, u) + " under its line)"
                                : "only " + formatSmallLength(c.stockLeftMinMm, u)) +
                ", within tolerance; moving it in would take the cone out of tolerance");
        }
    }

    // Passes added where the next cut would be deeper than the plan allows: max_depth, and for
    // the finishing pass twice the finishing allowance or half as much again as the plan's own
    // finishing cut, whichever is more (a plan written by hand may finish deeper).
    double plannedDepth = 0;
    {
        const Profile before = profileAfter(plan, n), next = profileAfter(plan, n + 1);
        for (double z : cutPlanes(*cone, next, 0.5 * plan.stock.diameterMm))
            plannedDepth = std::max(plannedDepth, (before.radiusAt(z) - next.radiusAt(z)) * cosTh);
    }
    for (int guard = 0; guard < 20 && n < static_cast<int>(story.plan.passes.size()); ++guard) {
        const Pass& next = story.plan.passes[static_cast<std::size_t>(n)];
        if (next.kind != PassKind::Compound)
            break;
        const bool isFinish = n == finish;
        const double planned = c.passesAdded == 0 ? plannedDepth : 0.0;
        const double limit =
            isFinish ? std::min(std::max(2.0 * plan.planning.finishAllowanceMm, 1.5 * planned),
                                std::max(plan.planning.maxDepthMm, planned))
                     : std::max(plan.planning.maxDepthMm, planned);
        const Profile after = profileAfter(story, n + 1);
        double deepest = 0;
        for (double z : cutPlanes(*cone, after, 0.5 * plan.stock.diameterMm))
            deepest = std::max(deepest, (now.radiusAt(z) - after.radiusAt(z)) * cosTh);
        if (deepest <= limit * (1 + 1e-9))
            break;
        Pass extra = next;
        extra.note = "added after the trial cut: takes the cut down to the plan's depth";
        extra.feedMmPerRev = plan.planning.roughFeedMmPerRev;
        const double outDiameter = 2.0 * (deepest - 0.8 * limit) / cosTh;
        const double step = plan.setup.cross.mmPerDivision;
        extra.crossMm = std::floor((next.crossMm - outDiameter * dial) / step + 1e-9) * step;
        extra.retractToMm.reset();
        story.plan.passes.insert(story.plan.passes.begin() + n, extra);
        ++finish;
        ++c.passesAdded;
    }
    if (c.passesAdded > 0)
        c.notes.push_back(std::to_string(c.passesAdded) + " pass" +
                          (c.passesAdded > 1 ? "es" : "") +
                          " added: the next cut would have been deeper than the plan allows");

    for (int k = n; k < static_cast<int>(story.plan.passes.size()); ++k) {
        const Pass& p = story.plan.passes[static_cast<std::size_t>(k)];
        CorrectedPass cp;
        cp.pass = k;
        cp.planPass = k - c.passesAdded >= n && k >= n + c.passesAdded ? k - c.passesAdded : -1;
        cp.crossMm = passStartCrossMm(p);
        cp.compoundAngleRad = p.compoundAngleRad.value_or(plan.setup.compoundReadingRad);
        cp.finish = k == finish;
        c.remaining.push_back(cp);
    }
    keepRetractsOut(story);
    c.corrected = story;
    return c;
}

} // namespace swarf
