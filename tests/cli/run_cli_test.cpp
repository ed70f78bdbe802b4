// `swarf run`: the terminal summary shows the figures result.json holds, on every scene; a scene
// it cannot honestly simulate is refused with exit 2 before anything is written.
#include "swarf/io/scene_reader.h"
#include "swarf/sim/units.h"

#include "support/cli_run.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <algorithm>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <regex>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <unistd.h>
#include <vector>

using namespace swarf;
namespace fs = std::filesystem;

using swarf::test::Run;
using swarf::test::runSwarf;
using swarf::test::slurp;

namespace {

std::vector<fs::path> sceneFiles() {
    std::vector<fs::path> files;
    for (const auto& e : fs::directory_iterator(SWARF_SCENES_DIR))
        if (e.path().extension() == ".toml")
            files.push_back(e.path());
    std::sort(files.begin(), files.end());
    return files;
}

bool contains(const std::string& text, const std::string& piece) {
    return text.find(piece) != std::string::npos;
}

} // namespace

TEST_CASE("swarf run prints the figures of result.json, on every scene", "[cli][run]") {
    int checked = 0;
    for (const fs::path& scene : sceneFiles()) {
        INFO(scene.filename().string());
        const fs::path dir = fs::temp_directory_path() / ("swarf-run-cli-" + scene.stem().string());
        fs::remove_all(dir);
        const Run r = runSwarf("run '" + scene.string() + "' --out '" + dir.string() +
                               "' --no-pictures --no-step");
        INFO(r.out << r.err);
        REQUIRE(r.exitCode == 0);
        const nlohmann::json j = nlohmann::json::parse(slurp(dir / "result.json"));
        const Units u = io::readScene(scene.string()).units;
        auto small = [&](const char* a, const char* b) {
            return formatSmallLength(j.at(a).at(b).get<double>(), u);
        };
        CHECK(contains(r.out, "largest metal left on: " + small("deviation", "max_left_on_mm")));
        CHECK(contains(r.out, "largest overcut: " + small("deviation", "max_overcut_mm")));
        CHECK(contains(r.out, "Rt " + formatRoughness(j["roughness"]["rt_um"].get<double>(), u)));
        CHECK(contains(r.out, "Ra " + formatRoughness(j["roughness"]["ra_um"].get<double>(), u)));
        CHECK(contains(r.out, "diameter as cut " +
                                  formatLength(j["gauge"]["as_cut_diameter_mm"].get<double>(), u,
                                               Precision::Fine)));
        CHECK(contains(r.out, j["verdict"] == "in_tolerance" ? "verdict: within tolerance"
                                                             : "verdict: out of tolerance"));
        for (const auto& f : j["features"]) {
            INFO(f["name"].get<std::string>());
            CHECK(contains(r.out, f["name"].get<std::string>() + ": left on " +
                                      formatSmallLength(f["max_left_on_mm"].get<double>(), u) +
                                      ", overcut " +
                                      formatSmallLength(f["max_overcut_mm"].get<double>(), u)));
        }
        for (const auto& f : j["findings"])
            CHECK(contains(r.out, f["message"].get<std::string>()));
        fs::remove_all(dir);
        ++checked;
    }
    CHECK(checked >= 19);
}

TEST_CASE("swarf run refuses a finishing feed of twice the nose radius", "[cli][run]") {
    // The demo with its finishing pass fed at 0.8 mm/rev: twice its 0.4 mm nose radius.
    std::string text = slurp(fs::path(SWARF_SCENES_DIR) / "fixture-arbor.toml");
    const std::size_t last = text.rfind("\nfeed = 0.05"); // the last pass's (not finish_feed)
    REQUIRE(last != std::string::npos);
    text.replace(last, std::string("\nfeed = 0.05").size(), "\nfeed = 0.8");
    const fs::path scene = fs::temp_directory_path() / "swarf-run-cli-feed-2r.toml";
    std::ofstream(scene) << text;
    const fs::path dir = fs::temp_directory_path() / "swarf-run-cli-feed-2r";
    fs::remove_all(dir);
    const Run r = runSwarf("run '" + scene.string() + "' --out '" + dir.string() + "'");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 2);
    CHECK(r.out.empty());
    CHECK(contains(r.err, "plan.pass[4].feed = 0.8"));
    CHECK(contains(r.err, "twice the nose radius"));
    CHECK_FALSE(fs::exists(dir)); // nothing written
    fs::remove(scene);
}

