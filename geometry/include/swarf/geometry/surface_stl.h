#pragma once
// The 3D as-cut surface with its feed marks (the kernel's HeightMap) as a triangle mesh file.
#include "swarf/sim/cut.h"

#include <cstddef>
#include <string>

namespace swarf::geometry {

/// How finely the surface is meshed.
struct SurfaceStlOptions {
    /// Largest number of triangles written. The kernel's map can have hundreds of thousands of
    /// rows (a 5 GB file for the demo part); rows closer than a spacing to the last kept one are
    /// then dropped, the spacing chosen as small as the limit allows (2 million triangles:
    /// about 100 MB). 0: every row.
    std::size_t maxTriangles = 2'000'000;
};

/// Writes the height map R(z, φ) as a closed binary STL mesh, mm, in the frame of solid.h: the
/// point (i, j) is at X = R cos φ, Y = R sin φ, Z = rowZ(i), φ = 2π j / nPhi. Each grid cell
/// between kept rows becomes two triangles (wrapping round in φ); both ends are closed by fans
/// to the axis, so the mesh bounds a solid. Rows are thinned to meet options.maxTriangles;
/// the first and last rows are always kept. Atomic: written as
/// `path.tmp`, then renamed. Returns the number of triangles. Preconditions: nz ≥ 2,
/// nPhi ≥ 3, radiusMm.size() == nz·nPhi. Throws OutputError if the file cannot be written
/// (nothing is left at `path` then).
std::size_t writeSurfaceStl(const HeightMap& surface, const std::string& path,
                            const SurfaceStlOptions& options = {});

} // namespace swarf::geometry
