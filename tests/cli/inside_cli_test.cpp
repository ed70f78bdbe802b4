// Inside work from the command line (issue 14): `swarf check` reads and prints a bore, inside
// features and a boring bar; the commands that do not simulate inside work yet refuse it with
// exit code 2, the message at its first piece, and nothing written.
#include "support/cli_run.h"

#include <catch2/catch.hpp>

#include <cstdio>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <unistd.h>

using swarf::test::Run;
using swarf::test::runSwarf;
using swarf::test::slurp;

namespace {

std::string insideScene(const char* name) {
    return std::string("'") + SWARF_TEST_DATA_DIR + "/inside_scenes/" + name + "'";
}

} // namespace

TEST_CASE("swarf check prints the hole, the inside cone and the boring bar", "[cli][inside]") {
    const Run r = runSwarf("check " + insideScene("morse-2-socket-sleeve-inch.toml"));
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    CHECK(r.out.find("hole 0.5625 in diameter, 3.5000 in deep from the free end (through the "
                     "work") != std::string::npos);
    CHECK(r.out.find("[2] inside cone \"Morse 2 socket\"") != std::string::npos);
    // Source: references R3 (Machinery's Handbook: Morse 2 gauge diameter 0.700 in), R12 (ISO
    // 296: at the socket's mouth).
    CHECK(r.out.find("gauge plane z = 0.0000 in, gauge diameter 0.7000 in") != std::string::npos);
    CHECK(r.out.find("widens toward the tailstock") != std::string::npos);
    CHECK(r.out.find("tool: boring bar 0.3750 in diameter, overhang 3.0000 in (8.0 bar "
                     "diameters)") != std::string::npos);
    // Common practice: about four diameters for a steel bar.
    CHECK(r.out.find("note: the boring bar overhangs") != std::string::npos);
    CHECK(r.out.find("OK: the scene is valid.") != std::string::npos);
}

TEST_CASE("run, plan, budget and view refuse inside work, writing nothing", "[cli][inside]") {
    const std::string scene = insideScene("collet-seat-1-10-bore.toml");
    const std::filesystem::path out =
        std::filesystem::temp_directory_path() / ("inside_cli_" + std::to_string(getpid()));
    for (const char* command : {"run", "plan", "budget"}) {
        INFO(command);
        const Run r =
            runSwarf(std::string(command) + " " + scene + " --out '" + out.string() + "'");
        INFO(r.out << r.err);
        CHECK(r.exitCode == 2);
        CHECK(r.err.find("part.feature[3].side") != std::string::npos);
        CHECK(r.err.find(std::string("swarf ") + command + " does not simulate") !=
              std::string::npos);
        CHECK_FALSE(std::filesystem::exists(out));
    }
    const Run v = runSwarf("view " + scene + " --screenshot '" + out.string() + ".png'");
    INFO(v.out << v.err);
    CHECK(v.exitCode == 2);
    CHECK(v.err.find("swarf view does not simulate") != std::string::npos);
    CHECK_FALSE(std::filesystem::exists(out.string() + ".png"));
}
