// A boring bar in its hole: the shank's clearance to the wall, the reach past a blind bottom.
#include "swarf/sim/boring_checks.h"

#include <cassert>
#include <cmath>
#include <limits>

namespace swarf {

double barAxisBehindTipMm(const Tool& tool) {
    assert(tool.kind == ToolKind::BoringBar && tool.barDiameterMm > 0);
    return tool.minBoreMm - tool.barDiameterMm / 2.0;
}

double barWallClearanceMm(const Tool& tool, double tipXMm, double boreRadiusMm) {
    const double axisX = tipXMm - barAxisBehindTipMm(tool);
    return boreRadiusMm - std::hypot(axisX, tool.tipHeightMm) - tool.barDiameterMm / 2.0;
}

BarClearance barClearanceAlongBore(const Scene& scene, const Profile& bore, double tipZMm,
                                   double tipXMm) {
    BarClearance least{std::numeric_limits<double>::infinity(), tipZMm};
    for (std::size_t i = 0; i < bore.radiusMm.size(); ++i) {
        const double z = bore.zAt(i);
        if (z < scene.stock.freeEndZMm() || z > tipZMm)
            continue;
        const double c = barWallClearanceMm(scene.tool, tipXMm, bore.radiusMm[i]);
        if (c < least.clearanceMm)
            least = {c, z};
    }
    return least;
}

double pastBoreBottomMm(const Scene& scene, double tipZMm, double leadPastTipMm) {
    const Stock& st = scene.stock;
    if (!st.hasBore() || st.boreThrough())
        return -std::numeric_limits<double>::infinity();
    return tipZMm + leadPastTipMm - st.boreBottomZMm();
}

} // namespace swarf
