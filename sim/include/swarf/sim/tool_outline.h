#pragma once
// The insert's outline in the tool plane (z, x), relative to the nose centre: a nose arc of
// radius r between the leading (main) and trailing straight edges, from the ISO 1832 corner
// angle and the holder's entering angle. Convex.
#include "swarf/sim/scene.h"

#include <Eigen/Core>
#include <cmath>
#include <cstddef>
#include <limits>
#include <vector>

namespace swarf {

/// One piece of the outline's boundary, counter-clockwise in (z, x).
struct OutlinePiece {
    enum class Kind { Segment, Arc } kind = Kind::Segment;
    Eigen::Vector2d a, b;              ///< Segment: ends. Arc: start and end points.
    Eigen::Vector2d centre{0, 0};      ///< Arc only
    double radius = 0;                 ///< Arc only
    double startRad = 0, sweepRad = 0; ///< Arc only: polar angle of a about centre, CCW sweep
};

/// The insert outline of a Tool. Immutable value; all lengths mm, nose centre at the origin.
class ToolOutline {
  public:
    /// Builds the outline; the Tool must have been validated.
    explicit ToolOutline(const Tool& tool);

    double noseRadiusMm() const { return r_; }
    /// Offset from the nose centre to the imaginary tip (z, x), mm.
    Eigen::Vector2d imaginaryTip() const { return tip_; }
    /// Lowest x of the outline at axial offset u from the nose centre; +inf outside [uMin, uMax].
    /// (Inline: the sweep and the height map call it hundreds of millions of times.)
    double lowerEnvelope(double uMm) const {
        if (uMm < uMin_ || uMm > uMax_)
            return std::numeric_limits<double>::infinity();
        // The lower chain is contiguous and sorted: the first piece whose end is past u.
        const std::size_t n = lower_.size();
        std::size_t i = 0;
        while (i + 1 < n && uMm > lower_[i].u1)
            ++i;
        const LowerPiece& p = lower_[i];
        if (p.arc) {
            const double d = uMm - p.cz;
            const double s = p.rad * p.rad - d * d;
            return p.cx - (s > 0 ? std::sqrt(s) : 0.0);
        }
        return p.x0 + p.slope * (uMm - p.u0);
    }
    double uMinMm() const { return uMin_; }
    double uMaxMm() const { return uMax_; }
    /// The outline point minimising x − slope·u: where a move of slope dx/dz touches the
    /// swept envelope.
    Eigen::Vector2d support(double slope) const;
    /// The closed boundary, counter-clockwise, as pieces.
    const std::vector<OutlinePiece>& boundary() const { return pieces_; }
    /// The closed boundary as a polygon whose chords stay within maxChordErrorMm of the arc.
    std::vector<Eigen::Vector2d> polygon(double maxChordErrorMm = 1e-4) const;
    /// Angle of the leading edge from +z (= κr for a right-hand tool), rad.
    double leadingEdgeAngleRad() const { return leadAngle_; }
    /// Angle of the trailing edge from +z, rad (κr + ε for a right-hand tool).
    double trailingEdgeAngleRad() const { return trailAngle_; }

  private:
    /// One piece of the lower chain over [u0, u1]: a line x = x0 + slope·(u − u0), or the
    /// lower half of a circle (centre cz, cx; radius rad).
    struct LowerPiece {
        double u0 = 0, u1 = 0;
        bool arc = false;
        double x0 = 0, slope = 0;       // line
        double cz = 0, cx = 0, rad = 0; // arc
    };
    double r_ = 0, uMin_ = 0, uMax_ = 0, leadAngle_ = 0, trailAngle_ = 0;
    Eigen::Vector2d tip_{0, 0};
    std::vector<OutlinePiece> pieces_;
    std::vector<LowerPiece> lower_; // sorted by u0, covering [uMin_, uMax_]
};

} // namespace swarf
