// Roughness measured on the feed-mark surface (see surface_roughness.h).
#include "swarf/sim/surface_roughness.h"

#include <algorithm>
#include <cmath>
#include <vector>

namespace swarf {
namespace {

constexpr int kSamplesPerPitch = 2048;
constexpr int kMaxPitches = 16;
// Meridians spread round the part, none a simple fraction of a turn from another.
constexpr double kMeridiansRad[] = {0.0, 1.61, 3.29, 4.87};

} // namespace

Roughness measureRoughness(const FeedMarkSurface& surface, int move, double zLoMm, double zHiMm) {
    Roughness out;
    const double pitch = surface.markPitchZMm(move);
    if (!(pitch > 0) || !(zHiMm - zLoMm >= pitch))
        return out;
    const int pitches = std::min(kMaxPitches, static_cast<int>((zHiMm - zLoMm) / pitch));
    const double za = 0.5 * (zLoMm + zHiMm) - 0.5 * pitches * pitch;
    const double zb = za + pitches * pitch;
    const int n = pitches * kSamplesPerPitch;
    // The envelope (mean line's shape) at the samples' midpoints, and its slope for the normal.
    std::vector<double> z(static_cast<std::size_t>(n)), base(static_cast<std::size_t>(n));
    for (int k = 0; k < n; ++k) {
        z[k] = za + (k + 0.5) * (zb - za) / n;
        base[k] = surface.envelopeRadiusAt(move, z[k]);
    }
    const double slope =
        (surface.envelopeRadiusAt(move, zb) - surface.envelopeRadiusAt(move, za)) / (zb - za);
    const double cosSlope = 1.0 / std::sqrt(1.0 + slope * slope);
    double rt = 0, ra = 0;
    std::vector<double> e(static_cast<std::size_t>(n));
    for (double phi : kMeridiansRad) {
        double lo = HUGE_VAL, hi = -HUGE_VAL, mean = 0;
        for (int k = 0; k < n; ++k) {
            e[k] = surface.radiusAt(z[k], phi) - base[k];
            lo = std::min(lo, e[k]);
            hi = std::max(hi, e[k]);
            mean += e[k];
        }
        mean /= n;
        double dev = 0;
        for (int k = 0; k < n; ++k)
            dev += std::abs(e[k] - mean);
        rt += hi - lo;
        ra += dev / n;
    }
    const double meridians = static_cast<double>(std::size(kMeridiansRad));
    out.rtUm = 1000.0 * cosSlope * rt / meridians;
    out.raUm = 1000.0 * cosSlope * ra / meridians;
    return out;
}

} // namespace swarf
