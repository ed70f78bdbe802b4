// planInsideCone: a socket bored with a boring bar. A pilot bore with saddle passes, then the
// cone with the compound: roughing passes parallel to it, then a finishing pass with the inside
// nose-radius offset; the checks of a socket (plug gauge, inside micrometer at the mouth, blue).
//
// The passes themselves are built by BoreBuilder (planner_bore.h, with the geometry).
#include "planner_bore.h"
#include "planner_build.h"

#include "swarf/sim/compound_sense.h"
#include "swarf/sim/compound_setting.h"
#include "swarf/sim/inside_work.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/nose_offset.h"

#include <algorithm>
#include <cmath>

namespace swarf {
namespace {

int featureIndexOf(const Part& part, const Feature* f) {
    for (std::size_t i = 0; i < part.features.size(); ++i)
        if (&part.features[i] == f)
            return static_cast<int>(i);
    return -1;
}

} // namespace

ConePlan planInsideCone(const Scene& scene) {
    ConePlan out;
    out.scene = scene;
    out.scene.plan.passes.clear();
    out.inside = true;
    const Units u = scene.units;
    auto L = [u](double mm) { return formatLength(mm, u); };
    const Stock& st = scene.stock;
    const Tool& tool = scene.tool;

    const Feature* fp = scene.part.mainInsideCone();
    if (!fp) {
        out.problems.push_back("the tool is a boring bar, but the drawing has no inside cone to "
                               "bore");
        return out;
    }
    const Feature& f = *fp;
    out.featureIndex = featureIndexOf(scene.part, fp);
    const Cone& cone = f.cone;
    const double th = cone.halfAngleRad, g = cone.growthSign();
    const double cosT = std::cos(th);
    out.halfAngleRad = th;
    if (!st.hasBore()) {
        out.problems.push_back("the bar has no hole for the boring bar to enter: drill one "
                               "first and give it as stock.bore_diameter and stock.bore_depth");
        return out;
    }
    const double dSmall = std::min(cone.diameterAt(f.zStartMm), cone.diameterAt(f.zEndMm));
    const double allowance = scene.planning.finishAllowanceMm;
    if (st.boreDiameterMm > dSmall - 0.02) {
        out.problems.push_back("the hole (Ø" + L(st.boreDiameterMm) +
                               ") leaves nothing to bore at the cone's small end (Ø" + L(dSmall) +
                               "): start from a smaller hole. Nothing was planned.");
        return out;
    }
    if (tool.minBoreMm > st.boreDiameterMm + 1e-9) {
        out.problems.push_back("the boring bar needs a bore of Ø" + L(tool.minBoreMm) +
                               " or more to enter, and the hole is Ø" + L(st.boreDiameterMm) +
                               ": drill it larger or use a smaller bar. Nothing was planned.");
        return out;
    }

    // Can the insert follow the cone? On the twin the path runs at −g·θ.
    Tool turning = tool;
    turning.kind = ToolKind::Turning;
    const double pathAngle = -g * th;
    if (!toolFollowsSlope(turning, pathAngle)) {
        out.problems.push_back("the insert cannot follow this bore's cone at " + formatDms(th, 0) +
                               ": its trailing or leading edge would rub the bore behind the "
                               "nose. Nothing was planned.");
        out.suggestions = suggestTools(turning, pathAngle);
        return out;
    }
    const CompoundFit fit = compoundFitForCone(scene.setup, tool, cone);
    if (!detail::setUpCompound(out, scene, f, fit))
        return out;
    Setup& setup = out.scene.setup;

    detail::BoreBuilder b(scene, out, f);
    out.noseOffsetRadialMm = b.noseOutMm();
    {
        const TipSide side = tool.hand == Hand::L ? TipSide::TailstockSide : TipSide::ChuckSide;
        const NoseOffsets no = insideNoseRadiusOffsets(tool.noseRadiusMm, th, cone.widens, side);
        out.noseNormalErrorMm = no.normalErrorMm;
        out.noseOffsetAxialMm = no.zShiftSign * no.dzMm;
    }

    // The pilot: the cone's small end less the finishing allowance, rounded down to a tenth of a
    // mm (or five thousandths of an inch), never smaller than the bar needs.
    const double q = u == Units::Inch ? 0.005 * kMmPerInch : 0.1;
    double pilotD = std::floor((dSmall - 2.0 * allowance / cosT - 0.05) / q + 1e-9) * q;
    pilotD = std::max(pilotD, tool.minBoreMm);
    const bool pilotBored = pilotD > st.boreDiameterMm + 1e-6;
    if (!pilotBored)
        pilotD = st.boreDiameterMm;
    out.bore.pilotDiameterMm = pilotD;
    const double r = tool.noseRadiusMm;
    double zDeep = f.zEndMm + r + 0.5; // past the cone's deep end, into the hole
    if (!st.boreThrough())
        zDeep = std::min(zDeep, st.boreBottomZMm() - 1.0);
    zDeep = std::min(zDeep, st.jawZMm() - 1.5);
    if (zDeep < f.zEndMm - 1e-9) {
        out.problems.push_back("the hole's bottom (" + L(st.boreBottomZMm()) +
                               " from the datum face) leaves the tool no room past the cone's "
                               "deep end (" +
                               L(f.zEndMm) + "): drill deeper. Nothing was planned.");
        return out;
    }

    // Where the readings count from.
    auto placing = scene.planning.placing;
    double zRef = 0, dRef = pilotD;
    if (placing == PlanningOptions::Placing::ReferenceShoulder) {
        if (g > 0) {
            out.cautions.push_back("a reference bore needs the cone to widen toward the mouth; "
                                   "this one widens toward the chuck, so the dials are zeroed on "
                                   "the pilot bore and the datum face instead");
            placing = PlanningOptions::Placing::ZeroOnDiameter;
        } else {
            const double div = scene.setup.saddle.mmPerDivision;
            zRef = std::clamp(cone.gaugeZMm, f.zStartMm, f.zEndMm);
            if (zRef - f.zStartMm < 2.0)
                zRef = 0.5 * (f.zStartMm + f.zEndMm); // a socket's gauge plane at its mouth
            zRef = std::clamp(std::round(zRef / div) * div, f.zStartMm, f.zEndMm);
            dRef = cone.diameterAt(zRef);
        }
    }
    out.scene.planning.placing = placing;
    const bool fromReference = placing == PlanningOptions::Placing::ReferenceShoulder;
    out.referenceZMm = fromReference ? zRef : 0.0;
    out.referenceDiameterMm = dRef;
    setup.zeroDiameterMm = dRef;
    setup.zeroZMm = out.referenceZMm;
    b.setZero(setup.zeroDiameterMm, setup.zeroZMm);
    out.stage0CrossOffsetMm = (st.boreDiameterMm - setup.zeroDiameterMm) / (2.0 * b.crossK());
    out.stage0SaddleOffsetMm = setup.zeroZMm;

    // Checks: the sine bar and the roughness as outside; the mouth and the plug gauge.
    detail::fillChecks(out, scene, f);
    detail::fillIndicator(out, scene);
    out.rolls = RollCheck{};
    const double len = f.zEndMm - f.zStartMm;
    out.checkZMm = f.zStartMm + std::min(1.0, len / 4.0);
    out.checkDiameterFinishedMm = cone.diameterAt(out.checkZMm);
    out.checkDiameterRoughMm = out.checkDiameterFinishedMm - 2.0 * allowance / cosT;
    out.bore.mouthZMm = out.checkZMm;
    out.bore.mouthDiameterFinishedMm = out.checkDiameterFinishedMm;
    out.bore.mouthDiameterRoughMm = out.checkDiameterRoughMm;
    out.bore.plugGauge = g < 0;
    out.bore.gaugeLineZMm = cone.gaugeZMm;
    out.bore.bandMm = f.toleranceMm / (2.0 * std::tan(th));
    out.bore.roughStandOutMm = allowance / std::sin(th);

    const double k = b.crossK();
    const std::string half = k < 1 ? "" : " / 2";
    detail::addStep(out, PlanStep::Kind::Face, detail::faceText(scene));
    detail::addStep(out, PlanStep::Kind::CentreHeight, detail::centreHeightText(scene));
    detail::addStep(
        out, PlanStep::Kind::TouchOff,
        "Stop the spindle and measure the hole with an inside micrometer or a telescopic "
        "gauge: Ø" +
            L(st.boreDiameterMm) +
            " nominal. With the compound at 0 and locked, touch the boring bar's tip on the "
            "hole's wall and set the cross-slide dial to 0; if the hole measured Ø d instead, "
            "set the dial to read (" +
            L(st.boreDiameterMm) + " − d)" + half +
            ". Touch the end face and zero the saddle dial. Inside, a smaller cross-slide "
            "reading opens the bore: approach every reading outward, toward the wall (wind "
            "in past it, then back out to it).");
    if (pilotBored)
        b.boreCylinder(0.5 * pilotD, zDeep, "pilot bore to Ø" + L(pilotD), 0);
    else
        out.cautions.push_back("the hole is already at the pilot's size: it is not bored "
                               "first, and the dials are zeroed on it as drilled; measure it "
                               "with care, a drilled hole is seldom round");
    if (fromReference) {
        b.boreCylinder(0.5 * dRef, zRef,
                       "bore the reference Ø" + L(dRef) + " to a shoulder at " + L(zRef), 0);
        detail::addStep(
            out, PlanStep::Kind::Measure,
            "Stop the spindle. Measure the reference bore with an inside micrometer or a "
            "telescopic gauge: Ø" +
                L(dRef) + "; check its shoulder stands " + L(zRef) + " from the datum face.");
        detail::addStep(out, PlanStep::Kind::SetCompound, detail::setCompoundText(out, scene));
        detail::addStep(out, PlanStep::Kind::TouchOff,
                        "Work from the reference: touch the tip on the reference bore and set the "
                        "cross-slide dial to 0 (if it measured Ø d instead, set it to read (" +
                            L(dRef) + " − d)" + half +
                            "); touch the shoulder with the insert and zero the saddle dial.");
    } else {
        detail::addStep(
            out, PlanStep::Kind::Measure,
            "Stop the spindle. Measure the pilot bore with an inside micrometer or a telescopic "
            "gauge: Ø" +
                L(pilotD) + ".");
        detail::addStep(out, PlanStep::Kind::SetCompound, detail::setCompoundText(out, scene));
        detail::addStep(
            out, PlanStep::Kind::TouchOff,
            "Work from the pilot bore: touch the tip on its wall and set the cross-slide dial "
            "to 0 (if it measured Ø d instead, set it to read (" +
                L(pilotD) + " − d)" + half + "); the saddle stays zeroed on the datum face.");
    }

    // The cone: one setting of the saddle, the tip from in front of the mouth to past the deep
    // end, roughing passes parallel to the cone, then the finish.
    const double zMouth =
        std::min(st.freeEndZMm(), f.zStartMm) - r - 0.5 - scene.setup.compound.backlashMm;
    if (!b.planSetting(zMouth, zDeep)) {
        out.problems.push_back("the compound's travel (" + L(scene.setup.compound.travelMm) +
                               ") is shorter than the bore's cone along its slant (" +
                               L(out.compoundRunMm) +
                               "): inside cones are planned in one setting of the saddle. "
                               "Nothing was planned.");
        out.scene.plan.passes.clear();
        out.display.clear();
        out.steps.clear();
        return out;
    }
    const double thick = b.thicknessMm();
    const int n =
        thick > allowance + 1e-9
            ? static_cast<int>(std::ceil((thick - allowance) / scene.planning.maxDepthMm - 1e-9))
            : 0;
    for (int i = 1; i <= n; ++i) {
        const double left = allowance + (thick - allowance) * (n - i) / n;
        b.conePass(false, "bore roughing pass " + std::to_string(i) + " of " + std::to_string(n),
                   roundToDivision(setup.cross, b.exactCross(left)));
    }
    out.roughingPasses = n;

    out.trialCut = scene.planning.trialCut;
    if (out.trialCut)
        detail::addStep(
            out, PlanStep::Kind::Measure,
            "Trial cut. Stop the spindle and measure the bore at " + L(out.checkZMm) +
                " from the datum face with an inside micrometer: it should be Ø" +
                L(out.checkDiameterRoughMm) + " (Ø" + L(out.checkDiameterFinishedMm) +
                " when finished). If it reads Ø d instead, add (d − " +
                L(out.checkDiameterRoughMm) + ")" + half +
                " to the finishing cross-slide reading below, to the nearest division (a bore "
                "that measures large takes a larger reading: less far out).");
    detail::addStep(
        out, PlanStep::Kind::Measure,
        "Stop the spindle. Before finishing, measure the bore just inside the mouth (" +
            L(out.checkZMm) +
            " from the datum face) with an inside micrometer or a telescopic "
            "gauge: Ø" +
            L(out.checkDiameterRoughMm) + " now (Ø" + L(out.checkDiameterFinishedMm) +
            " when finished)." +
            (out.bore.plugGauge
                 ? " Try the plug gauge, blued thinly: its gauge line should stand about " +
                       L(out.bore.roughStandOutMm) +
                       " out from where it will sit when finished, and the blue should rub off "
                       "along the whole length. Blue at the mouth only: the bore is shallower "
                       "than the plug; deep only: steeper. Correct the compound's angle before "
                       "finishing."
                 : std::string()));

    // The finish: the nearest whole division, or half a division when a whole one would use
    // more than half the tolerance.
    const double exact = b.exactCross(0.0);
    double reading = roundToDivision(setup.cross, exact);
    if (2.0 * k * std::fabs(reading - exact) > f.toleranceMm / 2.0) {
        reading = roundToDivision(setup.cross, exact, 2);
        out.halfDivisionPasses.push_back(static_cast<int>(out.scene.plan.passes.size()));
        out.cautions.push_back("the finishing reading is set on half a division: no whole "
                               "division keeps the bore within half its tolerance");
    }
    b.conePass(true, "bore finishing pass (inside nose-radius offset applied)", reading);
    out.finishPass = static_cast<int>(out.scene.plan.passes.size()) - 1;
    out.finishCrossMm = reading;
    out.finishPivotZMm = setup.zeroZMm + b.saddleMm();
    detail::addStep(
        out, PlanStep::Kind::Measure,
        "Stop the spindle, back the bar out of the bore and clear the swarf. Measure the "
        "finished bore: Ø" +
            L(out.checkDiameterFinishedMm) + " at " + L(out.checkZMm) +
            " with an inside micrometer" +
            (out.bore.plugGauge
                 ? "; the plug gauge's gauge line (Ø" + L(cone.gaugeDiameterMm) + ") at " +
                       L(out.bore.gaugeLineZMm) + " from the datum face, within ±" +
                       L(out.bore.bandMm) + ", with blue along the whole length"
                 : std::string()) +
            ".");

    for (const Feature& o : scene.part.features)
        if (&o != &f && (o.kind == FeatureKind::Cone || o.kind == FeatureKind::Chamfer))
            out.cautions.push_back(
                "'" + o.name + "' is not planned here (one cone per plan" +
                (o.side == Side::Outside ? ", and the boring bar cuts inside" : "") +
                "): plan it on its own, or the simulation shows it as left on");
    for (const std::string& note : insideWorkNotes(scene))
        out.cautions.push_back(note);
    if (tool.tipHeightMm != 0)
        out.cautions.push_back("the bar's tip is " + L(std::fabs(tool.tipHeightMm)) +
                               (tool.tipHeightMm > 0 ? " above" : " below") +
                               " centre: the readings allow for it at the gauge plane, but the "
                               "bore then comes out slightly curved; set it on centre if you can");
    if (!detail::settlePlanSize(out, scene, ""))
        return out;
    if (out.planned) {
        // Off the wall to a whole division as the stage reads it (machine.h's back-off, rounded
        // toward the centre).
        const double div = setup.cross.mmPerDivision;
        for (const BetweenMove& m : betweenPassMoves(out.scene)) {
            if (m.step != ReturnStep::BackOut || m.afterPass < 0)
                continue;
            const auto after = static_cast<std::size_t>(m.afterPass);
            const double off = out.display[after].stage == 0 ? out.stage0CrossOffsetMm : 0.0;
            const double shown = std::ceil((m.move.crossTo + off) / div - 1e-9) * div;
            out.scene.plan.passes[after].retractToMm = std::round((shown - off) * 1e9) / 1e9;
        }
    }
    out.scene.expect = Expect{};
    out.scene.expect.withinTolerance = true;
    out.scene.expect.noFindings = true;
    if (!out.planned)
        out.problems.push_back("there is no metal to remove: nothing was planned");
    return out;
}

} // namespace swarf
