// Absurd but valid scenes: each one in tests/absurd_scenes/ must run to the end with `swarf run`
// (exit 0, result.json written) and find what its [expect] table says; absurd plans beyond what
// a scene may hold are refused with exit 2 and a message that names the key, before anything is
// written. How long each takes is measured, not asserted (the report of issue 17 quotes it).
#include "swarf/io/scene_reader.h"

#include "support/cli_run.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <algorithm>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <unistd.h>
#include <vector>

namespace fs = std::filesystem;

using swarf::test::Run;
using swarf::test::runSwarf;
using swarf::test::slurp;

namespace {

fs::path scratch(const std::string& name) {
    const fs::path dir = fs::temp_directory_path() / ("swarf_absurd_" + name);
    fs::remove_all(dir);
    return dir;
}

} // namespace

TEST_CASE("every absurd but valid scene runs to the end and finds what it expects",
          "[cli][absurd]") {
    std::vector<fs::path> files;
    for (const auto& e : fs::directory_iterator(fs::path(SWARF_TEST_DATA_DIR) / "absurd_scenes"))
        if (e.path().extension() == ".toml")
            files.push_back(e.path());
    std::sort(files.begin(), files.end());
    CHECK(files.size() >= 8);
    for (const fs::path& file : files) {
        INFO(file.string());
        const swarf::Scene scene = swarf::io::readScene(file.string());
        REQUIRE(scene.expect.withinTolerance.has_value());
        const fs::path out = scratch(file.stem().string());
        const Run r = runSwarf("run '" + file.string() + "' --out '" + out.string() +
                               "' --no-pictures --no-step");
        INFO(r.out << r.err);
        REQUIRE(r.exitCode == 0);
        const auto j = nlohmann::json::parse(slurp(out / "result.json"));
        CHECK(j["verdict"] ==
              (*scene.expect.withinTolerance ? "in_tolerance" : "out_of_tolerance"));
        for (const std::string& kind : scene.expect.findings) {
            INFO("finding " << kind);
            const auto& fs_ = j["findings"];
            CHECK(std::any_of(fs_.begin(), fs_.end(),
                              [&](const nlohmann::json& f) { return f["kind"] == kind; }));
        }
        fs::remove_all(out);
    }
}

TEST_CASE("a plan of 10,000 passes is refused before anything is written", "[cli][absurd]") {
    // Made here at run time: the demo scene with its plan replaced by 10,000 short passes.
    std::string text = slurp(fs::path(SWARF_SCENES_DIR) / "fixture-arbor.toml");
    const auto first = text.find("[[plan.pass]]");
    const auto planning = text.find("[planning]");
    REQUIRE(first != std::string::npos);
    REQUIRE(planning != std::string::npos);
    const std::string pass = "[[plan.pass]]\nkind = \"compound\"\ncross = -0.16\nsaddle = 52\n"
                             "from = 0\nto = 55\nfeed = 0.05\n";
    std::string passes;
    for (int i = 0; i < 10000; ++i)
        passes += pass;
    text = text.substr(0, first) + passes + text.substr(planning);
    REQUIRE(text.size() < 1024 * 1024); // under the file limit: the pass count is what is refused
    const fs::path file = fs::temp_directory_path() / "swarf_absurd_10000_passes.toml";
    {
        std::ofstream o(file, std::ios::binary);
        o << text;
    }
    const fs::path out = scratch("10000");
    const Run r = runSwarf("run '" + file.string() + "' --out '" + out.string() +
                           "' --no-pictures --no-step");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 2);
    CHECK(r.err.find(file.string() + ":") != std::string::npos);
    CHECK(
        r.err.find("plan.pass[201]: expected at most 200 passes in a plan (this one has 10000)") !=
        std::string::npos);
    CHECK_FALSE(fs::exists(out / "result.json"));
    fs::remove(file);
    fs::remove_all(out);
}

TEST_CASE("swarf plan says so when the plan would need more passes than a scene may hold",
          "[cli][absurd]") {
    std::string text = slurp(fs::path(SWARF_SCENES_DIR) / "plan-7-24-taper.toml");
    const auto at = text.find("max_depth = ");
    REQUIRE(at != std::string::npos);
    text.replace(at, text.find('\n', at) - at, "max_depth = 0.05");
    const auto allowance = text.find("finish_allowance = ");
    REQUIRE(allowance != std::string::npos);
    text.replace(allowance, text.find('\n', allowance) - allowance, "finish_allowance = 0.01");
    const fs::path file = fs::temp_directory_path() / "swarf_absurd_plan.toml";
    {
        std::ofstream o(file, std::ios::binary);
        o << text;
    }
    const fs::path out = scratch("plan");
    const Run r = runSwarf("plan '" + file.string() + "' --out '" + out.string() + "'");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    CHECK(r.out.find("NOT PLANNED") != std::string::npos);
    CHECK(r.out.find("more than the 200 a scene may hold: take deeper cuts (planning.max_depth = "
                     "0.050 mm now)") != std::string::npos);
    CHECK_FALSE(fs::exists(out / "planned.toml"));
    CHECK(fs::exists(out / "setup-sheet.txt"));
    fs::remove(file);
    fs::remove_all(out);
}
