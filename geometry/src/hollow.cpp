// Hollow solids of revolution for inside work (hollow.h).
#include "swarf/geometry/hollow.h"

#include "occt_support.h"

#include <BRepPrimAPI_MakeCylinder.hxx>
#include <gp_Ax2.hxx>

#include <algorithm>
#include <cmath>
#include <utility>
#include <vector>

namespace swarf::geometry {
namespace {

Solid cylinder(double z0Mm, double z1Mm, double radiusMm, const char* what) {
    return guarded(what, [&] {
        BRepPrimAPI_MakeCylinder cyl(gp_Ax2(gp_Pnt(0, 0, z0Mm), gp_Dir(0, 0, 1)), radiusMm,
                                     z1Mm - z0Mm);
        cyl.Build();
        require(cyl.IsDone() == Standard_True, what, "making the cylinder failed");
        return wrap(cyl.Shape());
    });
}

double holeEndZMm(const Stock& stock) {
    return std::min(stock.boreBottomZMm(), stock.jawZMm());
}

} // namespace

Solid holeSolid(const Stock& stock) {
    if (!stock.hasBore())
        return Solid();
    return cylinder(stock.freeEndZMm(), holeEndZMm(stock), stock.boreDiameterMm / 2, "hole");
}

std::vector<Solid> boreSolids(const Stock& stock, const Profile& bore,
                              const ProfileFitOptions& options, double* fitErrorMm) {
    std::vector<Solid> out;
    const bool any =
        std::any_of(bore.radiusMm.begin(), bore.radiusMm.end(), [](double r) { return r > 0; });
    if (any && bore.radiusMm.size() >= 2) {
        FittedSolid fitted = profileSolid(bore, options);
        if (fitErrorMm)
            *fitErrorMm = fitted.maxFitErrorMm;
        out.push_back(fitted.solid);
    }
    if (stock.hasBore() && !bore.radiusMm.empty()) {
        const double zLast = bore.zAt(bore.radiusMm.size() - 1);
        if (holeEndZMm(stock) > zLast + 1e-9)
            out.push_back(
                cylinder(zLast, holeEndZMm(stock), stock.boreDiameterMm / 2, "hole beyond"));
    }
    return out;
}

Solid drawnBoreSolid(const Part& part) {
    std::vector<std::pair<double, double>> pts;
    for (const Feature& f : part.features) {
        if (f.side != Side::Inside || f.kind == FeatureKind::Face)
            continue;
        const double r0 = f.radiusAt(f.zStartMm), r1 = f.radiusAt(f.zEndMm);
        if (!pts.empty() && std::abs(pts.back().first - f.zStartMm) < 1e-12 &&
            std::abs(pts.back().second - r0) < 1e-12)
            pts.pop_back();
        pts.emplace_back(f.zStartMm, r0);
        pts.emplace_back(f.zEndMm, r1);
    }
    if (pts.size() < 2)
        return Solid();
    return polylineSolid(pts);
}

Part outsidePart(const Part& part) {
    Part p = part;
    p.features.clear();
    for (const Feature& f : part.features)
        if (f.side == Side::Outside)
            p.features.push_back(f);
    return p;
}

std::optional<double> innerRadiusAtZ(const Solid& solid, double zMm, double halfWidthMm) {
    if (solid.empty())
        return std::nullopt;
    const BoxMm b = solid.bounds();
    if (zMm < b.zMin - 1e-9 || zMm > b.zMax + 1e-9)
        return std::nullopt;
    // At an end face the slab is moved inside the solid (by at most halfWidthMm).
    const double zc = std::clamp(zMm, b.zMin + halfWidthMm, b.zMax - halfWidthMm);
    const std::optional<double> outer = solid.radiusAtZ(zc);
    if (!outer)
        return std::nullopt;
    const double t = 2.0 * halfWidthMm;
    const Solid slab = cylinder(zc - halfWidthMm, zc + halfWidthMm, *outer + 1.0, "slab");
    const double v = solid.common(slab).volumeMm3();
    const double ri2 = *outer * *outer - v / (kPi * t);
    return std::sqrt(std::max(0.0, ri2));
}

} // namespace swarf::geometry
