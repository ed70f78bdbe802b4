// Tests of swarf/viewer/snapshots.h: headless pictures (run under xvfb-run, or let
// ensureDisplay start a virtual display).
#include "swarf/viewer/snapshots.h"

#include "support/synthetic.h"
#include "swarf/io/report.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/kernel.h"
#include "swarf/viewer/image.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <filesystem>

using namespace swarf;
namespace fs = std::filesystem;

namespace {

std::string freshDir(const std::string& name) {
    const fs::path dir = fs::temp_directory_path() / ("swarf-viewer-test-" + name);
    fs::remove_all(dir);
    return dir.string();
}

// Pixel classes in the middle of a picture (the middle third each way).
struct Census {
    double red = 0, blue = 0, neutralPart = 0, total = 0;
};

Census census(const viewer::Image& img) {
    Census c;
    for (int y = img.heightPx / 3; y < 2 * img.heightPx / 3; ++y)
        for (int x = img.widthPx / 3; x < 2 * img.widthPx / 3; ++x) {
            const unsigned char* p = img.at(x, y);
            const int r = p[0], g = p[1], b = p[2];
            c.total += 1;
            if (r - b > 40)
                c.red += 1;
            else if (b - r > 40)
                c.blue += 1;
            // grey, and darker than the background (247, 247, 242)
            else if (std::abs(r - b) <= 20 && std::abs(r - g) <= 20 && r < 236)
                c.neutralPart += 1;
        }
    c.red /= c.total;
    c.blue /= c.total;
    c.neutralPart /= c.total;
    return c;
}

// Number of distinct colours (capped), to tell a picture from a blank one.
int distinctColours(const viewer::Image& img) {
    std::vector<bool> seen(1 << 15, false);
    int n = 0;
    for (std::size_t i = 0; i + 2 < img.rgb.size(); i += 3) {
        const int key =
            (img.rgb[i] >> 3) << 10 | (img.rgb[i + 1] >> 3) << 5 | (img.rgb[i + 2] >> 3);
        if (!seen[static_cast<std::size_t>(key)]) {
            seen[static_cast<std::size_t>(key)] = true;
            ++n;
        }
    }
    return n;
}

} // namespace

TEST_CASE("snapshots of a part with metal left on", "[viewer][snapshots]") {
    const Scene s = test::syntheticScene(3);
    // 0.1 mm left on radially after the last pass: four times the ±0.025 mm radial band.
    const CutResult r =
        test::syntheticResult(s, [](int k) { return k == 2 ? 0.1 : 1.0 - 0.4 * k; });
    REQUIRE_FALSE(r.withinTolerance);
    viewer::SnapshotOptions o;
    o.widthPx = 640;
    o.heightPx = 480;
    const auto rep = viewer::renderSnapshots(s, r, freshDir("lefton"), o);
    for (const std::string& f : rep.files()) {
        INFO(f);
        REQUIRE(fs::exists(f));
        CHECK_FALSE(fs::exists(f + ".tmp"));
        const auto img = viewer::readPng(f);
        CHECK(img.widthPx == 640);
        CHECK(img.heightPx == (f == rep.part || f == rep.cone || f == rep.marks ? 480 : 240));
        CHECK(distinctColours(img) > 20); // not blank
    }
    // The cone close-up is mostly the warm (left-on) side of the map.
    const Census c = census(viewer::readPng(rep.cone));
    INFO("red " << c.red << " blue " << c.blue << " neutral " << c.neutralPart);
    CHECK(c.red > 0.5);
    CHECK(c.blue < 0.02);
}

TEST_CASE("snapshots of a part within tolerance carry the near-zero colour",
          "[viewer][snapshots]") {
    const Scene s = test::syntheticScene(3);
    // Finished 2 µm above the drawing with ±1 µm feed ripple: well inside ±25 µm.
    const CutResult r = test::syntheticResult(
        s, [](int k) { return k == 2 ? 0.002 : 1.0 - 0.4 * k; },
        [](double z) { return 0.001 * std::cos(2 * kPi * z / 0.1); });
    REQUIRE(r.withinTolerance);
    viewer::SnapshotOptions o;
    o.widthPx = 640;
    o.heightPx = 480;
    const auto rep = viewer::renderSnapshots(s, r, freshDir("intol"), o);
    const Census c = census(viewer::readPng(rep.cone));
    INFO("red " << c.red << " blue " << c.blue << " neutral " << c.neutralPart);
    CHECK(c.neutralPart > 0.5);
    CHECK(c.red < 0.02);
    CHECK(c.blue < 0.02);
    // The section and the chart are drawn (more than a background and a few lines of text).
    CHECK(distinctColours(viewer::readPng(rep.section)) > 10);
    CHECK(distinctColours(viewer::readPng(rep.chart)) > 10);
}

TEST_CASE("demo scene: pictures and report", "[viewer][snapshots][demo]") {
    const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    const CutResult r = simulate(s);
    const std::string dir = freshDir("demo");
    const auto rep = viewer::renderSnapshots(s, r, dir);
    for (const std::string& f : rep.files()) {
        INFO(f);
        const auto img = viewer::readPng(f);
        CHECK(img.widthPx == 1200);
        CHECK(distinctColours(img) > 20);
    }
    const std::string html = io::writeReport(s, r, dir, &rep);
    CHECK(fs::exists(html));
    // The demo is made to come out within tolerance: its close-up is on the near-zero colour.
    REQUIRE(r.withinTolerance);
    const Census c = census(viewer::readPng(rep.cone));
    INFO("red " << c.red << " blue " << c.blue << " neutral " << c.neutralPart);
    CHECK(c.neutralPart > 0.5);
}

TEST_CASE("demo scene without the nose-radius offset: the cone is red, the marks picture is drawn",
          "[viewer][snapshots][demo]") {
    // The made-up scene leaves the cone 2·ΔX large on diameter (references R1): out of tolerance.
    const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor-no-offset.toml");
    const CutResult r = simulate(s);
    REQUIRE_FALSE(r.withinTolerance);
    viewer::SnapshotOptions o;
    o.widthPx = 640;
    o.heightPx = 420;
    const auto rep = viewer::renderSnapshots(s, r, freshDir("no-offset"), o);
    const Census cone = census(viewer::readPng(rep.cone));
    INFO("cone: red " << cone.red << " blue " << cone.blue << " neutral " << cone.neutralPart);
    CHECK(cone.red > 0.5);
    CHECK(cone.blue < 0.02);
    const Census marks = census(viewer::readPng(rep.marks));
    INFO("marks: red " << marks.red << " blue " << marks.blue);
    CHECK(marks.red > 0.3); // the marks stand on metal left on
    CHECK(distinctColours(viewer::readPng(rep.marksSection)) > 10);
}
