// `swarf check`: exit 0 and a summary on stdout for a good scene; exit 2 and the message on
// stderr (nothing on stdout) for a bad one.
#include "support/cli_run.h"

#include <catch2/catch.hpp>

#include <cstdio>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <unistd.h>
#include <utility>
#include <vector>

using swarf::test::Run;
using swarf::test::runSwarf;
using swarf::test::slurp;

namespace {} // namespace

TEST_CASE("swarf check accepts the demo scene and prints the cone in every form", "[cli][check]") {
    const Run r = runSwarf(std::string("check '") + SWARF_SCENES_DIR + "/fixture-arbor.toml'");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    CHECK(r.err.empty());
    CHECK(r.out.find("gauge plane z = 40.000 mm") != std::string::npos);
    CHECK(r.out.find("ratio 1:10.0000") != std::string::npos);
    // derived: 1:10 → half angle atan(0.05) = 2°51′44.7″, included 5°43′29.3″
    CHECK(r.out.find("2°51′44.7″") != std::string::npos);
    // Source: references R3 (ISO 1119: 1:10 → 5°43′29.3176″ included)
    CHECK(r.out.find("5°43′29.3″") != std::string::npos);
    CHECK(r.out.find("taper per foot 1.20000 in/ft") != std::string::npos);
    // Source: references R8 (93° holder with a 55° insert: trailing-edge limit 32°)
    CHECK(r.out.find("= 32.00°") != std::string::npos);
    CHECK(r.out.find("4 pass(es)") != std::string::npos);
}

TEST_CASE("swarf check shows an inch scene in inch", "[cli][check]") {
    const Run r = runSwarf(std::string("check '") + SWARF_SCENES_DIR + "/taper-shank-morse.toml'");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    CHECK(r.out.find("gauge diameter 0.7000 in") != std::string::npos); // Source: references R3
    CHECK(r.out.find(" mm") == std::string::npos);
}

TEST_CASE("swarf check refuses a bad scene with exit code 2 and the message on stderr",
          "[cli][check]") {
    const std::string bad = std::string(SWARF_TEST_DATA_DIR) + "/bad_scenes/two-taper-forms.toml";
    const Run r = runSwarf("check '" + bad + "'");
    CHECK(r.exitCode == 2);
    CHECK(r.out.empty());
    CHECK(r.err.find(bad + ":21:9:") != std::string::npos);
    CHECK(r.err.find("part.feature[1].ratio") != std::string::npos);
    CHECK(r.err.find("only one way to give the taper") != std::string::npos);
}

TEST_CASE("swarf check on a missing file is bad input too", "[cli][check]") {
    const Run r = runSwarf("check /nonexistent/scene.toml");
    CHECK(r.exitCode == 2);
    CHECK(r.err.find("/nonexistent/scene.toml") != std::string::npos);
}

