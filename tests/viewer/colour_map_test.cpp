// Tests of swarf/viewer/colour_map.h.
#include "swarf/viewer/colour_map.h"

#include "support/synthetic.h"

#include <catch2/catch.hpp>

using namespace swarf;

TEST_CASE("cool-warm map: blue end, neutral middle, red end", "[viewer][colour]") {
    // Source: K. Moreland, Diverging Color Maps for Scientific Visualization (ISVC 2009), the
    // cool-warm end points and its grey middle (0.865); from memory.
    const auto lo = viewer::coolWarm(0), mid = viewer::coolWarm(0.5), hi = viewer::coolWarm(1);
    CHECK(lo.r == Approx(0.230).margin(0.002));
    CHECK(lo.g == Approx(0.299).margin(0.002));
    CHECK(lo.b == Approx(0.754).margin(0.002));
    CHECK(hi.r == Approx(0.706).margin(0.002));
    CHECK(hi.g == Approx(0.016).margin(0.002));
    CHECK(hi.b == Approx(0.150).margin(0.002));
    CHECK(mid.r == Approx(0.865).margin(0.01));
    CHECK(mid.g == Approx(0.865).margin(0.01));
    CHECK(mid.b == Approx(0.865).margin(0.01));
}

TEST_CASE("deviation scale: centred on zero, band from the cone's tolerance", "[viewer][colour]") {
    const Scene s = test::syntheticScene(3);
    const CutResult r = test::syntheticResult(s, [](int k) { return k == 2 ? 0.1 : 1.0; });
    const auto sc = viewer::deviationScale(s, r);
    const double cosA = 1 / std::sqrt(1 + 0.05 * 0.05); // derived
    CHECK(sc.bandMm == Approx(0.025 * cosA));           // ±0.05 on diameter, derived
    // Fixed by the band: two bands, whatever the deviations (here up to 0.1 mm, four bands).
    CHECK(sc.limitMm == Approx(2 * sc.bandMm));
    const CutResult small = test::syntheticResult(s, [](int) { return 1.0; });
    CHECK(viewer::deviationScale(s, small).limitMm == sc.limitMm);
    CHECK(sc.mapPosition(0) == 0.5);
    CHECK(sc.mapPosition(sc.limitMm) == 1.0);
    CHECK(sc.mapPosition(-10) == 0.0);
    const auto left = viewer::deviationColour(0.05, sc), over = viewer::deviationColour(-0.05, sc);
    CHECK(left.r > left.b);
    CHECK(over.b > over.r);
    CHECK(std::string(sc.displayUnit()) == "µm");
    CHECK(sc.toDisplay(0.001) == Approx(1.0));
    Scene inch = s;
    inch.units = Units::Inch;
    const auto si = viewer::deviationScale(inch, r);
    CHECK(std::string(si.displayUnit()) == "thou");
    CHECK(si.toDisplay(0.0254) == Approx(1.0)); // derived: 1 thou = 0.0254 mm
}
