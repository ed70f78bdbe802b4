// Tests for sim/include/swarf/sim/bore_sweep.h: the sweep inside a hole.
#include "swarf/sim/bore_sweep.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/nose_offset.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace swarf;

namespace {

// A right-hand boring bar's insert: CCMT-like, 80°, r = 0.8, entering angle 95° (values
// invented for the test).
Tool boringInsert() {
    Tool t;
    t.kind = ToolKind::BoringBar;
    t.shape = 'C';
    t.includedAngleRad = degToRad(80);
    t.noseRadiusMm = 0.8;
    t.enteringAngleRad = degToRad(95);
    t.hand = Hand::R;
    t.edgeLengthMm = 9.7;
    t.barDiameterMm = 12;
    t.overhangMm = 50;
    t.minBoreMm = 16;
    return t;
}

// A 40 mm bar drilled 16 mm, 50 mm deep from the datum face.
Scene drilledBar() {
    Scene s;
    s.stock.diameterMm = 40;
    s.stock.lengthMm = 150;
    s.stock.stickOutMm = 80;
    s.stock.boreDiameterMm = 16;
    s.stock.boreDepthMm = 50;
    s.tool = boringInsert();
    return s;
}

Profile grid(double z0, double z1, double dz) {
    Profile p;
    p.z0Mm = z0;
    p.dzMm = dz;
    p.radiusMm.assign(static_cast<std::size_t>(std::lround((z1 - z0) / dz)) + 1, 0.0);
    return p;
}

ToolMove move(double z0, double x0, double z1, double x1) {
    ToolMove m;
    m.pass = 0;
    m.tipFrom = {z0, x0};
    m.tipTo = {z1, x1};
    return m;
}

} // namespace

TEST_CASE("the stock's hole on a grid: its radius to its bottom, solid beyond", "[bore_sweep]") {
    const Scene s = drilledBar();
    const Profile hole = boreOnGrid(s, grid(0, 60, 0.5));
    CHECK(hole.radiusAt(10) == Approx(8.0));
    CHECK(hole.radiusAt(50) == Approx(8.0));
    CHECK(hole.radiusAt(55) == Approx(0.0).margin(1e-12));
    Scene solid = s;
    solid.stock.boreDiameterMm = 0;
    solid.stock.boreDepthMm = 0;
    CHECK(boreOnGrid(solid, grid(0, 60, 0.5)).radiusAt(10) == Approx(0.0).margin(1e-12));
}

TEST_CASE("a straight pass bores to the tip's x; the hole stays where the tool does not reach",
          "[bore_sweep]") {
    const Scene s = drilledBar();
    const ToolOutline outline(s.tool);
    const Profile g = grid(0, 60, 0.01);
    // derived: on a cylinder the imaginary tip is exact (R1 at θ = 0).
    const Profile bored = boredProfile(s, outline, {move(0, 10, 30, 10)}, g);
    for (double z : {2.0, 15.0, 29.0})
        CHECK(bored.radiusAt(z) == Approx(10.0).margin(1e-9));
    CHECK(bored.radiusAt(40.0) == Approx(8.0)); // the drilled hole, untouched
    CHECK(bored.radiusAt(55.0) == Approx(0.0).margin(1e-12));
    // A pass inside the hole's wall cuts nothing.
    const Profile air = boredProfile(s, outline, {move(0, 7, 30, 7)}, g);
    CHECK(air.radiusAt(15.0) == Approx(8.0));
    // Off centre the bore is larger: sqrt(x² + h²) (derived; references R7 outside).
    Scene high = s;
    high.tool.tipHeightMm = 0.5;
    const Profile off = boredProfile(high, outline, {move(0, 10, 30, 10)}, g);
    CHECK(off.radiusAt(15.0) == Approx(std::sqrt(100.0 + 0.25)).margin(1e-9));
    CHECK(sweptHighestX(outline, move(0, 10, 30, 10), 15.0) == Approx(10.0).margin(1e-12));
    CHECK(std::isinf(sweptHighestX(outline, move(0, 10, 30, 10), 45.0)));
}

TEST_CASE("a 1:10 socket bored along its drawn line leaves the inside nose offset on",
          "[bore_sweep][inside]") {
    const Scene s = drilledBar();
    const ToolOutline outline(s.tool);
    const Profile g = grid(0, 45, 0.01);
    // Socket widening toward its mouth (the tailstock): R(z) = 12 − z·tan θ, 1:10 on diameter.
    const double theta = std::atan(1.0 / 20.0);
    const auto drawn = [&](double z) { return 12.0 - z * std::tan(theta); };
    // Source: references R1 (closed forms), R12 (mirrored inside; derived): the tip on the chuck
    // side leaves r(sin θ + cos θ − 1) normal to the surface, r(1 + tan θ − sec θ) on radius.
    const NoseOffsets o =
        insideNoseRadiusOffsets(0.8, theta, Widens::TowardTailstock, TipSide::ChuckSide);
    REQUIRE(o.leftOn);
    const Profile asDrawn = boredProfile(s, outline, {move(5, drawn(5), 35, drawn(35))}, g);
    for (double z : {10.0, 20.0, 30.0}) {
        INFO("z = " << z);
        CHECK(drawn(z) - asDrawn.radiusAt(z) == Approx(o.dxRadiusMm).epsilon(1e-9));
        CHECK((drawn(z) - asDrawn.radiusAt(z)) * std::cos(theta) ==
              Approx(o.normalErrorMm).epsilon(1e-9));
    }
    // With the offset worked in (the tip moved away from the axis), the bore is as drawn.
    const double dx = o.xShiftSign * o.dxRadiusMm;
    const Profile offset =
        boredProfile(s, outline, {move(5, drawn(5) + dx, 35, drawn(35) + dx)}, g);
    for (double z : {10.0, 20.0, 30.0})
        CHECK(offset.radiusAt(z) == Approx(drawn(z)).margin(1e-9));

    // The same through the drawing: the socket as an inside feature, its deviation left on by
    // the normal offset all along the swept part (references R1, R12; derived).
    Scene drawnScene = s;
    Feature socket;
    socket.kind = FeatureKind::Cone;
    socket.side = Side::Inside;
    socket.zStartMm = 0;
    socket.zEndMm = 40;
    socket.cone = Cone{0.0, 24.0, theta, Widens::TowardTailstock};
    drawnScene.part.features = {socket};
    const Profile nominal = nominalOnGrid(drawnScene.part, g, Side::Inside);
    const auto dev = normalDeviation(drawnScene.part, nominal, asDrawn, Side::Inside);
    const auto devOffset = normalDeviation(drawnScene.part, nominal, offset, Side::Inside);
    for (double z : {10.0, 20.0, 30.0}) {
        const auto i = static_cast<std::size_t>(std::lround(z / g.dzMm));
        CHECK(dev[i] == Approx(o.normalErrorMm).epsilon(1e-9));
        CHECK(devOffset[i] == Approx(0.0).margin(1e-9));
    }
}
