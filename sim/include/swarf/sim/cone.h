#pragma once
// A cone of the drawing and the conversions between the ways drawings give one.
// Axial positions z are distances from the part's datum face toward the chuck, in mm.
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace swarf {

/// Which way a cone's diameter grows along the axis.
enum class Widens { TowardChuck, TowardTailstock };

/// A cone fixed the way a drawing fixes it: a gauge plane, the diameter there, the half angle
/// and the direction in which it widens.
struct Cone {
    double gaugeZMm = 0;        ///< gauge plane: distance from the datum face toward the chuck, mm
    double gaugeDiameterMm = 0; ///< diameter at the gauge plane, mm, > 0
    double halfAngleRad = 0;    ///< half angle from the spindle axis, 0 < θ < π/2
    Widens widens = Widens::TowardChuck;

    /// Diameter at axial position z (mm); may be negative far past the small end.
    double diameterAt(double zMm) const;
    /// Axial position (mm) where the cone has the given diameter.
    double zAtDiameter(double diameterMm) const;
    /// Rate of taper C = (D − d)/L = 2 tan θ (ISO 3040), on diameter per unit length.
    double taperRate() const;
    /// Included angle 2θ, radians.
    double includedAngleRad() const { return 2 * halfAngleRad; }
    /// k of a ratio 1:k on diameter (k = 1/C).
    double ratioK() const { return 1.0 / taperRate(); }
    /// Taper per foot on diameter, in inches per foot (= 12 C).
    double taperPerFootIn() const { return 12.0 * taperRate(); }
    /// +1 if the diameter grows with z (toward the chuck), −1 otherwise.
    double growthSign() const { return widens == Widens::TowardChuck ? 1.0 : -1.0; }
};

/// Half angle (rad) from an included angle (rad).
double halfAngleFromIncluded(double includedRad);
/// Half angle (rad) from a ratio 1:k on diameter (C = 1/k). k > 0.
double halfAngleFromRatio(double k);
/// Half angle (rad) from a rate of taper C = (D − d)/L on diameter. C > 0.
double halfAngleFromTaperRate(double c);
/// Half angle (rad) from taper per foot on diameter, in inches per foot.
double halfAngleFromTaperPerFoot(double inchesPerFoot);
/// Half angle (rad) from two diameters at two planes (any order); the planes must differ.
double halfAngleFromTwoDiameters(double z1Mm, double d1Mm, double z2Mm, double d2Mm);
/// Axial length (mm) over which the cone goes from diameter d1 to d2 (absolute).
double lengthBetweenDiameters(const Cone& cone, double d1Mm, double d2Mm);

/// Diameter (mm) at the far end of a cone `lengthMm` long, measured from its gauge plane where
/// the diameter is gaugeDiameterMm: smaller by 2 L tan θ when the gauge plane is at the large
/// end, larger when it is at the small end. May be ≤ 0 past the cone's point.
double otherEndDiameterMm(double gaugeDiameterMm, double halfAngleRad, double lengthMm,
                          bool gaugeAtLargeEnd);

/// A standard taper from a published table (see ../references: R3).
struct StandardTaper {
    std::string name;                      ///< canonical name, e.g. "Morse 3", "7:24", "NPT"
    double taperRate = 0;                  ///< C on diameter per unit length
    std::optional<double> gaugeDiameterMm; ///< gauge diameter where the standard fixes one
    std::string note;                      ///< where the numbers come from, for `swarf check`
};

/// Looks up a standard taper by name, case- and space-insensitive ("morse3", "Morse 3", "MT3",
/// "metric 80", "7:24", "NPT", "Jarno 6", "B&S 7"). Empty if unknown.
std::optional<StandardTaper> lookupStandardTaper(std::string_view name);

/// Names accepted by lookupStandardTaper, for error messages ("expected one of ...").
std::vector<std::string> standardTaperNames();

} // namespace swarf
