// Tests of swarf/viewer/display.h. Runs under xvfb-run (DISPLAY set) or without a display.
#include "swarf/viewer/display.h"

#include <catch2/catch.hpp>

#include <cstdlib>
#include <filesystem>
#include <string>

TEST_CASE("ensureDisplay leaves DISPLAY alone or starts a virtual display", "[viewer][display]") {
    const char* before = std::getenv("DISPLAY");
    const std::string was = before ? before : "";
    swarf::viewer::ensureDisplay();
    const char* after = std::getenv("DISPLAY");
    REQUIRE(after != nullptr);
    REQUIRE(std::string(after).size() > 1);
    if (!was.empty()) {
        CHECK(std::string(after) == was);
    } else {
        CHECK(swarf::viewer::startedVirtualDisplay());
        // Its socket exists: ":N" → /tmp/.X11-unix/XN
        CHECK(std::filesystem::exists("/tmp/.X11-unix/X" + std::string(after).substr(1)));
    }
    swarf::viewer::ensureDisplay(); // a second call changes nothing
    CHECK(std::string(std::getenv("DISPLAY")) == std::string(after));
}
