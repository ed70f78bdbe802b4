// The checks that go with a planned cone: the diameter at a check plane, the reading over two
// rolls (references R6), the sine bar stack that sets the compound (references R4) and the
// theoretical roughness of the finishing pass (references R2).
#include "planner_build.h"

#include "swarf/sim/roll_check.h"
#include "swarf/sim/roughness.h"
#include "swarf/sim/sine_bar.h"

#include <algorithm>
#include <cmath>

namespace swarf::detail {
namespace {

// A roll diameter about a fifth of the cone's length, from sizes commonly kept.
double chooseRollMm(double coneLengthMm, Units u) {
    const double mm[] = {1, 1.5, 2, 3, 4, 5, 6, 8, 10, 12, 16, 20, 25};
    const double in[] = {0.0625, 0.125, 0.1875, 0.25, 0.375, 0.5, 0.75, 1.0};
    double best = u == Units::Inch ? in[0] * kMmPerInch : mm[0];
    if (u == Units::Inch) {
        for (double d : in)
            if (d * kMmPerInch <= 0.2 * coneLengthMm)
                best = d * kMmPerInch;
    } else {
        for (double d : mm)
            if (d <= 0.2 * coneLengthMm)
                best = d;
    }
    return best;
}

// A length rounded down to a whole mm, or a tenth of an inch.
double roundStackMm(double mm, Units u) {
    const double q = u == Units::Inch ? 0.1 * kMmPerInch : 1.0;
    return std::max(0.0, std::floor(mm / q + 1e-9) * q);
}

} // namespace

void fillChecks(ConePlan& out, const Scene& sc, const Feature& f) {
    const Cone& cone = f.cone;
    const double th = cone.halfAngleRad;
    const double allowance = sc.planning.finishAllowanceMm;
    const Units u = sc.units;
    const double len = f.zEndMm - f.zStartMm;
    // Diameter at a reference plane: the gauge plane, kept a little inside the cone.
    const double inset = std::min(1.0, len / 4.0);
    out.checkZMm = std::clamp(cone.gaugeZMm, f.zStartMm + inset, f.zEndMm - inset);
    out.checkDiameterFinishedMm = cone.diameterAt(out.checkZMm);
    out.checkDiameterRoughMm = out.checkDiameterFinishedMm + 2.0 * allowance / std::cos(th);

    // Over two rolls, the cone standing on its small end.
    const double g = cone.growthSign();
    const double zSmall = g > 0 ? f.zStartMm : f.zEndMm;
    const double d =
        sc.planning.rollDiameterMm > 0 ? sc.planning.rollDiameterMm : chooseRollMm(len, u);
    const double stack1 = roundStackMm(0.2 * len - d / 2.0, u);
    const double stack2 =
        std::max(stack1 + (u == Units::Inch ? 2.54 : 1.0), roundStackMm(0.75 * len - d / 2.0, u));
    const RollReadings rr = rollReadingsForCone(cone.diameterAt(zSmall), th, d, stack1, stack2);
    out.rolls.rollDiameterMm = d;
    out.rolls.height1Mm = rr.centreHeight1Mm;
    out.rolls.height2Mm = rr.centreHeight2Mm;
    out.rolls.z1Mm = zSmall + g * rr.centreHeight1Mm;
    out.rolls.z2Mm = zSmall + g * rr.centreHeight2Mm;
    out.rolls.reading1Mm = rr.reading1Mm;
    out.rolls.reading2Mm = rr.reading2Mm;
    out.rolls.roughExtraMm = 2.0 * allowance / std::cos(th);

    // Sine bar that sets the compound at θ from the spindle axis.
    const auto bars = commonSineBars();
    const std::string want = u == Units::Inch ? "5 in" : "100 mm";
    SineBar bar = bars.front();
    for (const SineBar& b : bars)
        if (b.name == want)
            bar = b;
    out.sineBar.barLengthMm = bar.lengthMm;
    out.sineBar.angleRad = th;
    out.sineBar.stackMm = sineBarStackMm(bar.lengthMm, th);
    GaugeBlockSet set = u == Units::Inch ? commonInchBlockSet() : commonMetricBlockSet();
    if (!sc.gaugeBlocksMm.empty()) {
        set.name = "the scene's gauge blocks";
        set.sizes.clear();
        for (double b : sc.gaugeBlocksMm)
            set.sizes.push_back(fromMm(b, u));
        set.units = u;
    }
    const GaugeStack gs = combineGaugeBlocks(out.sineBar.stackMm, set);
    if (gs.found) {
        for (double b : gs.blocks)
            out.sineBar.blocksMm.push_back(toMm(b, set.units));
    } else {
        // Too short a stack to build (small angles): raise both rolls on stacks that differ by it.
        const double step = u == Units::Inch ? 0.5 * kMmPerInch : 10.0;
        for (int i = 1; i <= 6 && out.sineBar.blocksMm.empty(); ++i) {
            const GaugeStack lo = combineGaugeBlocks(i * step, set);
            const GaugeStack hi = combineGaugeBlocks(i * step + out.sineBar.stackMm, set);
            if (!lo.found || !hi.found)
                continue;
            bool shared = false; // each block of the set exists once
            for (double a : lo.blocks)
                for (double c : hi.blocks)
                    shared = shared || std::fabs(a - c) < 1e-9;
            if (shared)
                continue;
            for (double b : hi.blocks)
                out.sineBar.blocksMm.push_back(toMm(b, set.units));
            for (double b : lo.blocks)
                out.sineBar.baseBlocksMm.push_back(toMm(b, set.units));
        }
    }

    // Theoretical roughness of the finishing pass (references R2).
    const double feed = sc.planning.finishFeedMmPerRev, r = sc.tool.noseRadiusMm;
    if (feed > 0 && feed < 2.0 * r) {
        out.rtMm = rtExactMm(feed, r);
        out.raMm = raExactMm(feed, r);
    }
}

} // namespace swarf::detail
