#pragma once
// Running the built `swarf` from a CLI test: stdout through a pipe, stderr through a file of this
// process's own (tests run side by side), the exit code. One copy for every tests/cli program.
#include <catch2/catch.hpp>

#include <cstdio>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <unistd.h>

namespace swarf::test {

/// What a run of swarf gave.
struct Run {
    int exitCode = -1;
    std::string out, err;
};

/// A whole file's bytes ("" if it cannot be read).
inline std::string slurp(const std::filesystem::path& path) {
    std::ifstream in(path, std::ios::binary);
    std::stringstream ss;
    ss << in.rdbuf();
    return ss.str();
}

/// Runs SWARF_BINARY with `args` (shell words), `env` (e.g. "SWARF_MEMORY_MB=350") before it.
inline Run runSwarf(const std::string& args, const std::string& env = "") {
    const std::string errFile = "cli_test." + std::to_string(getpid()) + ".stderr.txt";
    const std::string cmd = env + " '" + std::string(SWARF_BINARY) + "' " + args + " 2>" + errFile;
    Run r;
    FILE* p = popen(cmd.c_str(), "r");
    REQUIRE(p != nullptr);
    char buf[4096];
    std::size_t n;
    while ((n = std::fread(buf, 1, sizeof buf, p)) > 0)
        r.out.append(buf, n);
    const int status = pclose(p);
    r.exitCode = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
    r.err = slurp(errFile);
    std::remove(errFile.c_str());
    return r;
}

} // namespace swarf::test
