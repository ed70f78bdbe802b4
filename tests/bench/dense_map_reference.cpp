// Benchmark only: the dense height map swarf built before the feed-mark surface (a copy of the
// old sim/src/height_map.cpp, unchanged but for names), kept so that swarf_bench can measure
// today's surface against it in one run. Not part of swarf.
#include "dense_map_reference.h"

#include <algorithm>
#include <cmath>
#include <limits>
#include <thread>

namespace swarf::bench {
namespace {

constexpr double kInf = std::numeric_limits<double>::infinity();

// Largest vertical cusp a move with feed f can leave (with margin), mm.
double cuspBoundMm(double f, double r, double cosAlpha) {
    if (f <= 0)
        return 0;
    const double h = 0.5 * f;
    if (h >= r)
        return f;
    const double rt = h * h / (r + std::sqrt(r * r - h * h));
    return 1.5 * rt / std::max(cosAlpha, 0.05) + 1e-6;
}

double cosOfMove(const MoveSweep& s) {
    const Eigen::Vector2d d = s.centreTo - s.centreFrom;
    const double len = d.norm();
    return len > 0 ? std::abs(d.x()) / len : 1.0;
}

} // namespace

double cuspRowSpacingMm(double feedMmPerRev, double cosAlpha) {
    return 0.004 * feedMmPerRev * std::max(cosAlpha, 0.05);
}

DenseMap buildDenseMap(const Scene& scene, const ToolOutline& outline,
                       const std::vector<ToolMove>& moves, const ExactSweep& sweep,
                       const ProgressFn& progress) {
    const Profile& g = sweep.asCut;
    const std::size_t n = g.radiusMm.size();
    const std::size_t count = sweep.cuts.size();
    const double h = scene.tool.tipHeightMm, r = outline.noseRadiusMm();
    const double stockR = 0.5 * scene.stock.diameterMm;

    std::vector<MoveSweep> ms(count);
    std::vector<double> cosA(count), bound(count);
    double cusp = 1e-6;
    for (std::size_t k = 0; k < count; ++k) {
        ms[k] = prepareMove(outline, moves[k]);
        cosA[k] = cosOfMove(ms[k]);
        const bool vertical = std::abs(ms[k].centreTo.x() - ms[k].centreFrom.x()) <= 1e-12;
        cusp = std::max(cusp, vertical ? 0.0 : cuspBoundMm(moves[k].feedMmPerRev, r, cosA[k]));
    }

    DenseMap map;
    map.nPhi = std::max(1, scene.sim.angleSamples);
    // Rows: fine where one feed move leaves the final surface on both sides of an interval.
    map.dzMm = g.dzMm;
    for (std::size_t i = 0; i + 1 < n; ++i) {
        const int m0 = sweep.finalMove[i], m1 = sweep.finalMove[i + 1];
        double step = g.dzMm;
        if (m0 >= 0 && m0 == m1 && moves[m0].feedMmPerRev > 0 &&
            std::abs(ms[m0].centreTo.x() - ms[m0].centreFrom.x()) > 1e-12) {
            step = std::min(step, cuspRowSpacingMm(moves[m0].feedMmPerRev, cosA[m0]));
        }
        const int sub = std::max(1, static_cast<int>(std::ceil(g.dzMm / step - 1e-9)));
        for (int j = 0; j < sub; ++j)
            map.zMm.push_back(g.zAt(i) + g.dzMm * j / sub);
        map.dzMm = std::min(map.dzMm, g.dzMm / sub);
    }
    if (n > 0)
        map.zMm.push_back(g.zAt(n - 1));
    map.nz = static_cast<int>(map.zMm.size());
    map.z0Mm = map.zMm.empty() ? g.z0Mm : map.zMm.front();
    map.radiusMm.assign(static_cast<std::size_t>(map.nz) * map.nPhi, static_cast<float>(stockR));

    // Per move, what the inner loop needs: unit direction, length, support point's z.
    struct Mark {
        Eigen::Vector2d c0, dir;
        double len = 0, f = 0, supportZ = 0;
        bool vertical = true;
    };
    std::vector<Mark> mk(count);
    for (std::size_t k = 0; k < count; ++k) {
        const Eigen::Vector2d d = ms[k].centreTo - ms[k].centreFrom;
        mk[k].c0 = ms[k].centreFrom;
        mk[k].len = d.norm();
        mk[k].dir = mk[k].len > 0 ? Eigen::Vector2d(d / mk[k].len) : Eigen::Vector2d(1, 0);
        mk[k].f = moves[k].feedMmPerRev;
        mk[k].supportZ = ms[k].support.x();
        mk[k].vertical = std::abs(d.x()) <= 1e-12;
    }

    auto work = [&](std::size_t a, std::size_t b, bool report) {
        std::vector<std::size_t> relevant;
        std::vector<double> env(count), best(map.nPhi);
        for (std::size_t i = a; i < b; ++i) {
            const double z = map.zMm[i];
            double finalR = stockR;
            for (std::size_t k = 0; k < count; ++k) {
                env[k] = kInf;
                if (z < ms[k].zLoMm || z > ms[k].zHiMm)
                    continue;
                env[k] = cutRadiusMm(sweptLowestX(outline, ms[k], z), h);
                finalR = std::min(finalR, env[k]);
            }
            relevant.clear();
            for (std::size_t k = 0; k < count; ++k)
                if (env[k] <= finalR + cusp)
                    relevant.push_back(k);
            std::fill(best.begin(), best.end(), kInf); // lowest tool x per φ
            for (std::size_t k : relevant) {
                const Mark& m = mk[k];
                if (m.len <= 1e-12 || m.f <= 0) {
                    // A null move or no feed: the continuous envelope.
                    const double x = sweptLowestX(outline, ms[k], z);
                    for (int j = 0; j < map.nPhi; ++j)
                        best[j] = std::min(best[j], x);
                    continue;
                }
                auto xAt = [&](double sp) {
                    return outline.lowerEnvelope(z - m.c0.x() - sp * m.dir.x()) + m.c0.y() +
                           sp * m.dir.y();
                };
                const double sStar = m.vertical ? (m.dir.y() < 0 ? m.len : 0.0)
                                                : (z - m.supportZ - m.c0.x()) / m.dir.x();
                const double xEnd = xAt(m.len); // the dwell at the end
                for (int j = 0; j < map.nPhi; ++j) {
                    // Same bracketing as markedRadiusMm.
                    const double phiF = m.f * j / map.nPhi;
                    double x;
                    if (phiF >= m.len || sStar >= m.len) {
                        x = xEnd;
                    } else if (sStar <= phiF) {
                        x = xAt(phiF);
                    } else {
                        // sStar > phiF here, so truncation is the floor.
                        const double sa =
                            phiF +
                            static_cast<double>(static_cast<long long>((sStar - phiF) / m.f)) * m.f;
                        const double sb = sa + m.f;
                        x = std::min(xAt(sa), sb < m.len ? xAt(sb) : xEnd);
                    }
                    best[j] = std::min(best[j], x);
                }
            }
            float* row = &map.radiusMm[i * map.nPhi];
            for (int j = 0; j < map.nPhi; ++j)
                row[j] = static_cast<float>(std::min(stockR, cutRadiusMm(best[j], h)));
            if (report && progress && (i - a) % 2048 == 0)
                progress(double(i - a) / double(b - a));
        }
    };
    const std::size_t nz = map.zMm.size();
    if (nz < 2000) {
        work(0, nz, true);
    } else {
        const std::size_t mid = nz / 2;
        std::thread t(work, mid, nz, false);
        work(0, mid, true);
        t.join();
    }
    if (progress)
        progress(1.0);
    return map;
}

DenseRoughness measureDenseRoughness(const DenseMap& map, const ToolOutline& outline,
                                     const MoveSweep& s, double h, double zLoMm, double zHiMm) {
    DenseRoughness out;
    std::vector<int> rows;
    for (int i = 0; i < map.nz; ++i) {
        const double z = map.rowZ(i);
        if (z >= zLoMm && z <= zHiMm)
            rows.push_back(i);
    }
    if (rows.size() < 3)
        return out;
    const double cosA = cosOfMove(s);
    std::vector<double> base(rows.size()), w(rows.size());
    for (std::size_t k = 0; k < rows.size(); ++k) {
        base[k] = cutRadiusMm(sweptLowestX(outline, s, map.rowZ(rows[k])), h);
        // Trapezoid weights on the (uneven) rows.
        const double zPrev = map.rowZ(rows[k > 0 ? k - 1 : k]);
        const double zNext = map.rowZ(rows[k + 1 < rows.size() ? k + 1 : k]);
        w[k] = 0.5 * (zNext - zPrev);
    }
    // Row-major passes (the map is stored by rows): mean line, then extremes and Ra.
    const std::size_t nPhi = static_cast<std::size_t>(map.nPhi);
    std::vector<double> lo(nPhi, kInf), hi(nPhi, -kInf), sm(nPhi, 0.0), sa(nPhi, 0.0);
    double sw = 0;
    for (std::size_t k = 0; k < rows.size(); ++k) {
        const float* row = &map.radiusMm[static_cast<std::size_t>(rows[k]) * nPhi];
        sw += w[k];
        for (std::size_t j = 0; j < nPhi; ++j) {
            const double e = row[j] - base[k];
            lo[j] = std::min(lo[j], e);
            hi[j] = std::max(hi[j], e);
            sm[j] += w[k] * e;
        }
    }
    for (std::size_t k = 0; k < rows.size(); ++k) {
        const float* row = &map.radiusMm[static_cast<std::size_t>(rows[k]) * nPhi];
        for (std::size_t j = 0; j < nPhi; ++j)
            sa[j] += w[k] * std::abs(row[j] - base[k] - sm[j] / sw);
    }
    double rtSum = 0, raSum = 0;
    for (std::size_t j = 0; j < nPhi; ++j) {
        rtSum += hi[j] - lo[j];
        raSum += sa[j] / sw;
    }
    out.rtUm = 1000.0 * cosA * rtSum / map.nPhi;
    out.raUm = 1000.0 * cosA * raSum / map.nPhi;
    return out;
}

} // namespace swarf::bench
