#pragma once
// Theoretical roughness of a turned surface from feed f and nose radius r (references R2).
namespace swarf {

/// Peak-to-valley Rt ≈ f²/(8r), mm. f, r in mm, f > 0, r > 0.
double rtApproxMm(double feedMmPerRev, double noseRadiusMm);
/// Exact arc cusp Rt = r − sqrt(r² − f²/4), mm; precondition f < 2r.
double rtExactMm(double feedMmPerRev, double noseRadiusMm);
/// Ra ≈ 0.0321 f²/r, mm.
double raApproxMm(double feedMmPerRev, double noseRadiusMm);
/// Ra of the exact periodic arc profile (mean absolute deviation from its mean line), mm.
double raExactMm(double feedMmPerRev, double noseRadiusMm);

} // namespace swarf
