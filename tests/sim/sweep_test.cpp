// Tests for sim/include/swarf/sim/sweep.h: the exact axisymmetric profile.
#include "swarf/sim/sweep.h"

#include "kernel_scenes.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/kernel.h"

#include <catch2/catch.hpp>
#include <cmath>
#include <limits>

using namespace swarf;
using namespace swarf::testing;

namespace {

// A cone 10 mm long, 10 mm across at the datum, cut by one CNC move of the imaginary tip along
// the drawing's line shifted by (dz, dx).
Scene coneByTip(double thetaDeg, double shiftZ, double shiftX) {
    const double th = degToRad(thetaDeg);
    const double t = std::tan(th);
    Scene s = barScene(10 + 20 * t + 4);
    s.part.features.push_back(coneFeature(0, 10, 10, th, 0.02));
    auto line = [&](double z) { return 5 + (z - shiftZ) * t + shiftX; };
    s.plan.passes.push_back(pathPass({{-2, line(-2)}, {12, line(12)}}, 0.1));
    return s;
}

// Largest |deviation − want| over the cone's middle (z in [2, 8]).
double worstOffset(const Scene& s, double want) {
    const auto moves = planMoves(s);
    const Profile p = profileUpTo(s, moves, moves.size());
    const Profile n = nominalOnGrid(s.part, p);
    const auto dev = normalDeviation(s.part, n, p);
    double worst = 0;
    for (std::size_t i = 0; i < dev.size(); ++i) {
        const double z = p.zAt(i);
        if (z < 2 || z > 8)
            continue;
        worst = std::max(worst, std::abs(dev[i] - want));
    }
    return worst;
}

} // namespace

TEST_CASE("R1: the imaginary tip along the drawing line leaves r(sin+cos-1)", "[sweep]") {
    const double r = 0.8;
    struct Row {
        double thetaDeg, table;
    };
    // Source: references R1, table "normal error, no offset" for r = 0.8 mm.
    for (Row row : {Row{45, 0.33137}, Row{30, 0.29282}, Row{60, 0.29282}}) {
        const double th = degToRad(row.thetaDeg);
        const double formula = r * (std::sin(th) + std::cos(th) - 1); // references R1
        CHECK(formula == Approx(row.table).margin(5e-6));
        CHECK(worstOffset(coneByTip(row.thetaDeg, 0, 0), formula) < 1e-4); // 0.1 µm
    }
}

TEST_CASE("R1: with the offset applied the cone comes out on the line", "[sweep]") {
    const double r = 0.8;
    for (double deg : {30.0, 45.0, 60.0}) {
        const double th = degToRad(deg);
        // Source: references R1: ΔX (radius) = r(1 + tanθ − secθ), ΔZ = r(1 − tan(θ/2)).
        const double dX = r * (1 + std::tan(th) - 1 / std::cos(th));
        const double dZ = r * (1 - std::tan(th / 2));
        CHECK(worstOffset(coneByTip(deg, 0, -dX), 0.0) < 1e-4);
        CHECK(worstOffset(coneByTip(deg, dZ, 0), 0.0) < 1e-4);
    }
    // Source: references R1 table, r = 0.8, θ = 30°: ΔX radius 0.33812, ΔZ 0.58564.
    CHECK(r * (1 + std::tan(degToRad(30)) - 1 / std::cos(degToRad(30))) ==
          Approx(0.33812).margin(5e-6));
    CHECK(r * (1 - std::tan(degToRad(15))) == Approx(0.58564).margin(5e-6));
}

