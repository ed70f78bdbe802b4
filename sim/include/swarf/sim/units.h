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
constexpr double degToRad(double deg) {
    return deg * kPi / 180.0;
}
/// Radians to degrees.
constexpr double radToDeg(double rad) {
    return rad * 180.0 / kPi;
}

/// A length in the given units to millimetres.
constexpr double toMm(double value, Units u) {
    return u == Units::Inch ? value * kMmPerInch : value;
}
/// Millimetres to a length in the given units.
constexpr double fromMm(double mm, Units u) {
    return u == Units::Inch ? mm / kMmPerInch : mm;
}

/// "mm" or "in": the unit after a number.
inline const char* unitName(Units u) {
    return u == Units::Inch ? "in" : "mm";
}

/// "mm" or "inch": the unit as a word, as scene files spell it (`units = "inch"`).
inline const char* unitWord(Units u) {
    return u == Units::Inch ? "inch" : "mm";
}

/// "µm" or "thou": the unit small lengths (deviations, bands) are shown in.
inline const char* smallUnitName(Units u) {
    return u == Units::Inch ? "thou" : "µm";
}

/// A small length in mm as a number in µm (mm scenes) or thou (inch scenes).
constexpr double toSmallUnits(double mm, Units u) {
    return u == Units::Inch ? mm / kMmPerInch * 1000.0 : mm * 1000.0;
}

/// How finely a length is shown for people. The inch shows one decimal more than the mm at each
/// step but the last, as the trades read them.
enum class Precision {
    Normal, ///< a reading, a diameter, a length: 0.001 mm, 0.0001 in
    Fine,   ///< a diameter checked to the micron, a gauge stack: 0.0001 mm, 0.00001 in
    Finer,  ///< a change per unit of travel: 0.00001 mm, 0.000001 in
    Insert, ///< a nose radius: 0.01 mm, 0.00001 in (so 1/64 in shows as 0.01563 in)
};

/// Decimals after the point for a length in `u` at precision `p`.
int lengthDecimals(Units u, Precision p = Precision::Normal);

/// A length for people: "12.345 mm" or "0.4861 in" (Precision::Normal).
std::string formatLength(double mm, Units u, Precision p = Precision::Normal);

/// A length for people with `digits` after the point.
std::string formatLength(double mm, Units u, int digits);

/// The number alone, in `u`, without the unit: "12.345" or "0.4861".
std::string formatLengthNumber(double mm, Units u, Precision p = Precision::Normal);

/// A small length (deviation, roughness) for people: "4.2 µm" or "0.17 thou".
std::string formatSmallLength(double mm, Units u);

/// A roughness figure (Rt, Ra) given in µm, for people: "0.78 µm" in a mm scene; in an inch
/// scene microinches first, as the inch trade reads them, then µm: "31 µin (0.78 µm)".
std::string formatRoughness(double um, Units u);

/// An angle as degrees, minutes and seconds: 2°51′51.1″.
std::string formatDms(double rad, int secondDecimals = 1);

} // namespace swarf
