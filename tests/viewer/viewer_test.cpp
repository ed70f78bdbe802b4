// Tests of swarf/viewer/viewer.h: the window's data at a slider position, read back from what
// was handed to VTK (no pixels).
#include "swarf/app/display.h"
#include "swarf/viewer/viewer.h"

#include "support/synthetic.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/moment.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <filesystem>

using namespace swarf;

namespace {

// Largest difference between the drawn (z, r) rows and a profile. Every drawn row is one of the
// profile's samples, so it is compared with the sample nearest its z (the vertices are floats:
// interpolating at a float z beside a step would measure the rounding of z, not the drawing).
double drawnVersus(const std::vector<Eigen::Vector2d>& drawn, const Profile& p) {
    double worst = 0;
    for (const auto& q : drawn) {
        const double u = (q.x() - p.z0Mm) / p.dzMm;
        const auto i = static_cast<std::size_t>(
            std::clamp(std::round(u), 0.0, static_cast<double>(p.radiusMm.size() - 1)));
        worst = std::max(worst, std::fabs(q.y() - p.radiusMm[i]));
    }
    return worst;
}

} // namespace

TEST_CASE("stepping to pass k draws the cut after pass k", "[viewer][window]") {
    app::ensureDisplay();
    const Scene s = test::syntheticScene(4);
    const CutResult r = test::syntheticResult(s, [](int k) { return 1.2 - 0.4 * k; });
    viewer::ViewerOptions o;
    o.offScreen = true;
    o.widthPx = 400;
    o.heightPx = 300;
    viewer::ViewerSession view(s, r, o);
    CHECK(view.passCount() == 4);
    for (int k = 0; k < 4; ++k) {
        view.setPosition(k + 1.0);
        view.render();
        const auto drawn = view.drawnSection();
        REQUIRE(drawn.size() > 100);
        INFO("pass " << k + 1);
        // float vertices: a few µm of rounding on a 15 mm radius at most
        CHECK(drawnVersus(drawn, r.afterPass[static_cast<std::size_t>(k)]) < 1e-5);
        if (k > 0)
            CHECK(drawnVersus(drawn, r.afterPass[static_cast<std::size_t>(k - 1)]) > 0.3);
        // the rows span the whole part
        CHECK(drawn.front().x() == Approx(-1).margin(1e-6));
        CHECK(drawn.back().x() == Approx(60).margin(1e-4));
    }
    view.setPosition(0);
    CHECK(drawnVersus(view.drawnSection(), r.stock) < 1e-5);
}

TEST_CASE("demo scene: each pass's drawn part matches the kernel's profile after it",
          "[viewer][window][demo]") {
    app::ensureDisplay();
    const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    const CutResult r = simulate(s);
    REQUIRE(r.afterPass.size() == s.plan.passes.size());
    viewer::ViewerOptions o;
    o.offScreen = true;
    o.widthPx = 400;
    o.heightPx = 300;
    viewer::ViewerSession view(s, r, o);
    const int n = view.passCount();
    REQUIRE(n >= 2);
    for (int k = 0; k + 1 < n; ++k) { // the last position draws the 3D surface instead
        view.setPosition(k + 1.0);
        INFO("after pass " << k + 1);
        CHECK(view.moment().pass == k);
        CHECK(drawnVersus(view.drawnSection(), r.afterPass[static_cast<std::size_t>(k)]) < 1e-5);
    }
    // Half way through a pass, the part lies between the profiles before and after that pass:
    // cutting only removes metal.
    for (int k = 1; k < n; ++k) {
        const auto m = describeMoment(s, r, k + 0.5);
        const Profile& before = r.afterPass[static_cast<std::size_t>(k - 1)];
        const Profile& after = r.afterPass[static_cast<std::size_t>(k)];
        REQUIRE(m.profile.radiusMm.size() == before.radiusMm.size());
        double above = 0, below = 0;
        for (std::size_t i = 0; i < m.profile.radiusMm.size(); ++i) {
            above = std::max(above, m.profile.radiusMm[i] - before.radiusMm[i]);
            below = std::max(below, after.radiusMm[i] - m.profile.radiusMm[i]);
        }
        INFO("half way through pass " << k + 1);
        CHECK(above < 1e-9);
        CHECK(below < 1e-9);
    }
}

