// What moved the cone: counterfactual runs, one source at a time (see causes.h).
#include "swarf/sim/causes.h"

#include "cause_repairs.h"

#include "swarf/sim/budget.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/planner.h"
#include "swarf/sim/units.h"

#include <algorithm>
#include <cmath>
#include <functional>
#include <optional>

namespace swarf {

namespace {

using detail::CauseTarget;

// A cone as one run cuts it.
struct Outcome {
    double diameterMm = 0, halfAngleRad = 0;
};

Outcome run(const Scene& s, const CauseTarget& t) {
    const PartOutcome o = partOutcome(s, t.feature);
    return {o.gaugeDiameterMm, o.halfAngleRad};
}

// How far a cone is from the drawing, in tolerances: |gauge error|/t + |half-angle error|/tθ.
double distance(const Outcome& o, const CauseTarget& t) {
    const Feature& f = *t.cone;
    return std::fabs(o.diameterMm - f.cone.gaugeDiameterMm) / f.toleranceMm +
           std::fabs(o.halfAngleRad - f.cone.halfAngleRad) / f.angleToleranceRad;
}

// A change worth naming: 0.1 µm on the gauge diameter, or on the cone's length by its angle.
bool worthNaming(double dMm, double dRad, const CauseTarget& t) {
    return std::fabs(dMm) >= 1e-4 || std::fabs(dRad) * t.lengthMm >= 1e-4;
}

// A removal: a source the machine model has, set to zero.
struct Removal {
    std::string source;
    bool present;
    std::function<void(Scene&)> remove;
    std::string what, fix;
};

// The insert's straight edge the run found rubbing: "trailing" or "leading" ("" when neither),
// by the finding's own words (findings.cpp), and the steepest descent it was found on, rad.
struct RubbingEdge {
    std::string edge;
    double descentRad = 0;
};

RubbingEdge rubbingEdge(const CutResult& result) {
    RubbingEdge trailing{"", 0}, leading{"", 0};
    for (const Finding& f : result.findings) {
        if (f.kind != FindingKind::Rubbing)
            continue;
        const bool isTrailing = f.message.rfind("the trailing edge", 0) == 0;
        RubbingEdge& e = isTrailing ? trailing : leading;
        e.edge = isTrailing ? "trailing" : "leading";
        if (std::isfinite(f.angleRad))
            e.descentRad = std::max(e.descentRad, f.angleRad);
    }
    return trailing.edge.empty() ? leading : trailing;
}

// What to put in the holder instead: the first insert and holder suggestTools (planner.h) names
// for the slope the edge rubbed on (outside; inside the run's slopes are the twin's).
std::string edgeFix(const Scene& s, const RubbingEdge& e) {
    std::string fix = "use an insert and holder whose " + e.edge + " edge clears the slope";
    if (s.tool.kind == ToolKind::BoringBar || e.edge.empty())
        return fix;
    // A trailing edge rubs going in toward the chuck for a right-hand tool (a path that
    // descends toward the chuck); a leading edge, or a left-hand tool, the other way.
    const bool descendsTowardChuck = (e.edge == "trailing") == (s.tool.hand != Hand::L);
    const double pathAngleRad = descendsTowardChuck ? -e.descentRad : e.descentRad;
    const std::vector<std::string> tools = suggestTools(s.tool, pathAngleRad, 1);
    if (!tools.empty())
        fix += ", for example a " + tools.front().substr(0, tools.front().find(':'));
    return fix;
}

std::vector<Removal> removals(const Scene& s, const CutResult& result) {
    const Units u = s.units;
    const RubbingEdge rubbing = rubbingEdge(result);
    const std::string& edge = rubbing.edge;
    auto slideWords = [&](const char* name, const Slide& sl) {
        return std::string("the ") + name + "'s " + formatLength(sl.backlashMm, u) +
               " backlash was not taken up at a reading (dialled to it from the wrong side, or "
               "the slide reversed during the pass)";
    };
    bool angleError = s.setup.compoundErrorRad != 0;
    for (const Pass& p : s.plan.passes)
        angleError = angleError || (p.compoundErrorRad && *p.compoundErrorRad != 0);
    return {
        {"tip_height", s.tool.tipHeightMm != 0, [](Scene& x) { x.tool.tipHeightMm = 0; },
         "the tip stands " + formatLength(std::fabs(s.tool.tipHeightMm), u) +
             (s.tool.tipHeightMm > 0 ? " above" : " below") + " centre",
         s.tool.kind == ToolKind::BoringBar
             ? "set the bar with its tip on centre (against a centre in the tailstock)"
             : "set the tip on centre (against a centre in the tailstock, or by facing to a pip)"},
        {"cross_backlash", s.setup.cross.backlashMm > 0,
         [](Scene& x) { x.setup.cross.backlashMm = 0; }, slideWords("cross-slide", s.setup.cross),
         s.tool.kind == ToolKind::BoringBar
             ? "take the backlash up the same way at every cross-slide reading: with the bar out "
               "of the bore, wind past the reading and come back to it the way the dial was "
               "zeroed"
             : "come to every cross-slide reading from outside: back out past it and feed in"},
        {"compound_backlash", s.setup.compound.backlashMm > 0,
         [](Scene& x) { x.setup.compound.backlashMm = 0; },
         slideWords("compound", s.setup.compound),
         "wind the compound one way only during a pass, and come to its start from below"},
        {"saddle_backlash", s.setup.saddle.backlashMm > 0,
         [](Scene& x) { x.setup.saddle.backlashMm = 0; }, slideWords("saddle", s.setup.saddle),
         "bring the saddle to its reading from below and lock it"},
        {"compound_angle", angleError,
         [](Scene& x) {
             x.setup.compoundErrorRad = 0;
             for (Pass& p : x.plan.passes)
                 if (p.compoundErrorRad)
                     p.compoundErrorRad = 0.0;
         },
         "the compound stands " + formatDms(std::fabs(s.setup.compoundErrorRad), 0) +
             " off the angle set",
         "set the compound from a sine bar or an indicator run along a master cone"},
        // The insert reduced to its nose: a round insert of the same nose radius has the same
        // imaginary tip and no straight edge behind the nose (tool_outline.h).
        {edge + "_edge", !edge.empty(),
         [](Scene& x) {
             x.tool.shape = 'R';
             x.tool.includedAngleRad = 0;
         },
         "the insert's " + edge + " edge rubs: the pass runs in toward the " +
             (s.tool.kind == ToolKind::BoringBar ? "wall" : "axis") +
             " steeper than the insert and holder can follow, and the edge cuts behind the nose",
         edgeFix(s, rubbing)},
    };
}

Cause makeCause(const std::string& source, const Outcome& with, const Outcome& without, int pass,
                const std::string& what, const std::string& fix, Units u, bool inside) {
    Cause c;
    c.source = source;
    c.gaugeDiameterChangeMm = with.diameterMm - without.diameterMm;
    c.halfAngleChangeRad = with.halfAngleRad - without.halfAngleRad;
    c.pass = pass;
    c.message = what + ": " +
                detail::coneChangeWords(c.gaugeDiameterChangeMm, c.halfAngleChangeRad, u, inside) +
                (fix.empty() ? "" : "; " + fix);
    return c;
}

} // namespace

std::vector<Cause> findCauses(const Scene& scene, const CutResult& result) {
    std::vector<Cause> out;
    const CauseTarget t = detail::causeTarget(scene);
    if (!t.cone || scene.plan.passes.empty())
        return out;
    const Feature* cone = t.cone;
    const Units u = scene.units;

    Scene base = scene;
    base.sim.profileStepMm = budgetProfileStepMm(scene);
    const Outcome given = run(base, t);
    const auto fin = detail::finishingAt(planMoves(base), cone->cone.gaugeZMm, t.inside);
    const int finPass = fin ? fin->pass : -1;

    // Removals: each from the scene as given.
    Scene clean = base;
    for (const Removal& r : removals(base, result)) {
        if (!r.present)
            continue;
        Scene s = base;
        r.remove(s);
        r.remove(clean);
        const Outcome without = run(s, t);
        Cause c = makeCause(r.source, given, without, finPass, r.what, r.fix, u, t.inside);
        if (worthNaming(c.gaugeDiameterChangeMm, c.halfAngleChangeRad, t))
            out.push_back(c);
    }

    // Repairs: on the clean machine, the best one first, each kept when it brings the cone
    // nearer the drawing by more than a hundredth of a tolerance (a repair that reads every
    // reading another way, by at least half the distance: cause_repairs.h).
    Outcome now = run(clean, t);
    std::vector<detail::CauseRepair> todo = detail::causeRepairs(t);
    while (!todo.empty()) {
        // Each candidate's mended cone; the one kept is the first (in the order compound_scale,
        // dial_mode, nose_offset: a reading read another way before a shift of the finishing
        // pass, which could mimic either) within a tenth of a tolerance of the nearest.
        std::vector<std::optional<Scene>> scenes(todo.size());
        std::vector<Outcome> outcomes(todo.size());
        std::vector<std::string> msgs(todo.size());
        std::vector<bool> eligible(todo.size(), false);
        const double from = distance(now, t);
        double nearest = from - 0.01;
        for (std::size_t i = 0; i < todo.size(); ++i) {
            scenes[i] = todo[i].make(clean, msgs[i]);
            if (!scenes[i])
                continue;
            outcomes[i] = run(*scenes[i], t);
            const double d = distance(outcomes[i], t);
            eligible[i] = d < from - 0.01 && (!todo[i].explainsMost || d <= 0.5 * from);
            if (eligible[i])
                nearest = std::min(nearest, d);
        }
        std::size_t bestIndex = todo.size();
        for (std::size_t i = 0; i < todo.size() && bestIndex == todo.size(); ++i)
            if (eligible[i] && distance(outcomes[i], t) <= nearest + 0.1)
                bestIndex = i;
        const std::optional<Scene> bestScene =
            bestIndex < todo.size() ? scenes[bestIndex] : std::nullopt;
        const Outcome bestOutcome = bestIndex < todo.size() ? outcomes[bestIndex] : now;
        const std::string bestMsg = bestIndex < todo.size() ? msgs[bestIndex] : "";
        if (bestIndex == todo.size())
            break;
        const std::size_t bar = bestMsg.find('|');
        Cause c =
            makeCause(todo[bestIndex].source, now, bestOutcome, finPass, bestMsg.substr(0, bar),
                      bar == std::string::npos ? "" : bestMsg.substr(bar + 1), u, t.inside);
        if (worthNaming(c.gaugeDiameterChangeMm, c.halfAngleChangeRad, t))
            out.push_back(c);
        clean = *bestScene;
        now = bestOutcome;
        todo.erase(todo.begin() + static_cast<std::ptrdiff_t>(bestIndex));
    }

    // What the named causes leave of the error, when any was named.
    if (!out.empty()) {
        double dMm = given.diameterMm - cone->cone.gaugeDiameterMm;
        double dRad = given.halfAngleRad - cone->cone.halfAngleRad;
        for (const Cause& c : out) {
            dMm -= c.gaugeDiameterChangeMm;
            dRad -= c.halfAngleChangeRad;
        }
        if (worthNaming(dMm, dRad, t)) {
            Cause c;
            c.source = "other";
            c.gaugeDiameterChangeMm = dMm;
            c.halfAngleChangeRad = dRad;
            c.message = "what the causes named do not account for (the readings' rounding to "
                        "a division, or causes acting together): " +
                        detail::coneChangeWords(dMm, dRad, u, t.inside);
            out.push_back(c);
        }
    }

    // The feed marks' crests, when they take more than half the band the verdict allows.
    const double band = 0.5 * cone->toleranceMm * std::cos(cone->cone.halfAngleRad);
    const double rtMm = result.rtUm / 1000.0;
    if (rtMm > 0.5 * band && result.finishingPass >= 0) {
        const Pass& p = scene.plan.passes.at(static_cast<std::size_t>(result.finishingPass));
        // Rt ≈ f²/(8r) (references R2): the feed that leaves a quarter of the band.
        const double r = scene.tool.noseRadiusMm;
        const double feed = std::sqrt(8 * r * 0.25 * band);
        Cause c;
        c.source = "feed_marks";
        // Inside, the crests stand nearer the axis: a plug gauge finds the bore smaller.
        c.gaugeDiameterChangeMm =
            (t.inside ? -2.0 : 2.0) * rtMm / std::cos(cone->cone.halfAngleRad);
        c.pass = result.finishingPass;
        c.message = "the finishing feed of " + formatLength(p.feedMmPerRev, u) +
                    " a revolution leaves feed marks " + formatSmallLength(rtMm, u) +
                    " high (Rt), against a band of " + formatSmallLength(band, u) +
                    " normal to the surface: a gauge on the crests finds the " +
                    (t.inside ? "bore " : "cone ") +
                    formatLength(std::fabs(c.gaugeDiameterChangeMm), u, Precision::Fine) +
                    (t.inside ? " smaller" : " larger") + " on diameter; finish at " +
                    formatLength(feed, u) + " a revolution or less";
        out.push_back(c);
    }

    std::stable_sort(out.begin(), out.end(), [&](const Cause& a, const Cause& b) {
        auto size = [&](const Cause& c) {
            return std::fabs(c.gaugeDiameterChangeMm) / cone->toleranceMm +
                   std::fabs(c.halfAngleChangeRad) / cone->angleToleranceRad;
        };
        return size(a) > size(b);
    });
    return out;
}

const std::vector<std::string>& causeSourceNames() {
    static const std::vector<std::string> names{
        "nose_offset",     "tip_height",     "cross_backlash", "compound_backlash",
        "saddle_backlash", "compound_angle", "compound_scale", "dial_mode",
        "trailing_edge",   "leading_edge",   "feed_marks",     "other"};
    return names;
}

std::string causeLabel(const std::string& source) {
    static const std::vector<std::pair<std::string, std::string>> labels{
        {"nose_offset", "the nose-radius offset"},
        {"tip_height", "the tip's height off centre"},
        {"cross_backlash", "the cross-slide's backlash"},
        {"compound_backlash", "the compound's backlash"},
        {"saddle_backlash", "the saddle's backlash"},
        {"compound_angle", "the compound's angle"},
        {"compound_scale", "the compound set on the other scale"},
        {"dial_mode", "the cross-slide dial read in the other mode (diameter or radius)"},
        {"trailing_edge", "the insert's trailing edge rubbing"},
        {"leading_edge", "the insert's leading edge rubbing"},
        {"feed_marks", "the feed marks"},
        {"other", "everything else"}};
    for (const auto& [key, label] : labels)
        if (key == source)
            return label;
    return source;
}

std::vector<const Cause*> causesOfPass(const std::vector<Cause>& causes, int pass) {
    std::vector<const Cause*> out;
    for (const Cause& c : causes)
        if (c.pass == pass)
            out.push_back(&c);
    return out;
}

} // namespace swarf
