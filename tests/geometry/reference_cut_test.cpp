#include "swarf/geometry/reference_cut.h"

#include "swarf/sim/tool_outline.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace swarf;
using namespace swarf::geometry;
using Catch::Matchers::WithinAbs;

namespace {
// A bar of 20 mm sticking out 40 mm, a 55° insert (ISO 1832 D, references R8) with a 0.4 mm
// nose in a 93° holder (ISO 5608 J, references R8), right hand.
Scene barScene(double tipHeightMm = 0.0) {
    Scene s;
    s.stock.diameterMm = 20;
    s.stock.lengthMm = 100;
    s.stock.stickOutMm = 40;
    s.tool.shape = 'D';
    s.tool.noseRadiusMm = 0.4;
    s.tool.enteringAngleRad = degToRad(93);
    s.tool.hand = Hand::R;
    s.tool.edgeLengthMm = 11.6;
    s.tool.tipHeightMm = tipHeightMm;
    return s;
}

ToolMove move(double z0, double x0, double z1, double x1) {
    ToolMove m;
    m.tipFrom = {z0, x0};
    m.tipTo = {z1, x1};
    return m;
}
} // namespace

TEST_CASE("reference cut: straight turning leaves the tip's radius", "[geometry][reference]") {
    const Scene s = barScene();
    const ReferenceResult ref = referenceCut(s, {move(-2, 9, 30, 9)});
    REQUIRE(ref.asCut.isValid());
    CHECK(ref.movesCut == 1);
    // The imaginary tip touches the lowest point of the nose: radius 9 where the nose passed
    // (chords of the nose lie inside the arc by at most chordErrorMm).
    for (double z : {0.0, 10.0, 29.6}) {
        const auto r = ref.asCut.radiusAtZ(z);
        REQUIRE(r.has_value());
        CHECK_THAT(*r, WithinAbs(9.0, 1e-4));
        CHECK(*r >= 9.0 - 1e-9);
    }
    // Past the tip's end (z = 30) the bar is whole.
    CHECK_THAT(*ref.asCut.radiusAtZ(30.5), WithinAbs(10.0, 1e-9));
    // The nose arc at the end: centre at (29.6, 9.4), so at z = 29.8 the radius is
    // 9.4 − sqrt(0.4² − 0.2²) (derived).
    CHECK_THAT(*ref.asCut.radiusAtZ(29.8), WithinAbs(9.4 - std::sqrt(0.16 - 0.04), 1e-4));
}

TEST_CASE("reference cut: a compound move along a 1:10 taper", "[geometry][reference]") {
    const Scene s = barScene();
    // Tip line x = 7.5 + 0.05 z, wound from z = 45 toward the free end and past it.
    const auto tipX = [](double z) { return 7.5 + 0.05 * z; };
    const ReferenceResult ref = referenceCut(s, {move(45, tipX(45), -3, tipX(-3))});
    REQUIRE(ref.asCut.isValid());
    // derived: the nose centre runs r behind and r above the tip; the cut surface is the
    // centre line less r·sqrt(1 + s²) (references R1: the normal error r(sinθ + cosθ − 1)).
    const double r = 0.4, slope = 0.05;
    for (double z : {2.0, 10.0, 20.0, 30.0, 40.0}) {
        const double expected = tipX(z + r) + r - r * std::sqrt(1 + slope * slope);
        const auto got = ref.asCut.radiusAtZ(z);
        REQUIRE(got.has_value());
        INFO("z = " << z);
        CHECK_THAT(*got, WithinAbs(expected, 1e-4));
    }
}

TEST_CASE("reference cut: a tip above centre cuts sqrt(x² + h²)", "[geometry][reference]") {
    const Scene s = barScene(0.5);
    const ReferenceResult ref = referenceCut(s, {move(-2, 9, 30, 9)});
    REQUIRE(ref.asCut.isValid());
    // references R7 (formula derived): radius sqrt(x² + h²).
    CHECK_THAT(*ref.asCut.radiusAtZ(10.0), WithinAbs(std::sqrt(81.0 + 0.25), 1e-4));
}

TEST_CASE("reference cut: moves in the air cut nothing", "[geometry][reference]") {
    // The second move stays beyond the bar's end even with the trailing edge reaching back
    // about 10 mm from the nose.
    const Scene s = barScene();
    const ReferenceResult ref = referenceCut(s, {move(-2, 12, 30, 12), move(55, 5, 70, 5)});
    CHECK(ref.movesCut == 0);
    CHECK(ref.movesSkipped == 2);
    CHECK_THAT(ref.volumeMm3, WithinAbs(kPi * 100.0 * 40.0, 1e-6)); // derived: πR²L
}
