// Inside work from the command line (issue 14): `swarf check` reads and prints a bore, inside
// features and a boring bar; with a boring bar, `swarf run`, `view`, `plan` and `budget`
// simulate, draw, plan and budget it; `swarf correct` does not handle inside work yet and
// refuses it with exit code 2, the message at its first piece, and nothing written.
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

TEST_CASE("swarf view draws inside work: a screenshot of a bored socket", "[cli][inside][view]") {
    const std::filesystem::path png = std::filesystem::temp_directory_path() /
                                      ("inside_view_" + std::to_string(getpid()) + ".png");
    std::filesystem::remove(png);
    const Run v =
        runSwarf("view '" + std::string(SWARF_SCENES_DIR) +
                 "/bore-socket-no-offset.toml' --size 640x400 --camera cone --screenshot '" +
                 png.string() + "'");
    INFO(v.out << v.err);
    CHECK(v.exitCode == 0);
    CHECK(v.err.find("does not simulate") == std::string::npos);
    CHECK(std::filesystem::file_size(png) > 10000);
    std::filesystem::remove(png);
}

TEST_CASE("swarf run bores a socket: the bore in result.json and profile.csv, hollow STEP",
          "[cli][inside][run]") {
    const std::filesystem::path out =
        std::filesystem::temp_directory_path() / ("inside_run_" + std::to_string(getpid()));
    std::filesystem::remove_all(out);
    const Run r =
        runSwarf("run '" + std::string(SWARF_SCENES_DIR) + "/bore-socket-no-offset.toml' --out '" +
                 out.string() + "' --no-pictures");
    INFO(r.out << r.err);
    REQUIRE(r.exitCode == 0);
    // The gauge at the mouth 0.039 mm small: 2·r(1 + tanθ − secθ) with r = 0.4, θ = atan 0.05
    // (references R1, mirrored inside; derived in the scene's header).
    CHECK(r.out.find("diameter as cut 25.9610 mm, drawing 26.0000 mm (−39.0 µm)") !=
          std::string::npos);
    CHECK(r.out.find("metal left on, pass 6") != std::string::npos);
    // And its cause named, on the bore: the missing inside offset, the bore small by the same
    // 0.039 mm (references R1 mirrored, derived), with the fix toward the wall.
    CHECK(r.out.find("what moved the cone") != std::string::npos);
    CHECK(r.out.find("without the nose-radius offset") != std::string::npos);
    CHECK(r.out.find("the bore is 0.0390 mm small on diameter") != std::string::npos);
    CHECK(r.out.find("toward the wall") != std::string::npos);
    const std::string json = swarf::test::slurp(out / "result.json");
    CHECK(json.find("\"source\": \"nose_offset\"") != std::string::npos);
    CHECK(json.find("\"gauge_diameter_change_mm\": -0.039") != std::string::npos);
    CHECK(json.find("\"side\": \"inside\"") != std::string::npos);
    CHECK(json.find("\"bore\": {") != std::string::npos);
    const std::string csv = swarf::test::slurp(out / "profile.csv");
    CHECK(csv.rfind("z_mm,nominal_radius_mm,as_cut_radius_mm,deviation_mm,crest_radius_mm,"
                    "crest_deviation_mm,bore_nominal_radius_mm,bore_radius_mm,",
                    0) == 0);
    CHECK(std::filesystem::exists(out / "as-cut.step"));
    CHECK(std::filesystem::exists(out / "left-on.step"));
    std::filesystem::remove_all(out);
}

TEST_CASE("swarf run writes the pictures of a bored part, and --compare sets them side by side",
          "[cli][inside][run][pictures]") {
    const std::filesystem::path out =
        std::filesystem::temp_directory_path() / ("inside_pictures_" + std::to_string(getpid()));
    std::filesystem::remove_all(out);
    const Run r =
        runSwarf("run '" + std::string(SWARF_SCENES_DIR) + "/bore-socket-no-offset.toml' --out '" +
                 out.string() + "' --no-step --compare '" + std::string(SWARF_SCENES_DIR) +
                 "/bore-collet-seat-1-10.toml'");
    INFO(r.out << r.err);
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.find("pictures: none") == std::string::npos);
    for (const char* side : {"scene", "other"})
        for (const char* png : {"part.png", "cone.png", "section.png", "chart.png", "marks.png"}) {
            INFO(side << "/" << png);
            CHECK(std::filesystem::exists(out / side / png));
        }
    const std::string html = swarf::test::slurp(out / "compare.html");
    CHECK(html.find("scene/cone.png") != std::string::npos);
    CHECK(html.find("other/cone.png") != std::string::npos);
    std::filesystem::remove_all(out);
}

