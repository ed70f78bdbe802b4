// Tests for sim/include/swarf/sim/height_map.h: the 3D surface with feed marks.
#include "swarf/sim/height_map.h"

#include "kernel_scenes.h"
#include "swarf/sim/kernel.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;
using namespace swarf::testing;

namespace {
Scene turnedCylinder(double feed, double r, double thetaDeg = 0) {
    const double th = degToRad(thetaDeg), t = std::tan(th);
    Scene s = barScene(40);
    s.tool.noseRadiusMm = r;
    if (thetaDeg == 0) {
        s.part.features.push_back(cylinderFeature(0, 30, 30, 0.1));
        s.plan.passes.push_back(pathPass({{-3, 15.0}, {33, 15.0}}, feed));
    } else {
        s.part.features.push_back(coneFeature(0, 30, 20, th, 0.1));
        s.plan.passes.push_back(pathPass({{-3, 10 - 3 * t}, {33, 10 + 33 * t}}, feed));
    }
    return s;
}
} // namespace

TEST_CASE("R2: cusp height and Ra of a turned cylinder", "[height_map]") {
    // Source: references R2 table: f 0.2, r 0.8 → Rt exact 6.275 µm, Ra exact 1.609 µm.
    {
        const CutResult res = simulate(turnedCylinder(0.2, 0.8));
        CHECK(res.rtUm == Approx(6.275).epsilon(0.01));
        CHECK(res.raUm == Approx(1.609).epsilon(0.02));
    }
    // Source: references R2 table: f 0.1, r 0.4 → Rt exact 3.137 µm; Ra ≈ 0.0321 f²/r
    // (references R2, Boothroyd, from memory) = 0.8025 µm, the exact arc within 0.3% of it.
    {
        const CutResult res = simulate(turnedCylinder(0.1, 0.4));
        CHECK(res.rtUm == Approx(3.137).epsilon(0.01));
        CHECK(res.raUm == Approx(0.8025).epsilon(0.02));
    }
}

TEST_CASE("R2: the cusp normal to a cone is the arc value", "[height_map]") {
    // Feed along the cone's line: the marks are the same arcs, measured normal to the cone.
    // Source: references R2 (exact arc), f 0.2, r 0.8 → 6.275 µm.
    const CutResult res = simulate(turnedCylinder(0.2, 0.8, 20));
    CHECK(res.rtUm == Approx(6.275).epsilon(0.01));
    CHECK(res.raUm == Approx(1.609).epsilon(0.02));
}

TEST_CASE("the map never lies below the exact profile and keeps the stock", "[height_map]") {
    const Scene s = turnedCylinder(0.3, 0.4);
    const CutResult res = simulate(s);
    const HeightMap& m = res.surface;
    REQUIRE(m.nz == static_cast<int>(m.zMm.size()));
    REQUIRE(m.nPhi == s.sim.angleSamples);
    const ToolOutline o(s.tool);
    const MoveSweep ms = prepareMove(o, res.moves.at(0));
    double worstBelow = 0, maxAbove = 0;
    for (int i = 0; i < m.nz; ++i) {
        const double exact = std::min(20.0, cutRadiusMm(sweptLowestX(o, ms, m.rowZ(i)), 0));
        for (int j = 0; j < m.nPhi; ++j) {
            worstBelow = std::max(worstBelow, exact - m.at(i, j));
            if (m.rowZ(i) > 2 && m.rowZ(i) < 28)
                maxAbove = std::max(maxAbove, m.at(i, j) - exact);
        }
    }
    // Float storage: 1e-5 mm.
    CHECK(worstBelow < 1e-5);
    // The marks stand up by the cusp height, r − sqrt(r² − f²/4) (references R2), at most.
    const double cusp = 0.4 - std::sqrt(0.16 - 0.0225);
    CHECK(maxAbove <= cusp + 1e-5);
    CHECK(maxAbove >= 0.99 * cusp);
    // Rows are fine where the feed leaves the surface, coarser before the free end.
    CHECK(m.dzMm <= cuspRowSpacingMm(0.3, 1.0) + 1e-12);
}

TEST_CASE("one tool position per revolution and angle", "[height_map]") {
    // A single-revolution check against brute force over all positions (derived).
    Scene s = barScene(30);
    s.tool.noseRadiusMm = 0.4;
    const ToolOutline o(s.tool);
    ToolMove mv;
    mv.tipFrom = {0, 10};
    mv.tipTo = {5, 11};
    mv.feedMmPerRev = 0.17;
    const MoveSweep ms = prepareMove(o, mv);
    const double len = (ms.centreTo - ms.centreFrom).norm();
    for (double z = -0.5; z < 6; z += 0.0137) {
        for (double phi : {0.0, 1.0, 3.0, 6.0}) {
            double brute = std::numeric_limits<double>::infinity();
            auto at = [&](double sp) {
                const Eigen::Vector2d c =
                    ms.centreFrom + (sp / len) * (ms.centreTo - ms.centreFrom);
                brute = std::min(brute, o.lowerEnvelope(z - c.x()) + c.y());
            };
            for (int k = 0;; ++k) {
                const double sp = 0.17 * (k + phi / (2 * kPi));
                if (sp > len)
                    break;
                at(sp);
            }
            at(len);
            const double want = std::isinf(brute) ? brute : cutRadiusMm(brute, 0);
            const double got = markedRadiusMm(o, ms, 0.17, 0, z, phi);
            if (std::isinf(want)) {
                CHECK(std::isinf(got));
            } else {
                CHECK(got == Approx(want).margin(1e-12));
            }
        }
    }
}
