// The shop's steps before the passes, in words: face to length, set the tool on centre height,
// measure the bar and touch off, set the compound (sine bar or an indicator on a test bar), and
// the handwheel pace of a hand-fed pass.
#include "planner_build.h"

#include "swarf/sim/compound_sense.h"
#include "swarf/sim/compound_setting.h"
#include "swarf/sim/machine.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace swarf {

double handwheelTurnsPerMinute(const Setup& setup, const Pass& pass) {
    if (!setup.spindleRpm || pass.kind == PassKind::Path)
        return 0;
    const Slide& s = pass.kind == PassKind::Compound ? setup.compound
                     : pass.kind == PassKind::Saddle ? setup.saddle
                                                     : setup.cross;
    // A diameter dial's turn moves the slide half its reading.
    const double travelPerTurn =
        pass.kind == PassKind::CrossSlide ? crossTravelFromReading(setup, turnMm(s)) : turnMm(s);
    return pass.feedMmPerRev * *setup.spindleRpm / travelPerTurn;
}

namespace detail {

bool setUpCompound(ConePlan& out, const Scene& scene, const Feature& cone, const CompoundFit& fit) {
    if (!fit.parallel) {
        out.problems.push_back("the compound cannot cut this cone: " + fit.message +
                               " Nothing was planned.");
        return false;
    }
    Setup& setup = out.scene.setup;
    // The sheet has every reading set before a pass approached from below, taking up backlash.
    setup.approach = Approach::TakeUp;
    // Wound back far enough to take up the backlash: quarter turns, more if a slide needs it.
    while (setup.windBackTurns < 10 &&
           (setup.windBackTurns * turnMm(setup.compound) <= setup.compound.backlashMm ||
            setup.windBackTurns * turnMm(setup.saddle) <= setup.saddle.backlashMm))
        setup.windBackTurns += 0.25;
    if (auto other = otherScaleNote(scene.setup, cone))
        out.cautions.push_back("as the scene gives it, " + *other + " The plan sets it right.");
    setup.compoundReadingRad = compoundScaleReadingRad(cone.cone.halfAngleRad, setup.compoundScale);
    out.compoundReadingRad = setup.compoundReadingRad;
    out.trailingEdge = fit.trailingEdge;
    if (fit.trailingEdge)
        out.cautions.push_back("the cone is cut with the trailing edge: " + fit.message);
    return true;
}

bool settlePlanSize(ConePlan& out, const Scene& scene, const std::string& advice) {
    for (const Pass& p : out.scene.plan.passes)
        if (std::fabs(p.crossMm) > scene.setup.cross.travelMm) {
            out.cautions.push_back("a cross-slide reading is beyond its travel");
            break;
        }
    out.planned = !out.scene.plan.passes.empty();
    if (out.scene.plan.passes.size() <= kMaxPasses)
        return true;
    // A scene holds at most kMaxPasses: say which setting makes the plan so long.
    out.problems.push_back("the plan needs " + std::to_string(out.scene.plan.passes.size()) +
                           " passes, more than the " + std::to_string(kMaxPasses) +
                           " a scene may hold: take deeper cuts (planning.max_depth = " +
                           formatLength(scene.planning.maxDepthMm, scene.units) + " now)" +
                           (advice.empty() ? "" : " " + advice));
    out.planned = false;
    out.scene.plan.passes.clear();
    out.display.clear();
    out.steps.clear();
    return false;
}

void addStep(ConePlan& out, PlanStep::Kind kind, std::string text) {
    PlanStep s;
    s.kind = kind;
    s.text = std::move(text);
    out.steps.push_back(std::move(s));
}

std::string faceText(const Scene& sc) {
    const double allowance = sc.stock.faceAllowanceMm;
    return std::string("Face the end to length first: it is the datum face every axial reading "
                       "counts from") +
           (allowance > 0 ? " (face off " + formatLength(allowance, sc.units) + ")" : "") +
           ". Take the last skim with the tool set as in the next step.";
}

std::string centreHeightText(const Scene& sc) {
    std::string s = "Set the tool's tip on centre height: bring it up to the point of a centre in "
                    "the tailstock and shim the holder until tip and point meet, or take a light "
                    "facing cut to the middle and shim until it leaves no pip at the centre.";
    const double h = sc.tool.tipHeightMm;
    if (h != 0)
        s += " The scene has the tip " + formatLength(std::fabs(h), sc.units) +
             (h > 0 ? " above" : " below") +
             " centre; the plan allows for that, but on centre is better.";
    return s;
}

std::string measureBarText(const Scene& sc, double crossK, bool touchOff) {
    const std::string nominal = formatLength(sc.stock.diameterMm, sc.units);
    const std::string fix = "if it measured Ø d instead, set the dial to read (" + nominal +
                            " − d)" + (crossK < 1 ? "" : " / 2") +
                            ", so that the readings below still count from Ø" + nominal +
                            " (a bar under size reads more, one over size less)";
    if (!touchOff)
        return "Stop the spindle and measure the bar with a micrometer: Ø" + nominal +
               " nominal. You touch off on it after setting the compound; " + fix + ".";
    return "Stop the spindle and measure the bar with a micrometer: Ø" + nominal +
           " nominal. With the compound at 0 and locked, touch the tool on the turning bar and "
           "set the cross-slide dial to 0; " +
           fix +
           ". Touch the end face and zero the saddle dial. Approach every reading from below "
           "(wind back past it, then forward to it).";
}

void fillIndicator(ConePlan& out, const Scene& sc) {
    const Slide& c = sc.setup.compound;
    const double th = out.halfAngleRad;
    const double turn = turnMm(c);
    const double want = sc.units == Units::Inch ? kMmPerInch : 25.0;
    const double maxMove = sc.units == Units::Inch ? 0.2 * kMmPerInch : 5.0;
    double L = std::min({want, 0.5 * c.travelMm, th > 0 ? maxMove / std::sin(th) : want});
    L = std::max(turn, std::floor(L / turn + 1e-9) * turn);
    out.indicatorTravelMm = L;
    out.indicatorMoveMm = L * std::sin(th);
}

std::string setCompoundText(const ConePlan& out, const Scene& sc) {
    const Setup& su = out.scene.setup;
    const Units u = sc.units;
    char turns[32];
    std::snprintf(turns, sizeof turns, "%.0f", out.indicatorTravelMm / turnMm(su.compound));
    return std::string("Swing the compound to ") + formatDms(su.compoundReadingRad, 0) +
           (su.compoundScale == CompoundScale::FromAxis
                ? " on its scale (read from the spindle axis)"
                : " on its scale (read from the cross-slide)") +
           ", to the side where winding it in moves the tool " + compoundSenseWords(su) +
           ": half angle θ = " + formatDms(out.halfAngleRad, 1) +
           ". Set it exactly in one of two ways: with the sine bar (the stack is under the "
           "checks), or with a dial indicator in the tool post against the side of a test bar "
           "held parallel to the spindle axis (between centres), at centre height (spindle "
           "stopped): wind the "
           "compound in " +
           formatLength(out.indicatorTravelMm, u) + " (" + turns +
           " turns) and the indicator must move L·sin θ = " +
           formatLength(out.indicatorMoveMm, u, Precision::Fine) +
           "; swivel and repeat until it does, then lock the compound. Swinging the compound "
           "moves the tool: touch off after it, not before.";
}

} // namespace detail
} // namespace swarf