TEST_CASE("R7: a tip off centre makes a hyperboloid", "[sweep]") {
    // Source: references R7: D 20, h 0.5 → diameter +0.02498 mm.
    {
        Scene s = barScene(24);
        s.tool.tipHeightMm = 0.5;
        s.part.features.push_back(cylinderFeature(0, 20, 20, 0.1));
        s.plan.passes.push_back(pathPass({{-2, 10.0}, {22, 10.0}}, 0.1));
        const auto moves = planMoves(s);
        const Profile p = profileUpTo(s, moves, moves.size());
        CHECK(2 * p.radiusAt(10.0) - 20.0 == Approx(0.02498).margin(5e-6));
    }
    // A straight cone path: radius sqrt(x(z)² + h²) with x the tool's line (derived).
    {
        const double th = degToRad(10), h = -0.7, r = 0.8;
        Scene s = coneByTip(10, 0, 0);
        s.tool.tipHeightMm = h;
        const auto moves = planMoves(s);
        const Profile p = profileUpTo(s, moves, moves.size());
        const double offset = r * (std::sin(th) + std::cos(th) - 1) / std::cos(th);
        double worst = 0;
        for (std::size_t i = 0; i < p.radiusMm.size(); ++i) {
            const double z = p.zAt(i);
            if (z < 2 || z > 8)
                continue;
            const double x = 5 + z * std::tan(th) + offset;
            worst = std::max(worst, std::abs(p.radiusMm[i] - std::sqrt(x * x + h * h)));
        }
        CHECK(worst < 1e-4);
    }
}

TEST_CASE("removed volume matches Pappus for a cylinder and a cone", "[sweep]") {
    SECTION("cylinder turned over the whole grid") {
        Scene s = barScene(20, 50);
        s.part.features.push_back(cylinderFeature(0, 30, 16, 0.1));
        s.plan.passes.push_back(pathPass({{-5, 8.0}, {60, 8.0}}, 0.1));
        const CutResult r = simulate(s);
        const double len = r.asCut.zAt(r.asCut.radiusMm.size() - 1) - r.asCut.z0Mm;
        // Source: derived (Pappus: solid of revolution of a rectangle).
        const double want = kPi * (100.0 - 64.0) * len;
        CHECK(std::abs(r.removedVolumeMm3 - want) / want < 1e-6);
    }
    SECTION("cone running out into the bar") {
        const double th = degToRad(15), r0 = 10, rr = 0.8;
        Scene s = barScene(2 * r0, 50);
        s.part.features.push_back(coneFeature(0, 20, 10, th, 0.1));
        const double t = std::tan(th);
        s.plan.passes.push_back(pathPass({{-5, 5 - 5 * t}, {60, 5 + 60 * t}}, 0.1));
        const CutResult r = simulate(s);
        // The as-cut line sits r(sinθ+cosθ−1)/cosθ above the tip's line (references R1).
        const double a = 5 + rr * (std::sin(th) + std::cos(th) - 1) / std::cos(th);
        const double zc = (r0 - a) / t;
        // Source: derived (Pappus: cylinder minus frustum).
        const double want = kPi * r0 * r0 * zc - kPi * zc / 3 * (a * a + a * r0 + r0 * r0);
        CHECK(std::abs(r.removedVolumeMm3 - want) / want < 1e-6);
    }
}

TEST_CASE("the swept envelope is the hull of the end copies", "[sweep]") {
    Scene s = barScene(30);
    const ToolOutline o(s.tool);
    ToolMove m;
    m.tipFrom = {0, 10};
    m.tipTo = {10, 12};
    const MoveSweep ms = prepareMove(o, m);
    // Brute force: the lowest x over many intermediate copies (derived).
    for (double z = -3; z <= 12; z += 0.37) {
        double brute = std::numeric_limits<double>::infinity();
        for (int k = 0; k <= 20000; ++k) {
            const Eigen::Vector2d c = ms.centreFrom + (k / 20000.0) * (ms.centreTo - ms.centreFrom);
            brute = std::min(brute, o.lowerEnvelope(z - c.x()) + c.y());
        }
        const double exact = sweptLowestX(o, ms, z);
        if (std::isinf(brute)) {
            CHECK(std::isinf(exact));
        } else {
            CHECK(exact <= brute + 1e-12);
            CHECK(exact == Approx(brute).margin(2e-6));
        }
    }
}
