#pragma once
// A decoded picture, for checking snapshots without VTK types.
#include <string>
#include <vector>

namespace swarf::viewer {

/// An 8-bit RGB picture, rows from the top.
struct Image {
    int widthPx = 0, heightPx = 0;
    std::vector<unsigned char> rgb; ///< 3 bytes per pixel, row-major from the top-left
    /// Red, green, blue of pixel (x, y), y from the top. Precondition: inside the picture.
    const unsigned char* at(int x, int y) const {
        return rgb.data() + 3 * (static_cast<std::size_t>(y) * widthPx + x);
    }
};

/// Reads a PNG file (RGB or RGBA; alpha is dropped). Throws swarf::InputError if it cannot.
Image readPng(const std::string& path);

} // namespace swarf::viewer
