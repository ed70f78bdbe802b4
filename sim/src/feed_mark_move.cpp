// One move as the feed-mark surface sees it (see feed_mark_move.h).
#include "feed_mark_move.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf::detail {
namespace {

constexpr double kInf = std::numeric_limits<double>::infinity();

// The lower of the two positions that bracket s*, at phase ψ (0..1): s* − ψf and s* − ψf + f.
double bracketX(const ToolOutline& o, const MarkedMove& m, double zMm, double sStar, double psi) {
    const double sa = sStar - psi * m.feedMm;
    return std::min(xAtPath(o, m, zMm, sa), xAtPath(o, m, zMm, sa + m.feedMm));
}

// G over one feed at a plane where s* is mid-move, and its exact largest value: where the two
// bracketing positions cut equally deep (their difference grows with ψ: bisection).
// False when the support point is the outline's very end (an edge's corner, found a hair past it
// by rounding): then a straight edge, not the nose, forms the surface and leaves no scallops.
bool tabulate(const ToolOutline& o, MarkedMove& m) {
    const double sStar = 0.5 * m.lenMm;
    const double z = m.c0.x() + m.supportZMm + sStar * m.dir.x();
    const double line = xAtPath(o, m, z, sStar);
    if (!std::isfinite(line))
        return false;
    m.table.resize(kMarkTableSamples + 1);
    for (int i = 0; i <= kMarkTableSamples; ++i) {
        const double psi = static_cast<double>(i) / kMarkTableSamples;
        // A position with no edge at this plane gives the outline's "nothing here" (1e300): as
        // a float that is infinity, written so, since the narrowing itself would overflow.
        const double v = bracketX(o, m, z, sStar, psi) - line;
        m.table[static_cast<std::size_t>(i)] =
            std::isfinite(v) && std::fabs(v) <= std::numeric_limits<float>::max()
                ? static_cast<float>(v)
                : (std::signbit(v) ? -std::numeric_limits<float>::infinity()
                                   : std::numeric_limits<float>::infinity());
    }
    double lo = 0, hi = 1;
    for (int it = 0; it < 80; ++it) {
        const double mid = 0.5 * (lo + hi);
        const double sa = sStar - mid * m.feedMm;
        // Below the crossing the earlier position (sa) cuts deeper.
        if (xAtPath(o, m, z, sa) < xAtPath(o, m, z, sa + m.feedMm))
            lo = mid;
        else
            hi = mid;
    }
    m.crestMm = std::max(bracketX(o, m, z, sStar, lo), bracketX(o, m, z, sStar, hi)) - line;
    return true;
}

} // namespace

MarkedMove prepareMarkedMove(const ToolOutline& outline, const std::vector<ToolMove>& moves,
                             int index) {
    MarkedMove m;
    const ToolMove& mv = moves[static_cast<std::size_t>(index)];
    m.move = index;
    m.sweep = prepareMove(outline, mv);
    m.c0 = m.sweep.centreFrom;
    const Eigen::Vector2d d = m.sweep.centreTo - m.sweep.centreFrom;
    m.lenMm = d.norm();
    m.feedMm = mv.feedMmPerRev;
    if (m.lenMm <= 1e-12) {
        m.kind = MarkedMove::Kind::Still;
        return m;
    }
    m.dir = d / m.lenMm;
    if (std::abs(d.x()) <= 1e-12) {
        m.kind = MarkedMove::Kind::Plunge;
        return m;
    }
    m.supportZMm = m.sweep.support.x();
    if (!(m.feedMm > 0)) {
        m.kind = MarkedMove::Kind::Smooth;
        return m;
    }
    m.kind = MarkedMove::Kind::Marked;
    if (m.lenMm >= 2.0 * m.feedMm && !tabulate(outline, m))
        m.kind = MarkedMove::Kind::Smooth;
    return m;
}

double markedX(const ToolOutline& o, const MarkedMove& m, double zMm, double tMm) {
    switch (m.kind) {
    case MarkedMove::Kind::Still:
        return xAtPath(o, m, zMm, 0.0);
    case MarkedMove::Kind::Smooth:
        return envelopeX(o, m, zMm);
    case MarkedMove::Kind::Plunge:
        // Every position at the same z: the deepest one. Moving in, the dwell at the end; moving
        // out, the first position on this half-plane.
        return xAtPath(o, m, zMm, m.dir.y() < 0 ? m.lenMm : std::min(tMm, m.lenMm));
    case MarkedMove::Kind::Marked:
        break;
    }
    const double f = m.feedMm, len = m.lenMm;
    const double sStar = sStarAt(m, zMm);
    if (tMm >= len || sStar >= len)
        return xAtPath(o, m, zMm, len); // the dwell at the end is the position nearest s*
    if (sStar <= tMm)
        return xAtPath(o, m, zMm, tMm); // the first position on this half-plane
    const double sa = tMm + std::floor((sStar - tMm) / f) * f;
    const double sb = sa + f;
    return std::min(xAtPath(o, m, zMm, sa), xAtPath(o, m, zMm, sb < len ? sb : len));
}

double crestX(const ToolOutline& o, const MarkedMove& m, double zMm, int angleSamples) {
    switch (m.kind) {
    case MarkedMove::Kind::Still:
    case MarkedMove::Kind::Smooth:
        return markedX(o, m, zMm, 0.0);
    case MarkedMove::Kind::Plunge:
        // Moving out the first position climbs with φ: its highest is at the end of the turn.
        return m.dir.y() < 0 ? xAtPath(o, m, zMm, m.lenMm)
                             : xAtPath(o, m, zMm, std::min(m.feedMm, m.lenMm));
    case MarkedMove::Kind::Marked:
        break;
    }
    const double env = envelopeX(o, m, zMm);
    if (!std::isfinite(env))
        return kInf;
    const double sStar = sStarAt(m, zMm);
    if (sStar >= m.lenMm)
        return xAtPath(o, m, zMm, m.lenMm);
    if (sStar <= 0) // the first position climbs with φ: highest at the end of the turn
        return xAtPath(o, m, zMm, std::min(m.feedMm, m.lenMm));
    if (!m.table.empty() && m.periodic(sStar))
        return env + m.crestMm;
    return maxOverPhase([&](double phase) { return markedX(o, m, zMm, m.feedMm * phase); },
                        angleSamples);
}

} // namespace swarf::detail
