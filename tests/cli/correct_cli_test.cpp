// `swarf correct`: the round trip after a trial cut. A planned scene is cut with an error the
// plan did not know of (a mis-set compound, or a cross-slide zero off); the kernel's profile after
// the trial pass is measured with realistic rounding; `swarf correct` fits the cone and corrects
// the rest; `swarf run corrected.toml` must be within tolerance and the recovered compound error
// must match the one put in within the measurement's uncertainty. Also: bad measurement files
// and a contradictory set exit 2 with nothing written.
#include "swarf/io/scene_reader.h"
#include "swarf/io/scene_writer.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/planner.h"
#include "swarf/sim/roll_check.h"
#include "swarf/sim/units.h"

#include "support/cli_run.h"

#include <catch2/catch.hpp>
#include <fmt/format.h>
#include <nlohmann/json.hpp>

#include <cctype>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <unistd.h>

namespace fs = std::filesystem;
using namespace swarf;

using swarf::test::Run;
using swarf::test::runSwarf;
using swarf::test::slurp;

namespace {

// A reading as a person writes it down: rounded to the instrument's least count, in the
// scene's units (0.001 mm, 0.0001 in).
double rounded(double mm, Units u) {
    const double step = u == Units::Inch ? 0.0001 : 0.001;
    return std::round(fromMm(mm, u) / step) * step;
}

struct Case {
    const char* scene;
    double compoundErrorDeg; // the error put in (true minus intended)
    double crossOffsetMm;    // the cross-slide's real zero minus the plan's, on diameter
};

struct Trip {
    ConePlan plan;
    int afterPass = 0;
    fs::path dir;
    bool uncorrectedWithin = true; // the whole plan cut with the error, no correction
};

// Plans the scene, cuts it with the error, measures after the pass before the finish.
Trip cutAndMeasure(const Case& c) {
    Trip t;
    t.plan = planCone(io::readScene(std::string(SWARF_SCENES_DIR) + "/" + c.scene));
    REQUIRE(t.plan.planned);
    const Scene& planned = t.plan.scene;
    const Units u = planned.units;
    t.dir = fs::temp_directory_path() /
            ("swarf-correct-" + std::string(c.scene) + std::to_string(getpid()));
    fs::remove_all(t.dir);
    fs::create_directories(t.dir);
    io::writeScene(planned, (t.dir / "planned.toml").string());

    Scene truth = planned;
    truth.setup.compoundErrorRad += degToRad(c.compoundErrorDeg);
    truth.setup.zeroDiameterMm += c.crossOffsetMm;
    REQUIRE(t.plan.finishPass > 0);
    // The first of the cone's finishing passes; measured after the pass before it.
    int finish = t.plan.finishPass;
    for (std::size_t i = 0; i < t.plan.display.size(); ++i)
        if (t.plan.display[i].coneFinish) {
            finish = static_cast<int>(i);
            break;
        }
    t.afterPass = finish; // passes are counted from 1: pass `finish` is index finish − 1
    t.uncorrectedWithin = simulate(truth).withinTolerance;
    truth.plan.passes.resize(static_cast<std::size_t>(finish));
    const std::vector<ToolMove> moves = planMoves(truth);
    // What a micrometer, rolls or a gauge touch: the crests of the feed marks.
    const Profile cut = simulate(truth).crest;

    // Measured along the stroke of the pass just cut, on the cone (a plan with two saddle
    // settings cuts the cone in two strokes; each pivots where its compound reads 0).
    const Feature& cone = *planned.part.mainCone();
    double lo = 1e9, hi = -1e9;
    for (const ToolMove& mv : moves)
        if (mv.pass == finish - 1) {
            lo = std::min({lo, mv.tipFrom.x(), mv.tipTo.x()});
            hi = std::max({hi, mv.tipFrom.x(), mv.tipTo.x()});
        }
    lo = std::max(lo, cone.zStartMm);
    hi = std::min(hi, cone.zEndMm);
    REQUIRE(hi > lo);
    const double z1 = lo + 0.25 * (hi - lo), z2 = lo + 0.75 * (hi - lo);
    std::string m = fmt::format("# measured after the trial cut, spindle stopped\nafter_pass = "
                                "{}\n",
                                t.afterPass);
    for (double z : {z1, z2})
        m += fmt::format("[[diameter]]\nat = {:.4f}\nvalue = {:.4f}\n", rounded(z, u),
                         rounded(2 * cut.radiusAt(toMm(rounded(z, u), u)), u));
    // Over rolls at the same planes. Source: references R6: M = D + d (1 + sec θ), with the
    // cone's real angle between the two planes.
    const double zr1 = toMm(rounded(z1, u), u), zr2 = toMm(rounded(z2, u), u);
    const double d1 = 2 * cut.radiusAt(zr1), d2 = 2 * cut.radiusAt(zr2);
    const double th = std::atan(std::fabs(d2 - d1) / (2 * (zr2 - zr1)));
    const double roll = u == Units::Inch ? 0.25 * kMmPerInch : 6.0;
    m += fmt::format(
        "[[over_rolls]]\nroll = {:.4f}\nat = [{:.4f}, {:.4f}]\nreading = [{:.4f}, {:.4f}]\n",
        fromMm(roll, u), rounded(z1, u), rounded(z2, u),
        rounded(readingOverRollsMm(d1, roll, th), u), rounded(readingOverRollsMm(d2, roll, th), u));
    // An indicator along the axis over the same span, toward the large end: it reads the
    // change of radius (references R10: L tan θ for α = 0), read to the same least count.
    m += fmt::format("[[indicator]]\ntravel = {:.4f}\nchange = {:.4f}\n", rounded(zr2 - zr1, u),
                     rounded(std::fabs(d2 - d1) / 2, u));
    // A ring gauge of the drawing's gauge diameter, pushed home where the cone has that
    // diameter; its stand-off from the datum face read with a depth gauge to 0.01 mm (0.0005
    // in), when that falls on the stroke just cut.
    const double dg = cone.cone.gaugeDiameterMm;
    for (double z = lo + 0.5; z < hi - 0.5; z += 0.001)
        if ((2 * cut.radiusAt(z) - dg) * (2 * cut.radiusAt(z + 0.001) - dg) <= 0) {
            const double step = u == Units::Inch ? 0.0005 : 0.01;
            m += fmt::format("[[gauge]]\ngauge_diameter = {:.5f}\nstand_off = {:.4f}\n",
                             fromMm(dg, u), std::round(fromMm(z, u) / step) * step);
            break;
        }
    std::ofstream(t.dir / "MEASURED.toml") << m;
    return t;
}

} // namespace

