#pragma once
// ISO 2768-1 general tolerances (references R9).
#include "swarf/sim/scene.h"

#include <optional>
#include <string_view>

namespace swarf {

/// ± linear tolerance (mm) of a class for a nominal size (mm). Class v has none below 3 mm:
/// empty then; also empty above 4000 mm.
std::optional<double> iso2768LinearToleranceMm(Iso2768 cls, double nominalMm);

/// ± angular tolerance (rad) of a class for the length of the shorter leg (mm).
double iso2768AngularToleranceRad(Iso2768 cls, double shorterLegMm);

/// "f", "m", "c", "v" → class; empty for anything else.
std::optional<Iso2768> parseIso2768(std::string_view letter);
/// The class letter.
const char* iso2768Name(Iso2768 cls);

} // namespace swarf