TEST_CASE("bored sockets come out to the published tapers, within tolerance",
          "[cli][inside][run]") {
    const std::filesystem::path out =
        std::filesystem::temp_directory_path() / ("inside_sockets_" + std::to_string(getpid()));
    {
        const Run r = runSwarf("run '" + std::string(SWARF_SCENES_DIR) +
                               "/bore-morse-2-socket-inch.toml' --out '" + out.string() +
                               "' --no-step --no-pictures");
        INFO(r.out << r.err);
        REQUIRE(r.exitCode == 0);
        CHECK(r.out.find("verdict: within tolerance") != std::string::npos);
        // Source: references R3, Machinery's Handbook Morse table: No. 2 gauge diameter
        // 0.700 in, at the socket's mouth (ISO 296). Taper 1:20.020 on diameter: half angle
        // atan(1/40.04) = 1°25′50.4″ (derived).
        CHECK(r.out.find("drawing 0.70000 in") != std::string::npos);
        CHECK(r.out.find("(drawing 1°25′50.4″)") != std::string::npos);
        // The only finding: 2.9 in of a 7/16 in bar (common practice: about 4 diameters).
        CHECK(r.out.find("long boring-bar overhang") != std::string::npos);
        CHECK(r.out.find("boring bar rubs the bore") == std::string::npos);
    }
    {
        const Run r = runSwarf("run '" + std::string(SWARF_SCENES_DIR) +
                               "/bore-collet-seat-1-10.toml' --out '" + out.string() +
                               "' --no-step --no-pictures");
        INFO(r.out << r.err);
        REQUIRE(r.exitCode == 0);
        CHECK(r.out.find("verdict: within tolerance") != std::string::npos);
        // Source: references R3, ISO 1119: 1:10 → 5°43′29.3176″ included, 2°51′44.66″ half.
        CHECK(r.out.find("(drawing 2°51′44.7″)") != std::string::npos);
        CHECK(r.out.find("findings: none") != std::string::npos);
    }
    std::filesystem::remove_all(out);
}

TEST_CASE("swarf plan bores a socket: pilot, cone, plug gauge, and the plan runs within tolerance",
          "[cli][inside][plan]") {
    const std::filesystem::path out =
        std::filesystem::temp_directory_path() / ("inside_plan_" + std::to_string(getpid()));
    std::filesystem::remove_all(out);
    const Run r = runSwarf("plan '" + std::string(SWARF_SCENES_DIR) +
                           "/bore-collet-seat-1-10.toml' --out '" + out.string() + "'");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    CHECK(r.out.find("simulated: within tolerance") != std::string::npos);
    CHECK(r.out.find("no findings") != std::string::npos);
    const std::string sheet = slurp((out / "setup-sheet.txt").string());
    CHECK(sheet.find("pilot bore to") != std::string::npos);
    CHECK(sheet.find("Plug gauge of the drawing's cone") != std::string::npos);
    CHECK(sheet.find("Never put fingers") != std::string::npos);
    // The planned scene runs as `swarf run` runs any scene: within tolerance, no findings.
    const Run run = runSwarf("run '" + (out / "planned.toml").string() + "' --out '" +
                             (out / "run").string() + "' --no-pictures");
    INFO(run.out << run.err);
    CHECK(run.exitCode == 0);
    CHECK(run.out.find("within tolerance") != std::string::npos);
    std::filesystem::remove_all(out);
}

TEST_CASE("swarf budget of a bored socket", "[cli][inside][budget]") {
    const std::filesystem::path out =
        std::filesystem::temp_directory_path() / ("inside_budget_" + std::to_string(getpid()));
    std::filesystem::remove_all(out);
    const Run r = runSwarf("budget '" + std::string(SWARF_SCENES_DIR) +
                           "/bore-collet-seat-1-10.toml' --out '" + out.string() +
                           "' --samples 200 --no-pictures");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    CHECK(r.out.find("gauge diameter: mean") != std::string::npos);
    CHECK(std::filesystem::exists(out / "budget.json"));
    std::filesystem::remove_all(out);
}

TEST_CASE("swarf correct refuses inside work, writing nothing", "[cli][inside]") {
    const std::filesystem::path out =
        std::filesystem::temp_directory_path() / ("inside_correct_" + std::to_string(getpid()));
    std::filesystem::remove_all(out);
    const Run r = runSwarf("correct '" + std::string(SWARF_SCENES_DIR) +
                           "/bore-collet-seat-1-10.toml' --measured '" + SWARF_SCENES_DIR +
                           "/measured/plan-1-20-after-pass-2.toml' --out '" + out.string() + "'");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 2);
    CHECK(r.err.find("swarf correct does not simulate") != std::string::npos);
    CHECK_FALSE(std::filesystem::exists(out));
}
