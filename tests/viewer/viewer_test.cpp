// Tests of swarf/viewer/viewer.h: the window's data at a slider position, read back from what
// was handed to VTK (no pixels).
#include "swarf/viewer/viewer.h"

#include "swarf/viewer/display.h"
#include "swarf/viewer/moment.h"
#include "synthetic.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace swarf;

namespace {

// Largest difference between the drawn (z, r) rows and a profile.
double drawnVersus(const std::vector<Eigen::Vector2d>& drawn, const Profile& p) {
    double worst = 0;
    for (const auto& q : drawn) worst = std::max(worst, std::fabs(q.y() - viewer::profileRadiusAt(p, q.x())));
    return worst;
}

} // namespace

TEST_CASE("stepping to pass k draws the cut after pass k", "[viewer][window]") {
    viewer::ensureDisplay();
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
        if (k > 0) CHECK(drawnVersus(drawn, r.afterPass[static_cast<std::size_t>(k - 1)]) > 0.3);
        // the rows span the whole part
        CHECK(drawn.front().x() == Approx(-1).margin(1e-6));
        CHECK(drawn.back().x() == Approx(60).margin(1e-4));
    }
    view.setPosition(0);
    CHECK(drawnVersus(view.drawnSection(), r.stock) < 1e-5);
}
