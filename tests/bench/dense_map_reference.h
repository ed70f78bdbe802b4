#pragma once
// Benchmark only: the dense height map R(z, φ) swarf built before the feed-mark surface
// (sim/include/swarf/sim/feed_marks.h), every row and angle stored, evaluated move by move.
// Kept in the benchmark so that the new surface is measured against it in the same run.
#include "swarf/sim/cut.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <vector>

namespace swarf::bench {

/// The old map: radiusMm[i * nPhi + j] at z = zMm[i], φ = 2π j / nPhi.
struct DenseMap {
    double z0Mm = 0;
    double dzMm = 0.01;
    int nz = 0;
    int nPhi = 0;
    std::vector<float> radiusMm;
    std::vector<double> zMm;
    double rowZ(int i) const {
        return zMm.empty() ? z0Mm + i * dzMm : zMm[static_cast<std::size_t>(i)];
    }
};

/// The old row spacing that resolves the cusps of a move with feed f and direction cos α.
double cuspRowSpacingMm(double feedMmPerRev, double cosAlpha);

/// The old builder (two threads).
DenseMap buildDenseMap(const Scene& scene, const ToolOutline& outline,
                       const std::vector<ToolMove>& moves, const ExactSweep& sweep,
                       const ProgressFn& progress = {});

/// The old roughness, measured on the map.
struct DenseRoughness {
    double rtUm = 0, raUm = 0;
};
DenseRoughness measureDenseRoughness(const DenseMap& map, const ToolOutline& outline,
                                     const MoveSweep& sweep, double tipHeightMm, double zLoMm,
                                     double zHiMm);

} // namespace swarf::bench
