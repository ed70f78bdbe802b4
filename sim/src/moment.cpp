// One moment of the plan (see moment.h).
#include "swarf/sim/moment.h"

#include "swarf/sim/bore_sweep.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/kernel.h"

#include <algorithm>
#include <cmath>

namespace swarf {

namespace {

// Where the slider is: pass index and how far through it, by tool-path length.
struct PassPoint {
    int pass = -1;
    double fraction = 0;
};

PassPoint splitPosition(double position, int passCount) {
    if (position <= 0 || passCount == 0)
        return {-1, 0};
    if (position >= passCount)
        return {passCount - 1, 1.0};
    const double whole = std::floor(position);
    const double f = position - whole;
    // A whole number k means pass k (1-based) has just ended.
    if (f == 0)
        return {static_cast<int>(whole) - 1, 1.0};
    return {static_cast<int>(whole), f};
}

double moveLength(const ToolMove& m) {
    return (m.tipTo - m.tipFrom).norm();
}

double lerp(double a, double b, double t) {
    return a + (b - a) * t;
}

// The bore at a moment of a bored result: whole passes from the kernel, part of a pass swept
// again (boredProfile) with the first `count` moves, the last of them `fraction` of the way.
Profile boreNow(const Scene& scene, const CutResult& result, const MomentView& v, bool partial,
                std::size_t count, double fraction) {
    auto after = [&](int k) -> const Profile& {
        if (k < 0)
            return result.boreStock;
        if (static_cast<std::size_t>(k) < result.boreAfterPass.size())
            return result.boreAfterPass[static_cast<std::size_t>(k)];
        return result.bore;
    };
    if (v.finished && !result.bore.radiusMm.empty())
        return result.bore;
    if (!partial)
        return v.passFraction >= 1 ? after(v.pass) : after(v.pass - 1);
    std::vector<ToolMove> moves(result.moves.begin(),
                                result.moves.begin() + static_cast<std::ptrdiff_t>(count));
    ToolMove& last = moves.back();
    last.tipTo = last.tipFrom + (last.tipTo - last.tipFrom) * fraction;
    return boredProfile(scene, ToolOutline(scene.tool), moves, result.boreStock);
}

} // namespace

std::vector<std::size_t> movesOfPass(const CutResult& result, int pass) {
    std::vector<std::size_t> idx;
    for (std::size_t i = 0; i < result.moves.size(); ++i)
        if (result.moves[i].pass == pass)
            idx.push_back(i);
    return idx;
}

MomentView describeMoment(const Scene& scene, const CutResult& result, double position) {
    MomentView v;
    v.passCount = static_cast<int>(scene.plan.passes.size());
    v.position = std::clamp(position, 0.0, static_cast<double>(v.passCount));
    const PassPoint pp = splitPosition(v.position, v.passCount);
    v.pass = pp.pass;
    v.passFraction = pp.fraction;
    v.finished = v.passCount > 0 && v.position >= v.passCount;
    if (v.pass >= 0) {
        const Pass& p = scene.plan.passes[static_cast<std::size_t>(v.pass)];
        v.passKind = passKindName(p.kind);
        v.passNote = p.note;
        v.feedMmPerRev = p.feedMmPerRev;
    }

    // The tool and the dials: before the first pass, at the start of the first move.
    if (!result.moves.empty()) {
        const ToolMove& first = result.moves.front();
        v.tipZX = first.tipFrom;
        v.crossMm = first.crossFrom;
        v.compoundMm = first.compoundFrom;
        v.saddleMm = first.saddleFrom;
    }

    // The profile of whole passes comes straight from the kernel.
    auto afterPass = [&](int k) -> const Profile& {
        if (k < 0)
            return result.stock;
        if (static_cast<std::size_t>(k) < result.afterPass.size())
            return result.afterPass[static_cast<std::size_t>(k)];
        return result.asCut;
    };

    const std::vector<std::size_t> mine = movesOfPass(result, v.pass);
    bool partial = false; // part of a pass: the first cutCount moves, the last cutFraction along
    std::size_t cutCount = 0;
    double cutFraction = 1.0;
    if (v.pass < 0) {
        v.profile = result.stock;
    } else if (mine.empty()) {
        // A pass without moves (nothing to do): the cut as the pass before left it.
        v.profile = v.passFraction >= 1 ? afterPass(v.pass) : afterPass(v.pass - 1);
    } else {
        // Which move of the pass the slider is in, by path length.
        double total = 0;
        for (std::size_t i : mine)
            total += moveLength(result.moves[i]);
        const double target = v.passFraction * total;
        std::size_t k = mine.back();
        double local = 1.0;
        double walked = 0;
        for (std::size_t i : mine) {
            const double len = moveLength(result.moves[i]);
            if (walked + len >= target || i == mine.back()) {
                k = i;
                local = len > 0 ? std::clamp((target - walked) / len, 0.0, 1.0) : 1.0;
                break;
            }
            walked += len;
        }
        if (total == 0)
            local = v.passFraction;
        const ToolMove& m = result.moves[k];
        v.tipZX = m.tipFrom + (m.tipTo - m.tipFrom) * local;
        v.crossMm = lerp(m.crossFrom, m.crossTo, local);
        v.compoundMm = lerp(m.compoundFrom, m.compoundTo, local);
        v.saddleMm = lerp(m.saddleFrom, m.saddleTo, local);
        // A boring bar leaves the outside as the bar is (inside_kernel.h): the bore moves.
        if (v.passFraction >= 1 || result.bored)
            v.profile = afterPass(v.pass);
        else
            v.profile = profileUpTo(scene, result.moves, k + 1, local);
        partial = v.passFraction < 1;
        cutCount = k + 1;
        cutFraction = local;
    }

    if (v.finished && !result.asCut.radiusMm.empty())
        v.profile = result.asCut;
    if (v.finished && result.deviationMm.size() == v.profile.radiusMm.size())
        v.deviationMm = markedDeviation(result.deviationMm, result.crestDeviationMm);
    else if (result.nominal.radiusMm.size() == v.profile.radiusMm.size())
        v.deviationMm = normalDeviation(scene.part, result.nominal, v.profile);
    else
        v.deviationMm =
            normalDeviation(scene.part, nominalOnGrid(scene.part, v.profile), v.profile);
    if (result.bored) {
        v.bore = boreNow(scene, result, v, partial, cutCount, cutFraction);
        if (v.finished && result.boreDeviationMm.size() == v.bore.radiusMm.size())
            v.boreDeviationMm =
                markedDeviation(result.boreDeviationMm, result.boreCrestDeviationMm);
        else if (result.boreNominal.radiusMm.size() == v.bore.radiusMm.size())
            v.boreDeviationMm =
                normalDeviation(scene.part, result.boreNominal, v.bore, Side::Inside);
    }
    return v;
}

} // namespace swarf
