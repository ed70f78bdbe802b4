// The feed-mark surface: which moves count where, R(z, φ) and the crests (see feed_marks.h; the
// grids are filled in feed_mark_grid.cpp).
#include "feed_marks_data.h"

#include "swarf/sim/sweep.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf {
namespace {

constexpr double kInf = std::numeric_limits<double>::infinity();
constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

// The highest over φ of the lowest of several moves at z, φ sampled `n` times round.
double sampledCrest(const FeedMarkSurface::Data& d, const std::vector<int>& set, double zMm,
                    int n) {
    return detail::maxOverPhase(
        [&](double phase) {
            double r = d.stockRadiusMm;
            for (int k : set) {
                const detail::MarkedMove& m = d.moves[static_cast<std::size_t>(k)];
                r = std::min(r, d.radiusOf(detail::markedX(d.outline, m, zMm, m.feedMm * phase)));
            }
            return r;
        },
        n);
}

} // namespace

std::size_t FeedMarkSurface::Data::runOf(std::size_t sample) const {
    const auto it = std::upper_bound(runStart.begin(), runStart.end(), sample);
    return static_cast<std::size_t>(it - runStart.begin()) - 1;
}

std::size_t FeedMarkSurface::Data::sampleAt(double zMm) const {
    const double u = std::floor((zMm - z0Mm) / dzMm);
    if (!(u > 0))
        return 0;
    return std::min(static_cast<std::size_t>(u), samples - 1);
}

void FeedMarkSurface::Data::movesNear(double zMm, std::vector<int>& out) const {
    out.clear();
    const std::size_t i = sampleAt(zMm);
    const std::size_t a = runOf(i), b = runOf(std::min(i + 1, samples - 1));
    for (std::size_t r = a; r <= b; ++r)
        out.insert(out.end(), runMoves.begin() + static_cast<std::ptrdiff_t>(runOffset[r]),
                   runMoves.begin() + static_cast<std::ptrdiff_t>(runOffset[r + 1]));
    if (b > a) {
        std::sort(out.begin(), out.end());
        out.erase(std::unique(out.begin(), out.end()), out.end());
    }
}

double FeedMarkSurface::Data::radiusOf(double xMm) const {
    return std::min(stockRadiusMm, cutRadiusMm(xMm, tipHeightMm));
}

FeedMarkSurface::FeedMarkSurface() = default;

FeedMarkSurface::FeedMarkSurface(std::shared_ptr<const Data> d) : d_(std::move(d)) {}

FeedMarkSurface FeedMarkSurface::build(const Scene& scene, const ToolOutline& outline,
                                       const std::vector<ToolMove>& moves,
                                       const ExactSweep& sweep) {
    auto d = std::make_shared<Data>(outline);
    const Profile& g = sweep.asCut;
    d->tipHeightMm = scene.tool.tipHeightMm;
    d->stockRadiusMm = 0.5 * scene.stock.diameterMm;
    d->freeEndZMm = scene.stock.freeEndZMm();
    d->angleSamples = std::max(8, scene.sim.angleSamples);
    d->z0Mm = g.z0Mm;
    d->dzMm = g.dzMm;
    d->samples = g.radiusMm.size();
    const std::size_t count = std::min(sweep.cuts.size(), moves.size());
    for (std::size_t k = 0; k < count; ++k)
        d->moves.push_back(detail::prepareMarkedMove(outline, moves, static_cast<int>(k)));

    // Moves in the order their samples start, for a sweep along z with an active list.
    std::vector<int> order(count);
    for (std::size_t k = 0; k < count; ++k)
        order[k] = static_cast<int>(k);
    std::stable_sort(order.begin(), order.end(), [&](int a, int b) {
        return sweep.cuts[static_cast<std::size_t>(a)].sampleLo <
               sweep.cuts[static_cast<std::size_t>(b)].sampleLo;
    });
    std::vector<int> active, set, prev;
    std::size_t next = 0;
    int prevFinal = -2;
    d->crestRadiusMm.assign(d->samples, kNaN);
    for (std::size_t i = 0; i < d->samples; ++i) {
        const double z = g.zAt(i), asCut = g.radiusMm[i];
        while (next < order.size() &&
               sweep.cuts[static_cast<std::size_t>(order[next])].sampleLo <= i)
            active.push_back(order[next++]);
        active.erase(std::remove_if(active.begin(), active.end(),
                                    [&](int k) {
                                        return sweep.cuts[static_cast<std::size_t>(k)].sampleHi <=
                                               i;
                                    }),
                     active.end());
        const int fm = i < sweep.finalMove.size() ? sweep.finalMove[i] : -1;
        double crest = asCut;
        set.clear();
        if (fm >= 0 && static_cast<std::size_t>(fm) < count) {
            const double xc =
                detail::crestX(outline, d->moves[static_cast<std::size_t>(fm)], z, d->angleSamples);
            crest = std::max(asCut, d->radiusOf(xc));
            set.push_back(fm);
        }
        // A move counts where its envelope comes within the final marks' crest of the surface.
        const double reach = crest + 1e-9;
        for (int k : active) {
            if (k == fm)
                continue;
            // Not clamped to the bar: a move whose envelope stays above the bar cuts nothing.
            const double env =
                cutRadiusMm(detail::envelopeX(outline, d->moves[static_cast<std::size_t>(k)], z),
                            d->tipHeightMm);
            if (env <= reach)
                set.push_back(k);
        }
        std::sort(set.begin(), set.end());
        if (set.size() > 1)
            crest = std::max(asCut, sampledCrest(*d, set, z, d->angleSamples));
        d->crestRadiusMm[i] = crest;
        if (fm != prevFinal || set != prev) {
            d->runStart.push_back(i);
            d->runFinal.push_back(fm);
            d->runOffset.push_back(d->runMoves.size());
            d->runMoves.insert(d->runMoves.end(), set.begin(), set.end());
            prev = set;
            prevFinal = fm;
        }
    }
    d->runOffset.push_back(d->runMoves.size());
    if (d->samples == 0)
        return {};
    return FeedMarkSurface(std::move(d));
}

