// The fillets a nose radius leaves in the drawing's sharp internal corners (see findings.h).
//
// In a corner of interior angle α a nose of radius ρ leaves an arc tangent to both sides; it
// stands ρ (1/sin(α/2) − 1) out of the sharp corner along the bisector and runs ρ·cot(α/2) along
// each side (derived). The finding measures the as-cut profile itself: the distance from the
// drawn corner point to the profile's polyline in the (z, r) plane, so it also sees a corner
// left fuller than the nose alone would.
#include "swarf/sim/compare.h"
#include "swarf/sim/findings.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf {
namespace {

// Distance from point (pz, pr) to the segment (az, ar)–(bz, br).
double segmentDistance(double pz, double pr, double az, double ar, double bz, double br) {
    const double dz = bz - az, dr = br - ar;
    const double len2 = dz * dz + dr * dr;
    double t = len2 > 0 ? ((pz - az) * dz + (pr - ar) * dr) / len2 : 0.0;
    t = std::clamp(t, 0.0, 1.0);
    return std::hypot(pz - (az + t * dz), pr - (ar + t * dr));
}

} // namespace

std::vector<Finding> cornerFilletFindings(const Scene& scene, const Profile& asCut,
                                          const std::vector<int>& finalMove,
                                          const std::vector<ToolMove>& moves,
                                          const std::vector<FeatureReport>& features) {
    std::vector<Finding> out;
    const std::size_t n = asCut.radiusMm.size();
    if (n < 2 || !(asCut.dzMm > 0))
        return out;
    const double rho = scene.tool.noseRadiusMm;
    const Units u = scene.units;
    for (const InternalCorner& c : internalCorners(scene.part)) {
        const Feature& f = scene.part.features[static_cast<std::size_t>(c.feature)];
        // Only a feature that is turned to size away from the corner has a fillet in it; metal
        // left on all along is the left_on finding's.
        const auto rep =
            std::find_if(features.begin(), features.end(),
                         [&](const FeatureReport& r) { return r.feature == c.feature; });
        if (rep == features.end() || rep->maxLeftOnMm > normalBandMm(f) + 1e-9)
            continue;
        // Samples within a few nose radii of the corner.
        const double reach = 4 * rho + 2 * asCut.dzMm;
        const double lo = std::clamp(std::floor((c.zMm - reach - asCut.z0Mm) / asCut.dzMm), 0.0,
                                     static_cast<double>(n - 1));
        const double hi = std::clamp(std::ceil((c.zMm + reach - asCut.z0Mm) / asCut.dzMm), 0.0,
                                     static_cast<double>(n - 1));
        const auto i0 = static_cast<std::size_t>(lo), i1 = static_cast<std::size_t>(hi);
        if (i1 <= i0)
            continue;
        double dist = std::numeric_limits<double>::infinity();
        for (std::size_t i = i0; i < i1; ++i)
            dist =
                std::min(dist, segmentDistance(c.zMm, c.radiusMm, asCut.zAt(i), asCut.radiusMm[i],
                                               asCut.zAt(i + 1), asCut.radiusMm[i + 1]));
        // The sample next to the corner on the feature's side: metal there above the drawing
        // means the corner is filled, not cut sharp or overcut.
        const double zIn = c.atFeatureEnd ? c.zMm - 0.5 * rho : c.zMm + 0.5 * rho;
        const double band = normalBandMm(f);
        if (!(asCut.radiusAt(zIn) > f.radiusAt(std::clamp(zIn, f.zStartMm, f.zEndMm)) + band) ||
            !(dist > band))
            continue;
        const double cot = 1.0 / std::tan(0.5 * c.interiorAngleRad);
        const double ideal = rho * (1.0 / std::sin(0.5 * c.interiorAngleRad) - 1.0);
        const auto near = static_cast<std::size_t>(std::clamp(
            std::round((zIn - asCut.z0Mm) / asCut.dzMm), 0.0, static_cast<double>(n - 1)));
        const int m = near < finalMove.size() ? finalMove[near] : -1;
        if (m < 0)
            continue; // nothing cut the corner
        Finding fd;
        fd.kind = FindingKind::CornerFillet;
        fd.pass = m >= 0 && static_cast<std::size_t>(m) < moves.size()
                      ? moves[static_cast<std::size_t>(m)].pass
                      : static_cast<int>(scene.plan.passes.size()) - 1;
        fd.zMm = c.zMm;
        fd.valueMm = dist;
        fd.message =
            (f.name.empty() ? "feature " + std::to_string(c.feature + 1) : f.name) +
            ": the nose (radius " + formatLength(rho, u) +
            ") leaves a fillet in the corner at z = " + formatLength(c.zMm, u) +
            ": the surface stands " + formatSmallLength(dist, u) +
            " out of the drawn sharp corner (a nose alone: " + formatSmallLength(ideal, u) +
            ") and rises over the last " + formatLength(rho * cot, u) +
            " before the wall. A sharp corner needs a relief groove (undercut) there on the "
            "drawing, or the drawing may allow a corner radius of at least " +
            formatLength(rho, u) + "; an insert with a smaller nose radius leaves a smaller fillet";
        out.push_back(fd);
    }
    return out;
}

} // namespace swarf