TEST_CASE("swarf check notes a long stick-out but still accepts the scene", "[cli][check]") {
    std::string text = slurp(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    const std::string from = "stick_out = 85.0";
    const auto at = text.find(from);
    REQUIRE(at != std::string::npos);
    text.replace(at, from.size(), "stick_out = 140.0");
    const std::string file = "check_cli_test_long_stick_out.toml";
    {
        std::ofstream out(file);
        out << text;
    }
    const Run r = runSwarf("check " + file);
    std::remove(file.c_str());
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    // common practice: about three diameters of stick-out for work in a chuck alone
    CHECK(r.out.find("note: stick-out is 4.7 bar diameters") != std::string::npos);
}

namespace {

// A scene from scenes/ with some of its lines replaced, checked from a temporary file.
Run checkEdited(const std::string& scene,
                const std::vector<std::pair<std::string, std::string>>& edits,
                const std::string& file) {
    std::string text = slurp(std::string(SWARF_SCENES_DIR) + "/" + scene);
    for (const auto& [from, to] : edits) {
        const auto at = text.find(from);
        REQUIRE(at != std::string::npos);
        text.replace(at, from.size(), to);
    }
    {
        std::ofstream out(file);
        out << text;
    }
    const Run r = runSwarf("check " + file);
    std::remove(file.c_str());
    return r;
}

} // namespace

TEST_CASE("swarf check notes a compound angle read off the other scale, with or without passes",
          "[cli][check][compound]") {
    // The demo's 1:10 cone: half angle 2°51′44.7″ (Source: references R3, ISO 1119). A scale
    // graduated from the cross-slide reads 90° − θ (Source: references R5): 87°08′15″, which
    // set on a scale from the axis is the other scale's reading.
    for (bool passes : {true, false}) {
        INFO((passes ? "with passes" : "without passes"));
        std::string text = slurp(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
        text.replace(text.find("angle = 2.8624"), 14, "angle = 87.1376");
        if (!passes) {
            const auto a = text.find("[[plan.pass]]"), b = text.find("[planning]");
            REQUIRE(a != std::string::npos);
            REQUIRE(b != std::string::npos);
            text.erase(a, b - a);
        }
        const std::string file = "check_cli_test_other_scale.toml";
        {
            std::ofstream out(file);
            out << text;
        }
        const Run r = runSwarf("check " + file);
        std::remove(file.c_str());
        INFO(r.out << r.err);
        CHECK(r.exitCode == 0);
        CHECK(r.out.find("plan: " + std::string(passes ? "4" : "0") + " pass(es)") !=
              std::string::npos);
        CHECK(r.out.find("looks read off the other scale") != std::string::npos);
        CHECK(r.out.find("scale = \"cross_slide\"") != std::string::npos);
    }
    // Set right, no such note.
    const Run ok = runSwarf(std::string("check '") + SWARF_SCENES_DIR + "/fixture-arbor.toml'");
    CHECK(ok.out.find("other scale") == std::string::npos);
}

TEST_CASE("swarf check says when the compound cannot cut the cone, or only with the trailing "
          "edge, and what to change",
          "[cli][check][compound]") {
    // derived (compound_sense.h): the demo's cone widens toward the chuck.
    const Run trailing =
        runSwarf(std::string("check '") + SWARF_SCENES_DIR + "/fixture-arbor.toml'");
    CHECK(trailing.out.find("is cut with the trailing edge") != std::string::npos);
    CHECK(trailing.out.find("advance = \"chuck\", across = \"out\"") != std::string::npos);
    const Run main =
        runSwarf(std::string("check '") + SWARF_SCENES_DIR + "/plan-1-20-chuck-out.toml'");
    CHECK(main.exitCode == 0);
    CHECK(main.out.find("toward the chuck and out") != std::string::npos);
    CHECK(main.out.find("trailing edge") == std::string::npos);
    const Run across =
        checkEdited("fixture-arbor.toml", {{"advance = \"tailstock\"", "advance = \"chuck\""}},
                    "check_cli_test_wrong_sense.toml");
    INFO(across.out << across.err);
    CHECK(across.exitCode == 0); // a note, not an error
    CHECK(across.out.find("the compound cannot cut the cone") != std::string::npos);
}

TEST_CASE("swarf check notes numbers in a likely wrong unit, and still accepts the scene",
          "[cli][check]") {
    const Run r = checkEdited("fixture-arbor.toml",
                              {{"tolerance = 0.02", "tolerance = 15"},
                               {"rough_feed = 0.1", "rough_feed = 100"},
                               {"feed = 0.05", "feed = 5"}},
                              "check_cli_test_units.toml");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    CHECK(r.err.empty());
    // derived: a tenth of the 29 mm gauge diameter is 2.9 mm
    CHECK(r.out.find("note: part.feature[1].tolerance ± 15.000 mm is more than a tenth of its "
                     "29.000 mm diameter") != std::string::npos);
    CHECK(r.out.find("note: plan.pass[4].feed = 5.000 mm a revolution is more than 1.00 mm") !=
          std::string::npos);
    CHECK(r.out.find("note: planning.rough_feed = 100.000 mm a revolution") != std::string::npos);
    CHECK(r.out.find("OK: the scene is valid.") != std::string::npos);
}

TEST_CASE("swarf check notes a stick-out that leaves the tool no room before the jaws",
          "[cli][check]") {
    // The drawing ends at z = 80 (the bar left as drawn); 80.5 leaves half a millimetre.
    const Run r = checkEdited("fixture-arbor.toml", {{"stick_out = 85.0", "stick_out = 80.5"}},
                              "check_cli_test_room.toml");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    CHECK(r.out.find("note: stick-out 80.500 mm leaves 0.500 mm between the part's end and the "
                     "jaws") != std::string::npos);
}

TEST_CASE("swarf check refuses a stick-out shorter than the part, on stock.stick_out",
          "[cli][check]") {
    const Run r = checkEdited("fixture-arbor.toml", {{"stick_out = 85.0", "stick_out = 60.0"}},
                              "check_cli_test_short.toml");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 2);
    CHECK(r.out.empty());
    CHECK(r.err.find("check_cli_test_short.toml:33:13: stock.stick_out = 60.0: expected at least "
                     "80 mm: the part must end outside the jaws, but feature 2 (\"bar (left as "
                     "drawn)\") ends at z = 80 mm") != std::string::npos);
}

TEST_CASE("swarf check reads the old finding name past_stock as crosses_centre, with a note",
          "[cli][check][names]") {
    const Run r = checkEdited("finding-crosses-centre.toml",
                              {{"findings = [\"crosses_centre\"]", "findings = [\"past_stock\"]"}},
                              "check_cli_test_old_name.toml");
    INFO(r.out << r.err);
    CHECK(r.exitCode == 0);
    CHECK(r.out.find("\"past_stock\" is now called \"crosses_centre\"") != std::string::npos);
    CHECK(r.out.find("check_cli_test_old_name.toml:") != std::string::npos);
}