TEST_CASE("swarf correct: the round trip after a trial cut", "[cli][correct]") {
    const Case cases[] = {
        {"plan-1-20-chuck-out.toml", 0.03, 0.0}, {"plan-1-20-tailstock-in.toml", -0.02, 0.0},
        {"plan-morse-3-inch.toml", 0.025, 0.0},  {"plan-morse-3-chuck-out-inch.toml", -0.03, 0.0},
        {"plan-flare-10.toml", 0.1, 0.08}, // a cone widening toward the tailstock
        {"plan-7-24-taper.toml", 0.0, 0.06},     {"plan-shallow-1-50.toml", 0.02, 0.04},
    };
    for (const Case& c : cases) {
        if (getenv("SWARF_ONLY") && std::string(getenv("SWARF_ONLY")) != c.scene)
            continue;
        INFO(c.scene << ": compound off by " << c.compoundErrorDeg << "°, cross zero off by "
                     << c.crossOffsetMm << " mm");
        const Trip t = cutAndMeasure(c);
        CHECK_FALSE(t.uncorrectedWithin); // the error matters: uncorrected, the part is out
        const Run r = runSwarf("correct '" + (t.dir / "planned.toml").string() + "' --measured '" +
                               (t.dir / "MEASURED.toml").string() + "' --out '" +
                               (t.dir / "out").string() + "'");
        INFO(r.out << r.err);
        REQUIRE(r.exitCode == 0);
        const auto j = nlohmann::json::parse(slurp((t.dir / "out" / "correction.json").string()));
        CHECK(j["scrap"]["scrap"] == false);
        // The recovered error matches the one put in, within three of the fit's standard
        // uncertainties (common practice: a coverage factor of 3) and a thousandth of a degree
        // for the profile's own sampling.
        const double sd = j["measured"]["half_angle_sd_deg"].get<double>();
        CHECK(std::fabs(j["revealed_compound_error_deg"].get<double>() - c.compoundErrorDeg) <=
              3 * sd + 1e-3);
        CHECK(j["compound_change_deg"].get<double>() ==
              Approx(-j["revealed_compound_error_deg"].get<double>()).margin(1e-9));
        // The recovered offset of the cross-slide's zero, within the micrometer's rounding and
        // the dial's half division.
        CHECK(std::fabs(j["revealed_cross_offset_mm"].get<double>() - c.crossOffsetMm) <= 0.01);
        CHECK(j["verdict_after"] == "in_tolerance");
        // 0.3 mm more on diameter leaves 0.1 + 0.15 cos θ mm for the finishing pass, more than
        // twice the finishing allowance (0.1 mm): a pass is added (derived).
        CHECK(j["passes_added"].get<int>() == (c.crossOffsetMm > 0.2 ? 1 : 0));
        for (const char* f : {"corrected.toml", "setup-sheet.txt", "setup-sheet.html"})
            CHECK(fs::exists(t.dir / "out" / f));
        CHECK_THAT(slurp((t.dir / "out" / "setup-sheet.txt").string()),
                   Catch::Contains("stop the spindle before measuring"));
        // The last step measures the finished cone, and says the spindle is stopped (the sheet
        // wraps its lines: compared with each run of white space as one space).
        std::string flat;
        for (char ch : slurp((t.dir / "out" / "setup-sheet.txt").string()))
            if (!(std::isspace(static_cast<unsigned char>(ch)) && !flat.empty() &&
                  flat.back() == ' '))
                flat += std::isspace(static_cast<unsigned char>(ch)) ? ' ' : ch;
        CHECK_THAT(flat,
                   Catch::Contains("measure the finished cone (spindle stopped, tool backed out)"));
        const std::string html = slurp((t.dir / "out" / "setup-sheet.html").string());
        CHECK_THAT(html, Catch::Contains("stop the spindle before measuring"));
        CHECK_THAT(html, Catch::Contains("<svg")); // the before-and-after chart
        CHECK_THAT(html, Catch::Contains("after correction"));
        // swarf run on the story gives the verdict after correction.
        const Run run = runSwarf("run '" + (t.dir / "out" / "corrected.toml").string() +
                                 "' --out '" + (t.dir / "run").string() + "' --no-pictures");
        INFO(run.out << run.err);
        CHECK(run.exitCode == 0);
        const auto res = nlohmann::json::parse(slurp((t.dir / "run" / "result.json").string()));
        CHECK(res["verdict"] == "in_tolerance");
        if (!getenv("SWARF_KEEP"))
            fs::remove_all(t.dir);
    }
}

