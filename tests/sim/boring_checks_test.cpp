// Tests for sim/include/swarf/sim/boring_checks.h.
#include "swarf/sim/boring_checks.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace swarf;

namespace {

// A 12 mm bar that enters 16 mm bores (values invented for the test), in a 40 mm bar drilled
// 16 mm, 50 mm deep.
Scene boring() {
    Scene s;
    s.stock.diameterMm = 40;
    s.stock.lengthMm = 150;
    s.stock.stickOutMm = 80;
    s.stock.boreDiameterMm = 16;
    s.stock.boreDepthMm = 50;
    s.tool.kind = ToolKind::BoringBar;
    s.tool.barDiameterMm = 12;
    s.tool.overhangMm = 50;
    s.tool.minBoreMm = 16;
    return s;
}

} // namespace

TEST_CASE("in its smallest bore the shank touches the wall opposite the tip", "[boring]") {
    const Scene s = boring();
    // derived: the axis 16 − 6 = 10 mm behind the tip; tip on the wall of an 8 mm radius bore.
    CHECK(barAxisBehindTipMm(s.tool) == Approx(10.0));
    CHECK(barWallClearanceMm(s.tool, 8.0, 8.0) == Approx(0.0).margin(1e-12));
    // In a 20 mm bore with the tip on its wall the axis is on the work's axis: 10 − 0 − 6.
    CHECK(barWallClearanceMm(s.tool, 10.0, 10.0) == Approx(4.0));
    // A tip short of the wall in a small bore: the shank is in the wall behind it.
    CHECK(barWallClearanceMm(s.tool, 7.0, 8.0) == Approx(-1.0));
    // Off centre the shank's axis is higher: sqrt(x² + h²) from the work's axis (derived).
    Scene high = s;
    high.tool.tipHeightMm = 3.0;
    CHECK(barWallClearanceMm(high.tool, 14.0, 12.0) == Approx(12.0 - 5.0 - 6.0));
}

TEST_CASE("the tightest place along the bore behind the tip", "[boring]") {
    const Scene s = boring();
    Profile bore;
    bore.z0Mm = 0;
    bore.dzMm = 1;
    // A bore opened to 12 mm radius over its first 20 mm, the drilled 8 mm beyond.
    for (int i = 0; i <= 60; ++i)
        bore.radiusMm.push_back(i <= 20 ? 12.0 : (i <= 50 ? 8.0 : 0.0));
    // Tip at z = 15, x = 12: only the opened part is behind it: 12 − 2 − 6 = 4.
    const BarClearance a = barClearanceAlongBore(s, bore, 15.0, 12.0);
    CHECK(a.clearanceMm == Approx(4.0));
    // Tip at z = 30 cutting at x = 9 in the drilled part: the drilled bore behind it is the
    // tightest: 8 − |9 − 10| − 6 = 1, at z = 21.
    const BarClearance b = barClearanceAlongBore(s, bore, 30.0, 9.0);
    CHECK(b.clearanceMm == Approx(1.0));
    CHECK(b.zMm == Approx(21.0));
    // With the tip at x = 6 the shank rubs the drilled wall: 8 − 4 − 6 = −2.
    CHECK(barClearanceAlongBore(s, bore, 30.0, 6.0).clearanceMm == Approx(-2.0));
}

TEST_CASE("past the bottom of a blind hole, never of a through one", "[boring]") {
    Scene s = boring();
    CHECK(pastBoreBottomMm(s, 45.0, 1.0) == Approx(-4.0));
    CHECK(pastBoreBottomMm(s, 52.0, 0.5) == Approx(2.5));
    s.stock.boreDepthMm = 80; // reaches the jaws' face: through the work
    CHECK(std::isinf(pastBoreBottomMm(s, 79.0, 5.0)));
    CHECK(pastBoreBottomMm(s, 79.0, 5.0) < 0);
}
