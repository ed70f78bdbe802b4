// Reading [tool], [setup] and [[plan.pass]]: the insert, the lathe as set up, the passes.
#include "scene_sections.h"

#include "swarf/io/insert_codes.h"
#include "swarf/sim/machine.h"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdio>

namespace swarf::io::detail {

namespace {

const std::vector<std::string_view> kCompoundPassKeys = {
    "kind", "note", "cross",      "saddle",         "from",
    "to",   "feed", "retract_to", "compound_angle", "compound_error"};
const std::vector<std::string_view> kSaddlePassKeys = {
    "kind", "note", "cross",      "compound",       "from",
    "to",   "feed", "retract_to", "compound_angle", "compound_error"};
const std::vector<std::string_view> kCrossPassKeys = {
    "kind", "note", "compound",   "saddle",         "from",
    "to",   "feed", "retract_to", "compound_angle", "compound_error"};

std::string fmtNum(double v) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.6g", v);
    return buf;
}

// per_division, divisions, backlash, travel of one slide, defaults by the scene's units.
void readSlide(const Fields& f, Slide& s, double defaultPerDivisionMm, double defaultTravelMm) {
    s.mmPerDivision = f.length("per_division", "one dial division").value_or(defaultPerDivisionMm);
    requirePositive(f, "per_division", s.mmPerDivision);
    if (auto n = f.integer("divisions", "dial divisions per turn")) {
        f.require(*n > 0 && *n <= 100000, "divisions", "expected a whole number from 1 to 100000");
        s.divisionsPerTurn = static_cast<int>(*n);
    }
    s.backlashMm = f.length("backlash", "lost motion on reversing").value_or(0.0);
    requirePositive(f, "backlash", s.backlashMm, true);
    s.travelMm = f.length("travel", "usable travel from zero").value_or(defaultTravelMm);
    requirePositive(f, "travel", s.travelMm);
}

// With approach = "take_up" a slide is wound back past a reading by wind_back turns: that must
// be more than its backlash, or the slack is never taken up. Said at wind_back if the scene
// gives it, else at the slide's backlash.
void windBackTakesUp(const Fields& setup, const Fields& slideFields, const Setup& s,
                     const Slide& slide, const char* name) {
    if (s.approach != Approach::TakeUp ||
        s.windBackTurns * slide.mmPerDivision * slide.divisionsPerTurn > slide.backlashMm)
        return;
    const std::string why = std::string("expected a wind-back longer than the ") + name +
                            "'s backlash, or it is not taken up";
    if (setup.has("wind_back"))
        setup.fail("wind_back", why);
    slideFields.fail("backlash", "expected less than the wind-back of " + fmtNum(s.windBackTurns) +
                                     " turn (setup.wind_back): " + why);
}

} // namespace