TEST_CASE("swarf run names findings in words and says when a scene has no passes", "[cli][run]") {
    const fs::path dir =
        fs::temp_directory_path() / ("swarf-run-cli-words-" + std::to_string(getpid()));
    fs::remove_all(dir);
    // A plan scene has no passes yet.
    const Run r =
        runSwarf("run '" + std::string(SWARF_SCENES_DIR) + "/plan-lathe-centre.toml' --out '" +
                 dir.string() + "' --no-pictures --no-step");
    INFO(r.out << r.err);
    CHECK(contains(r.out, "no passes: make them with `swarf plan"));
    // The finding is named as people say it; its snake_case kind stays in result.json only.
    CHECK(contains(r.out, "metal left on, the plan: "));
    CHECK_FALSE(contains(r.out, "[left_on]"));
    CHECK(contains(slurp(dir / "result.json"), "\"kind\": \"left_on\""));
    fs::remove_all(dir);
}

TEST_CASE("swarf run names a trailing edge that rubs as the cause, and a holder that follows",
          "[cli][run]") {
    const fs::path dir =
        fs::temp_directory_path() / ("swarf-run-cli-edge-" + std::to_string(getpid()));
    fs::remove_all(dir);
    const Run r = runSwarf("run '" + std::string(SWARF_SCENES_DIR) +
                           "/lessons/11-steep-trailing-edge-mistake.toml' --out '" + dir.string() +
                           "' --no-pictures --no-step");
    INFO(r.out << r.err);
    REQUIRE(r.exitCode == 0);
    CHECK(contains(r.out, "the insert's trailing edge rubs"));
    // derived (references R8): the edge of a 55° insert in a 93° holder slopes at 32°, the
    // seat drawn at 45°: the edge leaves it 13° shallower.
    CHECK(contains(r.out, "its half angle 13°00′00″ shallower"));
    CHECK(contains(r.out, "style J holder")); // a V insert in it follows (the planner's list)
    const nlohmann::json j = nlohmann::json::parse(slurp(dir / "result.json"));
    REQUIRE_FALSE(j.at("causes").empty());
    CHECK(j.at("causes")[0].at("source") == "trailing_edge");
    CHECK(j.at("causes")[0].at("half_angle_change_deg").get<double>() ==
          Approx(-13.0).margin(0.01));
    fs::remove_all(dir);
}

TEST_CASE("swarf plan ends with the caution, planned or not", "[cli][plan]") {
    for (const char* scene : {"plan-lathe-centre.toml", "plan-valve-seat-rub.toml"}) {
        const fs::path dir =
            fs::temp_directory_path() / ("swarf-plan-cli-caution-" + std::to_string(getpid()));
        fs::remove_all(dir);
        const Run r = runSwarf("plan '" + std::string(SWARF_SCENES_DIR) + "/" + scene +
                               "' --out '" + dir.string() + "'");
        INFO(scene << "\n" << r.out << r.err);
        CHECK(r.exitCode == 0);
        const auto at = r.out.rfind("CAUTION:");
        REQUIRE(at != std::string::npos);
        // Nothing after the caution but its own wrapped lines.
        CHECK(r.out.find("wrote", at) == std::string::npos);
        CHECK(contains(r.out.substr(at), "stop the spindle before measuring"));
        fs::remove_all(dir);
    }
}

TEST_CASE("swarf view at a position past the plan says so, with the range", "[cli][view]") {
    const fs::path png =
        fs::temp_directory_path() / ("swarf-view-past-" + std::to_string(getpid()) + ".png");
    const Run r = runSwarf("view '" + std::string(SWARF_SCENES_DIR) +
                           "/fixture-arbor.toml' --pass 7 --screenshot '" + png.string() + "'");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 2);
    CHECK(contains(r.err, "--pass = 7: expected a position from 0 (before the first pass) to 4"));
    CHECK_FALSE(fs::exists(png));
}

TEST_CASE("view --camera chooses the view a screenshot is taken from", "[cli][view]") {
    const std::string scene = "'" + std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml'";
    auto shot = [&](const std::string& camera) {
        const fs::path png = fs::temp_directory_path() /
                             ("swarf-camera-" + camera + "-" + std::to_string(getpid()) + ".png");
        const Run r = runSwarf("view " + scene + " --size 640x400 --camera " + camera +
                               " --screenshot '" + png.string() + "'");
        INFO(r.out << r.err);
        CHECK(r.exitCode == 0);
        const std::string bytes = slurp(png);
        fs::remove(png);
        CHECK(bytes.size() > 1000);
        return bytes;
    };
    const std::string front = shot("front"), top = shot("top"), end = shot("end"),
                      close = shot("close-up");
    // Different views of the same part make different pictures.
    CHECK(front != top);
    CHECK(front != end);
    CHECK(top != end);
    CHECK(close != front);

    const fs::path png =
        fs::temp_directory_path() / ("swarf-camera-bad-" + std::to_string(getpid()) + ".png");
    const Run bad =
        runSwarf("view " + scene + " --camera sideways --screenshot '" + png.string() + "'");
    CHECK(bad.exitCode == 64); // a wrong command line (kExitUsage)
    CHECK(contains(bad.err, "expected front, top, end, oblique, cone or close-up; got 'sideways'"));
    CHECK_FALSE(fs::exists(png));
}
