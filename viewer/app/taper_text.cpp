// The bench figures of `swarf taper` as text (see taper_request.h): the cone in every form, the
// compound, sine bar stacks, nose-radius offsets, other ways to cut it, readings over rolls, the
// error of a tip off centre and the theoretical roughness. The arithmetic is in sim/; this file
// puts its answers into words.
#include "taper_request.h"

#include "swarf/sim/caution.h"
#include "swarf/sim/compound_setting.h"
#include "swarf/sim/off_centre.h"
#include "swarf/sim/roll_check.h"
#include "swarf/sim/roughness.h"

#include <fmt/core.h>

#include <cmath>
#include <utility>
#include <vector>

namespace swarf::app {

namespace {

// The text being written.
struct Out {
    std::string text;
    template <typename... Args> void say(fmt::format_string<Args...> f, Args&&... args) {
        text += fmt::format(f, std::forward<Args>(args)...);
    }
};

std::string degText(double rad) {
    return fmt::format("{:.5f}°", radToDeg(rad));
}

void printCone(Out& out, const TaperRequest& b) {
    const Units u = b.u;
    const double t = b.halfAngleRad;
    const double c = 2 * std::tan(t);
    out.say("Cone: {}\n", b.source);
    if (!b.note.empty())
        out.say("  ({})\n", b.note);
    out.say("  half angle        {:<14} {}\n", degText(t), formatDms(t, 2));
    out.say("  included angle    {:<14} {}\n", degText(2 * t), formatDms(2 * t, 2));
    out.say("  ratio             1:{:.4f}\n", 1 / c);
    out.say("  taper per foot    {:.5f} in/ft (on diameter)\n", 12 * c);
    out.say("  rate C            {:.6f} (diameter change per unit length)\n", c);
    out.say("  gauge diameter    {} (at the {} end)\n", formatLength(b.gaugeDiaMm, u),
            b.gaugeAtLarge ? "large" : "small");
    if (b.lengthMm) {
        out.say("  length            {}\n", formatLength(*b.lengthMm, u));
        out.say("  large end         {}\n", formatLength(b.largeMm(), u));
        out.say("  small end         {}\n", formatLength(b.smallMm(), u));
    }
    out.say("  diameter change   {} per {}, {} per {}\n",
            formatLength(c * toMm(1, u), u, Precision::Fine), unitWord(u),
            formatLength(c * toMm(u == Units::Inch ? 12 : 100, u), u),
            u == Units::Inch ? "foot" : "100 mm");
    const Cone cone{0, b.gaugeDiaMm, t, Widens::TowardChuck};
    if (b.atMm) {
        // Positive toward the cone's other end; a negative distance is said as a distance the
        // other way (no double negative), and beyond the gauge plane's end if the gauge is at one.
        const double d = cone.diameterAt((b.gaugeAtLarge ? -1 : 1) * *b.atMm);
        const bool towardSmall = (*b.atMm >= 0) == b.gaugeAtLarge;
        out.say("  {} from the gauge plane toward the {} end: diameter {}\n",
                formatLength(std::fabs(*b.atMm), u), towardSmall ? "small" : "large",
                formatLength(d, u));
    }
    if (b.toDiaMm) {
        const double d = *b.toDiaMm;
        out.say("  diameter {} is {} from the gauge plane ({} end side)\n", formatLength(d, u),
                formatLength(lengthBetweenDiameters(cone, b.gaugeDiaMm, d), u),
                d < b.gaugeDiaMm ? "small" : "large");
    }
}

void printCompound(Out& out, const TaperRequest& b) {
    const Units u = b.u;
    const double t = b.halfAngleRad;
    out.say("\nCompound slide (saddle locked, in-feed on the cross-slide)\n");
    out.say("  scale graduated from the spindle axis:  set {}\n",
            formatDms(compoundScaleReadingRad(t, CompoundScale::FromAxis), 1));
    out.say("  scale graduated from the cross-slide:   set {}\n",
            formatDms(compoundScaleReadingRad(t, CompoundScale::FromCrossSlide), 1));
    if (b.lengthMm)
        out.say("  stroke to cover {} of cone:  {} along the compound\n",
                formatLength(*b.lengthMm, u), formatLength(compoundStrokeMm(t, *b.lengthMm), u));
    const double unit = toMm(u == Units::Inch ? 0.001 : 0.01, u);
    out.say("  {} of compound travel changes the diameter by {}\n", formatLength(unit, u),
            formatLength(diameterChangeForCompoundTravelMm(t, unit), u, Precision::Finer));
}

std::string blockList(const GaugeStack& s, Units setUnits) {
    std::string out;
    for (double v : s.blocks) {
        if (!out.empty())
            out += " + ";
        out += fmt::format("{:.{}f}", v, lengthDecimals(setUnits));
    }
    return out + " " + unitName(setUnits);
}

void printSineBars(Out& out, const TaperRequest& b, const std::optional<GaugeBlockSet>& custom) {
    const GaugeBlockSet inch = custom ? *custom : commonInchBlockSet();
    const GaugeBlockSet metric = custom ? *custom : commonMetricBlockSet();
    out.say("\nSine bar: stack under one roll (H = L sin angle)\n");
    out.say("  blocks from: {}\n",
            custom ? custom->name : inch.name + " / " + metric.name + " (common practice)");
    const std::pair<const char*, double> uses[] = {
        {"half angle (work on sine centres: the top line lies level)", b.halfAngleRad},
        {"included angle (cone lying on the bar: the top line lies level)", 2 * b.halfAngleRad}};
    for (const auto& [what, angle] : uses) {
        out.say("  at the {}:\n", what);
        if (angle >= degToRad(90)) {
            out.say("    not on a sine bar: 90° or more\n");
            continue;
        }
        for (const auto& bar : commonSineBars()) {
            const bool inchBar = bar.name.find("in") != std::string::npos;
            const GaugeBlockSet& set = inchBar ? inch : metric;
            const Units show = inchBar ? Units::Inch : Units::Mm;
            const double h = sineBarStackMm(bar.lengthMm, angle);
            const auto s = combineGaugeBlocks(h, set);
            const std::string stack = formatLength(h, show, Precision::Fine);
            if (s.found)
                out.say("    {:>6} bar: {:<13} blocks {}\n", bar.name, stack,
                        blockList(s, set.units));
            else
                out.say("    {:>6} bar: {:<13} no blocks: {}\n", bar.name, stack, s.reason);
        }
    }
}

void printNoseOffsets(Out& out, const TaperRequest& b, double r, TipSide side) {
    const Units u = b.u;
    const auto o = noseRadiusOffsets(r, b.halfAngleRad, b.widens, side);
    const int fine = lengthDecimals(u, Precision::Fine);
    out.say(
        "\nNose radius {} (outside cone widening toward the {}; imaginary tip on the {} side)\n",
        formatLength(r, u, fine), b.widens == Widens::TowardChuck ? "chuck" : "tailstock",
        side == TipSide::ChuckSide ? "chuck" : "tailstock");
    out.say("  path on the drawing line {}: {} normal to the surface\n",
            o.leftOn ? "leaves metal on" : "overcuts", formatLength(o.normalErrorMm, u, fine));
    out.say("  shift the path by ONE of:\n");
    out.say("    ΔX {} on radius = {} on diameter, {} the axis\n",
            formatLength(o.dxRadiusMm, u, fine), formatLength(o.dxDiameterMm, u, fine),
            o.xShiftSign < 0 ? "toward" : "away from");
    out.say("    ΔZ {} toward the {}\n", formatLength(o.dzMm, u, fine),
            o.zShiftSign > 0 ? "chuck" : "tailstock");
}

void printMethods(Out& out, const TaperRequest& b) {
    const Units u = b.u;
    out.say("\nOther ways to cut it (limits are common practice; change them with options)\n");
    if (!b.lengthMm) {
        out.say("  give --length to judge set-over, taper attachment and compound\n");
        return;
    }
    const TaperMethodLimits& lim = b.limits;
    TaperJob job{b.halfAngleRad, *b.lengthMm, b.workLengthMm, true};
    out.say("  taper attachment guide bar: set {} from the axis (tan = TPF/24); offset {} per {}\n",
            formatDms(b.halfAngleRad, 1),
            formatLength(
                taperAttachmentOffsetMm(b.halfAngleRad, toMm(u == Units::Inch ? 10 : 100, u)), u),
            u == Units::Inch ? "10 in of bar" : "100 mm of bar");
    if (job.workLengthMm)
        out.say("  tailstock set-over for {} of work between centres: {}\n",
                formatLength(*job.workLengthMm, u),
                formatLength(tailstockSetOverMm(b.halfAngleRad, *job.workLengthMm), u));
    for (const auto& m : judgeTaperMethods(job, lim))
        out.say("  {:<20} {:<14} {}\n", m.name, m.practical ? "practical" : "not practical", m.why);
}

void printRolls(Out& out, const TaperRequest& b) {
    const Units u = b.u;
    const double d = *b.rollDiameterMm;
    out.say("\nOver two rolls of {} (cone standing on its small end on a surface plate)\n",
            formatLength(d, u));
    if (!b.lengthMm) {
        out.say("  give --length to place the rolls on the cone\n");
        return;
    }
    double h1 = 0, h2 = 0;
    if (b.rollStacksMm) {
        h1 = b.rollStacksMm->first;
        h2 = b.rollStacksMm->second;
    } else {
        // Lower rolls on the plate; upper rolls on the highest round stack that keeps them on
        // the cone.
        h2 = highestRollStackMm(*b.lengthMm, d, toMm(u == Units::Inch ? 0.25 : 5.0, u));
        if (h2 <= 0) {
            out.say("  the cone is too short for two heights with these rolls\n");
            return;
        }
    }
    if (std::max(h1, h2) + d > *b.lengthMm)
        out.say("  caution: the upper rolls stand above the cone's large end\n");
    const auto rr = rollReadingsForCone(b.smallMm(), b.halfAngleRad, d, h1, h2);
    const int fine = lengthDecimals(u, Precision::Fine);
    out.say("  rolls on stacks {}: centres {} up, cone diameter {}, read M1 = {}\n",
            formatLength(h1, u), formatLength(rr.centreHeight1Mm, u),
            formatLength(rr.diameter1Mm, u, fine), formatLength(rr.reading1Mm, u, fine));
    out.say("  rolls on stacks {}: centres {} up, cone diameter {}, read M2 = {}\n",
            formatLength(h2, u), formatLength(rr.centreHeight2Mm, u),
            formatLength(rr.diameter2Mm, u, fine), formatLength(rr.reading2Mm, u, fine));
    out.say("  M2 − M1 = {} for {} of height; M − D = {}\n",
            formatLength(rr.reading2Mm - rr.reading1Mm, u, fine), formatLength(h2 - h1, u),
            formatLength(rr.reading1Mm - rr.diameter1Mm, u, fine + 1));
    out.say("  from your readings: tan(half angle) = (M2 − M1) / (2 (H2 − H1)); "
            "D = M − d (1 + sec(half angle))\n");
}

void printTipHeight(Out& out, const TaperRequest& b, double h) {
    const Units u = b.u;
    out.say("\nTip {} {} centre (a straight cut makes a hyperboloid, not a cone)\n",
            formatLength(std::fabs(h), u, Precision::Normal), h >= 0 ? "above" : "below");
    std::vector<std::pair<const char*, double>> dias{{"gauge", b.gaugeDiaMm}};
    if (b.lengthMm)
        dias = {{"large end", b.largeMm()}, {"small end", b.smallMm()}};
    for (const auto& [what, d] : dias) {
        if (std::fabs(h) >= d / 2) {
            out.say("  {} {}: the tip is off by more than the radius\n", what, formatLength(d, u));
            continue;
        }
        out.say("  {:<10} {}: cut {} larger on diameter (≈ 2h²/D = {})\n", what, formatLength(d, u),
                formatSmallLength(diameterErrorOffCentreMm(d, h), u),
                formatSmallLength(diameterErrorOffCentreApproxMm(d, h), u));
    }
}

void printRoughness(Out& out, const TaperRequest& b, double f, double r) {
    const Units u = b.u;
    out.say("\nTheoretical roughness, feed {} per rev, nose radius {}\n",
            formatLength(f, u, Precision::Normal), formatLength(r, u, Precision::Insert));
    auto rough = [u](double mm) {
        return u == Units::Inch
                   ? fmt::format("{:.1f} µin ({:.3f} µm)", mm / kMmPerInch * 1e6, mm * 1e3)
                   : fmt::format("{:.3f} µm", mm * 1e3);
    };
    out.say("  Rt = f²/8r {}   exact arc {}\n", rough(rtApproxMm(f, r)), rough(rtExactMm(f, r)));
    out.say("  Ra ≈ 0.0321 f²/r {}   exact arc {}\n", rough(raApproxMm(f, r)),
            rough(raExactMm(f, r)));
    out.say("  (geometry only: real surfaces are rougher with built-up edge, chatter or wear)\n");
}

} // namespace

std::string taperFiguresText(const TaperRequest& b) {
    Out out;
    const Units u = b.u;
    const auto& r = b.noseRadiusMm;
    const auto& f = b.feedMmPerRev;
    const auto& h = b.tipHeightMm;
    out.say("swarf taper: bench figures in {}\n\n", unitWord(u));
    printCone(out, b);
    printCompound(out, b);
    printSineBars(out, b, b.blocks);
    if (r)
        printNoseOffsets(out, b, *r, b.tipSide);
    printMethods(out, b);
    if (b.rollDiameterMm)
        printRolls(out, b);
    if (h)
        printTipHeight(out, b, *h);
    if (f && r)
        printRoughness(out, b, *f, *r);

    std::vector<std::string> more;
    if (!r)
        more.push_back("--nose-radius R (offsets)");
    if (r && !f)
        more.push_back("--feed F (roughness)");
    if (!b.workLengthMm)
        more.push_back("--work-length L (set-over)");
    if (!b.rollDiameterMm)
        more.push_back("--rolls D (readings over rolls)");
    if (!h)
        more.push_back("--tip-height H (off-centre error)");
    if (!more.empty()) {
        out.say("\nMore figures with:");
        for (const auto& m : more)
            out.say(" {};", m);
        out.say("\n");
    }
    out.say("\n");
    for (const std::string& line : wrapWords(safetyCautionShort(), 96))
        out.say("{}\n", line);
    return out.text;
}

} // namespace swarf::app
