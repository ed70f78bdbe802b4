// planCone: choose the references, order the operations, plan the passes, work out the checks.
#include "planner_build.h"

#include "swarf/sim/compound_sense.h"
#include "swarf/sim/compound_setting.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/nose_offset.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace swarf {
namespace {

const Feature* coneToPlan(const Part& part, int& index) {
    const Feature* f = part.mainCone();
    if (!f) {
        for (const Feature& x : part.features)
            if (x.kind == FeatureKind::Chamfer) {
                f = &x;
                break;
            }
    }
    index = -1;
    for (std::size_t i = 0; i < part.features.size(); ++i)
        if (&part.features[i] == f)
            index = static_cast<int>(i);
    return f;
}

// The cone's finishing pass nearest the check plane: its reading, and where its line pivots.
void noteFinishPass(ConePlan& out) {
    const auto& passes = out.scene.plan.passes;
    const Setup& su = out.scene.setup;
    double best = 1e300;
    for (std::size_t k = 0; k < passes.size(); ++k) {
        if (!out.display[k].coneFinish)
            continue;
        const Pass& p = passes[k];
        const double zFrom = tipFromTravels(su, 0, p.fromMm, p.saddleMm).x();
        const double zTo = tipFromTravels(su, 0, p.toMm, p.saddleMm).x();
        const double d = out.checkZMm < std::min(zFrom, zTo)   ? std::min(zFrom, zTo) - out.checkZMm
                         : out.checkZMm > std::max(zFrom, zTo) ? out.checkZMm - std::max(zFrom, zTo)
                                                               : 0.0;
        if (d < best) {
            best = d;
            out.finishPass = static_cast<int>(k);
            out.finishCrossMm = p.crossMm;
            out.finishPivotZMm = tipFromTravels(su, 0, 0, p.saddleMm).x();
        }
    }
}

} // namespace

