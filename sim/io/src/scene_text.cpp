// Checks on the raw bytes of a scene file: its size and its UTF-8.
#include "scene_text.h"

#include "swarf/sim/error.h"

#include <cstdio>

namespace swarf::io::detail {

namespace {

// Length of the UTF-8 sequence starting at text[i], or 0 if it is not a valid one.
std::size_t sequenceLength(std::string_view text, std::size_t i) {
    auto at = [&](std::size_t k) -> unsigned {
        return k < text.size() ? static_cast<unsigned char>(text[k]) : 0u;
    };
    auto cont = [&](std::size_t k, unsigned lo = 0x80, unsigned hi = 0xBF) {
        return at(k) >= lo && at(k) <= hi;
    };
    const unsigned b = at(i);
    if (b < 0x80)
        return 1;
    if (b >= 0xC2 && b <= 0xDF)
        return cont(i + 1) ? 2 : 0;
    if (b == 0xE0) // no overlong forms
        return cont(i + 1, 0xA0) && cont(i + 2) ? 3 : 0;
    if (b == 0xED) // no UTF-16 surrogates
        return cont(i + 1, 0x80, 0x9F) && cont(i + 2) ? 3 : 0;
    if (b >= 0xE1 && b <= 0xEF)
        return cont(i + 1) && cont(i + 2) ? 3 : 0;
    if (b == 0xF0)
        return cont(i + 1, 0x90) && cont(i + 2) && cont(i + 3) ? 4 : 0;
    if (b >= 0xF1 && b <= 0xF3)
        return cont(i + 1) && cont(i + 2) && cont(i + 3) ? 4 : 0;
    if (b == 0xF4) // nothing past U+10FFFF
        return cont(i + 1, 0x80, 0x8F) && cont(i + 2) && cont(i + 3) ? 4 : 0;
    return 0;
}

} // namespace

Utf8Fault findUtf8Fault(std::string_view text) {
    int line = 1, column = 1;
    // A byte-order mark takes no column: editors do not show it.
    std::size_t i = text.substr(0, 3) == "\xEF\xBB\xBF" ? 3 : 0;
    while (i < text.size()) {
        const std::size_t n = sequenceLength(text, i);
        if (n == 0)
            return {line, column, static_cast<unsigned char>(text[i])};
        if (text[i] == '\n') {
            ++line;
            column = 1;
        } else {
            ++column;
        }
        i += n;
    }
    return {};
}

void checkSceneText(std::string_view text, const std::string& fileName) {
    if (text.size() > kMaxSceneBytes) {
        char size[64];
        std::snprintf(size, sizeof size, "%.1f MB", static_cast<double>(text.size()) / (1 << 20));
        throw InputError(
            {fileName, 1, 1}, "", "",
            std::string("expected a scene file of at most 1 MB; this one is ") +
                (text.size() == kMaxSceneBytes + 1 ? std::string("larger") : std::string(size)) +
                ": is it the right file?");
    }
    const Utf8Fault f = findUtf8Fault(text);
    if (f.line > 0) {
        char byte[8];
        std::snprintf(byte, sizeof byte, "0x%02X", f.byte);
        throw InputError({fileName, f.line, f.column}, "", "",
                         std::string("not valid TOML: expected UTF-8 text, but byte ") + byte +
                             " here is not UTF-8 (save the file as UTF-8)");
    }
}

} // namespace swarf::io::detail