bool FeedMarkSurface::empty() const {
    return !d_;
}

double FeedMarkSurface::zFromMm() const {
    return d_ ? d_->z0Mm : kNaN;
}

double FeedMarkSurface::zToMm() const {
    return d_ ? d_->zAt(d_->samples - 1) : kNaN;
}

int FeedMarkSurface::angleSamples() const {
    return d_ ? d_->angleSamples : 0;
}

std::size_t FeedMarkSurface::markedMoveCount() const {
    if (!d_)
        return 0;
    return static_cast<std::size_t>(
        std::count_if(d_->moves.begin(), d_->moves.end(), [](const detail::MarkedMove& m) {
            return m.kind == detail::MarkedMove::Kind::Marked;
        }));
}

double FeedMarkSurface::radiusAt(double zMm, double phiRad) const {
    if (!d_)
        return kNaN;
    const Data& d = *d_;
    if (zMm < d.freeEndZMm)
        return 0;
    if (zMm > zToMm())
        return d.stockRadiusMm; // past every tool position: the bar
    thread_local std::vector<int> set;
    d.movesNear(zMm, set);
    double phase = phiRad / (2 * kPi);
    phase -= std::floor(phase);
    double r = d.stockRadiusMm;
    for (int k : set) {
        const detail::MarkedMove& m = d.moves[static_cast<std::size_t>(k)];
        r = std::min(r, d.radiusOf(detail::markedX(d.outline, m, zMm, m.feedMm * phase)));
    }
    return r;
}

double FeedMarkSurface::crestRadiusAt(double zMm) const {
    if (!d_)
        return kNaN;
    const Data& d = *d_;
    if (zMm < d.freeEndZMm)
        return 0;
    if (zMm > zToMm())
        return d.stockRadiusMm;
    thread_local std::vector<int> set;
    d.movesNear(zMm, set);
    if (set.empty())
        return d.stockRadiusMm;
    if (set.size() == 1)
        return d.radiusOf(detail::crestX(d.outline, d.moves[static_cast<std::size_t>(set[0])], zMm,
                                         d.angleSamples));
    return sampledCrest(d, set, zMm, d.angleSamples);
}

const std::vector<double>& FeedMarkSurface::crestRadiusOnSamples() const {
    static const std::vector<double> none;
    return d_ ? d_->crestRadiusMm : none;
}

int FeedMarkSurface::finalMoveAt(double zMm) const {
    if (!d_)
        return -1;
    return d_->runFinal[d_->runOf(d_->sampleAt(zMm))];
}

double FeedMarkSurface::envelopeRadiusAt(int move, double zMm) const {
    if (!d_ || move < 0 || static_cast<std::size_t>(move) >= d_->moves.size())
        return kInf;
    const double x = detail::envelopeX(d_->outline, d_->moves[static_cast<std::size_t>(move)], zMm);
    return std::isfinite(x) ? cutRadiusMm(x, d_->tipHeightMm) : kInf;
}

double FeedMarkSurface::markPitchZMm(int move) const {
    if (!d_ || move < 0 || static_cast<std::size_t>(move) >= d_->moves.size())
        return 0;
    const detail::MarkedMove& m = d_->moves[static_cast<std::size_t>(move)];
    return m.kind == detail::MarkedMove::Kind::Marked ? m.feedMm * std::abs(m.dir.x()) : 0.0;
}

} // namespace swarf
