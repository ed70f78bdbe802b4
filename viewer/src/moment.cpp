// The viewer's description of one moment of the plan (see moment.h).
#include "swarf/viewer/moment.h"

#include "swarf/sim/kernel.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf::viewer {

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

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

} // namespace

const char* passKindName(PassKind kind) {
    switch (kind) {
    case PassKind::Compound:
        return "compound";
    case PassKind::Saddle:
        return "saddle";
    case PassKind::CrossSlide:
        return "cross-slide";
    case PassKind::Path:
        return "path";
    }
    return "?";
}

double profileRadiusAt(const Profile& p, double zMm) {
    if (p.radiusMm.empty())
        return kNaN;
    if (p.radiusMm.size() == 1 || p.dzMm <= 0)
        return p.radiusMm.front();
    const double u = (zMm - p.z0Mm) / p.dzMm;
    if (u <= 0)
        return p.radiusMm.front();
    const auto last = p.radiusMm.size() - 1;
    if (u >= static_cast<double>(last))
        return p.radiusMm.back();
    const auto i = static_cast<std::size_t>(u);
    const double t = u - static_cast<double>(i);
    // On a sample, that sample: a NaN neighbour (the edge of the drawing) must not spread.
    if (t == 0)
        return p.radiusMm[i];
    return lerp(p.radiusMm[i], p.radiusMm[i + 1], t);
}

std::vector<double> deviationFromNominal(const Profile& profile, const Profile& nominal) {
    const std::size_t n = profile.radiusMm.size();
    std::vector<double> dev(n, kNaN);
    const bool sameGrid = nominal.radiusMm.size() == n &&
                          std::fabs(nominal.z0Mm - profile.z0Mm) < 1e-9 &&
                          std::fabs(nominal.dzMm - profile.dzMm) < 1e-12;
    auto nominalAt = [&](std::size_t i) {
        return sameGrid ? nominal.radiusMm[i] : profileRadiusAt(nominal, profile.zAt(i));
    };
    for (std::size_t i = 0; i < n; ++i) {
        const double rn = nominalAt(i);
        if (std::isnan(rn))
            continue;
        // Slope of the drawn surface from its neighbours, so the deviation is taken normal to it
        // (a radial difference δ on a surface at half angle α is δ·cos α away from it).
        double slope = 0;
        const double rPrev = i > 0 ? nominalAt(i - 1) : kNaN;
        const double rNext = i + 1 < n ? nominalAt(i + 1) : kNaN;
        if (!std::isnan(rPrev) && !std::isnan(rNext))
            slope = (rNext - rPrev) / (2 * profile.dzMm);
        else if (!std::isnan(rNext))
            slope = (rNext - rn) / profile.dzMm;
        else if (!std::isnan(rPrev))
            slope = (rn - rPrev) / profile.dzMm;
        // A face (vertical step in the drawing) would give a huge slope; the radial difference is
        // then meaningless, so leave it out.
        if (!std::isfinite(slope) || std::fabs(slope) > 50)
            continue;
        dev[i] = (profile.radiusMm[i] - rn) / std::sqrt(1 + slope * slope);
    }
    return dev;
}

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
        if (v.passFraction >= 1)
            v.profile = afterPass(v.pass);
        else
            v.profile = profileUpTo(scene, result.moves, k + 1, local);
    }

    if (v.finished && !result.asCut.radiusMm.empty())
        v.profile = result.asCut;
    if (v.finished && result.deviationMm.size() == v.profile.radiusMm.size())
        v.deviationMm = result.deviationMm;
    else
        v.deviationMm = deviationFromNominal(v.profile, result.nominal);
    return v;
}

} // namespace swarf::viewer
