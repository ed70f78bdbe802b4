#pragma once
// The 3D as-cut surface with its feed marks (the kernel's HeightMap) as a triangle mesh file.
#include "swarf/sim/cut.h"

#include <cstddef>
#include <string>

namespace swarf::geometry {

/// Writes the height map R(z, φ) as a closed binary STL mesh, mm, in the frame of solid.h: the
/// point (i, j) is at X = R cos φ, Y = R sin φ, Z = z0 + i·dz, φ = 2π j / nPhi. Each grid cell
/// becomes two triangles (wrapping round in φ); both ends are closed by fans to the axis, so
/// the mesh bounds a solid. Atomic: written as `path.tmp`, then renamed. Returns the number of
/// triangles. Preconditions: nz ≥ 2, nPhi ≥ 3, radiusMm.size() == nz·nPhi. Throws OutputError
/// if the file cannot be written (nothing is left at `path` then).
std::size_t writeSurfaceStl(const HeightMap& surface, const std::string& path);

} // namespace swarf::geometry
