// Tests for sim/include/swarf/sim/feed_marks.h: the 3D surface with feed marks R(z, φ).
#include "swarf/sim/feed_marks.h"

#include "kernel_scenes.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/sweep.h"

#include <catch2/catch.hpp>
#include <cmath>
#include <limits>

using namespace swarf;
using namespace swarf::testing;

namespace {

// One CNC move along a cylinder of radius 15 (or a cone rising at thetaDeg), feed f.
Scene turnedPart(double feed, double r, double thetaDeg = 0) {
    const double t = std::tan(degToRad(thetaDeg));
    Scene s = barScene(40);
    s.tool.noseRadiusMm = r;
    if (thetaDeg == 0) {
        s.part.features.push_back(cylinderFeature(0, 30, 30, 0.1));
        s.plan.passes.push_back(pathPass({{-3, 15.0}, {33, 15.0}}, feed));
    } else {
        s.part.features.push_back(coneFeature(0, 30, 20, degToRad(thetaDeg), 0.1));
        s.plan.passes.push_back(pathPass({{-3, 10 - 3 * t}, {33, 10 + 33 * t}}, feed));
    }
    return s;
}

// The surface of a scene's first `count` moves, built from its exact sweep.
FeedMarkSurface surfaceOf(const Scene& s, const std::vector<ToolMove>& moves) {
    const ToolOutline o(s.tool);
    const ExactSweep sw = sweepExact(s, o, moves, moves.size(), 1.0, false);
    return FeedMarkSurface::build(s, o, moves, sw);
}

} // namespace

TEST_CASE("the surface never lies below the exact profile and keeps the stock", "[feed_marks]") {
    const Scene s = turnedPart(0.3, 0.4);
    const CutResult res = simulate(s);
    const FeedMarkSurface& m = res.surface;
    REQUIRE_FALSE(m.empty());
    CHECK(m.markedMoveCount() == 1);
    double worstBelow = 0, maxAbove = 0;
    for (double z = 0.5; z < 40; z += 0.00731) {
        const double exact = res.asCut.radiusAt(z);
        for (double phi : {0.0, 0.7, 2.0, 4.4, 6.1}) {
            const double r = m.radiusAt(z, phi);
            if (z < 32) // past the end the profile's chord cuts across the insert's steep flank
                worstBelow = std::max(worstBelow, exact - r);
            if (z > 2 && z < 28)
                maxAbove = std::max(maxAbove, r - exact);
        }
        CHECK(m.radiusAt(z, 1.0) <= 20.0); // never above the bar
    }
    // The exact profile is linear between its samples (0.002 mm apart) while the envelope is an
    // arc or a line: the surface may stand below that chord by its sagitta only.
    CHECK(worstBelow < 1e-6);
    // The marks stand up by the cusp height, r − sqrt(r² − f²/4) (references R2), at most.
    const double cusp = 0.4 - std::sqrt(0.16 - 0.0225);
    CHECK(maxAbove <= cusp + 1e-7);
    CHECK(maxAbove >= 0.99 * cusp);
    // The crests on the profile's samples are the cusp above the envelope in the middle.
    const std::size_t mid = res.asCut.radiusMm.size() / 2;
    CHECK(res.crest.radiusMm[mid] - res.asCut.radiusMm[mid] == Approx(cusp).epsilon(1e-9));
    // Before the free end there is no metal; past the samples the untouched bar.
    CHECK(m.radiusAt(-1, 0) == 0);
    CHECK(m.radiusAt(m.zToMm() + 1, 0) == 20);
}

TEST_CASE("one tool position per revolution and angle", "[feed_marks]") {
    // Against brute force over every position of one move, turn by turn (derived).
    Scene s = barScene(30);
    s.tool.noseRadiusMm = 0.4;
    s.part.features.push_back(cylinderFeature(0, 5, 22, 0.1));
    ToolMove mv;
    mv.pass = 0;
    mv.tipFrom = {0, 10};
    mv.tipTo = {5, 11};
    mv.feedMmPerRev = 0.17;
    const std::vector<ToolMove> moves{mv};
    const FeedMarkSurface surf = surfaceOf(s, moves);
    const ToolOutline o(s.tool);
    const Eigen::Vector2d c0 = mv.tipFrom - o.imaginaryTip(), c1 = mv.tipTo - o.imaginaryTip();
    const double len = (c1 - c0).norm();
    for (double z = 0.05; z < 6; z += 0.0137) {
        for (double phi : {0.0, 1.0, 3.0, 6.0}) {
            double brute = std::numeric_limits<double>::infinity();
            auto at = [&](double sp) {
                const Eigen::Vector2d c = c0 + (sp / len) * (c1 - c0);
                brute = std::min(brute, o.lowerEnvelope(z - c.x()) + c.y());
            };
            for (int k = 0;; ++k) {
                const double sp = 0.17 * (k + phi / (2 * kPi));
                if (sp > len)
                    break;
                at(sp);
            }
            at(len);
            const double want = std::min(15.0, cutRadiusMm(brute, 0));
            INFO("z " << z << " phi " << phi);
            CHECK(surf.radiusAt(z, phi) == Approx(want).margin(1e-12));
        }
    }
}

