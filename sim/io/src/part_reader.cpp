// Reading [part] and its features: cylinders, cones in every form, chamfers, faces.
#include "scene_sections.h"

#include "swarf/io/did_you_mean.h"
#include "swarf/sim/iso2768.h"

#include <cmath>
#include <cstdio>

namespace swarf::io::detail {

namespace {

const std::vector<std::string_view> kAnyFeatureKeys = {"kind",
                                                       "name",
                                                       "from",
                                                       "to",
                                                       "diameter",
                                                       "gauge_plane",
                                                       "gauge_diameter",
                                                       "half_angle",
                                                       "included_angle",
                                                       "ratio",
                                                       "taper_per_foot",
                                                       "second_plane",
                                                       "second_diameter",
                                                       "standard",
                                                       "widens_toward",
                                                       "at",
                                                       "length",
                                                       "angle",
                                                       "tolerance",
                                                       "angle_tolerance",
                                                       "side"};
const std::vector<std::string_view> kCylinderKeys = {"kind",     "name",      "from", "to",
                                                     "diameter", "tolerance", "side"};
const std::vector<std::string_view> kConeKeys = {
    "kind",        "name",           "from",         "to",
    "gauge_plane", "gauge_diameter", "half_angle",   "included_angle",
    "ratio",       "taper_per_foot", "second_plane", "second_diameter",
    "standard",    "widens_toward",  "tolerance",    "angle_tolerance",
    "side"};
const std::vector<std::string_view> kChamferKeys = {
    "kind",     "name",          "at",        "length",          "angle",
    "diameter", "widens_toward", "tolerance", "angle_tolerance", "side"};
const std::vector<std::string_view> kFaceKeys = {"kind",     "name",      "at",
                                                 "diameter", "tolerance", "side"};

std::string fmtLen(double mm, Units u) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.6g %s", fromMm(mm, u), unitName(u));
    return buf;
}

// A key that belongs to another kind of feature: say so, rather than "unknown".
void rejectOtherKindKeys(const toml::table& t, const std::string& path, const ReadContext& ctx,
                         const std::string& kind, const std::vector<std::string_view>& mine) {
    for (auto&& [k, v] : t) {
        bool ok = false;
        for (auto m : mine)
            ok = ok || m == k.str();
        if (ok)
            continue;
        std::string list;
        for (auto m : mine)
            list += (list.empty() ? "" : ", ") + std::string(m);
        throw InputError(locOf(k.source(), ctx.file), path + "." + std::string(k.str()), "",
                         "not a key of a " + kind + ": expected one of " + list);
    }
}

// The tolerance: given (> 0), or from the ISO 2768 class for the nominal size.
void readTolerance(const Fields& f, Feature& feat, Iso2768 cls, double nominalMm) {
    if (auto t = f.length("tolerance", "± on the diameter")) {
        requirePositive(f, "tolerance", *t);
        feat.toleranceMm = *t;
        feat.toleranceFromClass = false;
        return;
    }
    auto fromClass = iso2768LinearToleranceMm(cls, nominalMm);
    if (!fromClass)
        f.missing("tolerance", std::string("± on the diameter: ISO 2768 class ") +
                                   iso2768Name(cls) + " gives none for " +
                                   fmtLen(nominalMm, f.context().units));
    feat.toleranceMm = *fromClass;
    feat.toleranceFromClass = true;
}

void readAngleTolerance(const Fields& f, Feature& feat, Iso2768 cls, double shorterLegMm) {
    if (auto a = f.angle("angle_tolerance", "± on the half angle")) {
        requirePositive(f, "angle_tolerance", *a);
        f.require(*a < degToRad(10), "angle_tolerance", "expected less than 10 degrees");
        feat.angleToleranceRad = *a;
        feat.angleToleranceFromClass = false;
    } else {
        feat.angleToleranceRad = iso2768AngularToleranceRad(cls, shorterLegMm);
    }
}

// from < to, both ≥ 0 (the datum face is the part's free end).
void readExtent(const Fields& f, Feature& feat) {
    feat.zStartMm = f.requiredLength("from", "axial start, from the datum face");
    feat.zEndMm = f.requiredLength("to", "axial end, from the datum face");
    f.require(feat.zStartMm >= 0, "from",
              "expected 0 or more: positions are measured from the datum face toward the chuck");
    f.require(feat.zEndMm > feat.zStartMm, "to",
              "expected more than from (" + fmtLen(feat.zStartMm, f.context().units) + ")");
}

Widens readWidens(const Fields& f) {
    auto w = f.choice("widens_toward", {"chuck", "tailstock"});
    if (!w)
        f.missing("widens_toward", "\"chuck\" or \"tailstock\": which way the diameter grows");
    return *w == "chuck" ? Widens::TowardChuck : Widens::TowardTailstock;
}

// ratio = 10 or ratio = "1:10".
double readRatioK(const Fields& f) {
    const toml::node* n = f.node("ratio");
    if (auto s = n->as_string()) {
        const std::string& t = s->get();
        double a = 0, b = 0;
        char extra = 0;
        if (std::sscanf(t.c_str(), " %lf : %lf %c", &a, &b, &extra) == 2 && a > 0 && b > 0 &&
            std::isfinite(b / a) && b / a > 0)
            return b / a;
        f.fail("ratio", "expected k of a taper 1:k on diameter, as a number (10) or \"1:10\"");
    }
    const double k = *f.number("ratio", "k of a taper 1:k on diameter");
    requirePositive(f, "ratio", k);
    return k;
}

void readCone(const Fields& f, Feature& feat, Iso2768 cls) {
    const Units u = f.context().units;
    readExtent(f, feat);
    Cone& cone = feat.cone;
    cone.gaugeZMm =
        f.requiredLength("gauge_plane", "the drawing's gauge plane, from the datum face");

    // Exactly one way to give the taper.
    const char* forms[] = {"half_angle",   "included_angle",  "ratio",   "taper_per_foot",
                           "second_plane", "second_diameter", "standard"};
    std::string first;
    for (const char* key : forms) {
        if (!f.has(key))
            continue;
        const bool pairOfFirst = first == "second_plane" && std::string(key) == "second_diameter";
        if (!first.empty() && !pairOfFirst)
            f.fail(key, "expected only one way to give the taper; it is already given by " + first);
        if (first.empty())
            first = key;
    }
    if (first == "second_diameter")
        f.missing("second_plane", "the plane where second_diameter is, from the datum face");
    if (first.empty())
        f.missing("half_angle", "one way to give the taper: half_angle, included_angle, ratio, "
                                "taper_per_foot, second_plane with second_diameter, or standard");

    std::optional<double> standardGauge;
    if (first == "standard") {
        const std::string name = *f.string("standard", "a standard taper name");
        auto st = lookupStandardTaper(name);
        if (!st)
            f.fail("standard",
                   "expected a standard taper: " + suggestion(name, standardTaperNames()));
        cone.halfAngleRad = halfAngleFromTaperRate(st->taperRate);
        standardGauge = st->gaugeDiameterMm;
        feat.coneGivenAs = "standard " + st->name;
    }
    if (auto g = f.length("gauge_diameter", "diameter at the gauge plane")) {
        requirePositive(f, "gauge_diameter", *g);
        if (standardGauge && std::fabs(*g - *standardGauge) > 1e-3)
            f.fail("gauge_diameter", "expected the standard's gauge diameter " +
                                         fmtLen(*standardGauge, u) + " (or leave it out)");
        cone.gaugeDiameterMm = *g;
    } else if (standardGauge) {
        cone.gaugeDiameterMm = *standardGauge;
    } else {
        f.missing("gauge_diameter", "the diameter at the gauge plane, a length in " + f.unit());
    }

    if (first == "half_angle") {
        const double a = f.requiredAngle("half_angle", "half angle from the axis");
        f.require(a > 0 && a < degToRad(90), "half_angle",
                  "expected more than 0 and less than 90 degrees");
        cone.halfAngleRad = a;
        feat.coneGivenAs = "half angle";
    } else if (first == "included_angle") {
        const double a = f.requiredAngle("included_angle", "included angle");
        f.require(a > 0 && a < degToRad(180), "included_angle",
                  "expected more than 0 and less than 180 degrees");
        cone.halfAngleRad = halfAngleFromIncluded(a);
        feat.coneGivenAs = "included angle";
    } else if (first == "ratio") {
        cone.halfAngleRad = halfAngleFromRatio(readRatioK(f));
        feat.coneGivenAs = "ratio";
    } else if (first == "taper_per_foot") {
        const double tpf = f.requiredNumber("taper_per_foot", "inches per foot on diameter");
        requirePositive(f, "taper_per_foot", tpf);
        cone.halfAngleRad = halfAngleFromTaperPerFoot(tpf);
        feat.coneGivenAs = "taper per foot";
    } else if (first == "second_plane") {
        const double z2 = f.requiredLength("second_plane", "a second plane, from the datum face");
        const double d2 = f.requiredLength("second_diameter", "the diameter at the second plane");
        requirePositive(f, "second_diameter", d2);
        f.require(std::fabs(z2 - cone.gaugeZMm) > 1e-9, "second_plane",
                  "expected a plane other than the gauge plane");
        f.require(
            std::fabs(d2 - cone.gaugeDiameterMm) > 1e-9, "second_diameter",
            "expected a diameter other than the gauge diameter (equal diameters make a cylinder)");
        cone.halfAngleRad = halfAngleFromTwoDiameters(cone.gaugeZMm, cone.gaugeDiameterMm, z2, d2);
        const bool growsWithZ = (d2 > cone.gaugeDiameterMm) == (z2 > cone.gaugeZMm);
        cone.widens = growsWithZ ? Widens::TowardChuck : Widens::TowardTailstock;
        feat.coneGivenAs = "two diameters";
        f.require(z2 >= feat.zStartMm - 1e-9 && z2 <= feat.zEndMm + 1e-9, "second_plane",
                  "expected a plane within the cone, from " + fmtLen(feat.zStartMm, u) + " to " +
                      fmtLen(feat.zEndMm, u));
    }
    // However it was given, the taper must come out as a half angle strictly between 0 and 90°
    // (a ratio of 1:1e-300 or a taper per foot of 1e300 does not).
    if (!(cone.halfAngleRad > 0 && cone.halfAngleRad < degToRad(90) - 1e-12)) {
        char here[64];
        std::snprintf(here, sizeof here, "%.9g", radToDeg(cone.halfAngleRad));
        f.fail(first, std::string("expected a taper with a half angle more than 0 and less than "
                                  "90 degrees (here ") +
                          here + ")");
    }
    if (first == "second_plane") {
        if (f.has("widens_toward") && readWidens(f) != cone.widens)
            f.fail("widens_toward",
                   std::string("expected \"") +
                       (cone.widens == Widens::TowardChuck ? "chuck" : "tailstock") +
                       "\", as the two diameters say (or leave it out)");
    } else {
        cone.widens = readWidens(f);
    }

    f.require(cone.gaugeZMm >= feat.zStartMm - 1e-9 && cone.gaugeZMm <= feat.zEndMm + 1e-9,
              "gauge_plane",
              "expected a plane within the cone, from " + fmtLen(feat.zStartMm, u) + " to " +
                  fmtLen(feat.zEndMm, u));
    for (const char* key : {"from", "to"}) {
        const double z = std::string(key) == "from" ? feat.zStartMm : feat.zEndMm;
        f.require(cone.diameterAt(z) > 0, key,
                  "expected a position where the cone still has a diameter: it reaches zero at " +
                      fmtLen(cone.zAtDiameter(0), u));
    }
    readTolerance(f, feat, cls, cone.gaugeDiameterMm);
    readAngleTolerance(f, feat, cls, feat.zEndMm - feat.zStartMm);
    feat.diameterMm = std::max(cone.diameterAt(feat.zStartMm), cone.diameterAt(feat.zEndMm));
}

// `at` is the face whose edge the chamfer breaks and `diameter` the edge's. Outside, it widens
// from `at` over `length` to `diameter`; inside, it narrows from `at` to the bore's `diameter`
// (a mouth chamfer: widens toward the tailstock, runs from the face into the hole).
void readChamfer(const Fields& f, Feature& feat, Iso2768 cls) {
    const bool inside = feat.side == Side::Inside;
    const double at = f.requiredLength("at", "the position of the edge, from the datum face");
    f.require(at >= 0, "at", "expected 0 or more: positions are measured from the datum face");
    const double len = f.requiredLength("length", "the chamfer's axial length");
    requirePositive(f, "length", len);
    const double angle = f.angle("angle", "angle from the axis").value_or(degToRad(45));
    f.require(angle > 0 && angle < degToRad(90), "angle",
              "expected more than 0 and less than 90 degrees");
    const double d = f.requiredLength("diameter", "the diameter of the edge the chamfer breaks");
    requirePositive(f, "diameter", d);
    Widens w = inside ? Widens::TowardTailstock : Widens::TowardChuck;
    if (f.has("widens_toward"))
        w = readWidens(f);
    const double step = 2 * len * std::tan(angle);
    if (!inside)
        f.require(d - step > 0, "length",
                  "expected a chamfer that leaves a diameter (it would reach the axis)");
    f.require(d + step <= kMaxLengthMm, "length", "expected a chamfer of at most 10 m diameter");
    // Outside it extends from `at` the way it widens; inside the way it narrows.
    const bool towardChuck = (w == Widens::TowardChuck) != inside;
    feat.zStartMm = towardChuck ? at : at - len;
    feat.zEndMm = towardChuck ? at + len : at;
    f.require(feat.zStartMm >= 0, "at", "expected the chamfer to lie on the part (z 0 or more)");
    feat.diameterMm = d;
    feat.cone = Cone{at, inside ? d + step : d - step, angle, w};
    feat.coneGivenAs = "chamfer";
    readTolerance(f, feat, cls, d);
    readAngleTolerance(f, feat, cls, len);
}

Feature readFeature(const toml::table& t, int index, const ReadContext& ctx, Iso2768 cls) {
    const std::string path = "part.feature[" + std::to_string(index) + "]";
    Fields any(t, path, ctx, kAnyFeatureKeys);
    auto kind = any.choice("kind", {"cylinder", "cone", "chamfer", "face"});
    if (!kind)
        any.missing("kind", "\"cylinder\", \"cone\", \"chamfer\" or \"face\"");
    const auto keys = *kind == "cylinder"  ? kCylinderKeys
                      : *kind == "cone"    ? kConeKeys
                      : *kind == "chamfer" ? kChamferKeys
                                           : kFaceKeys;
    rejectOtherKindKeys(t, path, ctx, *kind, keys);
    Fields f(t, path, ctx, keys);

    Feature feat;
    feat.where = f.where();
    feat.name = f.string("name", "a label").value_or("feature " + std::to_string(index));
    if (auto side = f.choice("side", {"outside", "inside"}))
        feat.side = *side == "inside" ? Side::Inside : Side::Outside;
    if (*kind == "cylinder") {
        feat.kind = FeatureKind::Cylinder;
        readExtent(f, feat);
        feat.diameterMm = f.requiredLength("diameter", "the cylinder's diameter");
        requirePositive(f, "diameter", feat.diameterMm);
        readTolerance(f, feat, cls, feat.diameterMm);
    } else if (*kind == "cone") {
        feat.kind = FeatureKind::Cone;
        readCone(f, feat, cls);
    } else if (*kind == "chamfer") {
        feat.kind = FeatureKind::Chamfer;
        readChamfer(f, feat, cls);
    } else {
        feat.kind = FeatureKind::Face;
        feat.zStartMm = feat.zEndMm =
            f.requiredLength("at", "the face's position from the datum face");
        f.require(feat.zStartMm >= 0, "at",
                  "expected 0 or more: positions are measured from the datum face");
        feat.diameterMm = f.requiredLength("diameter", "the face's outer diameter");
        requirePositive(f, "diameter", feat.diameterMm);
        readTolerance(f, feat, cls, feat.diameterMm);
    }
    return feat;
}

} // namespace

