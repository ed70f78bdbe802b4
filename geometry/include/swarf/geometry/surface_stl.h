#pragma once
// The 3D as-cut surface with its feed marks (the kernel's FeedMarkSurface) as a triangle mesh
// file.
#include "swarf/sim/cut.h"

#include <cstddef>
#include <string>

namespace swarf::geometry {

/// How finely the surface is meshed.
struct SurfaceStlOptions {
    /// Largest number of triangles written (2 million: about 100 MB). 0: as many rows as resolve
    /// the feed marks (every 0.004 of a pitch where a feed leaves the surface: far too many
    /// for a whole part; for tests and short stretches).
    std::size_t maxTriangles = 2'000'000;
};

/// Writes the grid R(z, φ) as a closed binary STL mesh, mm, in the frame of solid.h: the point
/// (i, j) is at X = R cos φ, Y = R sin φ, Z = rowZ(i), φ = grid.phiRad[j] (a whole turn, evenly).
/// Each grid cell becomes two triangles (wrapping round in φ); both ends are closed by fans to
/// the axis, so the mesh bounds a solid. Atomic: written as `path.tmp`, then renamed. Returns
/// the number of triangles. Preconditions: nz ≥ 2, nPhi ≥ 3, radiusMm.size() == nz·nPhi.
/// Throws OutputError if the file cannot be written (nothing is left at `path` then).
std::size_t writeSurfaceStl(const SurfaceGrid& grid, const std::string& path);

/// Writes the surface with its feed marks over its whole extent: sim.angle_samples columns
/// round, and rows that resolve the marks (FeedMarkSurface::markRows), or as many evenly spaced
/// rows as options.maxTriangles allows if that is fewer. The grid is made for this file only.
std::size_t writeSurfaceStl(const FeedMarkSurface& surface, const std::string& path,
                            const SurfaceStlOptions& options = {});

} // namespace swarf::geometry