TEST_CASE("the README's example: the planned 1:20 arbor after pass 2", "[cli][correct]") {
    // scenes/measured/plan-1-20-after-pass-2.toml was measured (rounded to 0.001 mm) on the
    // kernel's profile of the plan cut with its compound 0.03° steep (a made-up example).
    const fs::path dir =
        fs::temp_directory_path() / ("swarf-correct-readme" + std::to_string(getpid()));
    fs::remove_all(dir);
    const Run r = runSwarf("correct '" + std::string(SWARF_SCENES_DIR) +
                           "/plan-1-20-chuck-out.toml' --measured '" + SWARF_SCENES_DIR +
                           "/measured/plan-1-20-after-pass-2.toml' --out '" + dir.string() + "'");
    INFO(r.out << r.err);
    REQUIRE(r.exitCode == 0);
    CHECK_THAT(r.out, Catch::Contains("passes planned by swarf plan"));
    const auto j = nlohmann::json::parse(slurp((dir / "correction.json").string()));
    CHECK(j["after_pass"] == 2);
    CHECK(std::fabs(j["revealed_compound_error_deg"].get<double>() - 0.03) <=
          3 * j["measured"]["half_angle_sd_deg"].get<double>());
    CHECK(j["verdict_after"] == "in_tolerance");
    fs::remove_all(dir);
}

