#pragma once
// The exact axisymmetric sweep: each straight move of the insert covers the convex hull of the
// outline at its two ends, whose lower envelope over z is
//     E(z) = min( L(z − z0) + x0,  L(z − z1) + x1,  bridge(z) )
// with L the outline's lower envelope, (z0, x0) and (z1, x1) the nose centre at the ends, and
// bridge the segment from q + P0 to q + P1 (q the outline's support point for the move's slope;
// a vertical move needs none). The as-cut radius at a sample is the minimum of the stock and of
// every move's sqrt(max(E, 0)² + h²) (h the tip height). Exact at the samples: no meshes.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/tool_outline.h"

#include <cmath>
#include <cstddef>
#include <vector>

namespace swarf {

/// One move prepared for sweeping: nose-centre ends and the bridge between them. mm.
struct MoveSweep {
    Eigen::Vector2d centreFrom{0, 0}, centreTo{0, 0};   ///< nose centre (z, x) at the ends
    bool hasBridge = false;                             ///< false for a vertical or null move
    double bridgeZLo = 0, bridgeZHi = 0;                ///< z-range of the bridge
    double bridgeZ0 = 0, bridgeX0 = 0, bridgeSlope = 0; ///< x = X0 + slope·(z − Z0)
    double zLoMm = 0, zHiMm = 0;                        ///< z-range the swept outline covers
    Eigen::Vector2d support{0, 0}; ///< outline point (from the nose centre) touching the bridge
};

/// Prepares a move; `fraction` (0..1) stops it part of the way along.
MoveSweep prepareMove(const ToolOutline& outline, const ToolMove& move, double fraction = 1.0);

/// Lowest x (mm) of the swept outline at z; +inf where the sweep does not reach.
double sweptLowestX(const ToolOutline& outline, const MoveSweep& sweep, double zMm);

/// Radius (mm) cut by a tool point at horizontal distance x with the tip h off centre.
inline double cutRadiusMm(double xMm, double tipHeightMm) {
    const double xp = xMm > 0 ? xMm : 0.0;
    if (tipHeightMm == 0)
        return xp; // on centre: no square root (and the same number)
    return std::sqrt(xp * xp + tipHeightMm * tipHeightMm);
}

/// Where the axial samples lie: `count` of them from z0Mm every dzMm.
struct SampleExtent {
    double z0Mm = 0, dzMm = 0;
    std::size_t count = 0;
};

/// The axial samples for a scene and its moves, without making them: from the stock's free end
/// to 1 mm past the last place the tool or the drawing reaches (never past the jaws' face),
/// spaced sim.profileStepMm.
SampleExtent sampleExtent(const Scene& scene, const ToolOutline& outline,
                          const std::vector<ToolMove>& moves);

/// The axial sample grid of sampleExtent, radii 0.
Profile sampleGrid(const Scene& scene, const ToolOutline& outline,
                   const std::vector<ToolMove>& moves);

/// The stock radius on a grid (the bar's radius; zero before the free end).
Profile stockOnGrid(const Scene& scene, const Profile& grid);

/// What one move did to the profile.
struct MoveCut {
    double maxRemovedMm = 0;         ///< largest radius reduction made by this move
    double zOfMaxRemovedMm = 0;      ///< where
    double maxThicknessNormalMm = 0; ///< largest depth of cut normal to the move direction
    double minXOverStockMm = 1e300;  ///< lowest tool x where there is stock (< 0: past centre)
    std::size_t sampleLo = 0, sampleHi = 0; ///< samples the sweep covers [lo, hi)
};

/// The exact sweep of the first `count` moves (the last only `fraction` of the way).
struct ExactSweep {
    Profile stock;                  ///< stock radius on the grid
    Profile asCut;                  ///< as-cut radius on the grid
    std::vector<Profile> afterPass; ///< as-cut after each pass (empty unless asked for)
    std::vector<MoveCut> cuts;      ///< one per move swept
    std::vector<int> finalMove;     ///< per sample: the move that leaves the surface, −1: stock
};

/// Sweeps moves [0, count) over the stock. With `perPass`, also keeps the profile after each
/// pass of the plan (by Pass index). Uses up to two threads.
ExactSweep sweepExact(const Scene& scene, const ToolOutline& outline,
                      const std::vector<ToolMove>& moves, std::size_t count, double fraction,
                      bool perPass);

/// As sweepExact, from `start` (radii on the scene's sample grid, sampleGrid) instead of the
/// bar: the inside kernel sweeps a hole this way (inside_kernel.h). `start` must have the grid's
/// samples.
ExactSweep sweepExactFrom(const Scene& scene, const ToolOutline& outline,
                          const std::vector<ToolMove>& moves, std::size_t count, double fraction,
                          bool perPass, const Profile& start);

} // namespace swarf
