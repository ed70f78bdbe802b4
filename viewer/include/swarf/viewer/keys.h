#pragma once
// The keys and mouse of `swarf view`, written once. The window's help overlay is made from this
// table; viewer/KEYS.md and the README carry it as Markdown (keysMarkdown()), and a test holds
// them equal.
#include <string>
#include <vector>

namespace swarf::viewer {

/// One row of the table.
struct KeyHelp {
    std::string keys;              ///< as people write them: "Right / Left", "h or ?"
    std::vector<std::string> syms; ///< the X key names the window acts on ("Right", "question")
    std::string does;              ///< what it does, in a few words
};

/// The keys of the window, in the order the help shows them.
const std::vector<KeyHelp>& windowKeys();

/// The mouse (no key names).
const std::vector<KeyHelp>& windowMouse();

/// The two Markdown tables ("## Keys" and "## Mouse" with their rows), as in viewer/KEYS.md.
std::string keysMarkdown();

/// The help overlay's text: one line per key, the description wrapped under itself, then the
/// mouse and the slider.
std::string helpOverlayText();

} // namespace swarf::viewer
