// Small helpers of the kernel's result values (cut.h).
#include "swarf/sim/cut.h"

#include <algorithm>
#include <cmath>

namespace swarf {

const char* findingKindName(FindingKind kind) {
    switch (kind) {
    case FindingKind::LeftOn:
        return "left_on";
    case FindingKind::Overcut:
        return "overcut";
    case FindingKind::Rubbing:
        return "rubbing";
    case FindingKind::JawCrash:
        return "jaw_crash";
    case FindingKind::PastStock:
        return "past_stock";
    case FindingKind::CompoundTravel:
        return "compound_travel";
    case FindingKind::DepthOfCut:
        return "depth_of_cut";
    case FindingKind::AirCut:
        return "air_cut";
    }
    return "unknown";
}

double Profile::radiusAt(double zMm) const {
    if (radiusMm.empty())
        return 0;
    const double t = (zMm - z0Mm) / dzMm;
    if (t <= 0)
        return radiusMm.front();
    const auto last = static_cast<double>(radiusMm.size() - 1);
    if (t >= last)
        return radiusMm.back();
    const auto i = static_cast<std::size_t>(std::floor(t));
    const double f = t - static_cast<double>(i);
    return radiusMm[i] + f * (radiusMm[i + 1] - radiusMm[i]);
}

double Profile::volumeMm3() const {
    // Each interval a frustum; NaN samples (no solid) count as nothing.
    double v = 0;
    for (std::size_t i = 1; i < radiusMm.size(); ++i) {
        const double a = radiusMm[i - 1], b = radiusMm[i];
        if (std::isnan(a) || std::isnan(b))
            continue;
        v += a * a + a * b + b * b;
    }
    return kPi * dzMm / 3.0 * v;
}

} // namespace swarf
