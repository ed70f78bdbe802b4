#pragma once
// The cone as it actually is, from what was measured on it: its diameter at the drawing's gauge
// plane and its half angle, by weighted least squares over every reading (Gauss–Newton: the
// readings over rolls depend on the angle through sec θ). With more readings than the two
// unknowns the residuals show a bad reading; a set that cannot come from one cone is refused.
// Models (references R6 for the rolls, references R10 for the rest; derived):
//   a diameter at z:           D(z) = D0 + 2 g t (z − zg)         (t = tan θ, g = ±1 the way it
//                                                                   widens, zg the gauge plane)
//   over rolls at z:           M = D(z) + d (1 + √(1 + t²))
//   a taper gauge's diameter:  Dgauge = D(zgauge)   (a stand-off s moves it by 2 s tan θ)
//   an indicator run L at α:   Δ = L (cos α · t − sin α)
#include "swarf/sim/cone.h"
#include "swarf/sim/measurement.h"

#include <string>
#include <vector>

namespace swarf {

/// One reading's residual after the fit.
struct FitResidual {
    std::string what;         ///< "diameter[1]", "over_rolls[1] plane 2", "gauge[1]", ...
    double zMm = 0;           ///< where it was taken (0 for an indicator run)
    double residualMm = 0;    ///< reading minus what the fitted cone gives, mm
    double uncertaintyMm = 0; ///< the reading's standard uncertainty, in the same terms
    SourceLoc where;          ///< the reading in the file
    /// residual ÷ uncertainty
    double normalised() const { return uncertaintyMm > 0 ? residualMm / uncertaintyMm : 0.0; }
};

/// The fitted cone.
struct ConeFit {
    bool ok = false;              ///< false: see problem (nothing else is meaningful but residuals)
    std::string problem;          ///< why the set gives no cone, in words
    double gaugeZMm = 0;          ///< the drawing's gauge plane
    double gaugeDiameterMm = 0;   ///< D0, the fitted diameter there
    double halfAngleRad = 0;      ///< θ, the fitted half angle
    double gaugeDiameterSdMm = 0; ///< standard uncertainty of D0 from the readings' uncertainties
    double halfAngleSdRad = 0;    ///< standard uncertainty of θ
    int readings = 0;             ///< number of scalar readings used
    double chiSquare = 0;         ///< Σ (residual / uncertainty)²
    std::vector<FitResidual> residuals;

    /// The fitted cone's diameter at z (mm).
    double diameterAt(double zMm, const Cone& drawing) const;
};

/// The largest residual, in uncertainties, a reading may have before the set is taken as
/// contradictory: 3 (common practice: a reading more than three of its standard uncertainties
/// off is suspect).
inline constexpr double kMaxNormalisedResidual = 3.0;

/// Fits the drawing's cone `drawing` (its gauge plane, the way it widens, its angle as a first
/// guess) to the readings. Fails (ok = false, problem said, residuals kept where there was a
/// fit) when the readings give no diameter, or no angle, or imply a cone narrowing the wrong
/// way, an angle more than 5° off the drawing's, or a reading more than
/// kMaxNormalisedResidual uncertainties off the rest.
ConeFit fitCone(const Cone& drawing, const Measurements& m);

} // namespace swarf
