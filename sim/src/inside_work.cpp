// Inside work: whether the hole, the inside features and the boring bar hang together; the
// notes on a boring set-up; the refusal of commands that do not simulate inside work yet.
#include "swarf/sim/inside_work.h"

#include <algorithm>
#include <cmath>
#include <cstdio>

namespace swarf {

namespace {

constexpr double kEps = 1e-9;

std::string shortNumber(double mm, Units u) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.6g", fromMm(mm, u));
    return buf;
}

std::string featureKey(std::size_t i) {
    return "part.feature[" + std::to_string(i + 1) + "]";
}

std::string featureNamed(const Feature& f, std::size_t i) {
    const std::string which = "feature " + std::to_string(i + 1);
    return f.name == which ? which : which + " (\"" + f.name + "\")";
}

// The feature's key that gives its smaller (or larger) end's diameter, as the scene writes it.
std::string endKey(const Feature& f, bool larger) {
    if (f.kind != FeatureKind::Cone)
        return f.kind == FeatureKind::Chamfer && larger ? "at" : "diameter";
    const bool startIsLarger = f.cone.widens == Widens::TowardTailstock;
    return (startIsLarger == larger) ? "from" : "to";
}

double diameterAt(const Feature& f, double zMm) {
    return 2.0 * f.radiusAt(std::clamp(zMm, f.zStartMm, f.zEndMm));
}

// The smaller and larger diameters of a radial feature (a face: its outer diameter).
std::pair<double, double> diameterRange(const Feature& f) {
    const double a = diameterAt(f, f.zStartMm), b = diameterAt(f, f.zEndMm);
    return {std::min(a, b), std::max(a, b)};
}

std::optional<InsideWorkProblem> stockProblem(const Scene& s) {
    const Stock& st = s.stock;
    const Units u = s.units;
    if (st.boreDiameterMm < 0 || (st.hasBore() && st.boreDiameterMm >= st.diameterMm - kEps))
        return InsideWorkProblem{"stock.bore_diameter", shortNumber(st.boreDiameterMm, u),
                                 "expected a hole smaller than the bar (" +
                                     formatLength(st.diameterMm, u) + "), leaving a wall",
                                 st.boreWhere};
    if (st.hasBore() && !(st.boreDepthMm > 0 && st.boreDepthMm <= st.lengthMm + kEps))
        return InsideWorkProblem{"stock.bore_depth", shortNumber(st.boreDepthMm, u),
                                 "expected more than 0 and at most the bar length (" +
                                     formatLength(st.lengthMm, u) + ")",
                                 st.boreWhere};
    return std::nullopt;
}

// An inside feature against the hole, the bar and the outside features it runs under.
std::optional<InsideWorkProblem> insideFeatureProblem(const Scene& s, std::size_t i) {
    const Stock& st = s.stock;
    const Units u = s.units;
    const Feature& f = s.part.features[i];
    const std::string k = featureKey(i);
    if (!st.hasBore())
        return InsideWorkProblem{k + ".side", "\"inside\"",
                                 "expected an inside feature only in stock with a hole: give "
                                 "stock.bore_diameter and stock.bore_depth (a boring bar does "
                                 "not drill)",
                                 f.where};
    const bool pointLike = f.kind == FeatureKind::Face || f.kind == FeatureKind::Chamfer;
    if (f.zEndMm > st.boreBottomZMm() + kEps)
        return InsideWorkProblem{
            k + (pointLike ? ".at" : ".to"), shortNumber(pointLike ? f.zStartMm : f.zEndMm, u),
            "expected the inside feature within the stock's hole, whose bottom is at z = " +
                formatLength(st.boreBottomZMm(), u) + " (stock.bore_depth " +
                formatLength(st.boreDepthMm, u) +
                " from the free end): a boring bar does not drill",
            f.where};
    const auto [dMin, dMax] = diameterRange(f);
    if (dMin < st.boreDiameterMm - kEps)
        return InsideWorkProblem{k + "." + endKey(f, false), shortNumber(dMin, u),
                                 "expected an inside diameter no smaller than the stock's hole (" +
                                     formatLength(st.boreDiameterMm, u) +
                                     "): cutting opens a hole, it cannot close it; here it is " +
                                     formatLength(dMin, u),
                                 f.where};
    if (dMax >= st.diameterMm - kEps)
        return InsideWorkProblem{k + "." + endKey(f, true), shortNumber(dMax, u),
                                 "expected an inside diameter smaller than the bar (" +
                                     formatLength(st.diameterMm, u) +
                                     "), leaving a wall; here it is " + formatLength(dMax, u),
                                 f.where};
    if (f.kind == FeatureKind::Face)
        return std::nullopt;
    // A wall under every outside feature it overlaps: both surfaces are straight, so the ends of
    // the overlap decide.
    for (std::size_t j = 0; j < s.part.features.size(); ++j) {
        const Feature& o = s.part.features[j];
        if (o.side != Side::Outside || o.kind == FeatureKind::Face)
            continue;
        const double za = std::max(f.zStartMm, o.zStartMm), zb = std::min(f.zEndMm, o.zEndMm);
        if (za > zb + kEps)
            continue;
        for (double z : {za, zb}) {
            const double in = diameterAt(f, z), out = diameterAt(o, z);
            if (in >= out - kEps)
                return InsideWorkProblem{k + "." + endKey(f, true), shortNumber(in, u),
                                         "expected a wall: the bore is " + formatLength(in, u) +
                                             " at z = " + formatLength(z, u) + ", where " +
                                             featureNamed(o, j) + " is only " +
                                             formatLength(out, u) + " outside",
                                         f.where};
        }
    }
    return std::nullopt;
}

// An outside feature where the hole runs must stay larger than it.
std::optional<InsideWorkProblem> outsideOverHoleProblem(const Scene& s, std::size_t i) {
    const Stock& st = s.stock;
    const Feature& f = s.part.features[i];
    if (!st.hasBore() || f.zStartMm > st.boreBottomZMm() + kEps)
        return std::nullopt;
    const double zb = std::min(f.zEndMm, st.boreBottomZMm());
    const double d = std::min(diameterAt(f, f.zStartMm), diameterAt(f, zb));
    if (d > st.boreDiameterMm + kEps)
        return std::nullopt;
    const Units u = s.units;
    const std::string key = f.kind == FeatureKind::Face ? "diameter" : endKey(f, false);
    return InsideWorkProblem{featureKey(i) + "." + key, shortNumber(d, u),
                             "expected the outside larger than the stock's hole (" +
                                 formatLength(st.boreDiameterMm, u) +
                                 ", to z = " + formatLength(st.boreBottomZMm(), u) +
                                 ") where the hole runs: here it is " + formatLength(d, u) +
                                 ", which would cut through the wall",
                             f.where};
}

std::optional<InsideWorkProblem> toolProblem(const Scene& s) {
    const Tool& t = s.tool;
    const Stock& st = s.stock;
    const Units u = s.units;
    const bool anyOutside = std::any_of(s.part.features.begin(), s.part.features.end(),
                                        [](const Feature& f) { return f.side == Side::Outside; });
    if (t.kind == ToolKind::Turning) {
        if (!anyOutside && !s.part.features.empty())
            return InsideWorkProblem{"tool.kind", "\"turning\"",
                                     "expected kind = \"boring_bar\": every feature of this part "
                                     "is inside, and a turning tool does not reach into a hole",
                                     t.where};
        return std::nullopt;
    }
    if (!st.hasBore())
        return InsideWorkProblem{"tool.kind", "\"boring_bar\"",
                                 "expected a boring bar only in stock with a hole: give "
                                 "stock.bore_diameter and stock.bore_depth",
                                 t.where};
    if (!(t.barDiameterMm > 0))
        return InsideWorkProblem{"tool.bar_diameter", shortNumber(t.barDiameterMm, u),
                                 "expected more than 0", t.where};
    if (!(t.overhangMm > 0))
        return InsideWorkProblem{"tool.overhang", shortNumber(t.overhangMm, u),
                                 "expected more than 0", t.where};
    if (t.minBoreMm < t.barDiameterMm - kEps)
        return InsideWorkProblem{"tool.min_bore", shortNumber(t.minBoreMm, u),
                                 "expected at least the bar diameter (" +
                                     formatLength(t.barDiameterMm, u) +
                                     "): the bar itself goes into the hole",
                                 t.where};
    // The bar must reach every inside surface it cuts: the smallest drawn inside diameter.
    for (std::size_t i = 0; i < s.part.features.size(); ++i) {
        const Feature& f = s.part.features[i];
        if (f.side != Side::Inside || f.kind == FeatureKind::Face)
            continue;
        const double dMin = diameterRange(f).first;
        if (t.minBoreMm > dMin + kEps)
            return InsideWorkProblem{
                "tool.min_bore", shortNumber(t.minBoreMm, u),
                "expected a boring bar that enters the drawn bore: " + featureNamed(f, i) + " is " +
                    formatLength(dMin, u) + " at its smallest, and this bar needs " +
                    formatLength(t.minBoreMm, u) + " or more",
                t.where};
    }
    if (std::fabs(t.tipHeightMm) >= st.boreDiameterMm / 2 - kEps)
        return InsideWorkProblem{"tool.axis_height", shortNumber(t.tipHeightMm, u),
                                 "expected less than the hole's radius (" +
                                     formatLength(st.boreDiameterMm / 2, u) + ") off centre",
                                 t.where};
    return std::nullopt;
}

} // namespace