ConePlan planCone(const Scene& scene) {
    if (scene.tool.kind == ToolKind::BoringBar)
        return planInsideCone(scene);
    ConePlan out;
    out.scene = scene;
    out.scene.plan.passes.clear();
    const Units u = scene.units;
    auto L = [u](double mm) { return formatLength(mm, u); };

    int index = -1;
    const Feature* fp = coneToPlan(scene.part, index);
    if (!fp) {
        out.problems.push_back("the drawing has no cone or chamfer to plan");
        return out;
    }
    const Feature& f = *fp;
    out.featureIndex = index;
    const Cone& cone = f.cone;
    const double th = cone.halfAngleRad, g = cone.growthSign();
    out.halfAngleRad = th;

    // Can the insert follow the cone? The path climbs toward the chuck when g > 0.
    const double pathAngle = g * th;
    if (!toolFollowsSlope(scene.tool, pathAngle)) {
        out.problems.push_back(
            "the insert and holder cannot follow this cone: a path at " + formatDms(th, 0) +
            (g > 0 ? " climbing" : " descending") +
            " toward the chuck would bring the insert's trailing or leading edge onto the cone "
            "behind the nose (it would rub and cut below the drawing). Nothing was planned.");
        out.suggestions = suggestTools(scene.tool, pathAngle);
        return out;
    }

    // The compound as the scene describes it: its sense is the lathe's, never rewritten.
    const CompoundFit fit = compoundFitForCone(scene.setup, scene.tool, cone);
    if (!detail::setUpCompound(out, scene, f, fit))
        return out;
    Setup& setup = out.scene.setup;

    const TipSide side = scene.tool.hand == Hand::L ? TipSide::TailstockSide : TipSide::ChuckSide;
    const NoseOffsets no = noseRadiusOffsets(scene.tool.noseRadiusMm, th, cone.widens, side);
    out.noseNormalErrorMm = no.normalErrorMm;
    out.noseOffsetAxialMm = no.zShiftSign * no.dzMm;

    detail::PlanBuilder b(scene, out, f);
    b.setFeatureIndex(index);
    out.noseOffsetRadialMm = b.noseRadialMm();
    const double stockD = scene.stock.diameterMm;
    const double z0 = scene.stock.freeEndZMm();

    // Cylinders to turn first: the finished diameter to zero on, and anything smaller than the bar
    // that a saddle pass from the free end can reach without cutting into what lies before it.
    std::vector<const Feature*> cylinders;
    const Feature* longest = nullptr;
    for (const Feature& c : scene.part.features) {
        if (c.kind != FeatureKind::Cylinder)
            continue;
        if (!longest || c.zEndMm - c.zStartMm > longest->zEndMm - longest->zStartMm)
            longest = &c;
        if (c.diameterMm > stockD + 1e-6) {
            out.cautions.push_back("the cylinder '" + c.name + "' (Ø" + L(c.diameterMm) +
                                   ") is larger than the bar: it cannot be turned from it");
            continue;
        }
        if (c.diameterMm > stockD - 1e-6)
            continue; // the bar's own diameter
        bool reachable = true;
        for (const Feature& o : scene.part.features)
            if (o.zEndMm <= c.zStartMm + 1e-9 && o.kind != FeatureKind::Face)
                reachable = reachable && std::max(o.radiusAt(o.zStartMm), o.radiusAt(o.zEndMm)) <=
                                             c.diameterMm / 2.0 + 1e-6;
        if (!reachable) {
            out.cautions.push_back("the cylinder '" + c.name +
                                   "' lies behind larger diameters: it is not planned here");
            continue;
        }
        cylinders.push_back(&c);
    }
    for (const Feature& o : scene.part.features)
        if (&o != &f && (o.kind == FeatureKind::Cone || o.kind == FeatureKind::Chamfer))
            out.cautions.push_back("'" + o.name +
                                   "' is not planned here (one cone per plan): plan "
                                   "it on its own, or the simulation shows it as left on");
    std::sort(cylinders.begin(), cylinders.end(),
              [](const Feature* x, const Feature* y) { return x->diameterMm > y->diameterMm; });

    auto placing = scene.planning.placing;
    if (placing == PlanningOptions::Placing::ReferenceShoulder && g < 0) {
        out.cautions.push_back("a reference shoulder needs the cone's small end toward the "
                               "tailstock; this cone narrows toward the chuck, so the dials are "
                               "zeroed on a finished diameter and face instead");
        placing = PlanningOptions::Placing::ZeroOnDiameter;
    }
    if (placing == PlanningOptions::Placing::ReferenceShoulder) {
        double zRef = std::clamp(cone.gaugeZMm, f.zStartMm, f.zEndMm);
        if (zRef - f.zStartMm < 2.0)
            zRef = f.zEndMm; // too short a reference: use the large end
        const double div = scene.setup.saddle.mmPerDivision;
        zRef = std::clamp(z0 + std::round((zRef - z0) / div) * div, f.zStartMm, f.zEndMm);
        out.referenceZMm = zRef;
        out.referenceDiameterMm = cone.diameterAt(zRef);
        // The metal just beyond the reference plane once the cylinders are turned: a shoulder
        // needs it to stand proud of the reference diameter.
        double beyond = stockD / 2.0;
        for (const Feature* c : cylinders)
            if (c->zEndMm > zRef + 1e-9)
                beyond = std::min(beyond, c->diameterMm / 2.0);
        if (beyond < out.referenceDiameterMm / 2.0 + 0.05) {
            out.cautions.push_back("no shoulder can be turned at the gauge plane (the metal beyond "
                                   "it is no larger than the gauge diameter), so the dials are "
                                   "zeroed on a finished diameter and the datum face instead");
            placing = PlanningOptions::Placing::ZeroOnDiameter;
        }
    }
    if (placing != PlanningOptions::Placing::ReferenceShoulder) {
        out.referenceZMm = 0.0;
        out.referenceDiameterMm = longest ? longest->diameterMm : stockD;
    }
    out.scene.planning.placing = placing; // as planned (a fallback is said in the cautions)
    setup.zeroDiameterMm = out.referenceDiameterMm;
    setup.zeroZMm = out.referenceZMm;
    b.setZero(setup.zeroDiameterMm, setup.zeroZMm);
    out.stage0CrossOffsetMm = (stockD - setup.zeroDiameterMm) / (2.0 * b.crossK());
    out.stage0SaddleOffsetMm = setup.zeroZMm - z0;

    // The order of the shop: the datum face, centre height, the bar measured (and touched off
    // on, when straight passes come first), the compound set, then the passes.
    detail::fillChecks(out, scene, f);
    detail::fillIndicator(out, scene);
    detail::addStep(out, PlanStep::Kind::Face, detail::faceText(scene));
    detail::addStep(out, PlanStep::Kind::CentreHeight, detail::centreHeightText(scene));
    const bool stage0 =
        !cylinders.empty() || placing == PlanningOptions::Placing::ReferenceShoulder;
    detail::addStep(out, PlanStep::Kind::TouchOff,
                    detail::measureBarText(scene, b.crossK(), stage0));
    if (!stage0)
        detail::addStep(out, PlanStep::Kind::SetCompound, detail::setCompoundText(out, scene));

    for (const Feature* c : cylinders) {
        const auto after = scene.part.nominalRadiusAt(c->zEndMm + 0.01);
        const bool shoulder = after && *after > c->diameterMm / 2.0 + 1e-6;
        b.turnCylinder(c->diameterMm / 2.0, c->zEndMm, shoulder,
                       "turn '" + c->name + "' to Ø" + L(c->diameterMm), 0,
                       static_cast<int>(c - scene.part.features.data()));
    }
    if (placing == PlanningOptions::Placing::ReferenceShoulder) {
        b.turnCylinder(out.referenceDiameterMm / 2.0, out.referenceZMm, true,
                       "turn the reference diameter Ø" + L(out.referenceDiameterMm) +
                           " up to a shoulder at " + L(out.referenceZMm),
                       0);
        detail::addStep(out, PlanStep::Kind::Measure,
                        "Stop the spindle. Measure the reference diameter with a micrometer: Ø" +
                            L(out.referenceDiameterMm) + ". Check the shoulder stands " +
                            L(out.referenceZMm) + " from the datum face.");
        detail::addStep(out, PlanStep::Kind::SetCompound, detail::setCompoundText(out, scene));
        detail::addStep(
            out, PlanStep::Kind::TouchOff,
            "Work from the reference: touch the tool on the reference diameter and set the "
            "cross-slide dial to 0 (if it measured Ø d instead, set the dial to read (" +
                L(out.referenceDiameterMm) + " − d)" + (b.crossK() < 1 ? "" : " / 2") +
                "); touch the shoulder face and zero the saddle dial.");
    } else if (stage0) {
        detail::addStep(out, PlanStep::Kind::Measure,
                        "Stop the spindle. Measure the finished diameter with a micrometer: Ø" +
                            L(out.referenceDiameterMm) + ".");
        detail::addStep(out, PlanStep::Kind::SetCompound, detail::setCompoundText(out, scene));
        detail::addStep(
            out, PlanStep::Kind::TouchOff,
            "Work from the finished diameter: touch the tool on it and set the cross-slide dial "
            "to 0 (if it measured Ø d instead, set the dial to read (" +
                L(out.referenceDiameterMm) + " − d)" + (b.crossK() < 1 ? "" : " / 2") +
                "); the saddle stays zeroed on the datum face.");
    }

    if (!stage0)
        detail::addStep(
            out, PlanStep::Kind::TouchOff,
            "Touch off with the compound at 0: touch the tool on the turning bar and set the "
            "cross-slide dial to 0 (or from the bar's measured diameter, as above); touch the "
            "end face and zero the saddle dial. Approach every reading from below (wind back "
            "past it, then forward to it).");

    // Roughing.
    const double allowance = scene.planning.finishAllowanceMm;
    if (scene.planning.roughing == PlanningOptions::Roughing::SaddleSteps) {
        if (g > 0) {
            b.saddleSteps();
        } else {
            out.scene.planning.roughing = PlanningOptions::Roughing::Compound;
            out.cautions.push_back("stepped saddle roughing needs the cone's small end toward "
                                   "the tailstock; roughed with the compound instead");
        }
    }
    b.planSettings();
    if (out.compoundSettings > 1)
        out.cautions.push_back(
            "the compound's travel (" + L(scene.setup.compound.travelMm) +
            ") is shorter than the " + "cone's length along its slant (" + L(out.compoundRunMm) +
            "): each pass is cut in " + std::to_string(out.compoundSettings) +
            " settings of the saddle, moving and locking it between them; expect a faint mark "
            "where the settings meet. A taper attachment (or a tailstock set-over between "
            "centres) would cut it in one stroke.");
    const double thick = b.maxNormalThickness();
    int n =
        thick > allowance + 1e-9
            ? static_cast<int>(std::ceil((thick - allowance) / scene.planning.maxDepthMm - 1e-9))
            : 0;
    int made = 0;
    for (int i = 1; i <= n; ++i) {
        const double left = allowance + (thick - allowance) * (n - i) / n;
        if (b.compoundPass(left, false, "cone roughing pass", i, n))
            ++made;
    }
    out.roughingPasses = made;

    // Checks before the finishing pass, then the finish.
    out.trialCut = scene.planning.trialCut;
    if (out.trialCut)
        detail::addStep(
            out, PlanStep::Kind::Measure,
            "Trial cut. Stop the spindle and measure the diameter at " + L(out.checkZMm) +
                " from the datum face with a micrometer: it should be Ø" +
                L(out.checkDiameterRoughMm) + " (Ø" + L(out.checkDiameterFinishedMm) +
                " when finished). If it reads Ø d instead, add (d − " +
                L(out.checkDiameterRoughMm) + ")" + (b.crossK() < 1 ? "" : " / 2") +
                " to every finishing cross-slide reading below, to the nearest division (a "
                "cone that measures large takes a larger reading: further in).");
    else
        detail::addStep(out, PlanStep::Kind::Measure,
                        "Stop the spindle. Before finishing, check the diameter at " +
                            L(out.checkZMm) + " from the datum face: Ø" +
                            L(out.checkDiameterRoughMm) + " now (Ø" +
                            L(out.checkDiameterFinishedMm) + " when finished).");
    detail::addStep(
        out, PlanStep::Kind::Measure,
        "With the spindle stopped, check the angle over two Ø" + L(out.rolls.rollDiameterMm) +
            " rolls with their centres at " + L(out.rolls.z1Mm) + " and " + L(out.rolls.z2Mm) +
            " from the datum face (" + L(out.rolls.height1Mm) + " and " + L(out.rolls.height2Mm) +
            " from the cone's small end): the readings must differ by " +
            L(out.rolls.reading2Mm - out.rolls.reading1Mm) + " (now " +
            L(out.rolls.reading1Mm + out.rolls.roughExtraMm) + " and " +
            L(out.rolls.reading2Mm + out.rolls.roughExtraMm) + "; finished " +
            L(out.rolls.reading1Mm) + " and " + L(out.rolls.reading2Mm) +
            "). If the difference is off, correct the compound's angle before finishing.");
    b.compoundPass(0.0, true, "cone finishing pass (nose-radius offset applied)", 1, 1);
    detail::addStep(out, PlanStep::Kind::Measure,
                    "Stop the spindle. Measure the finished cone: Ø" +
                        L(out.checkDiameterFinishedMm) + " at " + L(out.checkZMm) +
                        ", over the rolls " + L(out.rolls.reading1Mm) + " and " +
                        L(out.rolls.reading2Mm) + ".");

    if (!scene.stock.tailstockSupport && scene.stock.stickOutMm > 3.0 * stockD)
        out.cautions.push_back("the bar sticks out " + L(scene.stock.stickOutMm) +
                               ", more than three "
                               "diameters, with no tailstock: support it, or expect it to spring "
                               "away (not simulated)");
    if (scene.tool.tipHeightMm != 0)
        out.cautions.push_back("the tool tip is " + L(std::fabs(scene.tool.tipHeightMm)) +
                               (scene.tool.tipHeightMm > 0 ? " above" : " below") +
                               " centre: a straight pass then cuts a slightly hollow cone; set it "
                               "on centre if you can");
    if (!detail::settlePlanSize(out, scene, "or start from a bar closer to size"))
        return out;
    if (out.planned) {
        // Readings a person can set, checked by sweeping the plan; starts clear of the metal;
        // back-outs that keep the way back clear.
        detail::settleFinishReadings(out, b.finishReadings());
        detail::reliefWhereBuried(out, fit.trailingEdge
                                           ? "they start at the end where the metal stands"
                                           : "they start against metal");
        detail::chooseRetracts(out);
        noteFinishPass(out);
    }
    // What the plan claims; `swarf run` on the planned scene checks it.
    out.scene.expect = Expect{};
    out.scene.expect.withinTolerance = true;
    out.scene.expect.noFindings = true;
    if (!out.planned)
        out.problems.push_back("there is no metal to remove: nothing was planned");
    return out;
}

} // namespace swarf
