#pragma once
// The reference path: the as-cut part made with the solid modeller alone, independent of the
// kernel's sweep. The stock solid is cut, move by move, by the solid of revolution of each
// move's swept tool: the convex hull of the insert outline at the move's start and end, with
// everything above the outline (away from the axis) taken away too, as the chip is. Slow; it
// exists so the kernel can be checked against it.
#include "swarf/geometry/solid.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <vector>

namespace swarf::geometry {

/// How finely the reference path models the insert.
struct ReferenceOptions {
    /// The nose arc becomes chords within this distance of the arc, mm. The chords lie inside
    /// the arc, so the reference cuts at most this much less deep than the true nose.
    double chordErrorMm = 2e-5;
    /// With the tip off centre (h ≠ 0) a point at horizontal distance x cuts radius
    /// sqrt(x² + h²), which bends the hull's straight edges; they are split into pieces short
    /// enough that each piece's chord stays within this distance (mm) of the bent curve.
    double offCentreChordErrorMm = 1e-5;
};

/// The reference as-cut part and what it took.
struct ReferenceResult {
    Solid asCut;          ///< the stock's stick-out minus every move's swept tool
    double volumeMm3 = 0; ///< its volume
    int movesCut = 0;     ///< moves whose swept tool reached the stock
    int movesSkipped = 0; ///< moves wholly in the air (outside the stock)
};

/// Cuts the stock solid by every move of `moves` in turn (imaginary-tip positions, as
/// planMoves() makes them; the nose centre is the tip minus ToolOutline::imaginaryTip()).
/// Tip height h = scene.tool.tipHeightMm is modelled by mapping the swept region's x to
/// sqrt(x² + h²). A swept region reaching past the axis is clipped at the axis (x ≥ 0).
/// The scene must have been validated. Throws GeometryError if the modeller fails.
ReferenceResult referenceCut(const Scene& scene, const std::vector<ToolMove>& moves,
                             const ReferenceOptions& options = {});

/// The solid of revolution of one move's swept tool region, as referenceCut() uses it (for
/// tests and drawings). Empty if the move cannot reach a stock of radius stockRadiusMm.
Solid sweptToolSolid(const Tool& tool, const ToolMove& move, double stockRadiusMm,
                     const ReferenceOptions& options = {});

} // namespace swarf::geometry
