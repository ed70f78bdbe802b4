// Reading a scene file: parse the TOML, read every section, convert to mm and radians, validate.
#include "swarf/io/scene_reader.h"

#include "scene_sections.h"
#include "scene_text.h"
#include "swarf/io/did_you_mean.h"
#include "swarf/sim/causes.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/inside_work.h"

#include <cmath>
#include <filesystem>
#include <fstream>
#include <optional>
#include <string>

namespace swarf::io {

namespace detail {

void requirePositive(const Fields& f, std::string_view key, double value, bool zeroAllowed) {
    if (zeroAllowed)
        f.require(value >= 0, key, "expected 0 or more");
    else
        f.require(value > 0, key, "expected more than 0");
}

} // namespace detail

namespace {

using detail::Fields;

Stock readStock(const Fields& root) {
    const toml::table* t = root.subtable("stock");
    if (!t)
        root.missing("stock", "a [stock] table: the bar");
    Fields f(*t, "stock", root.context(),
             {"diameter", "length", "stick_out", "face_allowance", "material", "tailstock",
              "bore_diameter", "bore_depth"});
    Stock s;
    s.where = f.where();
    s.diameterMm = f.requiredLength("diameter", "the bar diameter");
    detail::requirePositive(f, "diameter", s.diameterMm);
    s.lengthMm = f.requiredLength("length", "the whole bar length");
    detail::requirePositive(f, "length", s.lengthMm);
    s.stickOutMm = f.requiredLength("stick_out", "from the jaws' face to the free end");
    detail::requirePositive(f, "stick_out", s.stickOutMm);
    f.require(s.stickOutMm <= s.lengthMm + 1e-9, "stick_out",
              "expected at most the bar length (" + detail::valueText(*f.node("length")) + " " +
                  f.unit() + "): the bar cannot stick out further than it is long");
    s.faceAllowanceMm = f.length("face_allowance", "stock beyond the datum face").value_or(0.0);
    detail::requirePositive(f, "face_allowance", s.faceAllowanceMm, true);
    f.require(s.faceAllowanceMm < s.stickOutMm, "face_allowance",
              "expected less than the stick-out");
    s.material = f.string("material", "free text").value_or("");
    s.tailstockSupport = f.boolean("tailstock").value_or(false);
    // A hole from the free end: both keys or neither. Against the bar and the features it is
    // checked with the whole scene (insideWorkProblem).
    s.boreWhere = f.where("bore_diameter");
    if (auto d = f.length("bore_diameter", "the hole's diameter")) {
        detail::requirePositive(f, "bore_diameter", *d);
        s.boreDiameterMm = *d;
        s.boreDepthMm = f.requiredLength("bore_depth", "how deep the hole goes from the free end");
        detail::requirePositive(f, "bore_depth", s.boreDepthMm);
    } else if (f.has("bore_depth")) {
        f.missing("bore_diameter", "the hole's diameter, with bore_depth");
    }
    return s;
}

PlanningOptions readPlanning(const Fields& root) {
    PlanningOptions p;
    const toml::table* t = root.subtable("planning");
    if (!t)
        return p;
    Fields f(*t, "planning", root.context(),
             {"max_depth", "finish_allowance", "rough_feed", "finish_feed", "placing", "roughing",
              "roll_diameter", "trial_cut", "in_tolerance_target"});
    p.where = f.where();
    p.maxDepthMm = f.length("max_depth", "largest depth per roughing pass").value_or(p.maxDepthMm);
    // Common practice: a depth of cut is dialled in hundredths of a mm or more; finer would
    // plan thousands of passes.
    f.require(p.maxDepthMm >= kMinMaxDepthMm - 1e-12, "max_depth",
              "expected at least 0.01 mm (0.0004 in): a roughing depth finer than that would take "
              "thousands of passes");
    p.finishAllowanceMm =
        f.length("finish_allowance", "left for finishing").value_or(p.finishAllowanceMm);
    detail::requirePositive(f, "finish_allowance", p.finishAllowanceMm, true);
    f.require(p.finishAllowanceMm < p.maxDepthMm, "finish_allowance",
              "expected less than max_depth");
    p.roughFeedMmPerRev =
        f.length("rough_feed", "roughing feed per rev").value_or(p.roughFeedMmPerRev);
    detail::requirePositive(f, "rough_feed", p.roughFeedMmPerRev);
    p.finishFeedMmPerRev =
        f.length("finish_feed", "finishing feed per rev").value_or(p.finishFeedMmPerRev);
    detail::requirePositive(f, "finish_feed", p.finishFeedMmPerRev);
    if (auto s = f.choice("placing", {"zero_on_diameter", "reference_shoulder"})) {
        p.placing = *s == "zero_on_diameter" ? PlanningOptions::Placing::ZeroOnDiameter
                                             : PlanningOptions::Placing::ReferenceShoulder;
        p.placingStated = true;
    }
    if (auto b = f.boolean("trial_cut")) {
        p.trialCut = *b;
        p.trialCutStated = true;
    }
    if (auto target = f.number("in_tolerance_target", "the chance of a part within tolerance")) {
        f.require(*target > 0 && *target < 1, "in_tolerance_target",
                  "expected a chance between 0 and 1, e.g. 0.95 for 19 parts in 20");
        p.inToleranceTarget = *target;
    }
    if (auto s = f.choice("roughing", {"compound", "saddle_steps"}))
        p.roughing = *s == "compound" ? PlanningOptions::Roughing::Compound
                                      : PlanningOptions::Roughing::SaddleSteps;
    p.rollDiameterMm =
        f.length("roll_diameter", "roll diameter for over-rolls checks").value_or(0.0);
    detail::requirePositive(f, "roll_diameter", p.rollDiameterMm, true);
    return p;
}

SimOptions readSim(const Fields& root) {
    SimOptions s;
    s.where = root.where();
    const toml::table* t = root.subtable("sim");
    if (!t)
        return s;
    Fields f(*t, "sim", root.context(), {"profile_step", "angle_samples"});
    s.where = f.where("profile_step"); // the table itself if the key is absent
    s.profileStepMm = f.length("profile_step", "axial sample spacing").value_or(s.profileStepMm);
    f.require(s.profileStepMm >= 1e-4 && s.profileStepMm <= 1.0, "profile_step",
              "expected from 0.0001 mm to 1 mm");
    if (auto n = f.integer("angle_samples", "samples around the part")) {
        f.require(*n >= 8 && *n <= 3600, "angle_samples", "expected a whole number from 8 to 3600");
        s.angleSamples = static_cast<int>(*n);
    }
    return s;
}

Expect readExpect(const Fields& root, std::vector<std::string>& notes) {
    Expect e;
    const toml::table* t = root.subtable("expect");
    if (!t)
        return e;
    Fields f(*t, "expect", root.context(), {"verdict", "findings", "no_findings", "cause"});
    e.where = f.where();
    if (auto v = f.choice("verdict", {"in_tolerance", "out_of_tolerance"}))
        e.withinTolerance = *v == "in_tolerance";
    std::vector<std::string> kinds;
    for (FindingKind k : allFindingKinds())
        kinds.emplace_back(findingKindName(k));
    if (const toml::array* a = f.array("findings", "finding kinds")) {
        for (const toml::node& n : *a) {
            const auto* s = n.as_string();
            if (s && s->get() == "past_stock") {
                // The old name of crosses_centre (it never meant past the stock's end).
                notes.push_back(detail::locOf(n.source(), root.context().file).str() +
                                ": expect.findings: \"past_stock\" is now called "
                                "\"crosses_centre\" (the tool crosses the centre where there is "
                                "metal); the old name is still read");
                e.findings.push_back("crosses_centre");
                continue;
            }
            bool ok = false;
            for (const auto& k : kinds)
                ok = ok || (s && s->get() == k);
            if (!ok)
                throw InputError(detail::locOf(n.source(), root.context().file), "expect.findings",
                                 detail::valueText(n),
                                 "expected a finding kind: " +
                                     suggestion(s ? s->get() : "", kinds));
            e.findings.push_back(s->get());
        }
    }
    if (auto c = f.choice("cause", causeSourceNames()))
        e.cause = *c;
    e.noFindings = f.boolean("no_findings").value_or(false);
    f.require(!(e.noFindings && !e.findings.empty()), "no_findings",
              "expected false when findings are listed (the two contradict)");
    return e;
}

std::vector<double> readGaugeBlocks(const Fields& root) {
    std::vector<double> sizes;
    const toml::table* t = root.subtable("gauge_blocks");
    if (!t)
        return sizes;
    Fields f(*t, "gauge_blocks", root.context(), {"sizes"});
    const toml::array* a = f.array("sizes", "block sizes");
    if (!a)
        f.missing("sizes", "a list of gauge block sizes in " + f.unit());
    f.require(!a->empty(), "sizes", "expected at least one block size");
    for (const toml::node& n : *a) {
        std::optional<double> v;
        if (auto i = n.as_integer())
            v = static_cast<double>(i->get());
        if (auto d = n.as_floating_point())
            v = d->get();
        if (!v || !(*v > 0) || !(toMm(*v, root.context().units) <= detail::kMaxLengthMm))
            throw InputError(detail::locOf(n.source(), root.context().file), "gauge_blocks.sizes",
                             detail::valueText(n),
                             "expected a block size, a length more than 0 and at most 10 m in " +
                                 f.unit());
        sizes.push_back(toMm(*v, root.context().units));
    }
    return sizes;
}

// The node a dotted key names ("part.feature[2].to"), or the deepest table on the way when the
// key itself is absent (a default); nullptr if not even the first table is there.
const toml::node* nodeAt(const toml::table& doc, const std::string& dotted) {
    const toml::node* at = &doc;
    std::size_t pos = 0;
    while (pos <= dotted.size()) {
        const std::size_t dot = dotted.find('.', pos);
        std::string part = dotted.substr(pos, dot == std::string::npos ? dot : dot - pos);
        std::optional<std::size_t> index;
        if (auto b = part.find('['); b != std::string::npos) {
            index = std::stoul(part.substr(b + 1)) - 1;
            part = part.substr(0, b);
        }
        const toml::table* t = at->as_table();
        const toml::node* next = t ? t->get(part) : nullptr;
        if (next && index) {
            const toml::array* a = next->as_array();
            next = a && *index < a->size() ? a->get(*index) : nullptr;
        }
        if (!next)
            return at == &doc ? nullptr : at;
        at = next;
        if (dot == std::string::npos)
            break;
        pos = dot + 1;
    }
    return at;
}

// Inside work that does not hang together, at the key's own line and column.
void checkInsideWork(const Scene& scene, const toml::table& doc, const std::string& fileName) {
    const auto p = insideWorkProblem(scene);
    if (!p)
        return;
    const toml::node* n = nodeAt(doc, p->key);
    const SourceLoc where = n ? detail::locOf(n->source(), fileName) : p->where;
    // The value as written when the key is there; else the value the scene came to.
    const bool written = n && !n->is_table() && !n->is_array();
    throw InputError(where, p->key, written ? detail::valueText(*n) : p->value, p->expected);
}

// Tables written at the top level that belong inside another: "did you mean [[part.feature]]?".
void rejectMisplacedTables(const toml::table& doc, const std::string& fileName) {
    static const std::pair<const char*, const char*> kNested[] = {
        {"feature", "[[part.feature]]"},  {"features", "[[part.feature]]"},
        {"pass", "[[plan.pass]]"},        {"passes", "[[plan.pass]]"},
        {"compound", "[setup.compound]"}, {"cross", "[setup.cross]"},
        {"saddle", "[setup.saddle]"}};
    for (auto&& [k, v] : doc)
        for (const auto& [name, header] : kNested)
            if (k.str() == name)
                throw InputError(detail::locOf(k.source(), fileName), std::string(k.str()), "",
                                 std::string("unknown key at the top level: did you mean ") +
                                     header + "?");
}

} // namespace

Scene readSceneText(const std::string& text, const std::string& fileName) {
    detail::checkSceneText(text, fileName);
    toml::table doc;
    try {
        doc = toml::parse(text, fileName);
    } catch (const toml::parse_error& e) {
        const auto& b = e.source().begin;
        throw InputError({fileName, static_cast<int>(b.line), static_cast<int>(b.column)}, "", "",
                         "not valid TOML: " + std::string(e.description()));
    }
    rejectMisplacedTables(doc, fileName);
    detail::ReadContext ctx{fileName, Units::Mm};
    Fields root(doc, "", ctx,
                {"name", "description", "units", "stock", "part", "tool", "setup", "plan",
                 "planning", "sim", "expect", "gauge_blocks", "uncertainty"});
    Scene scene;
    scene.file = fileName;
    if (auto u = root.choice("units", {"mm", "inch"}))
        ctx.units = *u == "inch" ? Units::Inch : Units::Mm;
    scene.units = ctx.units;
    std::string base = fileName;
    if (auto slash = base.find_last_of('/'); slash != std::string::npos)
        base = base.substr(slash + 1);
    scene.name = root.string("name", "a title").value_or(base);
    scene.description = root.string("description", "what the scene is for").value_or("");
    scene.stock = readStock(root);
    scene.part = detail::readPart(root, scene.stock);
    scene.tool = detail::readTool(root);
    scene.setup = detail::readSetup(root);
    scene.plan = detail::readPlan(root, scene.tool.kind == ToolKind::BoringBar);
    scene.planning = readPlanning(root);
    scene.sim = readSim(root);
    scene.expect = readExpect(root, scene.readNotes);
    scene.gaugeBlocksMm = readGaugeBlocks(root);
    scene.uncertainty = detail::readUncertainty(root, scene.tool, scene.setup);
    checkInsideWork(scene, doc, fileName);
    scene.validate();
    return scene;
}

Scene readScene(const std::string& path) {
    std::error_code ec;
    if (std::filesystem::is_directory(path, ec))
        throw InputError({path, 0, 0}, "", "", "cannot open the scene file: it is a folder");
    std::ifstream in(path, std::ios::binary);
    if (!in)
        throw InputError({path, 0, 0}, "", "", "cannot open the scene file");
    // Read no more than one byte past the limit: a huge file, /dev/zero or a pipe that never
    // ends is refused by checkSceneText without filling the memory.
    std::string text(detail::kMaxSceneBytes + 1, '\0');
    in.read(text.data(), static_cast<std::streamsize>(text.size()));
    text.resize(static_cast<std::size_t>(in.gcount()));
    return readSceneText(text, path);
}

} // namespace swarf::io
