// Checking the moves between passes against the metal (see between_passes.h).
#include "swarf/sim/between_passes.h"

#include "swarf/sim/findings.h"

#include <algorithm>
#include <cmath>

namespace swarf {
namespace {

const char* slideWord(SlideName s) {
    return s == SlideName::Cross ? "cross-slide" : s == SlideName::Compound ? "compound" : "saddle";
}

// The metal's radius at grid sample i: none before the free end, the profile over its grid,
// the bar past it. Samples, not interpolation: a wall between two samples is not metal.
double metalAt(const Scene& scene, const Profile& metal, long i) {
    const double z = metal.z0Mm + static_cast<double>(i) * metal.dzMm;
    if (z < scene.stock.freeEndZMm() - 1e-9)
        return 0.0;
    if (i < 0 || i >= static_cast<long>(metal.radiusMm.size()))
        return 0.5 * scene.stock.diameterMm;
    return metal.radiusMm[static_cast<std::size_t>(i)];
}

} // namespace

std::string betweenMoveWords(const BetweenMove& m) {
    const std::string s = slideWord(m.slide);
    switch (m.step) {
    case ReturnStep::BackOut:
        return "backing the cross-slide out";
    case ReturnStep::WindBack:
        return "winding the " + s + " back past its next reading";
    case ReturnStep::BringUp:
        return "bringing the " + s + " up to its reading";
    case ReturnStep::Dial:
        return "dialling the " + s + " to its next reading";
    case ReturnStep::FeedIn:
        return "feeding the cross-slide in";
    }
    return "moving the " + s;
}

MetalInTheWay metalInTheWay(const Scene& scene, const ToolOutline& outline, const ToolMove& move,
                            const Profile& metal) {
    MetalInTheWay out;
    out.depthMm = -1e9; // no metal within reach
    const MoveSweep s = prepareMove(outline, move);
    const double dz = metal.dzMm > 0 ? metal.dzMm : scene.sim.profileStepMm;
    const double h = scene.tool.tipHeightMm;
    // On the sweep's own samples (z0 + i·dz, the range worked out as sweepExact does, so that a
    // wall the last pass left between two samples is seen as it left it), continued past the
    // grid at the same spacing.
    const long iLo = static_cast<long>(std::ceil((s.zLoMm - metal.z0Mm) / dz));
    const long iHi = static_cast<long>(std::floor((s.zHiMm - metal.z0Mm) / dz));
    for (long i = iLo; i <= iHi; ++i) {
        const double r = metalAt(scene, metal, i);
        if (!(r > 0))
            continue;
        const double z = metal.z0Mm + static_cast<double>(i) * dz;
        // The outline's very edge touches a wall the pass left there; rounding decides which
        // side of the sample it falls (a pass's end is its start plus its length): no cut.
        if (z < s.zLoMm + 1e-7 || z > s.zHiMm - 1e-7)
            continue;
        const double cut = cutRadiusMm(sweptLowestX(outline, s, z), h);
        if (r - cut > out.depthMm) {
            out.depthMm = r - cut;
            out.zMm = z;
        }
    }
    return out;
}

const Profile& metalBefore(const BetweenMove& m, const ExactSweep& sweep) {
    if (m.afterPass >= 0 && m.afterPass < static_cast<int>(sweep.afterPass.size()))
        return sweep.afterPass[static_cast<std::size_t>(m.afterPass)];
    return sweep.stock;
}

const char* returnStepKey(ReturnStep step) {
    switch (step) {
    case ReturnStep::BackOut:
        return "back_out";
    case ReturnStep::WindBack:
        return "wind_back";
    case ReturnStep::BringUp:
        return "bring_up";
    case ReturnStep::Dial:
        return "dial";
    case ReturnStep::FeedIn:
        return "feed_in";
    }
    return "unknown";
}

const char* slideKey(SlideName slide) {
    return slide == SlideName::Cross      ? "cross"
           : slide == SlideName::Compound ? "compound"
                                          : "saddle";
}

std::vector<Finding> findCutsBetweenPasses(const Scene& scene, const ToolOutline& outline,
                                           std::vector<BetweenMove>& moves,
                                           const ExactSweep& sweep) {
    std::vector<Finding> out;
    const Units u = scene.units;
    for (BetweenMove& m : moves) {
        const MetalInTheWay w = metalInTheWay(scene, outline, m.move, metalBefore(m, sweep));
        m.cutsMm = std::max(0.0, w.depthMm);
        if (w.depthMm < kAirCutMm)
            continue;
        const int pass = m.beforePass >= 0 ? m.beforePass : m.afterPass;
        // One finding per pass is enough to send the person back to it; keep the deepest.
        auto same =
            std::find_if(out.begin(), out.end(), [&](const Finding& f) { return f.pass == pass; });
        std::string where = m.beforePass < 0  ? "after the last pass"
                            : m.afterPass < 0 ? "coming to pass " + std::to_string(pass + 1)
                                              : "between pass " + std::to_string(m.afterPass + 1) +
                                                    " and pass " + std::to_string(pass + 1);
        Finding f;
        f.kind = FindingKind::CutBetweenPasses;
        f.pass = pass;
        f.zMm = w.zMm;
        f.valueMm = w.depthMm;
        const std::string fix =
            m.step == ReturnStep::FeedIn
                ? "the pass starts in the metal: start it clear (plunge a relief there first, or "
                  "cut from the other end of the cone)"
            : m.step == ReturnStep::BackOut
                ? "the tool ends the pass against metal it cannot back out of"
                : "back the cross-slide out further before the tool goes back";
        f.message = where + ", " + betweenMoveWords(m) + " cuts " + formatLength(w.depthMm, u) +
                    " into the metal at z = " + formatLength(w.zMm, u) +
                    ", a move that should cut nothing: " + fix;
        if (same == out.end())
            out.push_back(f);
        else if (w.depthMm > same->valueMm)
            *same = f;
    }
    return out;
}

} // namespace swarf
