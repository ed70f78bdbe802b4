// The virtual display `swarf run` starts when there is no screen
// (viewer/app/support/src/display.cpp): a run killed part way (Ctrl-C, kill -9) leaves no Xvfb
// behind.
#include <catch2/catch.hpp>

#include <chrono>
#include <csignal>
#include <cstdlib>
#include <dirent.h>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <thread>
#include <unistd.h>
#include <vector>

namespace {

// Pids of the processes whose parent is `parent` and whose command is `name`.
std::vector<pid_t> childrenNamed(pid_t parent, const std::string& name) {
    std::vector<pid_t> out;
    DIR* proc = opendir("/proc");
    if (!proc)
        return out;
    while (dirent* e = readdir(proc)) {
        const pid_t pid = static_cast<pid_t>(std::atoi(e->d_name));
        if (pid <= 0)
            continue;
        std::ifstream stat("/proc/" + std::string(e->d_name) + "/stat");
        std::string line;
        if (!std::getline(stat, line))
            continue;
        // pid (comm) state ppid ...
        const auto open = line.find('('), close = line.rfind(')');
        if (open == std::string::npos || close == std::string::npos)
            continue;
        const std::string comm = line.substr(open + 1, close - open - 1);
        std::istringstream rest(line.substr(close + 2));
        char state = 0;
        pid_t ppid = 0;
        rest >> state >> ppid;
        if (ppid == parent && comm == name && state != 'Z')
            out.push_back(pid);
    }
    closedir(proc);
    return out;
}

bool alive(pid_t pid) {
    std::ifstream stat("/proc/" + std::to_string(pid) + "/stat");
    std::string line;
    if (!std::getline(stat, line))
        return false;
    const auto close = line.rfind(')');
    return close != std::string::npos && close + 2 < line.size() && line[close + 2] != 'Z';
}

} // namespace

TEST_CASE("a run killed part way leaves no virtual display behind", "[cli][display]") {
    if (::access("/usr/bin/Xvfb", X_OK) != 0) {
        WARN("Xvfb is not installed: nothing to check");
        return;
    }
    const auto out = std::filesystem::temp_directory_path() / "swarf-display-cli-test";
    std::filesystem::remove_all(out);
    const pid_t swarf = ::fork();
    REQUIRE(swarf >= 0);
    if (swarf == 0) {
        ::unsetenv("DISPLAY"); // so that swarf starts its own Xvfb for the pictures
        std::freopen("/dev/null", "w", stdout);
        std::freopen("/dev/null", "w", stderr);
        const std::string scene = std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml";
        ::execl(SWARF_BINARY, "swarf", "run", scene.c_str(), "--out", out.c_str(),
                static_cast<char*>(nullptr));
        ::_exit(127);
    }
    // Wait for its Xvfb to appear (the pictures come after the kernel and the solids).
    pid_t server = -1;
    bool finished = false;
    const auto deadline = std::chrono::steady_clock::now() + std::chrono::seconds(120);
    while (server < 0 && std::chrono::steady_clock::now() < deadline) {
        const auto found = childrenNamed(swarf, "Xvfb");
        if (!found.empty())
            server = found.front();
        int status = 0;
        if (::waitpid(swarf, &status, WNOHANG) == swarf) {
            finished = true; // it finished first
            break;
        }
        std::this_thread::sleep_for(std::chrono::milliseconds(20));
    }
    if (!finished) {
        ::kill(swarf, SIGKILL); // no atexit, no destructors
        ::waitpid(swarf, nullptr, 0);
    }
    // swarf draws its pictures on its own Xvfb for some seconds: one must have been seen, else
    // there is nothing to check and the test says so by failing.
    REQUIRE(server >= 0);
    bool gone = false;
    for (int i = 0; i < 100 && !gone; ++i) {
        gone = !alive(server);
        if (!gone)
            std::this_thread::sleep_for(std::chrono::milliseconds(50));
    }
    INFO("Xvfb pid " << server);
    CHECK(gone);
    if (!gone)
        ::kill(server, SIGTERM);
    std::filesystem::remove_all(out);
}
