// Settling a plan with the kernel: readings a person can set (whole divisions, checked against
// the tolerance by sweeping the plan), a relief plunge where the compound passes would start in
// metal, and back-outs far enough that the way back to each start cuts nothing.
#include "planner_build.h"

#include "swarf/sim/between_passes.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/findings.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <algorithm>
#include <cmath>
#include <map>

namespace swarf::detail {
namespace {

// The plan's exact sweep (with the profile after each pass) and its verdict per feature.
struct Exact {
    ExactSweep sweep;
    std::vector<FeatureReport> features;
};

Exact evaluate(const Scene& s) {
    const ToolOutline outline(s.tool);
    const std::vector<ToolMove> moves = planMoves(s);
    Exact e;
    e.sweep = sweepExact(s, outline, moves, moves.size(), 1.0, true);
    const Profile nominal = nominalOnGrid(s.part, e.sweep.asCut);
    const std::vector<double> dev = normalDeviation(s.part, nominal, e.sweep.asCut);
    const std::vector<bool> mask = verdictMask(s.part, e.sweep.asCut, outline.noseRadiusMm());
    // The valleys only (no crests): the crests of a finishing feed stand well under a micron,
    // and `swarf plan` runs the plan it writes through the whole kernel, crests and all.
    e.features = compareFeatures(s, e.sweep.asCut, dev, {}, mask);
    return e;
}

bool within(const Exact& e, int feature) {
    return feature >= 0 && feature < static_cast<int>(e.features.size()) &&
           e.features[static_cast<std::size_t>(feature)].withinTolerance;
}

// Puts a pass into the plan before index `at`, renumbering the steps that name later passes.
void insertPass(ConePlan& out, int at, const Pass& pass, const PassDisplay& display) {
    auto& passes = out.scene.plan.passes;
    passes.insert(passes.begin() + at, pass);
    out.display.insert(out.display.begin() + at, display);
    std::size_t stepAt = out.steps.size();
    for (std::size_t i = 0; i < out.steps.size(); ++i) {
        PlanStep& st = out.steps[i];
        if (st.kind != PlanStep::Kind::Pass)
            continue;
        if (st.pass == at && stepAt == out.steps.size())
            stepAt = i;
        if (st.pass >= at)
            ++st.pass;
    }
    PlanStep st;
    st.kind = PlanStep::Kind::Pass;
    st.pass = at;
    st.text = pass.note;
    out.steps.insert(out.steps.begin() + static_cast<std::ptrdiff_t>(stepAt), st);
    if (out.finishPass >= at)
        ++out.finishPass;
    for (int& p : out.halfDivisionPasses)
        if (p >= at)
            ++p;
}

// The imaginary tip where a manual pass starts, without backlash.
Eigen::Vector2d startTip(const Setup& su, const Pass& p) {
    const double c = passStartCrossMm(p);
    const double cp = p.kind == PassKind::Compound ? p.fromMm : p.compoundMm;
    const double s = p.kind == PassKind::Saddle ? p.fromMm : p.saddleMm;
    return tipFromTravels(su, crossTravelFromReading(su, c), cp, s);
}

// Takes pass `at` out of the plan, renumbering the steps that name later passes.
void erasePass(ConePlan& out, int at) {
    auto& passes = out.scene.plan.passes;
    passes.erase(passes.begin() + at);
    out.display.erase(out.display.begin() + at);
    for (std::size_t i = 0; i < out.steps.size();) {
        PlanStep& st = out.steps[i];
        if (st.kind == PlanStep::Kind::Pass && st.pass == at) {
            out.steps.erase(out.steps.begin() + static_cast<std::ptrdiff_t>(i));
            continue;
        }
        if (st.kind == PlanStep::Kind::Pass && st.pass > at)
            --st.pass;
        ++i;
    }
    if (out.finishPass > at)
        --out.finishPass;
    for (int& p : out.halfDivisionPasses)
        if (p > at)
            --p;
}

// Cone roughing passes that a relief left with nothing to cut are dropped, and the rest
// renumbered ("cone roughing pass 2 of 3").
void dropAirPasses(ConePlan& out) {
    const Exact e = evaluate(out.scene);
    const std::vector<ToolMove> moves = planMoves(out.scene);
    std::vector<double> removed(out.scene.plan.passes.size(), 0.0);
    for (std::size_t k = 0; k < moves.size() && k < e.sweep.cuts.size(); ++k)
        if (moves[k].pass >= 0)
            removed[static_cast<std::size_t>(moves[k].pass)] = std::max(
                removed[static_cast<std::size_t>(moves[k].pass)], e.sweep.cuts[k].maxRemovedMm);
    for (int k = static_cast<int>(removed.size()) - 1; k >= 0; --k)
        if (out.display[static_cast<std::size_t>(k)].coneRough &&
            out.scene.plan.passes[static_cast<std::size_t>(k)].kind == PassKind::Compound &&
            removed[static_cast<std::size_t>(k)] < kAirCutMm)
            erasePass(out, k);
    const std::string head = "cone roughing pass ";
    int n = 0, i = 0;
    for (std::size_t k = 0; k < out.scene.plan.passes.size(); ++k)
        if (out.display[k].coneRough && out.scene.plan.passes[k].note.rfind(head, 0) == 0 &&
            out.display[k].setting == 0)
            ++n;
    for (std::size_t k = 0; k < out.scene.plan.passes.size(); ++k) {
        std::string& note = out.scene.plan.passes[k].note;
        if (!out.display[k].coneRough || note.rfind(head, 0) != 0)
            continue;
        if (out.display[k].setting == 0)
            ++i;
        const std::size_t rest = note.find(',');
        note = head + std::to_string(i) + " of " + std::to_string(n) +
               (rest == std::string::npos ? "" : note.substr(rest));
    }
    for (PlanStep& st : out.steps)
        if (st.kind == PlanStep::Kind::Pass)
            st.text = out.scene.plan.passes[static_cast<std::size_t>(st.pass)].note;
    out.roughingPasses = n;
}

} // namespace

void settleFinishReadings(ConePlan& out, const std::vector<PlanBuilder::FinishReading>& finishes) {
    if (finishes.empty())
        return;
    const Slide& cross = out.scene.setup.cross;
    const double div = cross.mmPerDivision;
    std::map<int, std::vector<PlanBuilder::FinishReading>> byFeature;
    for (const auto& f : finishes)
        byFeature[f.feature].push_back(f);
    auto& passes = out.scene.plan.passes;
    Exact e = evaluate(out.scene);
    for (const auto& entry : byFeature) {
        // Not a structured binding: a lambda below uses the group (clang 14 cannot capture one).
        const int feature = entry.first;
        const std::vector<PlanBuilder::FinishReading>& group = entry.second;
        if (within(e, feature))
            continue;
        // The other whole division, then half a division, around each exact reading.
        auto apply = [&](int which) {
            for (const auto& f : group) {
                // On the dial as the sheet shows it.
                const double shown = f.exactMm + f.shownOffsetMm;
                const double lo = std::floor(shown / div + 1e-9) * div;
                const double near = roundToDivision(cross, shown);
                const double other = std::fabs(near - lo) < 1e-12 ? lo + div : lo;
                passes[static_cast<std::size_t>(f.pass)].crossMm = (which == 0   ? near
                                                                    : which == 1 ? other
                                                                                 : lo + 0.5 * div) -
                                                                   f.shownOffsetMm;
            }
        };
        bool held = false;
        for (int which : {1, 2}) {
            apply(which);
            e = evaluate(out.scene);
            if (within(e, feature)) {
                held = true;
                if (which == 2)
                    for (const auto& f : group)
                        out.halfDivisionPasses.push_back(f.pass);
                break;
            }
        }
        if (!held) {
            apply(0); // nothing holds it: the nearest whole division, and the proof says so
            e = evaluate(out.scene);
        }
    }
    for (int p : out.halfDivisionPasses)
        out.cautions.push_back(
            "pass " + std::to_string(p + 1) + "'s cross-slide reading is set on half a division (" +
            formatLength(passes[static_cast<std::size_t>(p)].crossMm, out.scene.units) +
            "): no whole division keeps the finished size within its tolerance");
}

void reliefWhereBuried(ConePlan& out, const std::string& why) {
    const Scene& sc = out.scene;
    const ToolOutline outline(sc.tool);
    const Exact e = evaluate(sc);
    const auto& passes = sc.plan.passes;
    // Compound passes that start in the metal, grouped by where they start (compound, saddle).
    std::map<std::pair<long, long>, std::vector<int>> groups;
    for (std::size_t k = 0; k < passes.size(); ++k) {
        const Pass& p = passes[k];
        if (p.kind != PassKind::Compound)
            continue;
        ToolMove still;
        still.tipFrom = still.tipTo = startTip(sc.setup, p);
        const Profile& metal = k == 0 ? e.sweep.stock : e.sweep.afterPass[k - 1];
        if (metalInTheWay(sc, outline, still, metal).depthMm < kAirCutMm)
            continue;
        const auto key = std::make_pair(std::lround(p.fromMm * 1e6), std::lround(p.saddleMm * 1e6));
        groups[key].push_back(static_cast<int>(k));
    }
    std::vector<std::pair<int, Pass>> reliefs;
    for (const auto& [key, ks] : groups) {
        // Plunge at that start to the deepest of the passes that start there (their finish).
        double deepest = -1e300;
        for (const Pass& p : passes)
            if (p.kind == PassKind::Compound && std::lround(p.fromMm * 1e6) == key.first &&
                std::lround(p.saddleMm * 1e6) == key.second)
                deepest = std::max(deepest, p.crossMm);
        const Pass& first = passes[static_cast<std::size_t>(ks.front())];
        Pass r;
        r.kind = PassKind::CrossSlide;
        r.compoundMm = first.fromMm;
        r.saddleMm = first.saddleMm;
        r.toMm = deepest;
        // Start the plunge half a millimetre outside the bar (or what is left of it) there.
        const Eigen::Vector2d tipTo = startTip(sc.setup, first);
        const double kTravel = crossTravelFromReading(sc.setup, 1.0);
        const Profile& metal = e.sweep.stock;
        double top = 0;
        for (double z = tipTo.x() - 3.0 * sc.tool.noseRadiusMm - 1.0; z <= tipTo.x() + 1.0;
             z += 0.05)
            top = std::max(top, metal.radiusAt(z));
        const Slide& cross = sc.setup.cross;
        // Reading at which the tip stands at `top` + 0.5 mm: travel out from the pass's reading.
        const double outTravel = (top + 0.5) - tipTo.y();
        double from = first.crossMm - outTravel / kTravel;
        from = std::floor(from / cross.mmPerDivision + 1e-9) * cross.mmPerDivision;
        r.fromMm = std::min(from, deepest - cross.mmPerDivision);
        r.feedMmPerRev = sc.planning.finishFeedMmPerRev;
        r.note = "relief at the start of the cone passes: plunge the cross-slide in to the "
                 "finishing reading, so that every cone pass starts clear of the metal (" +
                 why + ")";
        reliefs.emplace_back(ks.front(), r);
    }
    std::sort(reliefs.begin(), reliefs.end(),
              [](const auto& a, const auto& b) { return a.first > b.first; });
    for (const auto& [at, r] : reliefs) {
        PassDisplay d;
        d.stage = 1;
        insertPass(out, at, r, d);
        const double depth =
            (r.toMm - r.fromMm) * crossTravelFromReading(sc.setup, 1.0) - 0.5; // below the bar
        if (depth > sc.planning.maxDepthMm)
            out.cautions.push_back(
                "the relief at the start of the cone passes plunges " +
                formatLength(depth, sc.units) +
                " into the bar, deeper than a roughing pass: feed it in slowly. A compound "
                "winding the other way along the axis would start the passes at the cone's "
                "other end");
    }
    if (!reliefs.empty())
        dropAirPasses(out);
}

void chooseRetracts(ConePlan& out) {
    Scene& sc = out.scene;
    const ToolOutline outline(sc.tool);
    const Exact e = evaluate(sc);
    const double turn = turnMm(sc.setup.cross);
    const double clearanceMm = 0.2; // kept between the tool and the metal on the way back
    auto& passes = sc.plan.passes;
    for (std::size_t k = 0; k < passes.size(); ++k) {
        if (passes[k].kind == PassKind::Path)
            continue;
        double base = passEndCrossMm(passes[k]);
        if (k + 1 < passes.size() && passes[k + 1].kind != PassKind::Path)
            base = std::min(base, passStartCrossMm(passes[k + 1]));
        // A whole division as the dial reads after this pass (stage A counts from the bar).
        const double off = out.display[k].stage == 0 ? out.stage0CrossOffsetMm : 0.0;
        auto shownWhole = [&](double r) {
            const double d = sc.setup.cross.mmPerDivision;
            return std::floor((r + off) / d + 1e-9) * d - off;
        };
        passes[k].retractToMm = shownWhole(defaultRetractReadingMm(sc.setup, base, base));
        for (int extra = 0; extra <= 40; ++extra) {
            bool clear = true;
            for (const BetweenMove& m : betweenPassMoves(sc)) {
                if (m.afterPass != static_cast<int>(k))
                    continue;
                const bool traverse = m.step != ReturnStep::BackOut && m.step != ReturnStep::FeedIn;
                if (!traverse)
                    continue;
                const MetalInTheWay w = metalInTheWay(sc, outline, m.move, metalBefore(m, e.sweep));
                clear = clear && w.depthMm < -clearanceMm;
            }
            if (clear)
                break;
            passes[k].retractToMm = shownWhole(base - (extra + 2) * turn); // a turn more
        }
        if (!passes[k].retractToMm)
            passes[k].retractToMm = shownWhole(defaultRetractReadingMm(sc.setup, base, base));
    }
}

} // namespace swarf::detail
