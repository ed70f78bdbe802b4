// Tests of swarf/viewer/keys.h: one key table for the window's help, viewer/KEYS.md and the
// README, and every key in it does something in the window.
#include "swarf/app/display.h"
#include "swarf/viewer/keys.h"
#include "swarf/viewer/viewer.h"

#include "support/synthetic.h"

#include <catch2/catch.hpp>

#include <fstream>
#include <sstream>
#include <string>

using namespace swarf;

namespace {

std::string readText(const std::string& path) {
    std::ifstream in(path);
    REQUIRE(in.good());
    std::stringstream ss;
    ss << in.rdbuf();
    return ss.str();
}

} // namespace

TEST_CASE("KEYS.md and the README carry the window's key table word for word", "[viewer][keys]") {
    const std::string table = viewer::keysMarkdown();
    REQUIRE(table.find("| c | close-up") != std::string::npos);
    for (const char* doc : {"/../viewer/KEYS.md", "/../README.md"}) {
        INFO(doc);
        CHECK(readText(std::string(SWARF_TEST_DATA_DIR) + doc).find(table) != std::string::npos);
    }
}

TEST_CASE("the help overlay lists every key of the table", "[viewer][keys]") {
    const std::string help = viewer::helpOverlayText();
    for (const viewer::KeyHelp& k : viewer::windowKeys())
        CHECK(help.find("  " + k.keys + " ") != std::string::npos);
    CHECK(help.find("chuck key") != std::string::npos); // the caution
}

TEST_CASE("every key in the table does something in the window", "[viewer][keys]") {
    app::ensureDisplay();
    const Scene s = test::syntheticScene(3);
    const CutResult r = test::syntheticResult(s, [](int k) { return 1.0 - 0.4 * k; });
    viewer::ViewerOptions o;
    o.offScreen = true;
    o.widthPx = 400;
    o.heightPx = 300;
    viewer::ViewerSession view(s, r, o);
    int pressed = 0, listed = 0;
    for (const viewer::KeyHelp& k : viewer::windowKeys())
        listed += static_cast<int>(k.syms.size());
    for (const viewer::KeyHelp& k : viewer::windowKeys())
        for (const std::string& sym : k.syms) {
            if (sym == "q" || sym == "Escape" || sym == "s")
                continue; // quitting ends the loop; saving writes into the current folder
            INFO(sym);
            CHECK(view.pressKey(sym));
            ++pressed;
        }
    CHECK(pressed == listed - 3);
    CHECK(listed >= 28);
    CHECK_FALSE(view.pressKey("F12")); // a key the window has no use for
}
