#pragma once
// Internal to swarf_io: checks on the raw bytes of a scene file, before TOML reads them.
#include <cstddef>
#include <string>
#include <string_view>

namespace swarf::io::detail {

/// The largest scene file read (1 MB). A scene is a few kilobytes; a planned one with a few
/// hundred passes well under 100 kB.
inline constexpr std::size_t kMaxSceneBytes = 1u << 20;

/// Where the first byte that is not part of valid UTF-8 (RFC 3629: no overlong forms, no
/// surrogates, nothing past U+10FFFF) is: its 1-based line, and its column counted in
/// characters as an editor shows them. line = 0 if the text is valid.
struct Utf8Fault {
    int line = 0;
    int column = 0;
    unsigned char byte = 0; ///< the offending byte
};
Utf8Fault findUtf8Fault(std::string_view text);

/// Throws InputError (file:line:column) for a file over kMaxSceneBytes or for text that is not
/// UTF-8. A byte-order mark and CRLF line ends are fine (TOML allows both).
void checkSceneText(std::string_view text, const std::string& fileName);

} // namespace swarf::io::detail
