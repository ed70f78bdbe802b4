#pragma once
// The 3D as-cut surface with feed marks: a radial height map R(z, φ).
//
// At angle φ of revolution k the tool's nose centre sits at path length f·(k + φ/2π) along a
// move (and, at the end, where the move stops). For one move the lowest tool x at a given z is
// a convex function of the path position, whose continuous minimum lies where the contact is
// the outline's support point for the move's slope; the lowest of the discrete positions is
// therefore at one of the two that bracket it: O(1) per (z, φ, move). Only moves whose swept
// envelope comes within the largest cusp height of the final surface at a z can leave a mark
// there; the others are skipped.
//
// Row spacing: where a feed move leaves the final surface the cusp is an arc meeting an arc
// with slope about f/2r; sampling every 0.004·f·cos α along z puts a sample within 0.002·f of
// each cusp peak, so the sampled peak is within about 0.5% of the cusp height f²/8r. Elsewhere
// the rows follow the exact profile's step.
#include "swarf/sim/cut.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <vector>

namespace swarf {

/// Row spacing (mm) that resolves the cusps of a move with feed f (mm/rev) and direction at
/// angle α from the axis to better than 1%.
double cuspRowSpacingMm(double feedMmPerRev, double cosAlpha);

/// The height map for the moves of an exact sweep. Uses two threads; `progress` (may be empty)
/// gets fractions 0..1 from one thread.
HeightMap buildHeightMap(const Scene& scene, const ToolOutline& outline,
                         const std::vector<ToolMove>& moves, const ExactSweep& sweep,
                         const ProgressFn& progress = {});

/// The radius the move would leave at z and angle φ (rad), with the feed marks: the lowest of
/// the discrete tool positions on that half-plane. +inf where the move does not reach z.
double markedRadiusMm(const ToolOutline& outline, const MoveSweep& sweep, double feedMmPerRev,
                      double tipHeightMm, double zMm, double phiRad);

/// Theoretical roughness of the surface a move leaves, measured on the height map over the
/// rows in [zLo, zHi]: Rt (largest cusp) and Ra (mean absolute deviation from the mean line),
/// both normal to the surface, µm, averaged over φ. The mean line is the move's continuous
/// swept envelope (the cusps' valleys) plus the mean height.
struct Roughness {
    double rtUm = 0, raUm = 0;
};
Roughness measureRoughness(const HeightMap& map, const ToolOutline& outline, const MoveSweep& sweep,
                           double tipHeightMm, double zLoMm, double zHiMm);

} // namespace swarf