Part readPart(const Fields& root, const Stock& stock) {
    const toml::table* t = root.subtable("part");
    if (!t)
        root.missing("part", "a [part] table with [[part.feature]] entries");
    Fields f(*t, "part", root.context(), {"tolerance_class", "feature"});
    Part part;
    part.where = f.where();
    if (auto cls = f.choice("tolerance_class", {"f", "m", "c", "v"}))
        part.toleranceClass = *parseIso2768(*cls);
    const toml::array* arr = f.array("feature", "[[part.feature]] tables");
    if (!arr || arr->empty())
        f.missing("feature", "at least one [[part.feature]]");
    int index = 0;
    for (const toml::node& n : *arr) {
        ++index;
        const toml::table* ft = n.as_table();
        if (!ft)
            throw InputError(locOf(n.source(), root.context().file),
                             "part.feature[" + std::to_string(index) + "]", valueText(n),
                             "expected a table: write features as [[part.feature]]");
        Feature feat = readFeature(*ft, index, root.context(), part.toleranceClass);
        Fields ff(*ft, "part.feature[" + std::to_string(index) + "]", root.context(),
                  kAnyFeatureKeys);
        const Units u = root.context().units;
        // Along the axis in order, each starting where the one before on its side ends or
        // later: inside features lie under the outside ones.
        const Feature* before = nullptr;
        for (const Feature& p : part.features)
            if (p.side == feat.side)
                before = &p;
        if (before) {
            const Feature& prev = *before;
            ff.require(feat.zStartMm >= prev.zEndMm - 1e-9,
                       feat.kind == FeatureKind::Face || feat.kind == FeatureKind::Chamfer ? "at"
                                                                                           : "from",
                       "expected features in order from the datum face, not overlapping: the one "
                       "before ends at " +
                           fmtLen(prev.zEndMm, u));
        }
        // Outside the jaws: if not, the bar does not stick out far enough (the stick-out is
        // what to change, not the drawing).
        if (feat.zEndMm > stock.jawZMm() + 1e-9) {
            const toml::node* so = root.subtable("stock")->get("stick_out");
            const std::string which = "feature " + std::to_string(index);
            const std::string named =
                feat.name == which ? which : which + " (\"" + feat.name + "\")";
            throw InputError(locOf(so->source(), root.context().file), "stock.stick_out",
                             valueText(*so),
                             "expected at least " + fmtLen(feat.zEndMm + stock.faceAllowanceMm, u) +
                                 ": the part must end outside the jaws, but " + named +
                                 " ends at z = " + fmtLen(feat.zEndMm, u) +
                                 " and the jaws' face is at z = " + fmtLen(stock.jawZMm(), u) +
                                 " (stick-out less face allowance)");
        }
        // No larger than the bar; an inside feature is checked against the hole and the wall
        // with the whole scene (insideWorkProblem).
        if (feat.side == Side::Inside) {
            part.features.push_back(std::move(feat));
            continue;
        }
        double largest = feat.diameterMm;
        if (feat.kind == FeatureKind::Cone)
            largest =
                std::max(feat.cone.diameterAt(feat.zStartMm), feat.cone.diameterAt(feat.zEndMm));
        const char* sizeKey = feat.kind == FeatureKind::Cone
                                  ? (feat.cone.widens == Widens::TowardChuck ? "to" : "from")
                                  : "diameter";
        ff.require(largest <= stock.diameterMm + 1e-9, sizeKey,
                   "expected the part no larger than the bar (" + fmtLen(stock.diameterMm, u) +
                       "); here it is " + fmtLen(largest, u));
        part.features.push_back(std::move(feat));
    }
    return part;
}

} // namespace swarf::io::detail
