// Starting a virtual X display (Xvfb) when there is none.
#include "swarf/app/display.h"

#include "swarf/sim/error.h"

#include <chrono>
#include <csignal>
#include <cstdlib>
#include <filesystem>
#include <mutex>
#include <sstream>
#include <string>
#include <thread>

#include <sys/prctl.h>
#include <sys/types.h>
#include <sys/wait.h>
#include <unistd.h>

namespace swarf::app {

namespace {

std::mutex gMutex;
pid_t gServer = -1;

// Xvfb on the PATH (or in /usr/bin), or "".
std::string findXvfb() {
    namespace fs = std::filesystem;
    std::string path = std::getenv("PATH") ? std::getenv("PATH") : "";
    path += ":/usr/bin:/usr/local/bin";
    std::stringstream ss(path);
    std::string dir;
    while (std::getline(ss, dir, ':')) {
        if (dir.empty())
            continue;
        const fs::path p = fs::path(dir) / "Xvfb";
        if (::access(p.c_str(), X_OK) == 0)
            return p.string();
    }
    return "";
}

bool displayTaken(int n) {
    namespace fs = std::filesystem;
    std::error_code ec;
    return fs::exists("/tmp/.X" + std::to_string(n) + "-lock", ec) ||
           fs::exists("/tmp/.X11-unix/X" + std::to_string(n), ec);
}

void stopServer() {
    if (gServer > 0) {
        ::kill(gServer, SIGTERM);
        int status = 0;
        ::waitpid(gServer, &status, 0);
        gServer = -1;
    }
}

// Starts Xvfb on :n; returns its pid once its socket exists, or −1 if it died first.
pid_t startOn(const std::string& xvfb, int n) {
    const std::string display = ":" + std::to_string(n);
    const pid_t parent = ::getpid();
    const pid_t pid = ::fork();
    if (pid < 0)
        return -1;
    if (pid == 0) {
        // Child: dies with swarf however swarf ends (Ctrl-C, kill, a crash: atexit does not run
        // then), so no server is left behind; quiet; then becomes the server.
        ::prctl(PR_SET_PDEATHSIG, SIGTERM);
        if (::getppid() != parent)
            ::_exit(0); // swarf already gone

        FILE* devnull = std::fopen("/dev/null", "w");
        if (devnull) {
            ::dup2(fileno(devnull), STDOUT_FILENO);
            ::dup2(fileno(devnull), STDERR_FILENO);
        }
        ::execl(xvfb.c_str(), "Xvfb", display.c_str(), "-screen", "0", "1600x1200x24", "-nolisten",
                "tcp", static_cast<char*>(nullptr));
        ::_exit(127);
    }
    const std::string socket = "/tmp/.X11-unix/X" + std::to_string(n);
    const auto deadline = std::chrono::steady_clock::now() + std::chrono::seconds(15);
    while (std::chrono::steady_clock::now() < deadline) {
        int status = 0;
        if (::waitpid(pid, &status, WNOHANG) == pid)
            return -1; // it gave up (display taken)
        std::error_code ec;
        if (std::filesystem::exists(socket, ec)) {
            // The socket appears just before the server listens; give it a moment.
            std::this_thread::sleep_for(std::chrono::milliseconds(100));
            return pid;
        }
        std::this_thread::sleep_for(std::chrono::milliseconds(50));
    }
    ::kill(pid, SIGTERM);
    ::waitpid(pid, nullptr, 0);
    return -1;
}

} // namespace

void ensureDisplay() {
    std::lock_guard<std::mutex> lock(gMutex);
    const char* current = std::getenv("DISPLAY");
    if ((current && *current) || gServer > 0)
        return;
    const std::string xvfb = findXvfb();
    if (xvfb.empty())
        throw RenderError("no X display (DISPLAY is not set) and Xvfb is not installed: install "
                          "the 'xvfb' package, run under xvfb-run, or turn pictures off");
    for (int n = 99 + static_cast<int>(::getpid() % 50), tries = 0; tries < 40; ++n, ++tries) {
        if (displayTaken(n))
            continue;
        const pid_t pid = startOn(xvfb, n);
        if (pid <= 0)
            continue;
        gServer = pid;
        ::setenv("DISPLAY", (":" + std::to_string(n)).c_str(), 1);
        static bool registered = false;
        if (!registered) {
            std::atexit(stopServer);
            registered = true;
        }
        return;
    }
    throw RenderError("no X display (DISPLAY is not set) and Xvfb (" + xvfb +
                      ") did not start on any display number tried");
}

bool startedVirtualDisplay() {
    std::lock_guard<std::mutex> lock(gMutex);
    return gServer > 0;
}

} // namespace swarf::app
