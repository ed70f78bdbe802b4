// The kernel on inside work (sim/inside_kernel.h): a socket bored with a boring bar, against
// the closed forms and against the bore sweep computed directly (bore_sweep.h).
#include "kernel_scenes.h"

#include "swarf/sim/bore_sweep.h"
#include "swarf/sim/inside_kernel.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/nose_offset.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>

using namespace swarf;
using Catch::Matchers::WithinAbs;

namespace {

constexpr double kHalfAngle = 0.049958395721942765; // atan(0.05): a 1:10 taper (derived)

bool has(const CutResult& r, FindingKind kind) {
    return std::any_of(r.findings.begin(), r.findings.end(),
                       [kind](const Finding& f) { return f.kind == kind; });
}

// A 50 mm bar drilled 20 mm, 40 mm deep; an inside 1:10 socket 26 mm at its mouth (z = 0),
// narrowing toward the chuck to 23 mm at z = 30; a 16 mm boring bar entering 18 mm, 60 mm out,
// with an 80° insert of 0.4 mm nose at 95°. Numbers made up for the test.
Scene socketScene() {
    Scene s = testing::barScene(50.0, 70.0);
    s.stock.boreDiameterMm = 20.0;
    s.stock.boreDepthMm = 40.0;
    Feature f = testing::coneFeature(0.0, 30.0, 26.0, kHalfAngle, 0.01);
    f.side = Side::Inside;
    f.cone.widens = Widens::TowardTailstock;
    f.diameterMm = 26.0;
    s.part.features = {f};
    s.tool.kind = ToolKind::BoringBar;
    s.tool.shape = 'C';
    s.tool.includedAngleRad = degToRad(80);
    s.tool.enteringAngleRad = degToRad(95);
    s.tool.noseRadiusMm = 0.4;
    s.tool.edgeLengthMm = 9.7;
    s.tool.barDiameterMm = 16.0;
    s.tool.overhangMm = 60.0;
    s.tool.minBoreMm = 18.0;
    return s;
}

// A pilot to 22 mm, then the socket's line moved out by `offsetMm` (radius), as CNC paths of the
// imaginary tip from z = −1 to 30.5.
Scene boredSocket(double offsetMm) {
    Scene s = socketScene();
    auto line = [offsetMm](double z) { return 13.0 - 0.05 * z + offsetMm; };
    s.plan.passes = {testing::pathPass({{-1.0, 11.0}, {30.5, 11.0}}, 0.15),
                     testing::pathPass({{-1.0, line(-1.0) - 0.3}, {30.5, line(30.5) - 0.3}}, 0.15),
                     testing::pathPass({{-1.0, line(-1.0)}, {30.5, line(30.5)}}, 0.06)};
    return s;
}

} // namespace

TEST_CASE("a socket bored with the tip on the drawn line is small by the inside nose offset",
          "[sim][inside][kernel]") {
    // Source: references R1 (mirrored inside, derived in sim/nose_offset.h): the imaginary tip
    // on the drawn line leaves the bore small by ΔX = r(1 + tanθ − secθ) on radius.
    const NoseOffsets o =
        insideNoseRadiusOffsets(0.4, kHalfAngle, Widens::TowardTailstock, TipSide::ChuckSide);
    REQUIRE(o.leftOn);
    CHECK_THAT(o.dxRadiusMm, WithinAbs(0.4 * (1 + 0.05 - std::sqrt(1.0025)), 1e-12));

    const CutResult onLine = simulate(boredSocket(0.0));
    REQUIRE(onLine.bored);
    CHECK_THAT(onLine.gaugeAsCutDiameterMm - 26.0, WithinAbs(-o.dxDiameterMm, 2e-4));
    CHECK_FALSE(onLine.withinTolerance);
    CHECK(has(onLine, FindingKind::LeftOn));
    // The crests stand nearer the axis than the valleys: what a plug gauge meets.
    for (std::size_t i = 0; i < onLine.bore.radiusMm.size(); ++i)
        REQUIRE(onLine.boreCrest.radiusMm[i] <= onLine.bore.radiusMm[i] + 1e-9);

    const CutResult offset = simulate(boredSocket(o.dxRadiusMm));
    CHECK_THAT(offset.gaugeAsCutDiameterMm, WithinAbs(26.0, 2e-4));
    CHECK(offset.withinTolerance);
    CHECK(offset.findings.empty());
    // A 1:10 taper: a plug gauge stands off 10 mm per mm of diameter (derived).
    CHECK_THAT((26.0 - onLine.gaugeAsCutDiameterMm) * 10.0, WithinAbs(0.390, 0.003));
}

