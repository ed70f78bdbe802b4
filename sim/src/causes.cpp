// What moved the cone: counterfactual runs, one source at a time (see causes.h).
#include "swarf/sim/causes.h"

#include "swarf/sim/budget.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/nose_offset.h"
#include "swarf/sim/units.h"

#include <algorithm>
#include <cmath>
#include <functional>
#include <optional>

namespace swarf {

namespace {

// A cone as one run cuts it.
struct Outcome {
    double diameterMm = 0, halfAngleRad = 0;
};

// What the causes are measured against: the main cone of the drawing.
struct Target {
    int feature = -1;
    const Feature* cone = nullptr;
    double lengthMm = 0;
    Units units = Units::Mm;
};

Outcome run(const Scene& s, const Target& t) {
    const PartOutcome o = partOutcome(s, t.feature);
    return {o.gaugeDiameterMm, o.halfAngleRad};
}

// How far a cone is from the drawing, in tolerances: |gauge error|/t + |half-angle error|/tθ.
double distance(const Outcome& o, const Target& t) {
    const Feature& f = *t.cone;
    return std::fabs(o.diameterMm - f.cone.gaugeDiameterMm) / f.toleranceMm +
           std::fabs(o.halfAngleRad - f.cone.halfAngleRad) / f.angleToleranceRad;
}

// A change worth naming: 0.1 µm on the gauge diameter, or on the cone's length by its angle.
bool worthNaming(double dMm, double dRad, const Target& t) {
    return std::fabs(dMm) >= 1e-4 || std::fabs(dRad) * t.lengthMm >= 1e-4;
}

// The cone's change in words: "the cone is 0.100 mm small on diameter at the gauge plane" and,
// when the half angle moved by a second or more, its change too.
std::string sizeWords(double dMm, double dRad, Units u) {
    std::string s = "the cone is " + formatLength(std::fabs(dMm), u, Precision::Fine) +
                    (dMm >= 0 ? " large" : " small") + " on diameter at the gauge plane";
    if (std::fabs(dRad) >= degToRad(1.0 / 3600.0))
        s += ", its half angle " + formatDms(std::fabs(dRad), 0) +
             (dRad >= 0 ? " steeper" : " shallower");
    return s;
}

// The finishing move at the gauge plane: the cutting move whose imaginary tip runs deepest
// there. Returns its pass and the tip's x at the gauge plane.
struct Finishing {
    int pass = -1;
    double tipXMm = 0;
};

std::optional<Finishing> finishingAt(const std::vector<ToolMove>& moves, double zMm) {
    std::optional<Finishing> best;
    for (const ToolMove& m : moves) {
        const double z0 = m.tipFrom.x(), z1 = m.tipTo.x();
        if (std::fabs(z1 - z0) < 1e-9 || zMm < std::min(z0, z1) || zMm > std::max(z0, z1))
            continue;
        const double x = m.tipFrom.y() + (zMm - z0) / (z1 - z0) * (m.tipTo.y() - m.tipFrom.y());
        if (!best || x < best->tipXMm)
            best = Finishing{m.pass, x};
    }
    return best;
}

// Moves pass k's cut by dxMm in radius (+: away from the axis), as a person does by setting the
// cross-slide reading (or, on a CNC path, the points).
void shiftPass(Scene& s, int k, double dxMm) {
    Pass& p = s.plan.passes.at(static_cast<std::size_t>(k));
    const double reading = s.setup.crossDial == DialMode::Diameter ? 2 * dxMm : dxMm;
    switch (p.kind) {
    case PassKind::Compound:
    case PassKind::Saddle:
        p.crossMm -= reading; // increasing readings move in
        break;
    case PassKind::CrossSlide:
        p.fromMm -= reading;
        p.toMm -= reading;
        break;
    case PassKind::Path:
        for (auto& pt : p.pathZX)
            pt.second += dxMm;
        return;
    }
    if (p.retractToMm)
        *p.retractToMm -= reading;
}

// The reading on the scene's own scale that sets the compound to half angle θ.
double readingFor(const Setup& su, double thetaRad) {
    return su.compoundScale == CompoundScale::FromAxis ? thetaRad : kPi / 2 - thetaRad;
}

// One repair: its name, and the scene it makes from the current one (empty: not a candidate).
struct Repair {
    std::string source;
    std::function<std::optional<Scene>(const Scene&, std::string&)> make;
};

std::vector<Repair> repairs(const Target& t) {
    const Feature& f = *t.cone;
    const double theta = f.cone.halfAngleRad;
    std::vector<Repair> out;
    // The compound set to the reading the drawn half angle has on the other scale.
    out.push_back(
        {"compound_scale", [&f, theta](const Scene& s, std::string& msg) {
             std::optional<Scene> none;
             const double tol = f.angleToleranceRad;
             Scene r = s;
             bool any = false;
             auto mend = [&](double& reading) {
                 const double own =
                     s.setup.compoundScale == CompoundScale::FromAxis ? reading : kPi / 2 - reading;
                 const double other =
                     s.setup.compoundScale == CompoundScale::FromAxis ? kPi / 2 - reading : reading;
                 if (std::fabs(own - theta) > tol && std::fabs(other - theta) <= tol) {
                     reading = readingFor(s.setup, theta);
                     any = true;
                 }
             };
             mend(r.setup.compoundReadingRad);
             for (Pass& p : r.plan.passes)
                 if (p.compoundAngleRad)
                     mend(*p.compoundAngleRad);
             if (!any)
                 return none;
             msg = std::string("the compound was set to ") +
                   formatDms(s.setup.compoundReadingRad, 0) + ", the half angle as a scale read " +
                   (s.setup.compoundScale == CompoundScale::FromAxis ? "from the cross-slide"
                                                                     : "from the axis") +
                   " shows it, on a scale read " +
                   (s.setup.compoundScale == CompoundScale::FromAxis ? "from the axis"
                                                                     : "from the cross-slide") +
                   "|set " + formatDms(readingFor(s.setup, theta), 0) + " on this scale";
             return std::optional<Scene>(r);
         }});
    // The cross-slide readings worked out for the other dial mode.
    out.push_back({"dial_mode", [](const Scene& s, std::string& msg) {
                       std::optional<Scene> none;
                       const bool manual =
                           std::any_of(s.plan.passes.begin(), s.plan.passes.end(),
                                       [](const Pass& p) { return p.kind != PassKind::Path; });
                       if (!manual)
                           return none;
                       Scene r = s;
                       const bool dia = s.setup.crossDial == DialMode::Diameter;
                       r.setup.crossDial = dia ? DialMode::Radius : DialMode::Diameter;
                       msg = std::string("the cross-slide readings were worked out for a ") +
                             (dia ? "radius" : "diameter") + " dial, and the dial reads " +
                             (dia ? "diameter" : "radius") + "|work them out on " +
                             (dia ? "diameter" : "radius") + ", as the dial reads";
                       return std::optional<Scene>(r);
                   }});
    // The nose-radius offset: the finishing pass shifted to where the closed form puts the
    // imaginary tip (references R1), less what its readings already applied. A candidate when
    // the miss exceeds half a cross-slide division (finer than a person can set) and is no more
    // than 2.5 offsets (missing, doubled, or on the wrong side; a larger miss is not the
    // offset's).
    out.push_back({"nose_offset", [&f, theta](const Scene& s, std::string& msg) {
                       std::optional<Scene> none;
                       const auto fin = finishingAt(planMoves(s), f.cone.gaugeZMm);
                       if (!fin)
                           return none;
                       const TipSide side =
                           s.tool.hand == Hand::L ? TipSide::TailstockSide : TipSide::ChuckSide;
                       const NoseOffsets no =
                           noseRadiusOffsets(s.tool.noseRadiusMm, theta, f.cone.widens, side);
                       const double target =
                           0.5 * f.cone.gaugeDiameterMm + no.xShiftSign * no.dxRadiusMm;
                       const double miss = target - fin->tipXMm;
                       const double halfDivision =
                           0.5 * crossTravelFromReading(s.setup, s.setup.cross.mmPerDivision);
                       if (std::fabs(miss) <= halfDivision || std::fabs(miss) > 2.5 * no.dxRadiusMm)
                           return none;
                       Scene r = s;
                       shiftPass(r, fin->pass, miss);
                       const double reading = s.setup.crossDial == DialMode::Diameter
                                                  ? 2 * std::fabs(miss)
                                                  : std::fabs(miss);
                       msg = "the finishing pass " +
                             std::string(std::fabs(miss) > 1.5 * no.dxRadiusMm
                                             ? "had the nose-radius offset the wrong way"
                                         : std::fabs(miss) > 0.5 * no.dxRadiusMm
                                             ? "was set without the nose-radius offset"
                                             : "had only part of the nose-radius offset") +
                             " (" + formatLength(no.dxRadiusMm, s.units, Precision::Fine) +
                             " on radius for this nose and angle, references R1)";
                       msg += "|set the finishing reading " +
                              formatLength(reading, s.units, Precision::Fine) +
                              (miss < 0 ? " further in" : " further out") + " on the dial";
                       return std::optional<Scene>(r);
                   }});
    return out;
}

// A removal: a source the machine model has, set to zero.
struct Removal {
    std::string source;
    bool present;
    std::function<void(Scene&)> remove;
    std::string what, fix;
};

std::vector<Removal> removals(const Scene& s) {
    const Units u = s.units;
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
         "set the tip on centre (against a centre in the tailstock, or by facing to a pip)"},
        {"cross_backlash", s.setup.cross.backlashMm > 0,
         [](Scene& x) { x.setup.cross.backlashMm = 0; }, slideWords("cross-slide", s.setup.cross),
         "come to every cross-slide reading from outside: back out past it and feed in"},
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
    };
}

