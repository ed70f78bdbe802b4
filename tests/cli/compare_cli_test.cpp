// `swarf run SCENE --compare OTHER`: both scenes run in full into their own folders, and
// compare.html sets them side by side with the difference at the gauge plane; a bad OTHER is
// refused with exit 2 before anything is written.
#include "support/cli_run.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <cmath>
#include <filesystem>
#include <regex>
#include <string>

namespace fs = std::filesystem;
using swarf::test::Run;
using swarf::test::runSwarf;
using swarf::test::slurp;

namespace {

bool contains(const std::string& text, const std::string& piece) {
    return text.find(piece) != std::string::npos;
}

double gaugeDiameter(const fs::path& resultJson) {
    const nlohmann::json j = nlohmann::json::parse(slurp(resultJson));
    return j.at("gauge").at("as_cut_diameter_mm").get<double>();
}

} // namespace

TEST_CASE("run --compare: the no-offset arbor against the arbor, side by side", "[cli][compare]") {
    const fs::path scenes(SWARF_SCENES_DIR);
    const fs::path dir = fs::temp_directory_path() / "swarf-compare-cli-arbor";
    fs::remove_all(dir);
    const Run r = runSwarf("run '" + (scenes / "fixture-arbor-no-offset.toml").string() +
                           "' --compare '" + (scenes / "fixture-arbor.toml").string() +
                           "' --out '" + dir.string() + "' --no-step");
    INFO(r.out << r.err);
    REQUIRE(r.exitCode == 0);

    // Both runs in full, each in its folder.
    for (const char* side : {"scene", "other"})
        for (const char* f : {"result.json", "profile.csv", "report.html", "part.png", "cone.png",
                              "chart.png", "section.png"}) {
            INFO(side << "/" << f);
            CHECK(fs::is_regular_file(dir / side / f));
        }
    const double mistake = gaugeDiameter(dir / "scene" / "result.json");
    const double right = gaugeDiameter(dir / "other" / "result.json");

    // The page's difference is the difference of the two result.json figures.
    const std::string html = slurp(dir / "compare.html");
    std::smatch m;
    REQUIRE(std::regex_search(html, m,
                              std::regex("id=\"gauge-diameter-change\" data-mm=\"([-0-9.e+]+)\"")));
    const double shown = std::stod(m[1].str());
    CHECK(shown == Approx(mistake - right).margin(1e-8));

    // And it is the nose-radius offset on diameter, 2·r(1 + tanθ − secθ) with r = 0.4 mm and
    // tanθ = 0.05. Source: references R1 (the offset normal to a taper, as X); derived: the
    // arbor's finishing reading rounds its −0.161 to −0.16 (its header comment), 0.001 mm on
    // diameter, so the two cones differ by the offset to within that rounding.
    const double tanT = 0.05, secT = std::sqrt(1 + tanT * tanT);
    const double offsetOnDiameter = 2 * 0.4 * (1 + tanT - secT);
    CHECK(offsetOnDiameter == Approx(0.039).margin(1e-6)); // the header's 2·ΔX = 0.039 mm
    CHECK(std::abs(shown - offsetOnDiameter) <= 0.001 + 1e-6);
    CHECK(shown > 0); // no offset: metal left on, the cone large

    // Both pictures, by their paths in the two folders; both verdicts.
    for (const char* pic : {"scene/part.png", "other/part.png"})
        CHECK(contains(html, std::string("src=\"") + pic + "\""));
    // Both charts, drawn to one range (each run's own chart.png has its own scale, so the page
    // does not show those), and the range holds the metal the mistake leaves on: 2ΔX·cos θ/2
    // normal to the surface, 19.5 µm (references R1; derived).
    std::smatch chartLeft, chartRight;
    REQUIRE(std::regex_search(html, chartLeft,
                              std::regex("id=\"chart-left\"[^>]*data-lo=\"([-0-9.e+]+)\" "
                                         "data-hi=\"([-0-9.e+]+)\"")));
    REQUIRE(std::regex_search(html, chartRight,
                              std::regex("id=\"chart-right\"[^>]*data-lo=\"([-0-9.e+]+)\" "
                                         "data-hi=\"([-0-9.e+]+)\"")));
    CHECK(chartLeft[1].str() == chartRight[1].str());
    CHECK(chartLeft[2].str() == chartRight[2].str());
    CHECK(std::stod(chartLeft[2].str()) >= 0.5 * offsetOnDiameter * 1000 / secT);
    CHECK_FALSE(contains(html, "scene/chart.png"));
    CHECK(contains(html, "id=\"half-angle-change\""));
    CHECK(contains(html, "out of tolerance"));
    CHECK(contains(html, "within tolerance"));
    CHECK(contains(html, "Cautions"));
    CHECK(contains(r.out, "difference from "));
    CHECK(contains(r.out, "compare.html"));
    fs::remove_all(dir);
}

