// Reading MEASURED.toml (scenes/MEASURED.md): after_pass, then any mix of [[diameter]],
// [[over_rolls]], [[gauge]] and [[indicator]], each with an optional uncertainty whose default
// is common practice for the instrument (measurement.h).
#include "swarf/io/measured_reader.h"

#include "scene_sections.h"
#include "scene_text.h"

#include <cmath>
#include <filesystem>
#include <fstream>

namespace swarf::io {

using detail::Fields;

namespace {

// The tables of one array-of-tables key ("diameter" → [[diameter]]).
template <class Fn> void eachTable(const Fields& root, const char* key, Fn&& fn) {
    const toml::array* arr = root.array(key, std::string("[[") + key + "]] tables");
    if (!arr)
        return;
    int index = 0;
    for (const toml::node& n : *arr) {
        ++index;
        const std::string path = std::string(key) + "[" + std::to_string(index) + "]";
        const toml::table* t = n.as_table();
        if (!t)
            throw InputError(detail::locOf(n.source(), root.context().file), path,
                             detail::valueText(n),
                             std::string("expected a table: write it as [[") + key + "]]");
        fn(*t, path);
    }
}

// A list of lengths (mm), each finite and at most 10 m either way.
std::vector<double> lengths(const Fields& f, std::string_view key, const std::string& what) {
    const toml::array* a = f.array(key, what);
    if (!a)
        f.missing(key, what);
    std::vector<double> out;
    for (const toml::node& n : *a) {
        std::optional<double> v;
        if (auto i = n.as_integer())
            v = static_cast<double>(i->get());
        if (auto d = n.as_floating_point())
            v = d->get();
        if (!v || !std::isfinite(*v) ||
            std::fabs(toMm(*v, f.context().units)) > detail::kMaxLengthMm)
            throw InputError(
                detail::locOf(n.source(), f.context().file), f.keyPath(key), detail::valueText(n),
                "expected " + what + ": numbers in " + f.unit() + ", each at most 10 m either way");
        out.push_back(toMm(*v, f.context().units));
    }
    return out;
}

double uncertainty(const Fields& f, double defaultMm) {
    const auto v = f.length("uncertainty", "the reading's standard uncertainty");
    if (v)
        f.require(*v > 0, "uncertainty", "expected more than 0");
    return v.value_or(defaultMm);
}

} // namespace

Measurements readMeasurementsText(const std::string& text, const std::string& fileName,
                                  const Scene& scene) {
    detail::checkSceneText(text, fileName);
    toml::table doc;
    try {
        doc = toml::parse(text, fileName);
    } catch (const toml::parse_error& e) {
        const auto& b = e.source().begin;
        throw InputError({fileName, static_cast<int>(b.line), static_cast<int>(b.column)}, "", "",
                         "not valid TOML: " + std::string(e.description()));
    }
    detail::ReadContext ctx{fileName, scene.units};
    Fields root(doc, "", ctx,
                {"units", "after_pass", "note", "diameter", "over_rolls", "gauge", "indicator"});
    if (auto u = root.choice("units", {"mm", "inch"}))
        ctx.units = *u == "inch" ? Units::Inch : Units::Mm;
    const bool inch = ctx.units == Units::Inch;
    Measurements m;
    m.file = fileName;
    m.where = root.where();
    const int passes = static_cast<int>(scene.plan.passes.size());
    const auto after = root.integer("after_pass", "the pass after which the part was measured");
    if (!after)
        root.missing("after_pass", "the pass (counting from 1) after which the part was measured");
    root.require(*after >= 1 && *after < passes, "after_pass",
                 "expected a pass from 1 to " + std::to_string(passes - 1) + ": the scene has " +
                     std::to_string(passes) + " passes, and at least one must be left to correct");
    m.afterPass = static_cast<int>(*after);

    const Feature* cone = scene.part.mainCone();
    if (!cone)
        throw InputError({scene.file, 0, 0}, "", "",
                         "nothing to correct: the scene's drawing has no cone");
    const double zLo = cone->zStartMm, zHi = cone->zEndMm;
    const std::string onCone =
        "expected a plane on the cone, from " + formatLengthNumber(zLo, ctx.units) + " to " +
        formatLengthNumber(zHi, ctx.units) + " " + unitName(ctx.units) + " from the datum face";
    auto onTheCone = [&](double z) { return z >= zLo - 1e-9 && z <= zHi + 1e-9; };

    eachTable(root, "diameter", [&](const toml::table& t, const std::string& path) {
        Fields f(t, path, ctx, {"at", "value", "uncertainty", "note"});
        DiameterReading r;
        r.where = f.where();
        r.zMm = f.requiredLength("at", "the plane, from the datum face");
        f.require(onTheCone(r.zMm), "at", onCone);
        r.valueMm = f.requiredLength("value", "the diameter read");
        f.require(r.valueMm > 0, "value", "expected a diameter more than 0");
        r.uncertaintyMm = uncertainty(f, defaultMicrometerUncertaintyMm(inch));
        m.diameters.push_back(r);
    });
    eachTable(root, "over_rolls", [&](const toml::table& t, const std::string& path) {
        Fields f(t, path, ctx, {"roll", "at", "heights", "reading", "uncertainty", "note"});
        RollsReading r;
        r.where = f.where();
        r.rollDiameterMm = f.requiredLength("roll", "the rolls' diameter");
        f.require(r.rollDiameterMm > 0, "roll", "expected a roll diameter more than 0");
        f.require(!(f.has("at") && f.has("heights")), "heights",
                  "expected either at (planes from the datum face) or heights (from the cone's "
                  "small end), not both");
        if (f.has("heights")) {
            // Roll-centre heights above the cone's small end, as the set-up sheet prints them.
            const double g = cone->cone.growthSign();
            const double zSmall = g > 0 ? zLo : zHi;
            for (double h : lengths(f, "heights", "roll-centre heights above the small end"))
                r.zMm.push_back(zSmall + g * h);
        } else {
            r.zMm = lengths(f, "at", "roll-centre planes from the datum face");
        }
        const std::string key = f.has("heights") ? "heights" : "at";
        for (double z : r.zMm)
            f.require(onTheCone(z), key, onCone);
        r.readingMm = lengths(f, "reading", "the readings over the rolls, one per plane");
        f.require(!r.zMm.empty(), key, "expected at least one plane");
        f.require(r.readingMm.size() == r.zMm.size(), "reading",
                  "expected one reading per plane (" + std::to_string(r.zMm.size()) + ")");
        for (double v : r.readingMm)
            f.require(v > r.rollDiameterMm, "reading",
                      "expected readings larger than the rolls: a reading takes in both rolls");
        r.uncertaintyMm = uncertainty(f, defaultRollsUncertaintyMm(inch));
        m.rolls.push_back(r);
    });
    eachTable(root, "gauge", [&](const toml::table& t, const std::string& path) {
        Fields f(t, path, ctx,
                 {"gauge_diameter", "gauge_plane", "from", "stand_off", "uncertainty", "note"});
        GaugeReading r;
        r.where = f.where();
        r.gaugeDiameterMm = f.requiredLength("gauge_diameter", "the gauge's own gauge diameter");
        f.require(r.gaugeDiameterMm > 0, "gauge_diameter", "expected more than 0");
        r.gaugePlaneMm =
            f.length("gauge_plane", "from the gauge's face to its gauge plane").value_or(0.0);
        r.referenceZMm = f.length("from", "the part's reference face").value_or(0.0);
        r.standOffMm = f.requiredLength("stand_off", "from the reference face to the gauge's face");
        f.require(onTheCone(r.zMm()), "stand_off",
                  onCone + " (from + stand_off + gauge_plane puts the gauge's diameter at " +
                      formatLengthNumber(r.zMm(), ctx.units) + ")");
        r.uncertaintyMm = uncertainty(f, defaultStandOffUncertaintyMm(inch));
        m.gauges.push_back(r);
    });
    eachTable(root, "indicator", [&](const toml::table& t, const std::string& path) {
        Fields f(t, path, ctx, {"travel", "angle", "change", "uncertainty", "note"});
        IndicatorReading r;
        r.where = f.where();
        r.travelMm = f.requiredLength("travel", "the length run");
        f.require(r.travelMm > 0, "travel", "expected a length run more than 0");
        r.lineAngleRad = f.angle("angle", "the line of travel from the axis").value_or(0.0);
        f.require(r.lineAngleRad >= 0 && r.lineAngleRad < degToRad(90), "angle",
                  "expected 0 (along the axis) or more, less than 90 degrees");
        r.changeMm = f.requiredLength("change", "the change of reading over the travel");
        r.uncertaintyMm = uncertainty(f, defaultIndicatorUncertaintyMm(inch));
        m.indicators.push_back(r);
    });
    if (m.diameters.empty() && m.rolls.empty() && m.gauges.empty() && m.indicators.empty())
        throw InputError(m.where, "", "",
                         "no measurement in the file: expected at least one [[diameter]], "
                         "[[over_rolls]], [[gauge]] or [[indicator]]");
    return m;
}

Measurements readMeasurements(const std::string& path, const Scene& scene) {
    std::error_code ec;
    if (std::filesystem::is_directory(path, ec))
        throw InputError({path, 0, 0}, "", "", "cannot open the measurement file: it is a folder");
    std::ifstream in(path, std::ios::binary);
    if (!in)
        throw InputError({path, 0, 0}, "", "", "cannot open the measurement file");
    std::string text(detail::kMaxSceneBytes + 1, '\0');
    in.read(text.data(), static_cast<std::streamsize>(text.size()));
    text.resize(static_cast<std::size_t>(in.gcount()));
    return readMeasurementsText(text, path, scene);
}

} // namespace swarf::io
