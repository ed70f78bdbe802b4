#pragma once
// Reading angles and taper ratios as people write them: "1.4321", "2°51′51.09″", "2d51m51s",
// "2 51 51.09", "1:20". The inverse of formatDms (units.h). Used for command-line options;
// scene files may use it too.
#include <optional>
#include <string_view>

namespace swarf {

/// An angle written as decimal degrees ("8.29714", "8.3°", "8.3deg") or as degrees, minutes
/// and seconds ("8°17′49.72″", "8°17'49.72\"", "8d17m49.72s", "8 17 49.72", "8:17:49.72").
/// Minutes and seconds must be below 60 and only the last part may have decimals. Returns
/// radians, or empty when the text is not such an angle. A leading minus sign is allowed.
std::optional<double> parseAngleText(std::string_view text);

/// A taper ratio on diameter written "1:k", "1/k" or just "k" (k > 0). Returns k, or empty.
std::optional<double> parseRatioText(std::string_view text);

/// A plain decimal number (leading/trailing spaces allowed, nothing else). Empty otherwise.
std::optional<double> parseNumberText(std::string_view text);

} // namespace swarf