TEST_CASE("run --compare with a broken or missing OTHER exits 2 and writes nothing",
          "[cli][compare]") {
    const fs::path scenes(SWARF_SCENES_DIR);
    const fs::path dir = fs::temp_directory_path() / "swarf-compare-cli-bad";
    fs::remove_all(dir);
    {
        // A bad scene of the corpus: its header says where the reader stops.
        const fs::path bad =
            fs::path(SWARF_TEST_DATA_DIR) / "bad_scenes" / "angle-samples-too-few.toml";
        const Run r = runSwarf("run '" + (scenes / "fixture-arbor.toml").string() +
                               "' --compare '" + bad.string() + "' --out '" + dir.string() + "'");
        INFO(r.out << r.err);
        CHECK(r.exitCode == 2);
        CHECK(contains(r.err, "angle-samples-too-few.toml:45:17"));
        CHECK(contains(r.err, "sim.angle_samples"));
        CHECK_FALSE(fs::exists(dir));
    }
    {
        const fs::path missing = scenes / "no-such-scene-right.toml";
        const Run r =
            runSwarf("run '" + (scenes / "fixture-arbor.toml").string() + "' --compare '" +
                     missing.string() + "' --out '" + dir.string() + "' --no-pictures --no-step");
        INFO(r.out << r.err);
        CHECK(r.exitCode == 2);
        CHECK(contains(r.err, "no-such-scene-right.toml"));
        CHECK_FALSE(fs::exists(dir));
    }
}

TEST_CASE("view --twin with a broken twin exits 2 before any window", "[cli][compare]") {
    const fs::path scenes(SWARF_SCENES_DIR);
    const fs::path png = fs::temp_directory_path() / "swarf-compare-cli-twin.png";
    fs::remove(png);
    const fs::path bad =
        fs::path(SWARF_TEST_DATA_DIR) / "bad_scenes" / "angle-samples-too-few.toml";
    const Run r = runSwarf("view '" + (scenes / "fixture-arbor.toml").string() + "' --twin '" +
                           bad.string() + "' --screenshot '" + png.string() + "'");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 2);
    CHECK(contains(r.err, "angle-samples-too-few.toml:45:17"));
    CHECK_FALSE(fs::exists(png));
}

TEST_CASE("view finds the twin by name: <stem>-mistake.toml beside <stem>-right.toml",
          "[cli][compare]") {
    const fs::path scenes(SWARF_SCENES_DIR);
    const fs::path dir = fs::temp_directory_path() / "swarf-compare-cli-pair";
    fs::remove_all(dir);
    fs::create_directories(dir);
    fs::copy_file(scenes / "fixture-arbor-no-offset.toml", dir / "arbor-mistake.toml");
    // The twin found by the rule is read like any scene: a broken one is refused by name,
    // which shows it was found.
    fs::copy_file(fs::path(SWARF_TEST_DATA_DIR) / "bad_scenes" / "angle-samples-too-few.toml",
                  dir / "arbor-right.toml");
    const fs::path png = dir / "ghost.png";
    Run r = runSwarf("view '" + (dir / "arbor-mistake.toml").string() +
                     "' --show-twin --size 640x400 --screenshot '" + png.string() + "'");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 2);
    CHECK(contains(r.err, "arbor-right.toml:45:17"));
    CHECK_FALSE(fs::exists(png));
    // With a good twin beside it, the picture is made.
    fs::remove(dir / "arbor-right.toml");
    fs::copy_file(scenes / "fixture-arbor.toml", dir / "arbor-right.toml");
    r = runSwarf("view '" + (dir / "arbor-mistake.toml").string() +
                 "' --show-twin --size 640x400 --screenshot '" + png.string() + "'");
    CHECK(r.exitCode == 0);
    CHECK(fs::file_size(png) > 1000);
    fs::remove_all(dir);
}