TEST_CASE("keys step through the plan and toggle the help", "[viewer][window]") {
    app::ensureDisplay();
    const Scene s = test::syntheticScene(3);
    const CutResult r = test::syntheticResult(s, [](int k) { return 1.0 - 0.4 * k; });
    viewer::ViewerOptions o;
    o.offScreen = true;
    o.widthPx = 400;
    o.heightPx = 300;
    o.startPosition = 0;
    viewer::ViewerSession view(s, r, o);
    CHECK(view.moment().position == 0);
    view.pressKey("Right");
    CHECK(view.moment().position == 1);
    view.pressKey("Right");
    CHECK(view.moment().position == 2);
    view.pressKey("Left");
    CHECK(view.moment().position == 1);
    view.pressKey("Up");
    CHECK(view.moment().position == Approx(1.05));
    view.pressKey("Right"); // from inside pass 2 to its end
    CHECK(view.moment().position == 2);
    view.pressKey("End");
    CHECK(view.moment().finished);
    view.pressKey("Home");
    CHECK(view.moment().pass == -1);
    view.pressKey("not-a-key");
    CHECK(view.moment().pass == -1);
    // The help overlay, saved for a look (and checked to be written).
    view.pressKey("Right");
    view.pressKey("h");
    const auto png = std::filesystem::temp_directory_path() / "swarf-viewer-test-help.png";
    std::filesystem::remove(png);
    view.saveSnapshot(png.string());
    CHECK(std::filesystem::exists(png));
}

TEST_CASE("demo scene: what each frame draws stays small; the close-up follows the feed marks",
          "[viewer][window][demo]") {
    app::ensureDisplay();
    const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    const CutResult r = simulate(s);
    viewer::ViewerOptions o;
    o.offScreen = true;
    o.widthPx = 640;
    o.heightPx = 400;
    viewer::ViewerSession view(s, r, o);
    // The whole part at every pass end and half way: a few hundred rows round 72 columns, not
    // the profile's tens of thousands of samples (which software OpenGL could not turn smoothly).
    for (int k = 0; k <= 2 * view.passCount(); ++k) {
        view.setPosition(0.5 * k);
        INFO("slider at " << 0.5 * k);
        CHECK(view.partPolygons() > 1000);
        CHECK(view.partPolygons() < 120000);
        // only the finished part has feed marks...
        CHECK(view.sectionTrace().feedMarks == (k == 2 * view.passCount()));
    }
    view.pressKey("End");
    CHECK(view.sectionTrace().feedMarks); // ...whole cone, min/max decimated
    CHECK(view.sectionTrace().zMm.size() <= 2500);
    view.pressKey("c");
    REQUIRE(view.closeUpShown());
    const auto& line = view.sectionTrace();
    REQUIRE(line.feedMarks);
    const auto close = viewer::closeUpOf(s, r);
    CHECK(line.zMm.front() >= close.zFromMm);
    CHECK(line.zMm.back() <= close.zToMm);
    double lo = HUGE_VAL, hi = -HUGE_VAL;
    for (double d : line.deviationMm) {
        lo = std::min(lo, d);
        hi = std::max(hi, d);
    }
    // Source: references R2 (exact arc cusp r − sqrt(r² − f²/4)), f 0.05 mm, r 0.4 mm: the
    // demo's finishing feed and nose radius.
    CHECK(hi - lo == Approx(0.4 - std::sqrt(0.16 - 0.05 * 0.05 / 4)).epsilon(0.02));
    CHECK(view.partPolygons() < 120000);
    view.pressKey("4");
    CHECK_FALSE(view.closeUpShown());
}
