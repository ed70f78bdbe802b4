#pragma once
// A tool tip above or below the spindle centre (references R7). A tip at height h at horizontal
// distance x from the axis cuts radius sqrt(x² + h²): a straight move makes a hyperboloid, and
// every diameter comes out larger than the dials say, the small ones most.

namespace swarf {

/// Radius (mm) cut by a tip at horizontal distance xMm (mm) from the axis and height
/// tipHeightMm (mm, + above, − below centre): sqrt(x² + h²).
double cutRadiusOffCentreMm(double xMm, double tipHeightMm);

/// Diameter (mm) actually cut when the dials put the tip at the nominal diameter
/// (x = D/2) but the tip is tipHeightMm (mm) off centre: 2 sqrt((D/2)² + h²).
double diameterCutOffCentreMm(double nominalDiameterMm, double tipHeightMm);

/// Error of that diameter (mm, always ≥ 0): 2 sqrt((D/2)² + h²) − D, computed without
/// cancellation. D > 0.
double diameterErrorOffCentreMm(double nominalDiameterMm, double tipHeightMm);

/// The usual first-order estimate of the same error, 2h²/D (mm). D > 0.
double diameterErrorOffCentreApproxMm(double nominalDiameterMm, double tipHeightMm);

/// Horizontal distance x (mm) at which the off-centre tip cuts the wanted diameter:
/// sqrt((D/2)² − h²). Precondition |h| ≤ D/2; returns 0 if |h| > D/2 (the tip cannot reach it).
double xForDiameterOffCentreMm(double wantedDiameterMm, double tipHeightMm);

} // namespace swarf
