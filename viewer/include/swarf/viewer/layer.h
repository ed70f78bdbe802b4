#pragma once
// Identifies the viewer layer's VTK build, for bug reports.
#include <string>
namespace swarf::viewer {
/// "VTK 9.1.0" or similar.
std::string toolkitVersion();
} // namespace swarf::viewer
