// Tests of swarf/app/display.h: the virtual display the executable starts when there is none.
// Each case runs in a child process, so that DISPLAY can be set or unset for it alone.
#include "swarf/app/display.h"

#include <catch2/catch.hpp>

#include <cstdlib>
#include <filesystem>
#include <string>
#include <sys/wait.h>
#include <unistd.h>

namespace {

// Runs `body` in a child process and returns its exit status (0: every check in it held).
template <typename Body> int inChild(Body body) {
    const pid_t pid = ::fork();
    REQUIRE(pid >= 0);
    if (pid == 0)
        ::_exit(body());
    int status = 0;
    ::waitpid(pid, &status, 0);
    return WIFEXITED(status) ? WEXITSTATUS(status) : 100;
}

} // namespace

TEST_CASE("ensureDisplay leaves a set DISPLAY alone", "[app][display]") {
    const int rc = inChild([] {
        ::setenv("DISPLAY", ":4242", 1); // not opened: ensureDisplay only looks at the variable
        swarf::app::ensureDisplay();
        const char* after = std::getenv("DISPLAY");
        if (!after || std::string(after) != ":4242")
            return 1;
        return swarf::app::startedVirtualDisplay() ? 2 : 0;
    });
    CHECK(rc == 0);
}

TEST_CASE("ensureDisplay starts a virtual display when there is none, once", "[app][display]") {
    const int rc = inChild([] {
        ::unsetenv("DISPLAY");
        swarf::app::ensureDisplay();
        const char* after = std::getenv("DISPLAY");
        if (!after || std::string(after).size() < 2)
            return 1;
        if (!swarf::app::startedVirtualDisplay())
            return 2;
        // Its socket exists: ":N" → /tmp/.X11-unix/XN
        const std::string shown = after;
        if (!std::filesystem::exists("/tmp/.X11-unix/X" + shown.substr(1)))
            return 3;
        swarf::app::ensureDisplay(); // a second call changes nothing
        return std::string(std::getenv("DISPLAY")) == shown ? 0 : 4;
    });
    CHECK(rc == 0);
}
