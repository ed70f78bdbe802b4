#pragma once
// Units of length and angle. Everything inside swarf is millimetres and radians; a scene's
// inch values are converted once, when the scene is read, and printed back in inch.
#include <numbers>
#include <string>

namespace swarf {

/// The length unit a scene is written in and its results are shown in.
enum class Units { Mm, Inch };

inline constexpr double kMmPerInch = 25.4;
inline constexpr double kPi = std::numbers::pi;

/// Degrees to radians.
constexpr double degToRad(double deg) { return deg * kPi / 180.0; }
/// Radians to degrees.
constexpr double radToDeg(double rad) { return rad * 180.0 / kPi; }

/// A length in the given units to millimetres.
constexpr double toMm(double value, Units u) { return u == Units::Inch ? value * kMmPerInch : value; }
/// Millimetres to a length in the given units.
constexpr double fromMm(double mm, Units u) { return u == Units::Inch ? mm / kMmPerInch : mm; }

/// "mm" or "in".
inline const char* unitName(Units u) { return u == Units::Inch ? "in" : "mm"; }

/// A length for people: "12.345 mm" or "0.4861 in"; `digits` after the point (default: 3 for mm,
/// 4 for inch).
std::string formatLength(double mm, Units u, int digits = -1);

/// A small length (deviation, roughness) for people: "4.2 µm" or "0.17 thou".
std::string formatSmallLength(double mm, Units u);

/// An angle as degrees, minutes and seconds: 2°51′51.1″.
std::string formatDms(double rad, int secondDecimals = 1);

} // namespace swarf