Tool readTool(const Fields& root) {
    const toml::table* t = root.subtable("tool");
    if (!t)
        root.missing("tool", "a [tool] table: the insert and holder");
    Fields f(*t, "tool", root.context(),
             {"kind", "shape", "included_angle", "insert", "nose_radius", "entering_angle",
              "holder", "hand", "edge_length", "tip_height", "thickness", "bar_diameter",
              "overhang", "min_bore", "axis_height"});
    const Units u = root.context().units;
    Tool tool;
    tool.where = f.where();
    readToolKind(f, tool);

    // The ISO 1832 designation, if given, fixes the shape, nose radius and size.
    std::optional<InsertCode> code;
    if (auto s = f.string("insert", "an ISO 1832 designation such as \"DCMT 11T304\"")) {
        code = parseInsertCode(*s);
        if (!code)
            f.fail("insert", "expected an ISO 1832 metric designation: four letters, then size, "
                             "thickness and corner radius codes, e.g. \"DCMT 11T304\"");
    }
    if (f.has("shape") && f.has("included_angle"))
        f.fail("included_angle", "expected either shape or included_angle, not both");
    if (auto s = f.string("shape", "an ISO 1832 shape letter")) {
        f.require(s->size() == 1 && shapeIncludedAngleDeg((*s)[0]), "shape",
                  "expected an ISO 1832 shape letter: C, D, E, K, R, S, T, V or W");
        tool.shape = static_cast<char>(std::toupper(static_cast<unsigned char>((*s)[0])));
        f.require(!code || code->shape == tool.shape, "shape",
                  std::string("expected '") + (code ? code->shape : ' ') +
                      "' as the insert code says");
        tool.includedAngleRad = degToRad(*shapeIncludedAngleDeg(tool.shape));
    } else if (auto a = f.angle("included_angle", "the insert's corner angle ε")) {
        f.require(*a > 0 && *a < degToRad(180), "included_angle",
                  "expected more than 0 and less than 180 degrees");
        tool.shape = 0;
        tool.includedAngleRad = *a;
        f.require(!code, "included_angle", "expected no included_angle with an insert code");
    } else if (code) {
        tool.shape = code->shape;
        tool.includedAngleRad = degToRad(*shapeIncludedAngleDeg(tool.shape));
    } else {
        f.missing("shape",
                  "an ISO 1832 shape letter (C, D, E, K, R, S, T, V, W) or included_angle");
    }
    const bool round = tool.shape == 'R';

    if (auto e = f.length("edge_length", "the cutting edge length (round: the diameter)")) {
        requirePositive(f, "edge_length", *e);
        tool.edgeLengthMm = *e;
    } else if (code) {
        tool.edgeLengthMm = code->edgeLengthMm;
    }
    if (auto th = f.length("thickness", "the insert thickness")) {
        requirePositive(f, "thickness", *th);
        tool.thicknessMm = *th;
    } else if (code) {
        tool.thicknessMm = code->thicknessMm;
    }

    if (auto r = f.length("nose_radius", "the nose radius")) {
        requirePositive(f, "nose_radius", *r);
        if (code)
            f.require(std::fabs(*r - code->noseRadiusMm) < 0.01, "nose_radius",
                      "expected " + fmtNum(fromMm(code->noseRadiusMm, u)) + " " + f.unit() +
                          " as the insert code says");
        tool.noseRadiusMm = *r;
    } else if (code) {
        tool.noseRadiusMm = code->noseRadiusMm;
        if (tool.noseRadiusMm <= 0)
            f.fail("insert", "expected an insert with a corner radius (code 00 is a sharp corner)");
    } else if (round) {
        tool.noseRadiusMm = tool.edgeLengthMm / 2;
    } else {
        f.missing("nose_radius", "the nose radius, a length in " + f.unit());
    }
    const double maxR =
        maxNoseRadiusMm(round ? 'R' : tool.shape, tool.includedAngleRad, tool.edgeLengthMm);
    const std::string rKey = f.has("nose_radius") ? "nose_radius" : "insert";
    if (round)
        f.require(std::fabs(tool.noseRadiusMm - maxR) < 1e-6 || !f.has("edge_length") ||
                      !f.has("nose_radius"),
                  rKey, "expected half the round insert's diameter (edge_length)");
    else
        f.require(tool.noseRadiusMm <= maxR + 1e-9, rKey,
                  "expected at most " + fmtNum(fromMm(maxR, u)) + " " + f.unit() +
                      ": a larger nose does not fit this insert (edge length " +
                      fmtNum(fromMm(tool.edgeLengthMm, u)) + " " + f.unit() + ")");
    if (round && !f.has("edge_length"))
        tool.edgeLengthMm = 2 * tool.noseRadiusMm;

    if (f.has("entering_angle") && f.has("holder")) {
        const double given = *f.angle("entering_angle", "the holder's entering angle κr");
        auto letter = f.string("holder", "an ISO 5608 holder letter");
        auto fromLetter =
            letter && letter->size() == 1 ? holderEnteringAngleDeg((*letter)[0]) : std::nullopt;
        if (fromLetter)
            f.require(std::fabs(given - degToRad(*fromLetter)) < 1e-9, "entering_angle",
                      "expected " + fmtNum(*fromLetter) + " degrees as holder " + *letter +
                          " says (or give only one)");
    }
    if (auto h = f.string("holder", "an ISO 5608 holder letter")) {
        auto deg = h->size() == 1 ? holderEnteringAngleDeg((*h)[0]) : std::nullopt;
        f.require(deg.has_value(), "holder",
                  "expected an ISO 5608 holder style letter: A B D E F G H J K L N P Q S T V Y");
        tool.holderCode = *h;
        tool.enteringAngleRad = degToRad(*deg);
    } else if (auto k = f.angle("entering_angle", "the holder's entering angle κr")) {
        f.require(*k > 0 && *k < degToRad(180), "entering_angle",
                  "expected more than 0 and less than 180 degrees");
        tool.enteringAngleRad = *k;
    } else {
        f.missing("entering_angle",
                  "the holder's entering angle κr in degrees (or holder = a letter)");
    }
    if (!round) {
        const std::string key = f.has("holder") ? "holder" : "entering_angle";
        f.require(tool.enteringAngleRad + tool.includedAngleRad < degToRad(180) - 1e-9, key,
                  "expected an entering angle and insert angle that add up to less than 180 "
                  "degrees (here " +
                      fmtNum(radToDeg(tool.enteringAngleRad + tool.includedAngleRad)) +
                      "): the trailing edge would face the work");
    }

    if (auto h = f.choice("hand", {"R", "L", "N"}))
        tool.hand = *h == "R" ? Hand::R : *h == "L" ? Hand::L : Hand::N;
    const char* heightKey = tool.kind == ToolKind::BoringBar ? "axis_height" : "tip_height";
    tool.tipHeightMm = f.length(heightKey, tool.kind == ToolKind::BoringBar
                                               ? "the bar's axis above (+) or below (-) centre"
                                               : "tip above (+) or below (-) centre")
                           .value_or(0.0);
    f.require(std::fabs(tool.tipHeightMm) < 10.0, heightKey,
              "expected less than 10 mm off centre either way");
    return tool;
}

