#pragma once
// Private to sim/src: what a FeedMarkSurface holds (see feed_marks.h).
#include "feed_mark_move.h"

#include "swarf/sim/feed_marks.h"

#include <cstddef>
#include <vector>

namespace swarf {

/// The surface's data: the moves, and per sample of the exact profile which of them count.
/// Samples with the same final move and the same set of moves are kept as one run.
struct FeedMarkSurface::Data {
    explicit Data(const ToolOutline& o) : outline(o) {}
    ToolOutline outline;
    double tipHeightMm = 0, stockRadiusMm = 0, freeEndZMm = 0;
    int angleSamples = 180;
    double z0Mm = 0, dzMm = 0;
    std::size_t samples = 0;
    std::vector<detail::MarkedMove> moves; ///< one per kernel move, same index
    std::vector<double> crestRadiusMm;     ///< per sample: the crests' radius
    std::vector<std::size_t> runStart;     ///< first sample of each run
    std::vector<int> runFinal;             ///< the final move of each run (−1: stock)
    std::vector<std::size_t> runOffset; ///< run r's moves: runMoves[runOffset[r], runOffset[r+1])
    std::vector<int> runMoves;          ///< sorted move indices per run

    /// z of sample i, mm.
    double zAt(std::size_t i) const { return z0Mm + static_cast<double>(i) * dzMm; }
    /// The run holding sample i.
    std::size_t runOf(std::size_t sample) const;
    /// The sample at or before z, clamped to the samples.
    std::size_t sampleAt(double zMm) const;
    /// The moves that count at z (those of the samples on either side), sorted, in `out`.
    void movesNear(double zMm, std::vector<int>& out) const;
    /// Radius cut at x with this surface's tip height, no more than the bar.
    double radiusOf(double xMm) const;
};

} // namespace swarf
