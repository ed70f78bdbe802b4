// The exact axisymmetric sweep (see sweep.h for the construction).
#include "swarf/sim/sweep.h"

#include <algorithm>
#include <cassert>
#include <limits>
#include <thread>

namespace swarf {
namespace {

// Below this many samples one thread is quicker than two.
constexpr std::size_t kThreadMinSamples = 4000;

} // namespace

MoveSweep prepareMove(const ToolOutline& outline, const ToolMove& move, double fraction) {
    MoveSweep s;
    const Eigen::Vector2d tipTo = move.tipFrom + fraction * (move.tipTo - move.tipFrom);
    s.centreFrom = move.tipFrom - outline.imaginaryTip();
    s.centreTo = tipTo - outline.imaginaryTip();
    const Eigen::Vector2d d = s.centreTo - s.centreFrom;
    if (std::abs(d.x()) > 1e-12) {
        const double slope = d.y() / d.x();
        const Eigen::Vector2d q = outline.support(slope);
        s.support = q;
        const Eigen::Vector2d a = q + s.centreFrom, b = q + s.centreTo;
        s.hasBridge = true;
        s.bridgeZLo = std::min(a.x(), b.x());
        s.bridgeZHi = std::max(a.x(), b.x());
        s.bridgeZ0 = a.x();
        s.bridgeX0 = a.y();
        s.bridgeSlope = slope;
    }
    s.zLoMm = std::min(s.centreFrom.x(), s.centreTo.x()) + outline.uMinMm();
    s.zHiMm = std::max(s.centreFrom.x(), s.centreTo.x()) + outline.uMaxMm();
    return s;
}

double sweptLowestX(const ToolOutline& outline, const MoveSweep& s, double zMm) {
    double x = outline.lowerEnvelope(zMm - s.centreFrom.x()) + s.centreFrom.y();
    x = std::min(x, outline.lowerEnvelope(zMm - s.centreTo.x()) + s.centreTo.y());
    if (s.hasBridge && zMm >= s.bridgeZLo && zMm <= s.bridgeZHi) {
        x = std::min(x, s.bridgeX0 + s.bridgeSlope * (zMm - s.bridgeZ0));
    }
    return x;
}

SampleExtent sampleExtent(const Scene& scene, const ToolOutline& outline,
                          const std::vector<ToolMove>& moves) {
    SampleExtent e;
    e.z0Mm = scene.stock.freeEndZMm();
    e.dzMm = scene.sim.profileStepMm > 0 ? scene.sim.profileStepMm : 0.002;
    double zEnd = scene.part.features.empty() ? e.z0Mm : scene.part.zMaxMm();
    for (const auto& m : moves) {
        const double cz = std::max(m.tipFrom.x(), m.tipTo.x()) - outline.imaginaryTip().x();
        zEnd = std::max(zEnd, cz + outline.uMaxMm());
    }
    // A little beyond the last feature or tool reach, so a shoulder's corner shows; never past
    // the jaws, where there is no bar to cut.
    zEnd = std::min(zEnd + 1.0, scene.stock.jawZMm());
    zEnd = std::max(zEnd, e.z0Mm + e.dzMm);
    e.count = static_cast<std::size_t>(std::floor((zEnd - e.z0Mm) / e.dzMm + 1e-9)) + 1;
    return e;
}

Profile sampleGrid(const Scene& scene, const ToolOutline& outline,
                   const std::vector<ToolMove>& moves) {
    const SampleExtent e = sampleExtent(scene, outline, moves);
    Profile g;
    g.z0Mm = e.z0Mm;
    g.dzMm = e.dzMm;
    g.radiusMm.assign(e.count, 0.0);
    return g;
}

Profile stockOnGrid(const Scene& scene, const Profile& grid) {
    Profile s = grid;
    std::fill(s.radiusMm.begin(), s.radiusMm.end(), 0.5 * scene.stock.diameterMm);
    return s;
}

ExactSweep sweepExact(const Scene& scene, const ToolOutline& outline,
                      const std::vector<ToolMove>& moves, std::size_t count, double fraction,
                      bool perPass) {
    const Profile grid = sampleGrid(scene, outline, moves);
    return sweepExactFrom(scene, outline, moves, count, fraction, perPass,
                          stockOnGrid(scene, grid));
}

ExactSweep sweepExactFrom(const Scene& scene, const ToolOutline& outline,
                          const std::vector<ToolMove>& moves, std::size_t count, double fraction,
                          bool perPass, const Profile& start) {
    assert(count <= moves.size());
    ExactSweep out;
    Profile grid = start;
    std::fill(grid.radiusMm.begin(), grid.radiusMm.end(), 0.0);
    out.stock = start;
    out.asCut = out.stock;
    const std::size_t n = grid.radiusMm.size();
    const double z0 = grid.z0Mm, dz = grid.dzMm, h = scene.tool.tipHeightMm;
    out.finalMove.assign(n, -1);

    std::vector<MoveSweep> sweeps(count);
    out.cuts.resize(count);
    for (std::size_t k = 0; k < count; ++k) {
        sweeps[k] = prepareMove(outline, moves[k], k + 1 == count ? fraction : 1.0);
        MoveCut& c = out.cuts[k];
        const double lo = std::ceil((sweeps[k].zLoMm - z0) / dz);
        const double hi = std::floor((sweeps[k].zHiMm - z0) / dz) + 1;
        c.sampleLo = static_cast<std::size_t>(std::clamp(lo, 0.0, double(n)));
        c.sampleHi = static_cast<std::size_t>(std::clamp(hi, double(c.sampleLo), double(n)));
    }
    // Which moves end each pass (pass index → last move index + 1).
    const std::size_t nPass = scene.plan.passes.size();
    if (perPass)
        out.afterPass.assign(nPass, grid);

    // Each thread sweeps every move over its own sample range: disjoint writes, and the result
    // does not depend on the thread count except through the per-thread partial sums below.
    struct Partial {
        std::vector<double> maxRemoved, zOfMax, thickness, minX;
    };
    const int nThreads = n >= kThreadMinSamples ? 2 : 1;
    std::vector<Partial> parts(nThreads);
    auto work = [&](int t, std::size_t a, std::size_t b) {
        Partial& P = parts[t];
        P.maxRemoved.assign(count, 0.0);
        P.zOfMax.assign(count, 0.0);
        P.thickness.assign(count, 0.0);
        P.minX.assign(count, 1e300);
        std::vector<double>& r = out.asCut.radiusMm;
        std::size_t passDone = 0; // passes whose snapshot is taken
        auto snapshotUpTo = [&](std::size_t passLimit) {
            for (; passDone < passLimit && passDone < nPass; ++passDone) {
                if (perPass) {
                    std::copy(r.begin() + a, r.begin() + b,
                              out.afterPass[passDone].radiusMm.begin() + a);
                }
            }
        };
        for (std::size_t k = 0; k < count; ++k) {
            snapshotUpTo(static_cast<std::size_t>(std::max(0, moves[k].pass)));
            const MoveSweep& s = sweeps[k];
            MoveCut& c = out.cuts[k];
            const std::size_t lo = std::max(a, c.sampleLo), hi = std::min(b, c.sampleHi);
            const Eigen::Vector2d d = s.centreTo - s.centreFrom;
            const double len = d.norm();
            const bool vertical = std::abs(d.x()) <= 1e-12;
            const double cosA = len > 0 ? std::abs(d.x()) / len : 1.0;
            for (std::size_t i = lo; i < hi; ++i) {
                const double z = z0 + static_cast<double>(i) * dz;
                const double x = sweptLowestX(outline, s, z);
                const double rc = cutRadiusMm(x, h);
                const double before = r[i];
                if (before > 0 && x < P.minX[k])
                    P.minX[k] = x;
                const double after = std::min(before, rc);
                const double removed = before - after;
                if (removed > P.maxRemoved[k]) {
                    P.maxRemoved[k] = removed;
                    P.zOfMax[k] = z;
                }
                if (!vertical) {
                    P.thickness[k] = std::max(P.thickness[k], removed * cosA);
                } else if (removed > 1e-6) {
                    P.thickness[k] += dz; // a plunge: the cut's width along z
                }
                if (rc < before) {
                    r[i] = rc;
                    out.finalMove[i] = static_cast<int>(k);
                }
            }
        }
        snapshotUpTo(nPass);
    };
    if (nThreads == 1) {
        work(0, 0, n);
    } else {
        const std::size_t mid = n / 2;
        std::thread t1(work, 1, mid, n);
        work(0, 0, mid);
        t1.join();
    }
    for (std::size_t k = 0; k < count; ++k) {
        MoveCut& c = out.cuts[k];
        for (int t = 0; t < nThreads; ++t) {
            const Partial& P = parts[t];
            if (P.maxRemoved[k] > c.maxRemovedMm) {
                c.maxRemovedMm = P.maxRemoved[k];
                c.zOfMaxRemovedMm = P.zOfMax[k];
            }
            const bool vertical =
                std::abs(sweeps[k].centreTo.x() - sweeps[k].centreFrom.x()) <= 1e-12;
            c.maxThicknessNormalMm = vertical ? c.maxThicknessNormalMm + P.thickness[k]
                                              : std::max(c.maxThicknessNormalMm, P.thickness[k]);
            c.minXOverStockMm = std::min(c.minXOverStockMm, P.minX[k]);
        }
    }
    return out;
}

} // namespace swarf
