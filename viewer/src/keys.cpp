// The key table (see keys.h).
#include "swarf/viewer/keys.h"

#include "swarf/sim/caution.h"

#include <algorithm>

namespace swarf::viewer {

const std::vector<KeyHelp>& windowKeys() {
    static const std::vector<KeyHelp> kKeys = {
        {"Right / Left", {"Right", "Left"}, "next / previous pass (jumps to the end of a pass)"},
        {"Up / Down",
         {"Up", "Down"},
         "scrub forward / back within a pass, 1/20 of a pass per press"},
        {"Home / End", {"Home", "End"}, "the bar before the first pass / the finished part"},
        {"1", {"1"}, "front view, from the operator's side (chuck on the left)"},
        {"2", {"2"}, "top view, looking down on the tool"},
        {"3", {"3"}, "end view, from the tailstock"},
        {"4", {"4"}, "oblique view"},
        {"5", {"5"}, "the main cone filling the view"},
        {"c",
         {"c"},
         "close-up at the gauge plane: about forty feed marks of the finishing pass, drawn higher "
         "than they are (the factor is written on the screen) so they can be seen; the section and "
         "the chart follow that stretch"},
        {"r", {"r"}, "reset: whole part, oblique view, section refitted"},
        {"x", {"x"}, "cut-away quarter on / off"},
        {"g", {"g"}, "nominal cone (ghost) on / off"},
        {"w",
         {"w"},
         "the twin on / off (`--twin FILE`, or the `-mistake`/`-right` file beside it): a violet "
         "ghost, its line in the section and chart, the differences in the panel"},
        {"l", {"l"}, "metal left on, in the cut-away, on / off"},
        {"o", {"o"}, "stock outline on / off"},
        {"j", {"j"}, "chuck jaws on / off"},
        {"t", {"t"}, "insert on / off"},
        {"p", {"p"}, "tool paths on / off"},
        {"b", {"b"}, "colour bar on / off"},
        {"m / Shift+m", {"m", "M"}, "section magnification up / down (10× to 5000×)"},
        {"s", {"s"}, "save the window as `swarf-view-NNN.png` in the current folder"},
        {"h or ?", {"h", "question"}, "help overlay on / off"},
        {"q or Esc", {"q", "Escape"}, "quit"},
    };
    return kKeys;
}

const std::vector<KeyHelp>& windowMouse() {
    static const std::vector<KeyHelp> kMouse = {
        {"left drag", {}, "rotate"},
        {"middle drag, or Shift + left drag", {}, "pan"},
        {"wheel, or right drag", {}, "zoom"},
        {"drag the slider", {}, "move to any moment of the plan"},
    };
    return kMouse;
}

std::string keysMarkdown() {
    std::string md = "## Keys\n| key | does |\n|---|---|\n";
    for (const KeyHelp& k : windowKeys())
        md += "| " + k.keys + " | " + k.does + " |\n";
    md += "\n## Mouse\n| mouse | does |\n|---|---|\n";
    for (const KeyHelp& k : windowMouse())
        md += "| " + k.keys + " | " + k.does + " |\n";
    return md;
}

std::string helpOverlayText() {
    constexpr std::size_t kWidth = 66;
    auto rows = [&](const std::vector<KeyHelp>& table) {
        // The key names are plain ASCII: their width is their length.
        std::size_t kKeyColumn = 0;
        for (const KeyHelp& k : table)
            kKeyColumn = std::max(kKeyColumn, k.keys.size() + 2);
        std::string out;
        for (const KeyHelp& k : table) {
            std::string does;
            for (char c : k.does)
                if (c != '`')
                    does += c;
            const auto lines = wrapWords(does, kWidth);
            std::string key = "  " + k.keys;
            for (std::size_t i = 0; i < lines.size(); ++i) {
                const std::string lead = i == 0 ? key : "";
                out += lead + std::string(kKeyColumn + 2 - lead.size(), ' ') + lines[i] + "\n";
            }
        }
        return out;
    };
    std::string text = "Keys\n" + rows(windowKeys()) + "Mouse\n" + rows(windowMouse());
    for (const std::string& line : wrapWords(safetyCautionShort(), 16 + kWidth))
        text += line + "\n";
    text.pop_back();
    return text;
}

} // namespace swarf::viewer
