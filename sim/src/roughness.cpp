// Theoretical roughness of a turned surface: the nose arc repeated every feed (references R2).
#include "swarf/sim/roughness.h"

#include <cassert>
#include <cmath>

namespace swarf {

namespace {

// ∫₀ˣ y(u) du for the arc profile y(u) = r − sqrt(r² − u²) (height above the arc's lowest
// point), in closed form. r − s is written as u²/(r + s) so that small feeds keep their digits.
double areaUnderArc(double x, double r) {
    const double s = std::sqrt(r * r - x * x);
    return 0.5 * x * (x * x / (r + s)) + 0.5 * r * (x - r * std::asin(x / r));
}

} // namespace

double rtApproxMm(double feedMmPerRev, double noseRadiusMm) {
    assert(feedMmPerRev > 0 && noseRadiusMm > 0);
    return feedMmPerRev * feedMmPerRev / (8.0 * noseRadiusMm);
}

double rtExactMm(double feedMmPerRev, double noseRadiusMm) {
    assert(feedMmPerRev > 0 && noseRadiusMm > 0 && feedMmPerRev < 2.0 * noseRadiusMm);
    const double h = feedMmPerRev / 2.0;
    // r − sqrt(r² − h²) = h² / (r + sqrt(r² − h²)), without cancellation.
    return h * h / (noseRadiusMm + std::sqrt(noseRadiusMm * noseRadiusMm - h * h));
}

double raApproxMm(double feedMmPerRev, double noseRadiusMm) {
    assert(feedMmPerRev > 0 && noseRadiusMm > 0);
    return 0.0321 * feedMmPerRev * feedMmPerRev / noseRadiusMm;
}

double raExactMm(double feedMmPerRev, double noseRadiusMm) {
    assert(feedMmPerRev > 0 && noseRadiusMm > 0 && feedMmPerRev < 2.0 * noseRadiusMm);
    const double r = noseRadiusMm;
    const double h = feedMmPerRev / 2.0; // the profile is even: one half period suffices
    // Mean line: the mean height of the profile over the half period.
    const double mean = areaUnderArc(h, r) / h;
    // Where the profile crosses the mean line: r − sqrt(r² − x0²) = mean.
    const double x0 = std::sqrt(mean * (2.0 * r - mean));
    // Ra = (1/h) [∫₀^x0 (mean − y) + ∫_x0^h (y − mean)]; since ∫₀^h y = mean·h this is
    // (2/h) (mean·x0 − ∫₀^x0 y).
    return 2.0 / h * (mean * x0 - areaUnderArc(x0, r));
}

} // namespace swarf
