// swarf taper: the bench calculator. One cone in, every set-up figure out, with units.
// No scene file: the cone and the shop's numbers come from options. All arithmetic is in sim/;
// this file only reads options, checks them and prints.
#include "commands.h"
#include "swarf/sim/angle_text.h"
#include "swarf/sim/compound_setting.h"
#include "swarf/sim/cone.h"
#include "swarf/sim/error.h"
#include "swarf/sim/nose_offset.h"
#include "swarf/sim/off_centre.h"
#include "swarf/sim/roll_check.h"
#include "swarf/sim/roughness.h"
#include "swarf/sim/sine_bar.h"
#include "swarf/sim/taper_methods.h"
#include "swarf/sim/units.h"

#include <fmt/core.h>

#include <cmath>
#include <cstdio>
#include <memory>
#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace swarf::app {

namespace {

// Every option is read as text, so that a bad value gives our own message and exit code 2.
struct TaperOptions {
    std::string units = "mm";
    std::string standard, dia, halfAngle, included, ratio, perFoot, rate, dia2, length;
    std::string gaugeEnd = "large", widens = "chuck", tipSide = "chuck";
    std::string at, toDia;
    std::string noseRadius, feed, workLength, rolls, rollStacks, tipHeight, blocks;
    std::string compoundTravel, guideBarLength, guideBarMaxAngle, maxSetOver;
};

// Everything is written to this buffer and printed only when all values were good, so a bad
// option leaves nothing half-printed.
std::string gOut;

template <typename... Args> void say(fmt::format_string<Args...> f, Args&&... args) {
    gOut += fmt::format(f, std::forward<Args>(args)...);
}

[[noreturn]] void bad(const std::string& option, const std::string& value,
                      const std::string& expected) {
    throw InputError(SourceLoc{"command line", 0, 0}, option, value, expected);
}

// The resolved cone and the context to print it in.
struct Bench {
    Units u = Units::Mm;
    std::string source; // how the cone was given, for the heading
    std::string note;   // a standard's note
    double gaugeDiaMm = 0;
    double halfAngleRad = 0;
    bool gaugeAtLarge = true;
    std::optional<double> lengthMm;
    Widens widens = Widens::TowardChuck;
    double largeMm() const { return gaugeAtLarge || !lengthMm ? gaugeDiaMm : otherMm(); }
    double smallMm() const { return gaugeAtLarge && lengthMm ? otherMm() : gaugeDiaMm; }
    double otherMm() const {
        const double c = 2 * std::tan(halfAngleRad);
        return gaugeDiaMm + (gaugeAtLarge ? -1 : 1) * c * *lengthMm;
    }
};

// A length option in the chosen units, > 0 (or ≥ 0, or any sign), returned in mm.
double lengthOpt(const std::string& name, const std::string& text, Units u,
                 const char* rule = ">0") {
    const std::string unit = unitName(u);
    auto v = parseNumberText(text);
    const std::string r = rule;
    if (!v)
        bad(name, text, "a length in " + unit + " (a plain number)");
    if (r == ">0" && !(*v > 0))
        bad(name, text, "a length in " + unit + " greater than 0");
    if (r == ">=0" && !(*v >= 0))
        bad(name, text, "a length in " + unit + " of 0 or more");
    return toMm(*v, u);
}

std::optional<double> optLength(const std::string& name, const std::string& text, Units u,
                                const char* rule = ">0") {
    if (text.empty())
        return std::nullopt;
    return lengthOpt(name, text, u, rule);
}

std::string degText(double rad) {
    return fmt::format("{:.5f}°", radToDeg(rad));
}

Bench resolveCone(const TaperOptions& o) {
    Bench b;
    if (o.units == "mm")
        b.u = Units::Mm;
    else if (o.units == "inch" || o.units == "in")
        b.u = Units::Inch;
    else
        bad("--units", o.units, "mm or inch");
    const Units u = b.u;

    // Exactly one taper form.
    const std::pair<const char*, const std::string*> forms[] = {
        {"--standard", &o.standard}, {"--half-angle", &o.halfAngle}, {"--included", &o.included},
        {"--ratio", &o.ratio},       {"--per-foot", &o.perFoot},     {"--rate", &o.rate},
        {"--dia2", &o.dia2}};
    const char* given = nullptr;
    for (const auto& [name, value] : forms) {
        if (value->empty())
            continue;
        if (given)
            bad(name, *value, std::string("only one taper form; ") + given + " is given too");
        given = name;
    }
    if (!given)
        bad("taper", "(none given)",
            "one of --standard, --half-angle, --included, --ratio, "
            "--per-foot, --rate, or --dia2 with --length");

    b.lengthMm = optLength("--length", o.length, u);
    std::optional<StandardTaper> st;
    const std::string g = given;
    if (g == "--standard") {
        st = lookupStandardTaper(o.standard);
        if (!st)
            bad("--standard", o.standard,
                "a standard taper: Morse 0-6, Metric 4/6/80/100/120/160/200, 7:24 (sizes 30, 40, "
                "45, 50, 55, 60), NPT, Jarno 2-20, B&S 1-18, or an ISO 1119 rate 1:3 ... 1:500");
        b.halfAngleRad = halfAngleFromTaperRate(st->taperRate);
        b.source = st->name;
        b.note = st->note;
    } else if (g == "--half-angle") {
        auto a = parseAngleText(o.halfAngle);
        if (!a || !(*a > 0 && *a < degToRad(90)))
            bad(g, o.halfAngle, "an angle over 0° and under 90° (decimal degrees or 1°26′16″)");
        b.halfAngleRad = *a;
        b.source = "half angle " + o.halfAngle;
    } else if (g == "--included") {
        auto a = parseAngleText(o.included);
        if (!a || !(*a > 0 && *a < degToRad(180)))
            bad(g, o.included, "an angle over 0° and under 180° (decimal degrees or 2°52′31″)");
        b.halfAngleRad = halfAngleFromIncluded(*a);
        b.source = "included angle " + o.included;
    } else if (g == "--ratio") {
        auto k = parseRatioText(o.ratio);
        if (!k)
            bad(g, o.ratio, "a ratio on diameter written 1:k or k, with k > 0");
        b.halfAngleRad = halfAngleFromRatio(*k);
        b.source = "ratio 1:" + fmt::format("{:g}", *k);
    } else if (g == "--per-foot") {
        auto t = parseNumberText(o.perFoot);
        if (!t || !(*t > 0))
            bad(g, o.perFoot, "a taper per foot on diameter in in/ft, > 0");
        b.halfAngleRad = halfAngleFromTaperPerFoot(*t);
        b.source = fmt::format("taper per foot {:g} in/ft", *t);
    } else if (g == "--rate") {
        auto c = parseNumberText(o.rate);
        if (!c || !(*c > 0))
            bad(g, o.rate, "a rate of taper C = (D − d)/L, > 0");
        b.halfAngleRad = halfAngleFromTaperRate(*c);
        b.source = fmt::format("rate of taper C = {:g}", *c);
    }

    // The gauge diameter.
    if (!o.dia.empty()) {
        b.gaugeDiaMm = lengthOpt("--dia", o.dia, u);
        if (st && st->gaugeDiameterMm && std::fabs(*st->gaugeDiameterMm - b.gaugeDiaMm) > 1e-6)
            bad("--dia", o.dia,
                "no --dia with " + st->name + ", which fixes the gauge diameter at " +
                    formatLength(*st->gaugeDiameterMm, u) + " (or leave --dia out)");
    } else if (st && st->gaugeDiameterMm) {
        b.gaugeDiaMm = *st->gaugeDiameterMm;
    } else {
        bad("--dia", "(none given)",
            st ? "the gauge diameter, which " + st->name + " does not fix"
               : "the gauge diameter (the diameter at the gauge plane)");
    }

    if (g == "--dia2") {
        const double d2 = lengthOpt("--dia2", o.dia2, u);
        if (!b.lengthMm)
            bad("--length", "(none given)", "the axial length between --dia and --dia2");
        if (std::fabs(d2 - b.gaugeDiaMm) < 1e-9)
            bad("--dia2", o.dia2, "a diameter other than --dia");
        b.halfAngleRad = halfAngleFromTwoDiameters(0, b.gaugeDiaMm, *b.lengthMm, d2);
        b.gaugeAtLarge = b.gaugeDiaMm > d2;
        b.source = "diameters " + formatLength(b.gaugeDiaMm, u) + " and " + formatLength(d2, u) +
                   " over " + formatLength(*b.lengthMm, u);
    } else {
        if (o.gaugeEnd == "large")
            b.gaugeAtLarge = true;
        else if (o.gaugeEnd == "small")
            b.gaugeAtLarge = false;
        else
            bad("--gauge-end", o.gaugeEnd, "large or small");
    }
    if (b.lengthMm && !(b.smallMm() > 0))
        bad("--length", o.length,
            "a length shorter than the cone's " +
                formatLength(b.largeMm() / (2 * std::tan(b.halfAngleRad)), u) +
                " from its large end to its point");

    if (o.widens == "chuck")
        b.widens = Widens::TowardChuck;
    else if (o.widens == "tailstock")
        b.widens = Widens::TowardTailstock;
    else
        bad("--widens", o.widens, "chuck or tailstock (the way the diameter grows)");
    return b;
}

void printCone(const Bench& b, const TaperOptions& o) {
    const Units u = b.u;
    const double t = b.halfAngleRad;
    const double c = 2 * std::tan(t);
    say("Cone: {}\n", b.source);
    if (!b.note.empty())
        say("  ({})\n", b.note);
    say("  half angle        {:<14} {}\n", degText(t), formatDms(t, 2));
    say("  included angle    {:<14} {}\n", degText(2 * t), formatDms(2 * t, 2));
    say("  ratio             1:{:.4f}\n", 1 / c);
    say("  taper per foot    {:.5f} in/ft (on diameter)\n", 12 * c);
    say("  rate C            {:.6f} (diameter change per unit length)\n", c);
    say("  gauge diameter    {} (at the {} end)\n", formatLength(b.gaugeDiaMm, u),
        b.gaugeAtLarge ? "large" : "small");
    if (b.lengthMm) {
        say("  length            {}\n", formatLength(*b.lengthMm, u));
        say("  large end         {}\n", formatLength(b.largeMm(), u));
        say("  small end         {}\n", formatLength(b.smallMm(), u));
    }
    say("  diameter change   {} per {}, {} per {}\n",
        formatLength(c * toMm(1, u), u, u == Units::Inch ? 5 : 4), u == Units::Inch ? "inch" : "mm",
        formatLength(c * toMm(u == Units::Inch ? 12 : 100, u), u),
        u == Units::Inch ? "foot" : "100 mm");
    const Cone cone{0, b.gaugeDiaMm, t, Widens::TowardChuck};
    if (!o.at.empty()) {
        auto v = parseNumberText(o.at);
        if (!v)
            bad("--at", o.at,
                std::string("a distance in ") + unitName(u) + " from the gauge plane");
        // Positive toward the cone's other end.
        const double d = cone.diameterAt((b.gaugeAtLarge ? -1 : 1) * toMm(*v, u));
        say("  at {} from the gauge plane toward the {} end: diameter {}\n",
            formatLength(toMm(*v, u), u), b.gaugeAtLarge ? "small" : "large", formatLength(d, u));
    }
    if (!o.toDia.empty()) {
        const double d = lengthOpt("--to-dia", o.toDia, u);
        say("  diameter {} is {} from the gauge plane ({} end side)\n", formatLength(d, u),
            formatLength(lengthBetweenDiameters(cone, b.gaugeDiaMm, d), u),
            d < b.gaugeDiaMm ? "small" : "large");
    }
}

void printCompound(const Bench& b) {
    const Units u = b.u;
    const double t = b.halfAngleRad;
    say("\nCompound slide (saddle locked, in-feed on the cross-slide)\n");
    say("  scale graduated from the spindle axis:  set {}\n",
        formatDms(compoundScaleReadingRad(t, CompoundScale::FromAxis), 1));
    say("  scale graduated from the cross-slide:   set {}\n",
        formatDms(compoundScaleReadingRad(t, CompoundScale::FromCrossSlide), 1));
    if (b.lengthMm)
        say("  stroke to cover {} of cone:  {} along the compound\n", formatLength(*b.lengthMm, u),
            formatLength(compoundStrokeMm(t, *b.lengthMm), u));
    const double unit = toMm(u == Units::Inch ? 0.001 : 0.01, u);
    say("  {} of compound travel changes the diameter by {}\n", formatLength(unit, u),
        formatLength(diameterChangeForCompoundTravelMm(t, unit), u, u == Units::Inch ? 6 : 5));
}

std::string blockList(const GaugeStack& s, Units setUnits) {
    std::string out;
    for (double v : s.blocks) {
        if (!out.empty())
            out += " + ";
        out += fmt::format("{:.{}f}", v, setUnits == Units::Inch ? 4 : 3);
    }
    return out + " " + unitName(setUnits);
}

void printSineBars(const Bench& b, const std::optional<GaugeBlockSet>& custom) {
    const GaugeBlockSet inch = custom ? *custom : commonInchBlockSet();
    const GaugeBlockSet metric = custom ? *custom : commonMetricBlockSet();
    say("\nSine bar: stack under one roll (H = L sin angle)\n");
    say("  blocks from: {}\n",
        custom ? custom->name : inch.name + " / " + metric.name + " (common practice)");
    const std::pair<const char*, double> uses[] = {
        {"half angle (work on sine centres: the top line lies level)", b.halfAngleRad},
        {"included angle (cone lying on the bar: the top line lies level)", 2 * b.halfAngleRad}};
    for (const auto& [what, angle] : uses) {
        say("  at the {}:\n", what);
        if (angle >= degToRad(90)) {
            say("    not on a sine bar: 90° or more\n");
            continue;
        }
        for (const auto& bar : commonSineBars()) {
            const bool inchBar = bar.name.find("in") != std::string::npos;
            const GaugeBlockSet& set = inchBar ? inch : metric;
            const Units show = inchBar ? Units::Inch : Units::Mm;
            const double h = sineBarStackMm(bar.lengthMm, angle);
            const auto s = combineGaugeBlocks(h, set);
            const std::string stack = formatLength(h, show, show == Units::Inch ? 5 : 4);
            if (s.found)
                say("    {:>6} bar: {:<13} blocks {}\n", bar.name, stack, blockList(s, set.units));
            else
                say("    {:>6} bar: {:<13} no blocks: {}\n", bar.name, stack, s.reason);
        }
    }
}

void printNoseOffsets(const Bench& b, double r, TipSide side) {
    const Units u = b.u;
    const auto o = noseRadiusOffsets(r, b.halfAngleRad, b.widens, side);
    const int fine = u == Units::Inch ? 5 : 4;
    say("\nNose radius {} (outside cone widening toward the {}; imaginary tip on the {} side)\n",
        formatLength(r, u, fine), b.widens == Widens::TowardChuck ? "chuck" : "tailstock",
        side == TipSide::ChuckSide ? "chuck" : "tailstock");
    say("  path on the drawing line {}: {} normal to the surface\n",
        o.leftOn ? "leaves metal on" : "overcuts", formatLength(o.normalErrorMm, u, fine));
    say("  shift the path by ONE of:\n");
    say("    ΔX {} on radius = {} on diameter, {} the axis\n", formatLength(o.dxRadiusMm, u, fine),
        formatLength(o.dxDiameterMm, u, fine), o.xShiftSign < 0 ? "toward" : "away from");
    say("    ΔZ {} toward the {}\n", formatLength(o.dzMm, u, fine),
        o.zShiftSign > 0 ? "chuck" : "tailstock");
}

void printMethods(const Bench& b, const TaperOptions& o) {
    const Units u = b.u;
    say("\nOther ways to cut it (limits are common practice; change them with options)\n");
    if (!b.lengthMm) {
        say("  give --length to judge set-over, taper attachment and compound\n");
        return;
    }
    TaperMethodLimits lim;
    if (auto v = optLength("--compound-travel", o.compoundTravel, u))
        lim.compoundTravelMm = *v;
    if (auto v = optLength("--guide-bar-length", o.guideBarLength, u))
        lim.attachmentTravelMm = *v;
    if (auto v = optLength("--max-set-over", o.maxSetOver, u))
        lim.maxSetOverMm = *v;
    if (!o.guideBarMaxAngle.empty()) {
        auto a = parseAngleText(o.guideBarMaxAngle);
        if (!a || !(*a > 0 && *a < degToRad(90)))
            bad("--guide-bar-max-angle", o.guideBarMaxAngle, "an angle over 0° and under 90°");
        lim.maxAttachmentHalfAngleRad = *a;
    }
    TaperJob job{b.halfAngleRad, *b.lengthMm, optLength("--work-length", o.workLength, u), true};
    say("  taper attachment guide bar: set {} from the axis (tan = TPF/24); offset {} per {}\n",
        formatDms(b.halfAngleRad, 1),
        formatLength(taperAttachmentOffsetMm(b.halfAngleRad, toMm(u == Units::Inch ? 10 : 100, u)),
                     u),
        u == Units::Inch ? "10 in of bar" : "100 mm of bar");
    if (job.workLengthMm)
        say("  tailstock set-over for {} of work between centres: {}\n",
            formatLength(*job.workLengthMm, u),
            formatLength(tailstockSetOverMm(b.halfAngleRad, *job.workLengthMm), u));
    for (const auto& m : judgeTaperMethods(job, lim))
        say("  {:<20} {:<14} {}\n", m.name, m.practical ? "practical" : "not practical", m.why);
}

void printRolls(const Bench& b, const TaperOptions& o) {
    const Units u = b.u;
    const double d = lengthOpt("--rolls", o.rolls, u);
    say("\nOver two rolls of {} (cone standing on its small end on a surface plate)\n",
        formatLength(d, u));
    if (!b.lengthMm) {
        say("  give --length to place the rolls on the cone\n");
        return;
    }
    double h1 = 0, h2 = 0;
    if (!o.rollStacks.empty()) {
        const auto comma = o.rollStacks.find(',');
        if (comma == std::string::npos)
            bad("--roll-stacks", o.rollStacks,
                std::string("two stack heights in ") + unitName(u) + ", as H1,H2");
        h1 = lengthOpt("--roll-stacks", o.rollStacks.substr(0, comma), u, ">=0");
        h2 = lengthOpt("--roll-stacks", o.rollStacks.substr(comma + 1), u, ">=0");
        if (h1 == h2)
            bad("--roll-stacks", o.rollStacks, "two different heights");
    } else {
        // Lower rolls on the plate; upper rolls on the highest round stack that keeps them on
        // the cone.
        const double step = toMm(u == Units::Inch ? 0.25 : 5.0, u);
        h2 = std::floor((*b.lengthMm - d) / step) * step;
        if (h2 <= 0) {
            say("  the cone is too short for two heights with these rolls\n");
            return;
        }
    }
    if (std::max(h1, h2) + d > *b.lengthMm)
        say("  caution: the upper rolls stand above the cone's large end\n");
    const auto rr = rollReadingsForCone(b.smallMm(), b.halfAngleRad, d, h1, h2);
    const int fine = u == Units::Inch ? 5 : 4;
    say("  rolls on stacks {}: centres {} up, cone diameter {}, read M1 = {}\n",
        formatLength(h1, u), formatLength(rr.centreHeight1Mm, u),
        formatLength(rr.diameter1Mm, u, fine), formatLength(rr.reading1Mm, u, fine));
    say("  rolls on stacks {}: centres {} up, cone diameter {}, read M2 = {}\n",
        formatLength(h2, u), formatLength(rr.centreHeight2Mm, u),
        formatLength(rr.diameter2Mm, u, fine), formatLength(rr.reading2Mm, u, fine));
    say("  M2 − M1 = {} for {} of height; M − D = {}\n",
        formatLength(rr.reading2Mm - rr.reading1Mm, u, fine), formatLength(h2 - h1, u),
        formatLength(rr.reading1Mm - rr.diameter1Mm, u, fine + 1));
    say("  from your readings: tan(half angle) = (M2 − M1) / (2 (H2 − H1)); "
        "D = M − d (1 + sec(half angle))\n");
}

void printTipHeight(const Bench& b, double h) {
    const Units u = b.u;
    say("\nTip {} {} centre (a straight cut makes a hyperboloid, not a cone)\n",
        formatLength(std::fabs(h), u, u == Units::Inch ? 4 : 3), h >= 0 ? "above" : "below");
    std::vector<std::pair<const char*, double>> dias{{"gauge", b.gaugeDiaMm}};
    if (b.lengthMm)
        dias = {{"large end", b.largeMm()}, {"small end", b.smallMm()}};
    for (const auto& [what, d] : dias) {
        if (std::fabs(h) >= d / 2) {
            say("  {} {}: the tip is off by more than the radius\n", what, formatLength(d, u));
            continue;
        }
        say("  {:<10} {}: cut {} larger on diameter (≈ 2h²/D = {})\n", what, formatLength(d, u),
            formatSmallLength(diameterErrorOffCentreMm(d, h), u),
            formatSmallLength(diameterErrorOffCentreApproxMm(d, h), u));
    }
}

void printRoughness(const Bench& b, double f, double r) {
    const Units u = b.u;
    say("\nTheoretical roughness, feed {} per rev, nose radius {}\n",
        formatLength(f, u, u == Units::Inch ? 4 : 3), formatLength(r, u, u == Units::Inch ? 5 : 2));
    auto rough = [u](double mm) {
        return u == Units::Inch
                   ? fmt::format("{:.1f} µin ({:.3f} µm)", mm / kMmPerInch * 1e6, mm * 1e3)
                   : fmt::format("{:.3f} µm", mm * 1e3);
    };
    say("  Rt = f²/8r {}   exact arc {}\n", rough(rtApproxMm(f, r)), rough(rtExactMm(f, r)));
    say("  Ra ≈ 0.0321 f²/r {}   exact arc {}\n", rough(raApproxMm(f, r)), rough(raExactMm(f, r)));
    say("  (geometry only: real surfaces are rougher with built-up edge, chatter or wear)\n");
}

void run(const TaperOptions& o) {
    gOut.clear();
    const Bench b = resolveCone(o);
    const Units u = b.u;
    // Check every optional value before printing anything.
    const auto r = optLength("--nose-radius", o.noseRadius, u);
    const auto f = optLength("--feed", o.feed, u);
    const auto h = optLength("--tip-height", o.tipHeight, u, "any");
    optLength("--work-length", o.workLength, u);
    if (!o.rolls.empty())
        lengthOpt("--rolls", o.rolls, u);
    TipSide side = TipSide::ChuckSide;
    if (o.tipSide == "tailstock")
        side = TipSide::TailstockSide;
    else if (o.tipSide != "chuck")
        bad("--tip-side", o.tipSide, "chuck or tailstock");
    if (f && !r)
        bad("--feed", o.feed, "--nose-radius too, for the roughness");
    if (f && r && !(*f < 2 * *r))
        bad("--feed", o.feed,
            "a feed below twice the nose radius (" + formatLength(2 * *r, u) + ")");
    std::optional<GaugeBlockSet> custom;
    if (!o.blocks.empty()) {
        GaugeBlockSet set{"your blocks", u, {}};
        std::size_t start = 0;
        while (start <= o.blocks.size()) {
            const auto end = std::min(o.blocks.find(',', start), o.blocks.size());
            const std::string item = o.blocks.substr(start, end - start);
            auto v = parseNumberText(item);
            if (!v || !(*v > 0))
                bad("--blocks", o.blocks,
                    std::string("block sizes in ") + unitName(u) +
                        " > 0, separated by commas (bad: '" + item + "')");
            set.sizes.push_back(*v);
            start = end + 1;
        }
        custom = set;
    }

    say("swarf taper: bench figures in {}\n\n", u == Units::Inch ? "inch" : "mm");
    printCone(b, o);
    printCompound(b);
    printSineBars(b, custom);
    if (r)
        printNoseOffsets(b, *r, side);
    printMethods(b, o);
    if (!o.rolls.empty())
        printRolls(b, o);
    if (h)
        printTipHeight(b, *h);
    if (f && r)
        printRoughness(b, *f, *r);

    std::vector<std::string> more;
    if (!r)
        more.push_back("--nose-radius R (offsets)");
    if (r && !f)
        more.push_back("--feed F (roughness)");
    if (o.workLength.empty())
        more.push_back("--work-length L (set-over)");
    if (o.rolls.empty())
        more.push_back("--rolls D (readings over rolls)");
    if (!h)
        more.push_back("--tip-height H (off-centre error)");
    if (!more.empty()) {
        say("\nMore figures with:");
        for (const auto& m : more)
            say(" {};", m);
        say("\n");
    }
    say("\nCautions: these are geometry only. They do not model cutting forces, deflection of "
        "the work or tool, chatter, wear or measuring error. Check the set-up and take a "
        "trial cut before the finishing pass; stop the spindle before measuring; guard "
        "your eyes and keep clear of the chuck.\n");
    std::fputs(gOut.c_str(), stdout);
    gOut.clear();
}

} // namespace

