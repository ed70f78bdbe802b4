#pragma once
// Private to geometry/src: writing outputs atomically (a temporary file in the same folder,
// renamed over the target only when complete).
#include "swarf/sim/error.h"

#include <filesystem>
#include <string>
#include <system_error>

namespace swarf::geometry {

/// The temporary name a file is written under before it is renamed: "<path>.tmp".
inline std::string temporaryPathFor(const std::string& path) { return path + ".tmp"; }

/// Renames the finished temporary file over `path`; removes it and throws OutputError if that
/// fails.
inline void commitFile(const std::string& tmp, const std::string& path) {
    std::error_code ec;
    std::filesystem::rename(tmp, path, ec);
    if (ec) {
        std::filesystem::remove(tmp, ec);
        throw OutputError("cannot write " + path + ": " + ec.message());
    }
}

/// Removes a temporary file left by a failed write (ignores errors).
inline void discardFile(const std::string& tmp) {
    std::error_code ec;
    std::filesystem::remove(tmp, ec);
}

} // namespace swarf::geometry
