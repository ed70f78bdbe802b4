// The viewer draws bored work (issue 14): the hollow part with its bore coloured by the inside
// deviation on the one colour scale, the boring bar at its real size in the bore, the section and
// chart along the bore, and the pictures of a bored socket. Run under xvfb-run (or let
// ensureDisplay start a virtual display).
#include "swarf/app/display.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/boring_checks.h"
#include "swarf/sim/kernel.h"
#include "swarf/viewer/colour_map.h"
#include "swarf/viewer/image.h"
#include "swarf/viewer/snapshots.h"
#include "swarf/viewer/viewer.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <filesystem>
#include <string>

using namespace swarf;
namespace fs = std::filesystem;

namespace {

Scene scene(const char* name) {
    return io::readScene(std::string(SWARF_SCENES_DIR) + "/" + name);
}

viewer::ViewerOptions small() {
    viewer::ViewerOptions o;
    o.offScreen = true;
    o.widthPx = 480;
    o.heightPx = 320;
    return o;
}

// The share of the picture's middle third (each way) in a warm colour of the deviation map
// (left on beyond the tolerance band: the map's upper fifth and a half), whatever the lighting:
// the ratios of green and blue to red are the map's at some position there.
double warmShare(const viewer::Image& img) {
    double warm = 0, total = 0;
    for (int y = img.heightPx / 3; y < 2 * img.heightPx / 3; ++y)
        for (int x = img.widthPx / 3; x < 2 * img.widthPx / 3; ++x) {
            const unsigned char* p = img.at(x, y);
            total += 1;
            if (p[0] < 60)
                continue;
            const double g = p[1] / double(p[0]), b = p[2] / double(p[0]);
            for (double t = 0.8; t <= 1.0001; t += 0.01) {
                const viewer::Rgb c = viewer::coolWarm(t);
                if (std::fabs(g - c.g / c.r) < 0.06 && std::fabs(b - c.b / c.r) < 0.06) {
                    warm += 1;
                    break;
                }
            }
        }
    return warm / std::max(total, 1.0);
}

} // namespace

TEST_CASE("a bored socket is drawn hollow: the bore in the inside deviation's colours",
          "[viewer][bore]") {
    app::ensureDisplay();
    // Without the inside nose-radius offset the socket comes out small: metal left on within the
    // drawn bore (the scene's header derives 0.039 mm on diameter at the mouth, references R1).
    const Scene s = scene("bore-socket-no-offset.toml");
    const CutResult r = simulate(s);
    REQUIRE(r.bored);
    viewer::ViewerSession view(s, r, small());
    const auto bore = view.drawnBore();
    REQUIRE(bore.size() > 100);
    const viewer::DeviationScale sc = viewer::deviationScale(s, r);
    double most = -1e9, farFromBore = 0;
    for (const Eigen::Vector3d& p : bore) {
        // Every point lies on the kernel's bore at its row (the rows are its samples; VTK keeps
        // the points in single precision).
        const auto row = static_cast<std::size_t>(std::lround((p.x() - r.bore.z0Mm) / r.bore.dzMm));
        REQUIRE(row < r.bore.radiusMm.size());
        farFromBore = std::max(farFromBore, std::fabs(p.y() - r.bore.radiusMm[row]));
        if (!std::isnan(p.z()))
            most = std::max(most, p.z());
    }
    CHECK(farFromBore < 1e-5);
    // The bore's colours: + left on (red), as much as the result's largest left on (the crests
    // counted, as result.json) and beyond the band.
    CHECK(most > sc.toDisplay(sc.bandMm));
    CHECK(most == Approx(sc.toDisplay(r.maxLeftOnMm)).epsilon(0.05));
    // The outside of the part is the bar as it was: drawn, no colour (no outside feature).
    CHECK_FALSE(view.drawnSection().empty());

    // The section and the chart follow the bore, + left on.
    const viewer::DeviationTrace& t = view.sectionTrace();
    CHECK(t.inside);
    const double worst =
        *std::max_element(t.deviationMm.begin(), t.deviationMm.end(), [](double a, double b) {
            return std::isnan(a) || (!std::isnan(b) && a < b);
        });
    CHECK(worst > sc.bandMm);

    // Within tolerance (the offset applied), the bore stays within the band.
    const Scene good = scene("bore-collet-seat-1-10.toml");
    const CutResult rg = simulate(good);
    viewer::ViewerSession goodView(good, rg, small());
    double mostGood = 0;
    for (const Eigen::Vector3d& p : goodView.drawnBore())
        if (!std::isnan(p.z()) && p.x() > 0.5 && p.x() < 29.5) // clear of the ends' corners
            mostGood = std::max(mostGood, std::fabs(p.z()));
    CHECK(mostGood < sc.toDisplay(sc.bandMm));
}