std::optional<InsideWorkProblem> insideWorkProblem(const Scene& scene) {
    if (auto p = stockProblem(scene))
        return p;
    for (std::size_t i = 0; i < scene.part.features.size(); ++i) {
        auto p = scene.part.features[i].side == Side::Inside ? insideFeatureProblem(scene, i)
                                                             : outsideOverHoleProblem(scene, i);
        if (p)
            return p;
    }
    return toolProblem(scene);
}

void validateInsideWork(const Scene& scene) {
    if (auto p = insideWorkProblem(scene))
        throw InputError(p->where, p->key, p->value, p->expected);
}

bool hasInsideWork(const Scene& scene) {
    return scene.stock.hasBore() || scene.part.hasInside() ||
           scene.tool.kind == ToolKind::BoringBar;
}

void refuseInsideWork(const Scene& scene, std::string_view command) {
    const std::string why = "expected a scene without inside work: swarf " + std::string(command) +
                            " does not simulate bores, inside features or boring bars yet "
                            "(swarf check reads and checks them)";
    for (std::size_t i = 0; i < scene.part.features.size(); ++i)
        if (scene.part.features[i].side == Side::Inside)
            throw InputError(scene.part.features[i].where, featureKey(i) + ".side", "\"inside\"",
                             why);
    if (scene.tool.kind == ToolKind::BoringBar)
        throw InputError(scene.tool.where, "tool.kind", "\"boring_bar\"", why);
    if (scene.stock.hasBore())
        throw InputError(scene.stock.boreWhere, "stock.bore_diameter",
                         shortNumber(scene.stock.boreDiameterMm, scene.units), why);
}

std::vector<std::string> insideWorkNotes(const Scene& scene) {
    std::vector<std::string> notes;
    const Tool& t = scene.tool;
    if (t.kind != ToolKind::BoringBar)
        return notes;
    const Units u = scene.units;
    // Common practice: a steel boring bar chatters beyond about four diameters of overhang.
    if (t.overhangMm > kSteelBarOverhangDiameters * t.barDiameterMm + kEps) {
        char ratio[32];
        std::snprintf(ratio, sizeof ratio, "%.1f", t.overhangMm / t.barDiameterMm);
        notes.push_back("the boring bar overhangs " + formatLength(t.overhangMm, u) + ", " + ratio +
                        " bar diameters: about 4 or less is usual for a steel bar "
                        "(common practice; a carbide or damped bar goes further), or it chatters");
    }
    if (!scene.part.hasInside())
        notes.push_back("the tool is a boring bar, but the part has no inside feature: it "
                        "has nothing to bore");
    return notes;
}

} // namespace swarf
