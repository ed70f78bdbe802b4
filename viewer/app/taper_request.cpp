// Reading the options of `swarf taper` (see taper_request.h).
#include "taper_request.h"

#include "swarf/sim/angle_text.h"
#include "swarf/sim/error.h"

#include <fmt/core.h>

#include <algorithm>
#include <cmath>

namespace swarf::app {

namespace {

[[noreturn]] void bad(const std::string& option, const std::string& value,
                      const std::string& expected) {
    throw InputError(SourceLoc{"command line", 0, 0}, option, value, expected);
}

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

TaperRequest resolveCone(const TaperOptions& o) {
    TaperRequest b;
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

// Two stack heights "H1,H2", different, each 0 or more.
std::pair<double, double> rollStacks(const std::string& text, Units u) {
    const auto comma = text.find(',');
    if (comma == std::string::npos)
        bad("--roll-stacks", text,
            std::string("two stack heights in ") + unitName(u) + ", as H1,H2");
    const double h1 = lengthOpt("--roll-stacks", text.substr(0, comma), u, ">=0");
    const double h2 = lengthOpt("--roll-stacks", text.substr(comma + 1), u, ">=0");
    if (h1 == h2)
        bad("--roll-stacks", text, "two different heights");
    return {h1, h2};
}

GaugeBlockSet blockSet(const std::string& text, Units u) {
    GaugeBlockSet set{"your blocks", u, {}};
    std::size_t start = 0;
    while (start <= text.size()) {
        const auto end = std::min(text.find(',', start), text.size());
        const std::string item = text.substr(start, end - start);
        auto v = parseNumberText(item);
        if (!v || !(*v > 0))
            bad("--blocks", text,
                std::string("block sizes in ") + unitName(u) + " > 0, separated by commas (bad: '" +
                    item + "')");
        set.sizes.push_back(*v);
        start = end + 1;
    }
    return set;
}

} // namespace

double TaperRequest::largeMm() const {
    return gaugeAtLarge || !lengthMm
               ? gaugeDiaMm
               : otherEndDiameterMm(gaugeDiaMm, halfAngleRad, *lengthMm, false);
}

double TaperRequest::smallMm() const {
    return gaugeAtLarge && lengthMm ? otherEndDiameterMm(gaugeDiaMm, halfAngleRad, *lengthMm, true)
                                    : gaugeDiaMm;
}

TaperRequest readTaperOptions(const TaperOptions& o) {
    TaperRequest b = resolveCone(o);
    const Units u = b.u;
    b.noseRadiusMm = optLength("--nose-radius", o.noseRadius, u);
    b.feedMmPerRev = optLength("--feed", o.feed, u);
    b.tipHeightMm = optLength("--tip-height", o.tipHeight, u, "any");
    b.workLengthMm = optLength("--work-length", o.workLength, u);
    b.rollDiameterMm = optLength("--rolls", o.rolls, u);
    if (o.tipSide == "tailstock")
        b.tipSide = TipSide::TailstockSide;
    else if (o.tipSide != "chuck")
        bad("--tip-side", o.tipSide, "chuck or tailstock");
    const auto& r = b.noseRadiusMm;
    const auto& f = b.feedMmPerRev;
    if (f && !r)
        bad("--feed", o.feed, "--nose-radius too, for the roughness");
    if (f && r && !(*f < 2 * *r))
        bad("--feed", o.feed,
            "a feed below twice the nose radius (" + formatLength(2 * *r, u) + ")");
    if (!o.blocks.empty())
        b.blocks = blockSet(o.blocks, u);
    if (!o.at.empty()) {
        auto v = parseNumberText(o.at);
        if (!v)
            bad("--at", o.at,
                std::string("a distance in ") + unitName(u) + " from the gauge plane");
        b.atMm = toMm(*v, u);
    }
    b.toDiaMm = optLength("--to-dia", o.toDia, u);
    if (auto v = optLength("--compound-travel", o.compoundTravel, u))
        b.limits.compoundTravelMm = *v;
    if (auto v = optLength("--guide-bar-length", o.guideBarLength, u))
        b.limits.attachmentTravelMm = *v;
    if (auto v = optLength("--max-set-over", o.maxSetOver, u))
        b.limits.maxSetOverMm = *v;
    if (!o.guideBarMaxAngle.empty()) {
        auto a = parseAngleText(o.guideBarMaxAngle);
        if (!a || !(*a > 0 && *a < degToRad(90)))
            bad("--guide-bar-max-angle", o.guideBarMaxAngle, "an angle over 0° and under 90°");
        b.limits.maxAttachmentHalfAngleRad = *a;
    }
    if (!o.rollStacks.empty())
        b.rollStacksMm = rollStacks(o.rollStacks, u);
    return b;
}

} // namespace swarf::app
