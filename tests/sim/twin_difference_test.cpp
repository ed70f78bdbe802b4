// Tests of sim/twin_difference.h: what differs between a scene's result and its twin's.
#include "swarf/sim/twin_difference.h"

#include "support/synthetic.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace swarf;

namespace {

// A result whose main cone (feature 0) is cut to `gaugeDiameterMm` at z = 20 with half angle
// `halfAngleRad`; the figures alone, as the kernel reports them.
CutResult resultWith(double gaugeDiameterMm, double halfAngleRad, bool within, double gaugeZ = 20) {
    CutResult r;
    r.gaugeZMm = gaugeZ;
    r.gaugeNominalDiameterMm = 22;
    r.gaugeAsCutDiameterMm = gaugeDiameterMm;
    r.withinTolerance = within;
    FeatureReport f;
    f.feature = 0;
    f.asCutDiameterMm = gaugeDiameterMm;
    f.asCutHalfAngleRad = halfAngleRad;
    f.withinTolerance = within;
    r.features.push_back(f);
    return r;
}

} // namespace

TEST_CASE("twinDifference: this less twin, at the gauge plane and in the half angle",
          "[sim][twin]") {
    const Scene s = test::syntheticScene(2);
    const double a = std::atan(0.05);
    const double arcSecond = kPi / (180.0 * 3600.0); // derived: 1″ in radians
    const CutResult mistake = resultWith(22.039, a - 2 * arcSecond, false);
    const CutResult right = resultWith(22.000, a, true);
    const TwinDifference d = twinDifference(s, mistake, s, right);
    CHECK(d.gaugeDiameterChangeMm == Approx(0.039).margin(1e-12));
    CHECK(d.sameGaugePlane);
    REQUIRE(d.halfAngleChangeRad);
    CHECK(*d.halfAngleChangeRad == Approx(-2 * arcSecond).margin(1e-15));
    CHECK(d.coneThis->drawnHalfAngleRad == a);
    CHECK_FALSE(d.withinThis);
    CHECK(d.withinTwin);
    // The other way round, the signs turn.
    const TwinDifference back = twinDifference(s, right, s, mistake);
    CHECK(back.gaugeDiameterChangeMm == Approx(-0.039).margin(1e-12));
    CHECK(*back.halfAngleChangeRad == Approx(2 * arcSecond).margin(1e-15));

    const std::string text = twinDifferenceText(s, d, "Twin: right.toml");
    INFO(text);
    CHECK(text.find("Twin: right.toml\n") == 0);
    CHECK(text.find("difference " + formatDiameterChange(0.039, s.units)) != std::string::npos);
    CHECK(text.find("difference " + formatAngleChange(-2 * arcSecond)) != std::string::npos);
    CHECK(text.find("verdict: this out of tolerance, twin within tolerance") != std::string::npos);
}

TEST_CASE("twinDifference says when the planes differ and when there is no cone to compare",
          "[sim][twin]") {
    const Scene s = test::syntheticScene(2);
    Scene noCone = s;
    noCone.part.features[0].kind = FeatureKind::Cylinder;
    const CutResult r = resultWith(22.0, std::atan(0.05), true, 20);
    const CutResult other = resultWith(21.9, std::atan(0.05), true, 25);
    const TwinDifference d = twinDifference(s, r, noCone, other);
    CHECK_FALSE(d.sameGaugePlane);
    CHECK_FALSE(d.halfAngleChangeRad.has_value());
    const std::string text = twinDifferenceText(s, d, "Twin");
    CHECK(text.find("not at the same gauge plane") != std::string::npos);
    CHECK(text.find("no cone to compare") != std::string::npos);
    CHECK(formatDiameterChange(-0.0012, Units::Mm).rfind("−", 0) == 0);
    CHECK(formatDiameterChange(0.0012, Units::Mm).rfind("+", 0) == 0);
}
