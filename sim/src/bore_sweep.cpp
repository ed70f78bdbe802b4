// The sweep inside a hole: the mirror of the outside sweep (sim/sweep.h), column by column.
#include "swarf/sim/bore_sweep.h"

#include "swarf/sim/sweep.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf {

ToolMove mirroredMove(const ToolMove& move) {
    ToolMove m = move;
    m.tipFrom.y() = -move.tipFrom.y();
    m.tipTo.y() = -move.tipTo.y();
    return m;
}

double sweptHighestX(const ToolOutline& outline, const ToolMove& move, double zMm) {
    const MoveSweep sweep = prepareMove(outline, mirroredMove(move));
    return -sweptLowestX(outline, sweep, zMm);
}

Profile boreOnGrid(const Scene& scene, const Profile& grid) {
    Profile bore = grid;
    const Stock& st = scene.stock;
    for (std::size_t i = 0; i < bore.radiusMm.size(); ++i) {
        const double z = bore.zAt(i);
        const bool inHole = st.hasBore() && z >= st.freeEndZMm() && z <= st.boreBottomZMm();
        bore.radiusMm[i] = inHole ? st.boreDiameterMm / 2.0 : 0.0;
    }
    return bore;
}

Profile boredProfile(const Scene& scene, const ToolOutline& outline,
                     const std::vector<ToolMove>& moves, const Profile& grid) {
    Profile bored = boreOnGrid(scene, grid);
    const double h = scene.tool.tipHeightMm;
    for (const ToolMove& move : moves) {
        const MoveSweep sweep = prepareMove(outline, mirroredMove(move));
        // Only the samples the sweep covers.
        const auto first = static_cast<long>(std::ceil((sweep.zLoMm - grid.z0Mm) / grid.dzMm));
        const auto last = static_cast<long>(std::floor((sweep.zHiMm - grid.z0Mm) / grid.dzMm));
        const long n = static_cast<long>(bored.radiusMm.size());
        for (long i = std::max(0L, first); i <= std::min(n - 1, last); ++i) {
            const double lowest =
                sweptLowestX(outline, sweep, grid.zAt(static_cast<std::size_t>(i)));
            if (!std::isfinite(lowest))
                continue;
            double& r = bored.radiusMm[static_cast<std::size_t>(i)];
            r = std::max(r, cutRadiusMm(-lowest, h));
        }
    }
    return bored;
}

} // namespace swarf
