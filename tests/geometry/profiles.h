#pragma once
// Hand-made profiles for the geometry tests, in the kernel's form (radius samples along z).
// A 1:10 taper cut by a 0.4 mm nose running out into a 30 mm bar: the cone's outline is a
// straight line offset by the nose (derived: the lower envelope of a circle moved along a line
// x = a + s·z is that line less r·sqrt(1 + s²), ending in the nose arc).
#include "swarf/sim/cut.h"

#include <algorithm>
#include <cmath>
#include <functional>

namespace swarf::testprofiles {

/// The as-cut radius of the taper test piece at z, mm: 12.5 + 0.05 z along the cone (so 29.000
/// on diameter at z = 40), the nose arc where the move ends (nose centre at z = 49), rising into
/// the 15 mm bar at z ≈ 49.19. With tip height hMm the radius becomes sqrt(x² + h²) (references R7,
/// derived).
inline double taperRadius(double zMm, double hMm = 0.0) {
    const double r = 0.4, s = 0.05, a = 12.5, zc = 49.0;
    const double root = std::sqrt(1 + s * s);
    const double xc = a + s * zc + r * root; // nose centre height at the move's end
    const double zTangent = zc + r * s / root;
    double x = 15.0;
    if (zMm <= zTangent)
        x = a + s * zMm;
    else if (zMm < zc + r)
        x = xc - std::sqrt(r * r - (zMm - zc) * (zMm - zc));
    x = std::min(x, 15.0);
    return std::sqrt(x * x + hMm * hMm);
}

/// Samples f on [z0, z1] every dz.
inline Profile sampled(const std::function<double(double)>& f, double z0, double z1, double dz) {
    Profile p;
    p.z0Mm = z0;
    p.dzMm = dz;
    const auto n = static_cast<std::size_t>(std::llround((z1 - z0) / dz)) + 1;
    for (std::size_t i = 0; i < n; ++i)
        p.radiusMm.push_back(f(p.zAt(i)));
    return p;
}

/// The taper test piece from z = 0 to 60 mm at the kernel's default 2 µm spacing.
inline Profile taperProfile(double hMm = 0.0) {
    return sampled([hMm](double z) { return taperRadius(z, hMm); }, 0.0, 60.0, 0.002);
}

} // namespace swarf::testprofiles
