// `swarf budget`: writes budget.json and report.html for the demo, the same file for the same
// seed, one line per source and the sentence on the console; refuses bad options, bad scenes
// and scenes with nothing to budget with exit 2 and nothing written.
#include "support/cli_run.h"

#include <catch2/catch.hpp>

#include <nlohmann/json.hpp>

#include <cstdio>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <unistd.h>

namespace fs = std::filesystem;

using swarf::test::Run;
using swarf::test::runSwarf;
using swarf::test::slurp;

namespace {

std::string scene(const char* name) {
    return std::string("'") + SWARF_SCENES_DIR + "/" + name + "'";
}

} // namespace

TEST_CASE("swarf budget writes budget.json and the report for the demo", "[cli][budget]") {
    const fs::path dir = fs::temp_directory_path() / "swarf-budget-cli-demo";
    fs::remove_all(dir);
    const Run r = runSwarf("budget " + scene("fixture-arbor.toml") + " --out '" + dir.string() +
                           "' --samples 300 --seed 5 --no-pictures");
    INFO(r.out << r.err);
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.find("the compound setting (sd 1.5′)") != std::string::npos);
    CHECK(r.out.find("% of the spread") != std::string::npos);
    CHECK(r.out.find("parts within tolerance;") != std::string::npos);
    const auto j = nlohmann::json::parse(slurp((dir / "budget.json").string()));
    CHECK(j["format"] == "swarf budget");
    CHECK(j["samples"] == 300);
    CHECK(j["seed"] == 5);
    for (const char* k : {"mean", "sd", "p2_5", "p97_5"}) {
        CHECK(j["gauge_diameter_mm"][k].is_number());
        CHECK(j["half_angle_deg"][k].is_number());
    }
    CHECK(j["gauge_diameter_mm"]["p2_5"] <= j["gauge_diameter_mm"]["p97_5"]);
    CHECK(j["p_in_tolerance"] >= 0.0);
    CHECK(j["p_in_tolerance"] <= 1.0);
    // The demo states eight sources (scenes/fixture-arbor.toml, [uncertainty]).
    REQUIRE(j["sources"].size() == 8);
    CHECK(j["sources"][0]["name"] == "compound_angle");
    CHECK(fs::exists(dir / "report.html"));
    CHECK_FALSE(fs::exists(dir / "budget.png"));

    // The same seed gives the same file.
    const fs::path again = fs::temp_directory_path() / "swarf-budget-cli-again";
    fs::remove_all(again);
    REQUIRE(runSwarf("budget " + scene("fixture-arbor.toml") + " --out '" + again.string() +
                     "' --samples 300 --seed 5 --no-pictures")
                .exitCode == 0);
    CHECK(slurp((again / "budget.json").string()) == slurp((dir / "budget.json").string()));
    fs::remove_all(dir);
    fs::remove_all(again);
}

TEST_CASE("swarf budget refuses bad input and scenes with nothing to budget, writing nothing",
          "[cli][budget]") {
    const fs::path dir = fs::temp_directory_path() / "swarf-budget-cli-refused";
    fs::remove_all(dir);
    const std::string out = " --out '" + dir.string() + "' --no-pictures";
    Run r = runSwarf("budget " + scene("fixture-arbor.toml") + out + " --samples 1");
    CHECK(r.exitCode == 2);
    CHECK(r.err.find("--samples") != std::string::npos);
    r = runSwarf("budget " + scene("plan-chamfer-45.toml") + out);
    CHECK(r.exitCode == 2);
    CHECK(r.err.find("nothing to budget: the drawing has no cone") != std::string::npos);
    r = runSwarf(std::string("budget '") + SWARF_TEST_DATA_DIR +
                 "/bad_scenes/uncertainty-backlash-unsure.toml'" + out);
    CHECK(r.exitCode == 2);
    CHECK(r.err.find("uncertainty.saddle_backlash") != std::string::npos);
    CHECK(r.out.empty());
    CHECK_FALSE(fs::exists(dir));
}

TEST_CASE("swarf budget plans a scene without passes first", "[cli][budget]") {
    const fs::path dir = fs::temp_directory_path() / "swarf-budget-cli-planned";
    fs::remove_all(dir);
    const Run r = runSwarf("budget " + scene("plan-morse-3-inch.toml") + " --out '" + dir.string() +
                           "' --samples 100 --no-pictures");
    INFO(r.out << r.err);
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.find("passes planned by swarf plan") != std::string::npos);
    const auto j = nlohmann::json::parse(slurp((dir / "budget.json").string()));
    CHECK(j["passes_planned"] == true);
    CHECK(j["scene"]["units"] == "in");
    fs::remove_all(dir);
}

