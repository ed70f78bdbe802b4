#pragma once
// Hollow solids of revolution: the stock's hole, the as-cut bore and the drawn bore, for inside
// work (a scene cut with a boring bar, sim/inside_kernel.h). Frame and units as solid.h.
#include "swarf/geometry/revolve.h"
#include "swarf/geometry/solid.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <optional>
#include <vector>

namespace swarf::geometry {

/// The stock's hole as a solid: a cylinder of bore_diameter from the bar's free end to the
/// hole's bottom or the jaws' face, whichever comes first. Empty for a bar with no hole.
/// Throws GeometryError if the modeller fails.
Solid holeSolid(const Stock& stock);

/// The as-cut hole, as the pieces to take off the bar: profileSolid() of the kernel's bore
/// (radius 0 where the bar is solid), and, from its last sample to the hole's bottom or the
/// jaws' face, the drilled hole as it was (the kernel samples only as far as the tool reaches,
/// plus 1 mm). None with no hole and no bore. `fitErrorMm`, if given, receives the fit's largest
/// distance from the samples (profileSolid). Throws GeometryError as profileSolid().
std::vector<Solid> boreSolids(const Stock& stock, const Profile& bore,
                              const ProfileFitOptions& options = {}, double* fitErrorMm = nullptr);

/// The drawing's bore: the inside features' outlines (cylinders, cones, chamfers) revolved
/// about the axis, bridged straight across gaps; empty if the drawing has no inside feature.
Solid drawnBoreSolid(const Part& part);

/// The part with its outside features only (the nominal solid's outline is the outside one).
Part outsidePart(const Part& part);

/// The inside radius (mm) of a hollow solid of revolution at z: from the volume of a slab
/// 2·halfWidthMm thick about z, taken as π (Ro² − Ri²)·thickness with Ro the outside radius
/// there (the mean of Ri² over the slab: exact for a cylinder, within (halfWidth·slope)² for a
/// cone; derived). At an end face the slab is moved inside, so the radius is that halfWidthMm
/// in. Empty if z misses the solid. Throws GeometryError if the modeller fails.
std::optional<double> innerRadiusAtZ(const Solid& solid, double zMm, double halfWidthMm = 0.001);

} // namespace swarf::geometry