Setup readSetup(const Fields& root) {
    const toml::table* t = root.subtable("setup");
    if (!t)
        root.missing("setup", "a [setup] table with [setup.compound] and [setup.cross]");
    Fields f(*t, "setup", root.context(),
             {"compound", "cross", "saddle", "spindle_rpm", "approach", "wind_back"});
    const bool inch = root.context().units == Units::Inch;
    Setup s;
    s.where = f.where();
    if (auto rpm = f.number("spindle_rpm", "spindle speed in rev/min")) {
        f.require(*rpm > 0 && *rpm <= 100000, "spindle_rpm",
                  "expected more than 0 and at most 100000 rev/min");
        s.spindleRpm = *rpm;
    }
    auto approach = f.choice("approach", {"in_order", "take_up"});
    s.approach = approach && *approach == "take_up" ? Approach::TakeUp : Approach::InOrder;
    if (auto w = f.number("wind_back", "turns of a handwheel wound back past a reading")) {
        f.require(*w > 0 && *w <= 10, "wind_back", "expected more than 0 and at most 10 turns");
        s.windBackTurns = *w;
    }

    const toml::table* ct = f.subtable("compound");
    if (!ct)
        f.missing("compound", "a [setup.compound] table: the compound's angle and dial");
    Fields c(*ct, "setup.compound", root.context(),
             {"angle", "scale", "error", "advance", "across", "per_division", "divisions",
              "backlash", "travel"});
    s.compoundReadingRad = c.requiredAngle("angle", "the compound angle as read on its scale");
    // "cross-slide", as the screens write it, is read as "cross_slide".
    auto scale = c.choice("scale", {"axis", "cross_slide", "cross-slide"});
    s.compoundScale =
        scale && *scale != "axis" ? CompoundScale::FromCrossSlide : CompoundScale::FromAxis;
    if (s.compoundScale == CompoundScale::FromAxis)
        c.require(
            s.compoundReadingRad >= 0 && s.compoundReadingRad < degToRad(90), "angle",
            "expected 0 or more and less than 90 degrees on a scale read from the spindle axis");
    else
        c.require(
            s.compoundReadingRad > 0 && s.compoundReadingRad <= degToRad(90), "angle",
            "expected more than 0 and at most 90 degrees on a scale read from the cross-slide");
    s.compoundErrorRad = c.angle("error", "true angle minus intended").value_or(0.0);
    c.require(std::fabs(s.compoundErrorRad) < degToRad(5), "error",
              "expected less than 5 degrees either way");
    const double trueAngle = s.compoundAxisAngleRad();
    c.require(trueAngle >= 0 && trueAngle < degToRad(90), "error",
              "expected a true compound angle from 0 to less than 90 degrees (here " +
                  fmtNum(radToDeg(trueAngle)) + ")");
    auto adv = c.choice("advance", {"chuck", "tailstock"});
    if (!adv)
        c.missing("advance",
                  "\"chuck\" or \"tailstock\": where the tool goes as the reading grows");
    s.compoundAdvanceToward = *adv == "chuck" ? Widens::TowardChuck : Widens::TowardTailstock;
    auto across = c.choice("across", {"in", "out"});
    s.compoundAdvanceAcross = across && *across == "out" ? Across::Out : Across::In;
    readSlide(c, s.compound, inch ? 0.001 * kMmPerInch : 0.02, inch ? 4 * kMmPerInch : 100);
    windBackTakesUp(f, c, s, s.compound, "compound");

    const toml::table* xt = f.subtable("cross");
    if (!xt)
        f.missing("cross", "a [setup.cross] table: the cross-slide dial");
    Fields x(*xt, "setup.cross", root.context(),
             {"dial", "zero_diameter", "per_division", "divisions", "backlash", "travel"});
    auto dial = x.choice("dial", {"diameter", "radius"});
    s.crossDial = dial && *dial == "radius" ? DialMode::Radius : DialMode::Diameter;
    s.zeroDiameterMm =
        x.requiredLength("zero_diameter", "the diameter at which the cross-slide reads 0");
    requirePositive(x, "zero_diameter", s.zeroDiameterMm, true);
    readSlide(x, s.cross, inch ? 0.001 * kMmPerInch : 0.02, inch ? 6 * kMmPerInch : 150);

    s.saddle = Slide{inch ? 0.01 * kMmPerInch : 0.1, inch ? 100 : 200, 0, 1e9};
    if (const toml::table* st = f.subtable("saddle")) {
        Fields sd(*st, "setup.saddle", root.context(),
                  {"zero_z", "per_division", "divisions", "backlash", "travel"});
        s.zeroZMm = sd.length("zero_z", "z at which the saddle reads 0").value_or(0.0);
        readSlide(sd, s.saddle, s.saddle.mmPerDivision, 1e9);
        windBackTakesUp(f, sd, s, s.saddle, "saddle");
    }
    return s;
}

