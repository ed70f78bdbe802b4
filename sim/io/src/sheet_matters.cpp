// The set-up sheet's "what matters" section (see sheet_sections.h): how much the diameter at the
// check plane moves for each small error, and the corrections a trial cut calls for. The numbers
// come from the kernel (sensitivity.h).
#include "sheet_sections.h"

#include "swarf/sim/sensitivity.h"

#include <cmath>
#include <cstdio>

namespace swarf::io::detail {
namespace {

std::string minutes(double rad) {
    char buf[32];
    std::snprintf(buf, sizeof buf, "%.1f′", rad / kArcMinuteRad);
    return buf;
}

} // namespace

Section mattersSection(const SheetCtx& c) {
    const ConeSensitivity s = coneSensitivity(c.plan);
    const Units u = c.u;
    auto dd = [&](double mm) {
        return c.L(mm, Precision::Fine) + " (" + formatSmallLength(mm, u) + ")";
    };
    Table t;
    t.head = {"what is off", "by", "the diameter at " + c.L(s.checkZMm) + " changes by"};
    t.rows.push_back(
        {"where you measure along the axis", c.L(s.axialStepMm), dd(s.perAxialStepMm)});
    t.rows.push_back({"the cross-slide", "1 division", dd(s.perCrossDivisionMm)});
    t.rows.push_back({"the compound's angle", "1′", dd(s.perCompoundMinuteMm)});
    t.rows.push_back(
        {"the tool's height (tip off centre)", c.L(s.axialStepMm), dd(s.perToolHeightStepMm)});
    std::vector<std::string> notes;
    notes.push_back(
        "Measuring position: 2·tan θ of diameter per unit of length along the axis. Compound "
        "angle: the finishing cut pivots where its compound reads 0 (" +
        c.L(s.pivotZMm) + " from the datum face, " + c.L(std::fabs(s.checkZMm - s.pivotZMm)) +
        " from the check plane), so an angle error grows with that distance. Tool height: second "
        "order, small near centre and growing fast further off.");
    char dial[96];
    std::snprintf(dial, sizeof dial, "%s", s.dialPerDiameter < 1 ? " × ½ (radius dial)" : "");
    notes.push_back("If the diameter at " + c.L(s.checkZMm) + " reads D′ instead of Ø" +
                    c.L(s.roughDiameterMm) + " before finishing, finish at cross-slide reading " +
                    formatLengthNumber(s.finishCrossMm, u) + " + (D′ − " +
                    formatLengthNumber(s.roughDiameterMm, u) + ")" + dial + " instead of " +
                    formatLengthNumber(s.finishCrossMm, u) + ".");
    const double step = u == Units::Inch ? 0.001 * kMmPerInch : 0.01;
    if (c.plan.inside)
        notes.push_back("Inside there are no rolls to measure over: the blue on the plug gauge "
                        "says which way the angle is off (see the checks). Turn the compound a "
                        "minute or two at a time; with the indicator on the test bar, 1′ is " +
                        c.L(s.indicatorPerMinuteMm, Precision::Fine) + " over " +
                        c.L(s.indicatorTravelMm) +
                        " of compound travel. Then try the plug again before the finishing pass.");
    else
        notes.push_back(
            "If the roll readings differ by Δ′ instead of " + c.L(s.rollDifferenceMm) +
            ", turn the compound by " + minutes(s.compoundPerRollMmRad * step) + " for every " +
            c.L(step) + " of (Δ′ − " + formatLengthNumber(s.rollDifferenceMm, u) +
            "): toward the spindle axis when Δ′ is larger (the cone is too steep), away from it "
            "when "
            "smaller. With the indicator on the test bar, 1′ is " +
            c.L(s.indicatorPerMinuteMm, Precision::Fine) + " over " + c.L(s.indicatorTravelMm) +
            " of compound travel. Then recheck before the finishing pass.");
    return {"What matters at the check plane",
            {paragraph("How much the diameter at the check plane (" + c.L(s.checkZMm) +
                       " from the datum face) moves for a small error in each thing you set or "
                       "measure, so you know which to fear:"),
             tableBlock(t), listBlock(notes)}};
}

} // namespace swarf::io::detail
