#pragma once
// Internal: writing outputs atomically (name.tmp, then rename over name).
#include <string>

class vtkRenderWindow;

namespace swarf::viewer::detail {

/// Writes text to path via path + ".tmp" and a rename. Throws OutputError.
void writeTextAtomic(const std::string& path, const std::string& text);

/// Renders `window` and writes its pixels as a PNG to path via a temporary file and a rename.
/// Throws OutputError.
void writeWindowPng(vtkRenderWindow* window, const std::string& path);

/// Creates a directory (and parents). Throws OutputError.
void makeDirectory(const std::string& dir);

} // namespace swarf::viewer::detail