Cause makeCause(const std::string& source, const Outcome& with, const Outcome& without, int pass,
                const std::string& what, const std::string& fix, Units u) {
    Cause c;
    c.source = source;
    c.gaugeDiameterChangeMm = with.diameterMm - without.diameterMm;
    c.halfAngleChangeRad = with.halfAngleRad - without.halfAngleRad;
    c.pass = pass;
    c.message = what + ": " + sizeWords(c.gaugeDiameterChangeMm, c.halfAngleChangeRad, u) +
                (fix.empty() ? "" : "; " + fix);
    return c;
}

} // namespace

std::vector<Cause> findCauses(const Scene& scene, const CutResult& result) {
    std::vector<Cause> out;
    const Feature* cone = scene.part.mainCone();
    if (!cone || scene.plan.passes.empty())
        return out;
    Target t;
    t.feature = static_cast<int>(cone - scene.part.features.data());
    t.cone = cone;
    t.lengthMm = cone->zEndMm - cone->zStartMm;
    t.units = scene.units;
    const Units u = scene.units;

    Scene base = scene;
    base.sim.profileStepMm = budgetProfileStepMm(scene);
    const Outcome given = run(base, t);
    const auto fin = finishingAt(planMoves(base), cone->cone.gaugeZMm);
    const int finPass = fin ? fin->pass : -1;

    // Removals: each from the scene as given.
    Scene clean = base;
    for (const Removal& r : removals(base)) {
        if (!r.present)
            continue;
        Scene s = base;
        r.remove(s);
        r.remove(clean);
        const Outcome without = run(s, t);
        Cause c = makeCause(r.source, given, without, finPass, r.what, r.fix, u);
        if (worthNaming(c.gaugeDiameterChangeMm, c.halfAngleChangeRad, t))
            out.push_back(c);
    }

    // Repairs: on the clean machine, the best one first, each kept when it brings the cone
    // nearer the drawing by more than a hundredth of a tolerance.
    Outcome now = run(clean, t);
    std::vector<Repair> todo = repairs(t);
    while (!todo.empty()) {
        // Each candidate's mended cone; the one kept is the first (in the order compound_scale,
        // dial_mode, nose_offset: a reading read another way before a shift of the finishing
        // pass, which could mimic either) within a tenth of a tolerance of the nearest.
        std::vector<std::optional<Scene>> scenes(todo.size());
        std::vector<Outcome> outcomes(todo.size());
        std::vector<std::string> msgs(todo.size());
        double nearest = distance(now, t) - 0.01;
        for (std::size_t i = 0; i < todo.size(); ++i) {
            scenes[i] = todo[i].make(clean, msgs[i]);
            if (!scenes[i])
                continue;
            outcomes[i] = run(*scenes[i], t);
            nearest = std::min(nearest, distance(outcomes[i], t));
        }
        std::size_t bestIndex = todo.size();
        for (std::size_t i = 0; i < todo.size() && bestIndex == todo.size(); ++i)
            if (scenes[i] && distance(outcomes[i], t) <= nearest + 0.1 &&
                distance(outcomes[i], t) < distance(now, t) - 0.01)
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
                      bar == std::string::npos ? "" : bestMsg.substr(bar + 1), u);
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
                        sizeWords(dMm, dRad, u);
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
        c.gaugeDiameterChangeMm = 2 * rtMm / std::cos(cone->cone.halfAngleRad);
        c.pass = result.finishingPass;
        c.message = "the finishing feed of " + formatLength(p.feedMmPerRev, u) +
                    " a revolution leaves feed marks " + formatSmallLength(rtMm, u) +
                    " high (Rt), against a band of " + formatSmallLength(band, u) +
                    " normal to the surface: a gauge on the crests finds the cone " +
                    formatLength(c.gaugeDiameterChangeMm, u, Precision::Fine) +
                    " larger on diameter; finish at " + formatLength(feed, u) +
                    " a revolution or less";
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
        "feed_marks",      "other"};
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
