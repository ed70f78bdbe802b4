#pragma once
// Private to sim/src: one straight move as the feed-mark surface sees it (see feed_marks.h).
//
// At angle φ of revolution k the nose centre sits at path length s = t + k·f along the move,
// t = f·φ/2π in [0, f), and at the end it dwells at s = L. For a plane z the tool's lowest x
// over s, x(s) = lowerEnvelope(z − c_z(s)) + c_x(s), is convex with its minimum at s*(z), where
// the outline's support point for the move's slope sits over z; the lowest discrete position is
// one of the two that bracket s*. Where both lie inside the move (f ≤ s* ≤ L − f) the lowest x
// is the continuous envelope plus G(ψ), ψ = frac((s* − t)/f): the move's one fine profile,
// tabulated over one feed. Elsewhere the brackets are evaluated directly.
#include "swarf/sim/cut.h"
#include "swarf/sim/feed_marks.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <vector>

namespace swarf::detail {

/// Samples of G over one feed (ψ = 0 … 1).
inline constexpr int kMarkTableSamples = kFeedMarkProfileSamples;

/// One move prepared for the feed-mark surface. Lengths mm, x is the tool's horizontal distance
/// from the axis (the radius it cuts is cutRadiusMm(x, tip height)).
struct MarkedMove {
    enum class Kind {
        Still,  ///< no length: one tool position
        Smooth, ///< no feed: the continuous envelope
        Plunge, ///< no axial motion: every position at the same z
        Marked, ///< a feed along a move with axial motion: screw marks
    };
    Kind kind = Kind::Still;
    int move = -1;             ///< index into the kernel's moves
    MoveSweep sweep;           ///< the continuous envelope (sweep.h)
    Eigen::Vector2d c0{0, 0};  ///< nose centre at s = 0
    Eigen::Vector2d dir{1, 0}; ///< unit direction of the move (z, x)
    double lenMm = 0;          ///< path length
    double feedMm = 0;         ///< feed per revolution along the path
    double supportZMm = 0;     ///< z of the outline's support point, from the nose centre
    std::vector<float> table;  ///< G(ψ) at ψ = i/N, i = 0..N (Marked moves of 2 feeds or more)
    double crestMm = 0;        ///< the largest G: the marks' crest above the envelope, in x
    bool periodic(double sStar) const { return sStar >= feedMm && sStar <= lenMm - feedMm; }
};

/// The largest of fn(phase) over phase in [0, 1): sampled `n` times round, then refined twice
/// around the best sample 16 times finer (the marks' crests are sharp, so a coarse sample
/// alone misses their top by up to its spacing times their slope).
template <class Fn> double maxOverPhase(const Fn& fn, int n) {
    n = n < 8 ? 8 : n;
    double best = fn(0.0), at = 0.0;
    for (int j = 1; j < n; ++j) {
        const double p = static_cast<double>(j) / n, v = fn(p);
        if (v > best)
            best = v, at = p;
    }
    double step = 1.0 / n;
    for (int level = 0; level < 2; ++level) {
        const double centre = at;
        step /= 16;
        for (int k = -15; k <= 15; ++k) {
            double p = centre + k * step;
            p -= p >= 1.0 ? 1.0 : 0.0;
            p += p < 0.0 ? 1.0 : 0.0;
            const double v = fn(p);
            if (v > best)
                best = v, at = p;
        }
    }
    return best;
}

/// Prepares move `index` of `moves` over `outline`.
MarkedMove prepareMarkedMove(const ToolOutline& outline, const std::vector<ToolMove>& moves,
                             int index);

/// Lowest x of the tool at s along the move, at z; +inf where the outline does not reach z.
inline double xAtPath(const ToolOutline& o, const MarkedMove& m, double zMm, double sMm) {
    return o.lowerEnvelope(zMm - m.c0.x() - sMm * m.dir.x()) + m.c0.y() + sMm * m.dir.y();
}

/// s*(z) of a Marked or Smooth move with axial motion.
inline double sStarAt(const MarkedMove& m, double zMm) {
    return (zMm - m.c0.x() - m.supportZMm) / m.dir.x();
}

/// The continuous swept envelope's lowest x at z (the exact profile's, sweep.h).
inline double envelopeX(const ToolOutline& o, const MarkedMove& m, double zMm) {
    return sweptLowestX(o, m.sweep, zMm);
}

/// Lowest x of the discrete tool positions at z and angle phase t = f·φ/2π ∈ [0, f): exact.
double markedX(const ToolOutline& o, const MarkedMove& m, double zMm, double tMm);

/// The largest over φ of markedX at z, sampling φ at `angleSamples` where it has no closed
/// form. +inf where the move does not reach z.
double crestX(const ToolOutline& o, const MarkedMove& m, double zMm, int angleSamples);

} // namespace swarf::detail