TEST_CASE("swarf correct says scrap plainly and corrects nothing", "[cli][correct]") {
    // The trial cut went 0.3 mm under the plan on diameter (the cross-slide's zero off): the
    // 1:20 arbor's trial pass leaves 0.2 mm on diameter for the finish (finishing allowance 0.1
    // mm normal to the cone, references R3 for 1:20), so the cone is 0.1 mm under the drawing,
    // 0.08 mm under its lower limit (tolerance ±0.02 mm).
    const Case c{"plan-1-20-chuck-out.toml", 0.0, -0.3};
    const Trip t = cutAndMeasure(c);
    const Run r =
        runSwarf("correct '" + (t.dir / "planned.toml").string() + "' --measured '" +
                 (t.dir / "MEASURED.toml").string() + "' --out '" + (t.dir / "out").string() + "'");
    INFO(r.out << r.err);
    REQUIRE(r.exitCode == 0);
    CHECK_THAT(r.out, Catch::Contains("SCRAP"));
    const auto j = nlohmann::json::parse(slurp((t.dir / "out" / "correction.json").string()));
    CHECK(j["scrap"]["scrap"] == true);
    // derived: the trial pass stands (finish reading − trial reading) on diameter above the
    // finished cone, which the plan itself leaves `excess` over the drawing (its half-division
    // rounding); 0.3 mm under that, less the tolerance, is how far under the lower limit.
    const Scene& p = t.plan.scene;
    const double excess =
        simulate(p).gaugeAsCutDiameterMm - p.part.mainCone()->cone.gaugeDiameterMm;
    const double step = p.plan.passes[static_cast<std::size_t>(t.afterPass)].crossMm -
                        p.plan.passes[static_cast<std::size_t>(t.afterPass - 1)].crossMm;
    CHECK(j["scrap"]["amount_mm"].get<double>() ==
          Approx(0.3 - step - excess - p.part.mainCone()->toleranceMm).margin(0.002));
    CHECK(j["verdict_after"] == "scrap");
    CHECK(j["remaining"].empty());
    CHECK_THAT(slurp((t.dir / "out" / "setup-sheet.txt").string()),
               Catch::Contains("No correction can put the metal back"));
    // corrected.toml holds the story so far, and no more passes.
    CHECK(slurp((t.dir / "out" / "corrected.toml").string()).find("after the trial cut") ==
          std::string::npos);
    if (!getenv("SWARF_KEEP"))
        fs::remove_all(t.dir);
}

TEST_CASE("swarf correct refuses bad measurement files with nothing written", "[cli][correct]") {
    const fs::path dir =
        fs::temp_directory_path() / ("swarf-correct-bad" + std::to_string(getpid()));
    fs::remove_all(dir);
    fs::create_directories(dir);
    const ConePlan plan =
        planCone(io::readScene(std::string(SWARF_SCENES_DIR) + "/plan-1-20-chuck-out.toml"));
    io::writeScene(plan.scene, (dir / "planned.toml").string());
    auto correct = [&](const std::string& measured) {
        return runSwarf("correct '" + (dir / "planned.toml").string() + "' --measured '" +
                        measured + "' --out '" + (dir / "out").string() + "'");
    };
    SECTION("a bad file") {
        const std::string bad =
            std::string(SWARF_TEST_DATA_DIR) + "/bad_measurements/diameter-off-cone.toml";
        const Run r = correct(bad);
        CHECK(r.exitCode == 2);
        CHECK_THAT(r.err, Catch::Contains("diameter-off-cone.toml:9:6"));
        CHECK_THAT(r.err, Catch::Contains("diameter[2].at"));
        CHECK_FALSE(fs::exists(dir / "out"));
    }
    SECTION("a contradictory set: two diameters that make the cone narrow toward the chuck") {
        std::ofstream(dir / "M.toml") << "after_pass = 2\n[[diameter]]\nat = 10\nvalue = 23.9\n"
                                         "[[diameter]]\nat = 50\nvalue = 22.1\n";
        const Run r = correct((dir / "M.toml").string());
        CHECK(r.exitCode == 2);
        CHECK_THAT(r.err, Catch::Contains("narrow toward the chuck"));
        CHECK_THAT(r.err, Catch::Contains("residuals"));
        CHECK_THAT(r.err, Catch::Contains("diameter[2] at z"));
        CHECK_FALSE(fs::exists(dir / "out"));
    }
    SECTION("a set with one reading far off the others") {
        // 1:20: 0.05 mm a mm on diameter (references R3, ISO 296); the third reading is 0.05 mm
        // off the line the other three make.
        std::ofstream(dir / "M.toml")
            << "after_pass = 2\n[[diameter]]\nat = 10\nvalue = 21.7\n[[diameter]]\nat = 20\n"
               "value = 22.2\n[[diameter]]\nat = 30\nvalue = 22.75\n[[diameter]]\nat = 40\n"
               "value = 23.2\n";
        const Run r = correct((dir / "M.toml").string());
        CHECK(r.exitCode == 2);
        CHECK_THAT(r.err, Catch::Contains("contradict"));
        CHECK_THAT(r.err, Catch::Contains("M.toml:8:1"));
        CHECK_FALSE(fs::exists(dir / "out"));
    }
    fs::remove_all(dir);
}
