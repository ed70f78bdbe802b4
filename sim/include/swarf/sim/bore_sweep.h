#pragma once
// The exact axisymmetric sweep inside a hole: a boring tool's outline is the turning outline of
// the same insert and holder mirrored across its tip's z line (the nose points away from the
// axis, toward the wall), so its swept outline's upper envelope is the mirror of the lower
// envelope sweep.h computes, column by column and exact at the samples. The as-cut bore is the
// larger of the stock's hole and every move's cutRadiusMm(highest x, tip height): off centre the
// bore is a hyperboloid as the outside is. simulate() computes the same bore through the outside
// sweep on a twin (inside_kernel.h); the tests hold the two to each other.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/tool_outline.h"

#include <vector>

namespace swarf {

/// A boring tool's move mirrored across the axis (x → −x at both ends): sweeping it with the
/// turning outline gives the mirror of the boring tool's sweep.
ToolMove mirroredMove(const ToolMove& move);

/// Highest x (mm) a boring tool's swept outline reaches at z, for a move of its imaginary tip
/// (the corner of the tangents at the nose's highest x and its leading z); −inf where the sweep
/// does not reach z. `outline` is the insert's turning outline (ToolOutline of the Tool).
double sweptHighestX(const ToolOutline& outline, const ToolMove& move, double zMm);

/// The stock's hole on the samples of `grid`: its radius from the free end to its bottom, 0
/// where the bar is solid (and everywhere for a bar with no hole).
Profile boreOnGrid(const Scene& scene, const Profile& grid);

/// The as-cut bore on the samples of `grid` after `moves` of a boring tool whose tip is
/// `tipHeightMm` off centre: at each sample the larger of the stock's hole and every move's
/// cutRadiusMm(sweptHighestX, tipHeightMm). Values in, value out; lengths mm.
Profile boredProfile(const Scene& scene, const ToolOutline& outline,
                     const std::vector<ToolMove>& moves, const Profile& grid);

} // namespace swarf
