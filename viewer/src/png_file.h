#pragma once
// Internal to the viewer: a render window's pixels as a PNG file, written atomically.
#include <string>

class vtkRenderWindow;

namespace swarf::viewer::detail {

/// Renders `window` and writes its pixels as a PNG to `path` (via path.tmp and a rename: see
/// swarf/io/output_file.h). Throws OutputError.
void writeWindowPng(vtkRenderWindow* window, const std::string& path);

} // namespace swarf::viewer::detail
