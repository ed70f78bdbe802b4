#pragma once
// Identifies the geometry layer's OpenCASCADE build, for `swarf --version` and bug reports.
#include <string>
namespace swarf::geometry {
/// "OCCT 7.6.3" or similar.
std::string modellerVersion();
} // namespace swarf::geometry