void registerTaper(CLI::App& app, int& exitCode) {
    auto o = std::make_shared<TaperOptions>();
    auto* cmd = app.add_subcommand(
        "taper", "Bench calculator: one cone in every form, with compound, sine bar, nose-radius, "
                 "set-over, roll and roughness figures");
    cmd->add_option("--units", o->units,
                    "mm (default) or inch: the unit of every length in and out");
    cmd->add_option(
        "--standard", o->standard,
        "a standard taper: 'Morse 3', 'Metric 80', '7:24 40', NPT, 'Jarno 6', 'B&S 7', 1:10");
    cmd->add_option("--dia", o->dia, "diameter at the gauge plane");
    cmd->add_option("--half-angle", o->halfAngle, "half angle from the axis: 1.4321 or 1°25′56″");
    cmd->add_option("--included", o->included, "included angle: 2.8642 or 2°51′51″");
    cmd->add_option("--ratio", o->ratio, "taper ratio on diameter: 1:20");
    cmd->add_option("--per-foot", o->perFoot, "taper per foot on diameter, in/ft");
    cmd->add_option("--rate", o->rate, "rate of taper C = (D − d)/L");
    cmd->add_option("--dia2", o->dia2, "a second diameter, --length away from --dia");
    cmd->add_option("--length", o->length, "cone length from the gauge plane to its other end");
    cmd->add_option("--gauge-end", o->gaugeEnd, "large (default) or small: which end --dia is at");
    cmd->add_option("--widens", o->widens,
                    "chuck (default) or tailstock: the way the diameter grows on the lathe");
    cmd->add_option("--at", o->at, "print the diameter this far from the gauge plane");
    cmd->add_option("--to-dia", o->toDia,
                    "print how far from the gauge plane the cone has this diameter");
    cmd->add_option("--nose-radius", o->noseRadius,
                    "tool nose radius, for the offsets and roughness");
    cmd->add_option(
        "--tip-side", o->tipSide,
        "chuck (default) or tailstock: the side of the nose the imaginary tip is set on");
    cmd->add_option("--feed", o->feed, "feed per revolution, for the roughness");
    cmd->add_option("--work-length", o->workLength,
                    "work length between centres, for the set-over");
    cmd->add_option("--compound-travel", o->compoundTravel,
                    "usable compound travel (default 100 mm)");
    cmd->add_option("--guide-bar-length", o->guideBarLength,
                    "taper attachment's usable length (default 250 mm)");
    cmd->add_option("--guide-bar-max-angle", o->guideBarMaxAngle,
                    "taper attachment's largest angle (default 10°)");
    cmd->add_option("--max-set-over", o->maxSetOver,
                    "largest tailstock set-over you accept (default 10 mm)");
    cmd->add_option("--rolls", o->rolls, "roll (pin) diameter, for readings over rolls");
    cmd->add_option("--roll-stacks", o->rollStacks, "heights of the blocks under the rolls: H1,H2");
    cmd->add_option("--tip-height", o->tipHeight, "tool tip above (+) or below (−) centre");
    cmd->add_option("--blocks", o->blocks,
                    "your gauge blocks, comma separated, in --units (replaces the common sets)");
    cmd->callback([o, &exitCode] {
        run(*o);
        exitCode = kExitOk;
    });
}

} // namespace swarf::app