Plan readPlan(const Fields& root, bool boringBar) {
    Plan plan;
    const toml::table* t = root.subtable("plan");
    if (!t)
        return plan;
    Fields f(*t, "plan", root.context(), {"pass"});
    plan.where = f.where();
    const toml::array* arr = f.array("pass", "[[plan.pass]] tables");
    if (!arr)
        return plan;
    const Units u = root.context().units;
    struct Retract {
        std::size_t index;
        SourceLoc where;
        std::string value;
    };
    std::vector<Retract> retracts;
    int index = 0;
    for (const toml::node& n : *arr) {
        ++index;
        const std::string path = "plan.pass[" + std::to_string(index) + "]";
        const toml::table* pt = n.as_table();
        if (!pt)
            throw InputError(locOf(n.source(), root.context().file), path, valueText(n),
                             "expected a table: write passes as [[plan.pass]]");
        Fields any(*pt, path, root.context(),
                   {"kind", "note", "cross", "compound", "saddle", "from", "to", "feed", "points",
                    "retract_to", "compound_angle", "compound_error"});
        // "cross-slide", the word the screens and sheets use, is read as "cross".
        auto kind = any.choice("kind", {"compound", "saddle", "cross", "cross-slide", "path"});
        if (!kind)
            any.missing("kind", "\"compound\", \"saddle\", \"cross\" or \"path\"");
        if (*kind == "cross-slide")
            kind = "cross";
        Pass p;
        p.where = any.where();
        p.note = any.string("note", "what the person does").value_or("");
        if (*kind == "path") {
            Fields pf(*pt, path, root.context(), {"kind", "note", "points", "feed"});
            p.kind = PassKind::Path;
            const toml::array* pts = pf.array("points", "[[z, diameter], ...]");
            if (!pts)
                pf.missing("points", "the imaginary tip's points [[z, diameter], ...]");
            pf.require(pts->size() >= 2, "points",
                       "expected at least two points [[z, diameter], ...]");
            for (const toml::node& pn : *pts) {
                const toml::array* pair = pn.as_array();
                auto num = [](const toml::node* e) -> std::optional<double> {
                    if (!e)
                        return std::nullopt;
                    if (auto i = e->as_integer())
                        return static_cast<double>(i->get());
                    if (auto d = e->as_floating_point())
                        return d->get();
                    return std::nullopt;
                };
                std::optional<double> z, d;
                if (pair && pair->size() == 2) {
                    z = num(pair->get(0));
                    d = num(pair->get(1));
                }
                auto inRange = [u](double v) {
                    return std::isfinite(v) && std::fabs(toMm(v, u)) <= kMaxLengthMm;
                };
                if (!z || !d || !inRange(*z) || !inRange(*d) ||
                    *d < 0) // finite before <: no FP trap
                    throw InputError(locOf(pn.source(), root.context().file), path + ".points",
                                     valueText(pn),
                                     "expected a point [z, diameter] of two numbers in " +
                                         std::string(unitName(u)) +
                                         ", diameter 0 or more, each at most 10 m either way");
                p.pathZX.emplace_back(toMm(*z, u), toMm(*d, u) / 2.0);
            }
            p.feedMmPerRev = pf.requiredLength("feed", "feed per revolution");
            requirePositive(pf, "feed", p.feedMmPerRev);
            plan.passes.push_back(std::move(p));
            continue;
        }
        // The moving slide's readings are from/to; the other two slides' readings stay put.
        const auto keys = *kind == "compound" ? kCompoundPassKeys
                          : *kind == "saddle" ? kSaddlePassKeys
                                              : kCrossPassKeys;
        for (const char* moving : {"compound", "saddle", "cross"})
            if (*kind == moving && pt->get(moving))
                any.fail(moving, std::string("expected no fixed ") + moving + " reading in a " +
                                     moving + " pass: the " + moving + " moves, give from and to");
        Fields pf(*pt, path, root.context(), keys);
        p.kind = *kind == "compound" ? PassKind::Compound
                 : *kind == "saddle" ? PassKind::Saddle
                                     : PassKind::CrossSlide;
        p.crossMm = pf.length("cross", "the cross-slide reading").value_or(0.0);
        p.compoundMm = pf.length("compound", "the compound reading").value_or(0.0);
        p.saddleMm = pf.length("saddle", "the saddle reading").value_or(0.0);
        p.fromMm = pf.requiredLength("from", "the moving slide's reading at the start");
        p.toMm = pf.requiredLength("to", "the moving slide's reading at the end");
        pf.require(std::fabs(p.toMm - p.fromMm) > 1e-9, "to",
                   "expected a reading other than from: the pass must move");
        p.feedMmPerRev = pf.requiredLength("feed", "feed per revolution");
        requirePositive(pf, "feed", p.feedMmPerRev);
        p.retractToMm = pf.length("retract_to", "the cross-slide reading backed out to after "
                                                "the pass");
        p.compoundAngleRad = pf.angle("compound_angle", "this pass's compound angle on its scale");
        p.compoundErrorRad = pf.angle("compound_error", "this pass's compound error");
        if (p.compoundErrorRad)
            pf.require(std::fabs(*p.compoundErrorRad) < degToRad(5), "compound_error",
                       "expected less than 5 degrees either way");
        if (p.retractToMm)
            retracts.push_back(
                {plan.passes.size(), pf.where("retract_to"), valueText(*pt->get("retract_to"))});
        plan.passes.push_back(std::move(p));
    }
    // Backed out: no further in than the pass ends or the next pass starts (at the key itself;
    // Scene::validate checks the same for scenes built in code).
    for (const auto& r : retracts) {
        const RetractLimit lim = retractLimit(plan, r.index, boringBar);
        if (!lim.allows(*plan.passes[r.index].retractToMm))
            throw InputError(r.where, "plan.pass[" + std::to_string(r.index + 1) + "].retract_to",
                             r.value,
                             lim.expected(fmtNum(fromMm(lim.limitMm, u)) + " " + unitName(u)));
    }
    return plan;
}

} // namespace swarf::io::detail
