// The set-up sheet (see setup_sheet.h): built section by section as a document, then rendered
// as plain text or as HTML (sheet_document.h).
#include "swarf/io/setup_sheet.h"

#include "sheet_document.h"
#include "sheet_sections.h"
#include "swarf/sim/caution.h"
#include "swarf/sim/compound_sense.h"

#include <cmath>
#include <cstdio>
#include <string>
#include <vector>

namespace swarf::io {
namespace {

using detail::Block;
using detail::Document;
using detail::listBlock;
using detail::paragraph;
using detail::Section;
using detail::Table;

using Ctx = detail::SheetCtx;

const char* towardName(Widens w) {
    return w == Widens::TowardChuck ? "chuck" : "tailstock";
}

Section safetySection(const Scene& scene) {
    std::vector<std::string> l = safetyCautions();
    if (scene.tool.kind == ToolKind::BoringBar)
        for (const std::string& b : boringCautions())
            l.push_back(b);
    if (auto m = materialCaution(scene.stock.material))
        l.push_back(*m);
    return {"Safety first", {listBlock(l, Block::Kind::Warn)}};
}

Section noPlanSection(const ConePlan& plan) {
    Section no{"No plan", {listBlock(plan.problems)}};
    if (!plan.suggestions.empty()) {
        no.blocks.push_back(paragraph("Inserts and holders that can follow this cone:"));
        no.blocks.push_back(listBlock(plan.suggestions));
    }
    return no;
}

Section jobSection(const Ctx& c) {
    const Feature& f = c.sc.part.features[c.plan.featureIndex];
    const Cone& cone = f.cone;
    const Tool& t = c.sc.tool;
    const Setup& su = c.su;
    std::vector<std::string> jl;
    jl.push_back(std::string(f.side == Side::Inside ? "Inside cone (a bore) '" : "Cone '") +
                 f.name + "': Ø" + c.L(cone.gaugeDiameterMm) + " ± " + c.L(f.toleranceMm) +
                 " at the gauge plane " + c.L(cone.gaugeZMm) + " from the datum face; from " +
                 c.L(f.zStartMm) + " to " + c.L(f.zEndMm) + ", widening toward the " +
                 towardName(cone.widens) + ".");
    char ratio[32];
    std::snprintf(ratio, sizeof ratio, "%.3f", cone.ratioK());
    jl.push_back("Half angle θ = " + formatDms(c.plan.halfAngleRad, 1) + " (included " +
                 formatDms(2 * c.plan.halfAngleRad, 1) + "; taper 1:" + ratio +
                 " on diameter), ± " + formatDms(f.angleToleranceRad, 0) + ".");
    const Stock& st = c.sc.stock;
    jl.push_back("Bar Ø" + c.L(st.diameterMm) + ", " + c.L(st.stickOutMm) + " out of the jaws" +
                 (st.hasBore() ? ", with a hole Ø" + c.L(st.boreDiameterMm) +
                                     (st.boreThrough() ? " through the work"
                                                       : " " + c.L(st.boreDepthMm) + " deep")
                               : std::string()) +
                 (st.material.empty() ? "" : ", " + st.material) + ".");
    if (t.kind == ToolKind::BoringBar) {
        char ratio2[32];
        std::snprintf(ratio2, sizeof ratio2, "%.1f", t.overhangMm / t.barDiameterMm);
        jl.push_back("Boring bar Ø" + c.L(t.barDiameterMm) + ", " + c.L(t.overhangMm) +
                     " out of its holder (" + ratio2 + " bar diameters); it enters a bore of Ø" +
                     c.L(t.minBoreMm) + " or more.");
    }
    const char* hand = t.hand == Hand::L ? "L" : t.hand == Hand::N ? "N" : "R";
    jl.push_back(std::string("Insert shape ") + (t.shape ? std::string(1, t.shape) : "?") +
                 ", nose radius " + c.L(t.noseRadiusMm) + ", entering angle " +
                 formatDms(t.enteringAngleRad, 0) +
                 (t.holderCode.empty() ? "" : " (holder style " + t.holderCode + ")") + ", hand " +
                 hand + ", tip " +
                 (t.tipHeightMm == 0 ? "on centre" : c.L(t.tipHeightMm) + " off centre") + ".");
    jl.push_back(std::string("Cross-slide dial reads on ") +
                 (su.crossDial == DialMode::Diameter ? "diameter" : "radius") + ", " +
                 c.L(su.cross.mmPerDivision) + " per division, " +
                 std::to_string(su.cross.divisionsPerTurn) + " divisions a turn; compound " +
                 c.L(su.compound.mmPerDivision) + " per division, " +
                 std::to_string(su.compound.divisionsPerTurn) + " a turn; saddle " +
                 c.L(su.saddle.mmPerDivision) + " per division, " +
                 std::to_string(su.saddle.divisionsPerTurn) + " a turn.");
    if (su.spindleRpm) {
        char rpm[32];
        std::snprintf(rpm, sizeof rpm, "%.0f", *su.spindleRpm);
        jl.push_back(std::string("Spindle ") + rpm +
                     " rev/min (check it against the supplier's data).");
    }
    return {"The job", {listBlock(jl)}};
}

std::string sineBarLine(const Ctx& c) {
    const auto& sb = c.plan.sineBar;
    std::string s = "Sine bar " + c.L(sb.barLengthMm) + " at " + formatDms(sb.angleRad, 1) +
                    ": gauge stack " + c.L(sb.stackMm, Precision::Fine);
    auto blocks = [&](const std::vector<double>& b) {
        std::string t;
        for (std::size_t i = 0; i < b.size(); ++i)
            t += (i ? " + " : "") + c.L(b[i]);
        return t;
    };
    if (!sb.blocksMm.empty() && sb.baseBlocksMm.empty())
        s += " = " + blocks(sb.blocksMm);
    else if (!sb.blocksMm.empty())
        s += ", too short to build alone: stand the raised roll on " + blocks(sb.blocksMm) +
             " and the other roll on " + blocks(sb.baseBlocksMm);
    else
        s += " (the gauge block set cannot build it: use the nearest stack and note the angle it "
             "gives)";
    return s + ". Lay the bar at that angle to a reference trued parallel to the spindle axis, run "
               "an indicator on the compound along it, and swivel the compound until the reading "
               "stays put.";
}

Section compoundSection(const Ctx& c) {
    const ConePlan& plan = c.plan;
    std::vector<std::string> cl;
    cl.push_back("Compound on its scale: " + formatDms(plan.compoundReadingRad, 0) +
                 (c.su.compoundScale == CompoundScale::FromAxis
                      ? " (scale read from the spindle axis)"
                      : " (scale read from the cross-slide: 90° − θ)") +
                 "; winding it in (the reading increasing) moves the tool " +
                 compoundSenseWords(c.su) + ".");
    cl.push_back(sineBarLine(c));
    cl.push_back("Or with an indicator on a test bar parallel to the spindle axis: over " +
                 c.L(plan.indicatorTravelMm) +
                 " of compound travel the indicator moves L·sin θ = " +
                 c.L(plan.indicatorMoveMm, Precision::Fine) + ".");
    cl.push_back(
        "Nose-radius offset (plane geometry): a tip placed on the drawn cone line would leave " +
        formatSmallLength(plan.noseNormalErrorMm, c.u) +
        " normal to the cone; the finishing readings already include the offset (tip line " +
        c.L(std::fabs(plan.noseOffsetRadialMm), Precision::Fine) + " on radius " +
        (plan.inside                   ? "outside the drawn bore, toward the wall"
         : plan.noseOffsetRadialMm < 0 ? "inside the drawn line"
                                       : "outside the drawn line") +
        ", the same as " + c.L(std::fabs(plan.noseOffsetAxialMm), Precision::Fine) +
        " along the axis).");
    if (plan.trailingEdge)
        cl.push_back("The trailing edge cuts the cone (see the notes for this job).");
    return {"Compound and nose-radius offset", {listBlock(cl)}};
}

Section readingsSection(const Ctx& c) {
    Section refs{"References and readings", {}};
    refs.blocks.push_back(paragraph(
        "Readings are dial readings in " + std::string(c.u == Units::Inch ? "inches" : "mm") +
        "; in the table, [n t + d] means n whole turns from zero (negative: back from zero), then "
        "division d on the dial, which wraps every turn. Approach every reading "
        "in its increasing direction (cross-slide: " +
        std::string(c.plan.inside ? "out toward the bore's wall: its readings decrease, so wind "
                                    "it in past the reading, then out to it"
                                  : "in toward the centre") +
        "; compound: winding in, which moves the tool " + compoundSenseWords(c.su) +
        "; saddle: toward the chuck): wind back past it, then forward to it. The readings then "
        "need no backlash correction. Lock the slides that do not move during a pass. Between "
        "passes, " +
        (c.plan.inside ? "bring the bar off the wall, toward the centre, before it goes back"
                       : "back the cross-slide out before the tool goes back") +
        ": each pass says where to."));
    bool twoStages = false;
    for (const PassDisplay& d : c.plan.display)
        twoStages = twoStages || d.stage == 0;
    const std::string zero = "the cross-slide reads 0 at Ø" + c.L(c.su.zeroDiameterMm) +
                             ", the saddle reads 0 with the tip at " + c.L(c.su.zeroZMm) +
                             " from the datum face.";
    refs.blocks.push_back(paragraph(
        twoStages ? "Readings from the first touch-off count from the first touch-off on the " +
                        (c.plan.inside ? "hole (Ø" + c.L(c.sc.stock.boreDiameterMm)
                                       : "bar (Ø" + c.L(c.sc.stock.diameterMm)) +
                        ") and its end face. Readings from the references count from the "
                        "references: " +
                        zero
                  : "Readings count from the touch-off: " + zero));
    return refs;
}

// A bored cone's checks: the mouth with an inside micrometer, a plug gauge, blue.
Section boreChecksSection(const Ctx& c) {
    const ConePlan& plan = c.plan;
    const BoreChecks& b = plan.bore;
    const Feature& f = c.sc.part.features[static_cast<std::size_t>(plan.featureIndex)];
    std::vector<std::string> l;
    l.push_back("Diameter just inside the mouth, " + c.L(b.mouthZMm) +
                " from the datum face, with an inside micrometer or a telescopic gauge: Ø" +
                c.L(b.mouthDiameterRoughMm) + " before finishing, Ø" +
                c.L(b.mouthDiameterFinishedMm) + " finished.");
    if (b.plugGauge)
        l.push_back("Plug gauge of the drawing's cone: its gauge line (Ø" +
                    c.L(f.cone.gaugeDiameterMm) + ") stands at " + c.L(b.gaugeLineZMm) +
                    " from the datum face when the bore is finished, within ±" + c.L(b.bandMm) +
                    " (the drawing's ±" + c.L(f.toleranceMm) +
                    " on diameter, divided by twice the taper's tan θ); before finishing it "
                    "stands about " +
                    c.L(b.roughStandOutMm) +
                    " further out. Standing out: the bore is small, take more; going in past "
                    "the band: the bore is large.");
    l.push_back("Blue (common practice): wipe a thin film of engineer's blue on the plug, push "
                "it in by hand, turn it a little and draw it out. Blue rubbed off along the "
                "whole length: the angle is right. Only at the mouth: the bore's taper is "
                "shallower than the plug's, so increase the compound's angle; only deep in: "
                "steeper, so decrease it.");
    l.push_back("Compound angle with the sine bar stack above, before the first cone pass.");
    return {"Checks before the finishing pass (spindle stopped)", {listBlock(l)}};
}

Section checksSection(const Ctx& c) {
    const ConePlan& plan = c.plan;
    if (plan.inside)
        return boreChecksSection(c);
    const auto& rolls = plan.rolls;
    return {"Checks before the finishing pass (spindle stopped)",
            {listBlock({
                "Diameter at " + c.L(plan.checkZMm) + " from the datum face: Ø" +
                    c.L(plan.checkDiameterRoughMm) + " before finishing, Ø" +
                    c.L(plan.checkDiameterFinishedMm) + " finished.",
                "Over two Ø" + c.L(rolls.rollDiameterMm) + " rolls, roll centres at " +
                    c.L(rolls.z1Mm) + " and " + c.L(rolls.z2Mm) + " from the datum face (" +
                    c.L(rolls.height1Mm) + " and " + c.L(rolls.height2Mm) +
                    " from the cone's small end): before finishing " +
                    c.L(rolls.reading1Mm + rolls.roughExtraMm) + " and " +
                    c.L(rolls.reading2Mm + rolls.roughExtraMm) + "; finished " +
                    c.L(rolls.reading1Mm) + " and " + c.L(rolls.reading2Mm) + ". The difference, " +
                    c.L(rolls.reading2Mm - rolls.reading1Mm) + ", checks the angle at any size.",
                "Compound angle with the sine bar stack above, before the first cone pass.",
            })}};
}

Section finishSection(const Ctx& c) {
    return {"Expected finish",
            {paragraph("Finishing pass at " + formatLength(c.sc.planning.finishFeedMmPerRev, c.u) +
                       "/rev with a " + c.L(c.sc.tool.noseRadiusMm) + " nose: theoretical Rt " +
                       formatSmallLength(c.plan.rtMm, c.u) + ", Ra " +
                       formatSmallLength(c.plan.raMm, c.u) +
                       " (from feed and nose radius only; the real finish also depends on the "
                       "material, the edge, speed and rigidity).")}};
}

Section proofSection(const Ctx& c, const CutResult& proof) {
    std::vector<std::string> l;
    l.push_back(std::string("Verdict: ") + verdictWords(proof.withinTolerance) + ".");
    l.push_back("Gauge diameter as cut Ø" + c.L(proof.gaugeAsCutDiameterMm) + " (drawing Ø" +
                c.L(proof.gaugeNominalDiameterMm) + "); most metal left on " +
                formatSmallLength(proof.maxLeftOnMm, c.u) + ", deepest overcut " +
                formatSmallLength(proof.maxOvercutMm, c.u) + ".");
    for (const Finding& fd : proof.findings)
        l.push_back(std::string(findingLabel(fd.kind)) +
                    (fd.pass >= 0 ? " (pass " + std::to_string(fd.pass + 1) + ")" : std::string()) +
                    ": " + fd.message);
    if (proof.findings.empty())
        l.push_back("No findings.");
    return {"The plan, simulated", {listBlock(l)}};
}

Document buildSheet(const ConePlan& plan, const CutResult* proof) {
    const Ctx c{plan, plan.scene, plan.scene.units, plan.scene.setup};
    Document sh;
    sh.title = "Set-up sheet: " + c.sc.name;
    sh.subtitle = c.sc.description;
    sh.sections.push_back(safetySection(c.sc));
    if (!plan.planned) {
        sh.sections.push_back(noPlanSection(plan));
        return sh;
    }
    sh.sections.push_back(jobSection(c));
    sh.sections.push_back(compoundSection(c));
    sh.sections.push_back(readingsSection(c));
    sh.sections.push_back(detail::operationsSection(c));
    sh.sections.push_back(checksSection(c));
    sh.sections.push_back(detail::mattersSection(c));
    if (!plan.choiceLines.empty()) {
        Section why{"Why this way of working, and the steps that matter most", {}};
        why.blocks.push_back(paragraph(
            "swarf planned the cone each way it knows and ran the error budget of each from the "
            "scene's [uncertainty] (a Monte Carlo of the parts the set-up makes):"));
        why.blocks.push_back(listBlock(plan.choiceLines));
        if (!plan.stepsThatMatter.empty()) {
            why.blocks.push_back(paragraph(
                "Of the spread of the gauge diameter in the way kept, the largest parts come "
                "from these steps: take most care over them."));
            why.blocks.push_back(listBlock(plan.stepsThatMatter));
        }
        sh.sections.push_back(why);
    }
    sh.sections.push_back(finishSection(c));
    if (!plan.cautions.empty())
        sh.sections.push_back(
            {"Notes for this job", {listBlock(plan.cautions, Block::Kind::Warn)}});
    if (proof)
        sh.sections.push_back(proofSection(c, *proof));
    return sh;
}

} // namespace

namespace detail {

std::string dialCell(const Slide& slide, double readingMm, Units u) {
    const DialSetting d = dialSetting(slide, readingMm);
    const double frac = d.division - std::floor(d.division);
    char buf[96];
    std::snprintf(buf, sizeof buf, "%s\u00a0[%ld\u00a0t\u00a0+\u00a0%.*f]",
                  formatLengthNumber(readingMm, u).c_str(), d.turns,
                  frac < 1e-6 || frac > 1 - 1e-6 ? 0 : 1, d.division);
    return buf;
}

} // namespace detail

std::string dialReadingText(const Slide& slide, double readingMm, Units units) {
    const DialSetting d = dialSetting(slide, readingMm);
    // Whole divisions print without decimals; half divisions with one.
    const double frac = d.division - std::floor(d.division);
    char div[32];
    std::snprintf(div, sizeof div,
                  std::fabs(frac) < 1e-6 || std::fabs(frac - 1) < 1e-6 ? "%.0f" : "%.1f",
                  d.division);
    return formatLength(readingMm, units) + " (" + std::to_string(d.turns) + " turns + " + div +
           " div)";
}

std::string setupSheetText(const ConePlan& plan, const CutResult* proof) {
    return detail::renderText(buildSheet(plan, proof));
}

std::string setupSheetHtml(const ConePlan& plan, const CutResult* proof) {
    return detail::renderHtml(buildSheet(plan, proof));
}

} // namespace swarf::io