TEST_CASE("the boring bar is drawn at its diameter, in the bore, at the slider's pass",
          "[viewer][bore]") {
    app::ensureDisplay();
    const Scene s = scene("bore-collet-seat-1-10.toml");
    const CutResult r = simulate(s);
    viewer::ViewerSession view(s, r, small());
    for (double at : {2.5, 4.0, 6.0}) {
        INFO("slider at " << at);
        view.setPosition(at);
        const auto b = view.barBounds();
        REQUIRE(b.size() == 6);
        // 32 facets round with one at each quarter: the extent across is the diameter itself.
        CHECK(b[3] - b[2] == Approx(s.tool.barDiameterMm).margin(1e-9));
        CHECK(b[5] - b[4] == Approx(s.tool.barDiameterMm).margin(1e-9));
        // Its axis min_bore − bar/2 behind the tip, at the tip height (boring_checks.h).
        const Eigen::Vector2d tip = view.moment().tipZX;
        CHECK(0.5 * (b[2] + b[3]) == Approx(tip.y() - barAxisBehindTipMm(s.tool)).margin(1e-9));
        CHECK(0.5 * (b[4] + b[5]) == Approx(s.tool.tipHeightMm).margin(1e-9));
        // From just behind the tip back to the holder, `overhang` from the tip.
        CHECK(b[0] == Approx(tip.x() - s.tool.overhangMm).margin(1e-9));
        CHECK(b[1] < tip.x());
        CHECK(b[1] > tip.x() - 1.0);
        // Inside the bore as it stands: the shank clears the wall (the scene's findings say no
        // rubbing), so its far side lies within the bore's radius at the mouth.
        CHECK(b[2] > -view.moment().bore.radiusAt(0.0));
    }
    // Half way through pass 5 (rough 3, fed from the mouth toward the chuck), the bore is swept
    // up to the tool: as pass 5 leaves it near the mouth, as pass 4 left it near the seat's end.
    view.setPosition(4.5);
    const Profile& now = view.moment().bore;
    CHECK(view.moment().tipZX.x() > 5.0);
    CHECK(view.moment().tipZX.x() < 25.0);
    CHECK(now.radiusAt(1.0) == Approx(r.boreAfterPass[4].radiusAt(1.0)).margin(1e-6));
    CHECK(now.radiusAt(28.0) == Approx(r.boreAfterPass[3].radiusAt(28.0)).margin(1e-6));
    CHECK(r.boreAfterPass[4].radiusAt(28.0) > r.boreAfterPass[3].radiusAt(28.0) + 0.1);

    // A turning tool has no shank drawn.
    const Scene outside = scene("fixture-arbor.toml");
    viewer::ViewerSession arbor(outside, simulate(outside), small());
    CHECK(arbor.barBounds().empty());
    CHECK(arbor.drawnBore().empty());
}

TEST_CASE("pictures of a bored socket show the bore's left-on in the warm colours",
          "[viewer][bore][snapshots]") {
    app::ensureDisplay();
    viewer::SnapshotOptions so;
    so.widthPx = 480;
    so.heightPx = 320;
    double share[2] = {0, 0};
    int k = 0;
    for (const char* name : {"bore-socket-no-offset.toml", "bore-collet-seat-1-10.toml"}) {
        INFO(name);
        const Scene s = scene(name);
        const CutResult r = simulate(s);
        const fs::path dir =
            fs::temp_directory_path() / ("swarf-bore-pictures-" + std::to_string(k));
        fs::remove_all(dir);
        const viewer::SnapshotReport pics = viewer::renderSnapshots(s, r, dir.string(), so);
        for (const std::string& f : pics.files())
            CHECK(fs::file_size(f) > 1000);
        // The close-up looks at the bore's far wall at the gauge plane.
        share[k++] = warmShare(viewer::readPng(pics.marks));
        CHECK(pics.marksLabel.find("Close-up of the bore") != std::string::npos);
        fs::remove_all(dir);
    }
    // Left on at the mouth (no offset): the wall is red; with the offset it is not.
    CHECK(share[0] > 0.5);
    CHECK(share[1] < 0.05);
}

TEST_CASE("the close-up of a finished bore shows its feed marks, raised toward the axis",
          "[viewer][bore]") {
    app::ensureDisplay();
    const Scene s = scene("bore-collet-seat-1-10.toml");
    const CutResult r = simulate(s);
    REQUIRE(r.rtUm > 0);
    viewer::ViewerSession view(s, r, small());
    view.pressKey("c");
    REQUIRE(view.closeUpShown());
    const viewer::CloseUp close = viewer::closeUpOf(s, r);
    // The patch along its first column: each point's height off the swept bore, mm.
    double lo = 0, hi = -1e9;
    std::vector<double> off;
    for (const Eigen::Vector2d& p : view.drawnSection()) {
        off.push_back(p.y() - r.bore.radiusAt(p.x()));
        lo = std::min(lo, off.back());
        hi = std::max(hi, off.back());
    }
    REQUIRE(off.size() > 100);
    // Nothing stands into the wall past the swept bore (single-precision points), and the crests
    // stand inward the kernel's Rt times the stated relief (derived: the patch and the roughness
    // come from one surface).
    CHECK(hi < 1e-4);
    CHECK(-lo == Approx(close.reliefFactor * r.rtUm / 1000.0).epsilon(0.15));
    // One crest per feed of the finishing pass over the stretch (the scene's feed, 0.06 mm).
    int crests = 0;
    bool in = false;
    for (double d : off) {
        if (!in && d < 0.5 * lo)
            ++crests;
        in = d < 0.5 * lo;
    }
    const double expected = (close.zToMm - close.zFromMm) / close.feedMmPerRev;
    CHECK(std::abs(crests - expected) <= 2);
    CHECK(view.closeUpText().find("feed marks 0.060 mm apart") != std::string::npos);
}