TEST_CASE("rows and grids filled from the moves' profiles agree with the exact surface",
          "[feed_marks]") {
    // The lookup interpolates 1024 samples a feed: within 0.2 % of the crest height (derived:
    // the crest's sides slope ±f/2r, half a sample from it the chord loses at most f/2r · f/2048,
    // 2/1024 of the crest f²/8r), plus float rounding of a 15 mm radius (1e-6 mm).
    for (double tip : {0.0, 0.3}) {
        Scene s = turnedPart(0.2, 0.8, 8);
        s.tool.tipHeightMm = tip;
        const CutResult res = simulate(s);
        const double crest = 0.8 - std::sqrt(0.64 - 0.01); // references R2, exact arc
        std::vector<double> phase(500);
        for (std::size_t j = 0; j < phase.size(); ++j)
            phase[j] = static_cast<double>(j) / phase.size();
        std::vector<float> row(phase.size());
        double worst = 0;
        for (double z = 3; z < 27; z += 0.0173) {
            res.surface.fillRow(z, phase.data(), static_cast<int>(phase.size()), row.data());
            for (std::size_t j = 0; j < phase.size(); ++j)
                worst =
                    std::max(worst, std::abs(row[j] - res.surface.radiusAt(z, 2 * kPi * phase[j])));
        }
        INFO("tip height " << tip);
        CHECK(worst <= 0.002 * crest + 2e-6);
        // The same from the grid fill, its columns evenly round (the resampled profile).
        std::vector<double> rows;
        for (double z = 3; z < 27; z += 0.0173)
            rows.push_back(z);
        std::vector<float> grid(rows.size() * phase.size());
        res.surface.fillGrid(rows, static_cast<int>(phase.size()), 0.3, grid.data());
        double worstGrid = 0;
        for (std::size_t i = 0; i < rows.size(); ++i)
            for (std::size_t j = 0; j < phase.size(); ++j)
                worstGrid = std::max(
                    worstGrid, std::abs(grid[i * phase.size() + j] -
                                        res.surface.radiusAt(rows[i], 0.3 + 2 * kPi * phase[j])));
        CHECK(worstGrid <= 0.002 * crest + 2e-6);
    }
}

TEST_CASE("the crest radius is the highest point round the part", "[feed_marks]") {
    // Brute force over 36000 angles (derived), where one move leaves the surface, where two
    // moves overlap (a second pass 5 µm deeper with another feed) and near the end of a move.
    Scene s = turnedPart(0.25, 0.4);
    s.plan.passes.push_back(pathPass({{-3, 14.995}, {20, 14.995}}, 0.17));
    const CutResult res = simulate(s);
    const double crest = 0.4 - std::sqrt(0.16 - 0.125 * 0.125); // references R2, f 0.25
    for (double z : {5.0, 12.5, 19.9, 20.2, 20.6, 25.0}) {
        double top = 0;
        for (int j = 0; j < 36000; ++j)
            top = std::max(top, res.surface.radiusAt(z, 2 * kPi * j / 36000));
        INFO("z " << z);
        // Exact where one move leaves the surface; sampled and refined where two do: within a
        // thousandth of the crest height.
        CHECK(res.surface.crestRadiusAt(z) == Approx(top).margin(1e-3 * crest));
        CHECK(res.surface.crestRadiusAt(z) >= res.asCut.radiusAt(z) - 1e-9);
    }
}

TEST_CASE("grids come at the resolution asked for", "[feed_marks]") {
    const CutResult res = simulate(turnedPart(0.3, 0.4));
    const std::vector<double> rows{1.0, 1.5, 2.25, 10.0};
    const SurfaceGrid g = res.surface.grid(rows, evenColumns(7, 0.5));
    REQUIRE(g.nz == 4);
    REQUIRE(g.nPhi == 7);
    REQUIRE(g.radiusMm.size() == 28u);
    for (int i = 0; i < g.nz; ++i)
        for (int j = 0; j < g.nPhi; ++j)
            CHECK(g.at(i, j) == Approx(res.surface.radiusAt(rows[i], 0.5 + 2 * kPi * j / 7))
                                    .margin(0.002 * 0.0287 + 2e-6));
    // Rows that resolve the marks: at most 0.004 of the pitch apart where the pass leaves them.
    const std::vector<double> mr = res.surface.markRows(10, 11);
    REQUIRE(mr.size() > 2);
    CHECK(mr.front() == 10);
    CHECK(mr.back() == 11);
    double widest = 0;
    for (std::size_t i = 1; i < mr.size(); ++i) {
        CHECK(mr[i] > mr[i - 1]);
        widest = std::max(widest, mr[i] - mr[i - 1]);
    }
    CHECK(widest <= 0.004 * 0.3 + 1e-12);
}

TEST_CASE("an empty surface has no radius", "[feed_marks]") {
    const FeedMarkSurface none;
    CHECK(none.empty());
    CHECK(std::isnan(none.radiusAt(1, 0)));
    CHECK(none.markedMoveCount() == 0);
}