TEST_CASE("the inside kernel's bore is the bore sweep's, on centre and off it",
          "[sim][inside][kernel]") {
    for (double h : {0.0, 0.5, -0.3}) {
        INFO("axis height " << h);
        Scene s = boredSocket(0.02);
        s.tool.tipHeightMm = h;
        const CutResult r = simulate(s);
        const ToolOutline outline(s.tool);
        const Profile direct = boredProfile(s, outline, r.moves, r.bore);
        REQUIRE(direct.radiusMm.size() == r.bore.radiusMm.size());
        double worst = 0;
        for (std::size_t i = 0; i < direct.radiusMm.size(); ++i)
            worst = std::max(worst, std::abs(direct.radiusMm[i] - r.bore.radiusMm[i]));
        CHECK(worst < 1e-9);
    }
}

TEST_CASE("a bar off centre bores a hyperboloid", "[sim][inside][kernel]") {
    // Source: references R7: a tip h off centre at x cuts radius sqrt(x² + h²); D 20 mm,
    // h 0.5 mm → +0.02498 mm on diameter.
    Scene s = socketScene();
    s.part.features[0] = testing::cylinderFeature(0.0, 30.0, 20.5, 0.1);
    s.part.features[0].side = Side::Inside;
    s.tool.tipHeightMm = 0.5;
    s.plan.passes = {testing::pathPass({{-1.0, 10.25}, {30.5, 10.25}}, 0.1)};
    const CutResult r = simulate(s);
    CHECK_THAT(2.0 * r.bore.radiusAt(15.0), WithinAbs(2.0 * std::hypot(10.25, 0.5), 1e-9));
    s.plan.passes = {testing::pathPass({{-1.0, 10.0}, {30.5, 10.0}}, 0.1)};
    s.part.features[0].diameterMm = 20.0;
    s.stock.boreDiameterMm = 19.0;
    CHECK_THAT(2.0 * simulate(s).bore.radiusAt(15.0) - 20.0, WithinAbs(0.02498, 1e-5));
}

TEST_CASE("boring findings: the shank on the wall, past the bottom, the overhang, the hole",
          "[sim][inside][findings]") {
    SECTION("a tip off the wall puts the shank in the far wall") {
        Scene s = socketScene();
        s.tool.minBoreMm = 20.0; // axis 12 mm behind the tip: no room in the drilled hole
        s.plan.passes = {testing::pathPass({{-1.0, 10.8}, {30.5, 9.2}}, 0.15)};
        const CutResult r = simulate(s);
        CHECK(has(r, FindingKind::BarRubsBore));
        CHECK_FALSE(has(r, FindingKind::BarTooBig));
    }
    SECTION("a pass wound past the bottom of the blind hole") {
        Scene s = socketScene();
        s.plan.passes = {testing::pathPass({{-1.0, 10.5}, {41.0, 10.5}}, 0.15)};
        CHECK(has(simulate(s), FindingKind::PastBoreBottom));
        s.plan.passes = {testing::pathPass({{-1.0, 10.5}, {39.0, 10.5}}, 0.15)};
        CHECK_FALSE(has(simulate(s), FindingKind::PastBoreBottom));
    }
    SECTION("more than four bar diameters out (common practice, steel bar)") {
        Scene s = boredSocket(0.0195);
        CHECK_FALSE(has(simulate(s), FindingKind::LongOverhang));
        s.tool.overhangMm = 65.0;
        CHECK(has(simulate(s), FindingKind::LongOverhang));
    }
    SECTION("a pass that bores smaller than the bar's head") {
        // The head enters a bore as the insert opens it: a 21 mm min_bore goes into the 20 mm
        // drill's hole behind a pilot boring 22 mm, not behind one boring 20.8 mm.
        Scene s = boredSocket(0.0195);
        s.tool.minBoreMm = 21.0;
        CHECK_FALSE(has(simulate(s), FindingKind::BarTooBig));
        s.plan.passes[0] = testing::pathPass({{-1.0, 10.4}, {30.5, 10.4}}, 0.15);
        CHECK(has(simulate(s), FindingKind::BarTooBig));
    }
}