TEST_CASE("swarf plan --target chooses the way of working from the budget", "[cli][budget][plan]") {
    const fs::path work =
        fs::temp_directory_path() / ("swarf-plan-target-" + std::to_string(getpid()));
    fs::remove_all(work);
    fs::create_directories(work);
    // The 1:20 arbor with a dial zeroed on a bar read with a caliper (sd 0.02 mm): no way of
    // working without a trial cut holds ±0.02 on the diameter most of the time.
    const fs::path sceneFile = work / "arbor.toml";
    {
        std::ofstream out(sceneFile);
        out << slurp(fs::path(SWARF_SCENES_DIR) / "plan-1-20-chuck-out.toml")
            << "\n[uncertainty]\nmeasuring_sd = 0.02\n";
    }
    const fs::path dir = work / "out";
    const Run r = runSwarf("plan '" + sceneFile.string() + "' --out '" + dir.string() +
                           "' --target 0.9 --samples 200");
    INFO(r.out << r.err);
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.find("chosen from the error budget") != std::string::npos);
    CHECK(r.out.find("with a trial cut: ") != std::string::npos);
    CHECK(r.out.find("<- kept") != std::string::npos);
    const std::string sheet = slurp(dir / "setup-sheet.txt");
    CHECK(sheet.find("Why this way of working") != std::string::npos);
    CHECK(sheet.find("Trial cut. Stop the spindle") != std::string::npos);
    CHECK(slurp(dir / "planned.toml").find("trial_cut = true") != std::string::npos);

    // The planned scene's budget keeps its trial cut: the same parts as the budget of the scene
    // asking for that way of working (zero on the diameter, with a trial cut).
    const fs::path withTrial = work / "arbor-trial-cut.toml";
    {
        std::string text = slurp(sceneFile);
        const auto at = text.find("[planning]\n");
        REQUIRE(at != std::string::npos);
        text.insert(at + 11, "trial_cut = true\n");
        std::ofstream(withTrial) << text;
    }
    const fs::path b1 = work / "budget-scene", b2 = work / "budget-planned";
    const Run first = runSwarf("budget '" + withTrial.string() + "' --out '" + b1.string() +
                               "' --samples 200 --no-pictures");
    INFO(first.out << first.err);
    REQUIRE(first.exitCode == 0);
    CHECK(first.out.find("with the plan's measured trial cut") != std::string::npos);
    const Run second = runSwarf("budget '" + (dir / "planned.toml").string() + "' --out '" +
                                b2.string() + "' --samples 200 --no-pictures");
    INFO(second.out << second.err);
    REQUIRE(second.exitCode == 0);
    CHECK(second.out.find("with the plan's measured trial cut") != std::string::npos);
    const auto j1 = nlohmann::json::parse(slurp((b1 / "budget.json").string()));
    const auto j2 = nlohmann::json::parse(slurp((b2 / "budget.json").string()));
    CHECK(j2["gauge_diameter_mm"]["sd"].get<double>() ==
          Approx(j1["gauge_diameter_mm"]["sd"].get<double>()).epsilon(1e-6));
    CHECK(j2["p_in_tolerance"].get<double>() == Approx(j1["p_in_tolerance"].get<double>()));

    // A target without an [uncertainty]: exit 2, the option named, nothing written.
    const fs::path none = work / "none";
    const Run bare = runSwarf("plan " + scene("plan-1-20-chuck-out.toml") + " --out '" +
                              none.string() + "' --target 0.9");
    CHECK(bare.exitCode == 2);
    CHECK(bare.err.find("--target = 0.9: expected an [uncertainty] table") != std::string::npos);
    CHECK_FALSE(fs::exists(none));
    const Run bad =
        runSwarf("plan '" + sceneFile.string() + "' --out '" + none.string() + "' --target 1.5");
    CHECK(bad.exitCode == 2);
    CHECK(bad.err.find("--target = 1.5: expected a chance between 0 and 1") != std::string::npos);
    CHECK_FALSE(fs::exists(none));
    fs::remove_all(work);
}
