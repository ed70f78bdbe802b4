// Tests for sim/include/swarf/sim/compare.h: deviation from the drawing and verdicts.
#include "swarf/sim/compare.h"

#include "kernel_scenes.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;
using namespace swarf::testing;

namespace {
Profile gridOf(double z0, double dz, std::size_t n, double r) {
    Profile p;
    p.z0Mm = z0;
    p.dzMm = dz;
    p.radiusMm.assign(n, r);
    return p;
}
} // namespace

TEST_CASE("tolerance band normal to a cone", "[compare]") {
    // ±t on diameter is ±t/2 on radius, (t/2)·cosθ normal to the surface (derived).
    const Feature c = coneFeature(0, 10, 10, degToRad(10), 0.02);
    CHECK(normalBandMm(c) == Approx(0.01 * std::cos(degToRad(10))));
    CHECK(normalBandMm(cylinderFeature(0, 1, 10, 0.05)) == Approx(0.025));
}

TEST_CASE("nominal profile and the feature that gives it", "[compare]") {
    Part part;
    part.features.push_back(cylinderFeature(0, 10, 20, 0.1));
    part.features.push_back(cylinderFeature(10, 20, 30, 0.1));
    CHECK(featureAt(part, 5) == 0);
    CHECK(featureAt(part, 10) == 1); // the larger where two meet
    CHECK(featureAt(part, 25) == -1);
    const Profile n = nominalOnGrid(part, gridOf(-1, 0.5, 50, 0));
    CHECK(std::isnan(n.radiusMm[0]));
    CHECK(n.radiusAt(5) == Approx(10));
    CHECK(n.radiusAt(15) == Approx(15));
}

TEST_CASE("internal corners keep the nose radius out of the verdict", "[compare]") {
    Part part;
    part.features.push_back(cylinderFeature(0, 10, 20, 0.1));
    part.features.push_back(cylinderFeature(10, 20, 30, 0.1));
    const Profile g = gridOf(0, 0.1, 201, 0);
    const auto mask = verdictMask(part, g, 0.8);
    CHECK(mask[50]);        // z = 5
    CHECK_FALSE(mask[95]);  // z = 9.5, within 0.8 of the corner at 10
    CHECK_FALSE(mask[105]); // z = 10.5
    CHECK(mask[120]);       // z = 12
}

TEST_CASE("a cone cut parallel but off by more than its band is out", "[compare]") {
    const double th = degToRad(5);
    Scene s = barScene(30);
    s.part.features.push_back(coneFeature(0, 20, 20, th, 0.02));
    s.part.features.back().cone.gaugeZMm = 10;
    s.part.features.back().cone.gaugeDiameterMm = 20 + 20 * std::tan(th);
    for (double shift : {0.009, 0.011}) { // normal band 0.01·cos 5° = 0.00996 (derived)
        Profile cut = gridOf(0, 0.01, 2001, 0);
        for (std::size_t i = 0; i < cut.radiusMm.size(); ++i)
            cut.radiusMm[i] = 10 + cut.zAt(i) * std::tan(th) + shift / std::cos(th);
        const Profile n = nominalOnGrid(s.part, cut);
        const auto dev = normalDeviation(s.part, n, cut);
        CHECK(dev[1000] == Approx(shift));
        CHECK(normalDeviationAt(s.part, cut.zAt(1000), cut.radiusMm[1000]) == Approx(shift));
        const auto rep =
            compareFeatures(s, cut, dev, {}, std::vector<bool>(cut.radiusMm.size(), true));
        REQUIRE(rep.size() == 1);
        CHECK(rep[0].maxLeftOnMm == Approx(shift));
        CHECK(rep[0].asCutHalfAngleRad == Approx(th));
        CHECK(rep[0].asCutDiameterMm ==
              Approx(s.part.features[0].cone.gaugeDiameterMm + 2 * shift / std::cos(th)));
        CHECK(rep[0].withinTolerance == (shift < 0.00996));
    }
}

TEST_CASE("left-on volume between the drawing and the cut", "[compare]") {
    Part part;
    part.features.push_back(cylinderFeature(0, 10, 20, 0.1));
    const Profile cut = gridOf(0, 0.01, 1001, 10.5);
    const Profile n = nominalOnGrid(part, cut);
    // Source: derived (Pappus: annulus 10..10.5 over 10 mm).
    CHECK(leftoverVolumeMm3(n, cut) == Approx(kPi * (10.5 * 10.5 - 100) * 10).epsilon(1e-9));
}

TEST_CASE("left on counts the crests, overcut the valleys", "[compare]") {
    Scene s = barScene(30);
    s.part.features.push_back(cylinderFeature(0, 10, 20, 0.02)); // band 0.01 on radius
    const Profile valleys = gridOf(0, 0.01, 1001, 9.996);        // 4 µm under
    const Profile n = nominalOnGrid(s.part, valleys);
    const auto dev = normalDeviation(s.part, n, valleys);
    for (double crest : {0.009, 0.012}) { // crests 5 and 8 µm above the drawing
        const Profile crests = gridOf(0, 0.01, 1001, 9.996 + crest);
        const auto up = normalDeviation(s.part, n, crests);
        const auto rep = compareFeatures(s, valleys, dev, up, std::vector<bool>(1001, true));
        CHECK(rep[0].maxOvercutMm == Approx(0.004));
        CHECK(rep[0].maxLeftOnMm == Approx(crest - 0.004));
        CHECK(rep[0].withinTolerance == (crest - 0.004 <= 0.01));
        // The colour: whichever stands further from the drawing.
        const auto shown = markedDeviation(dev, up);
        CHECK(shown[500] == Approx(crest - 0.004 > 0.004 ? crest - 0.004 : -0.004));
    }
}

TEST_CASE("overcut volume and the drawing's inside corners", "[compare]") {
    Part part;
    part.features.push_back(cylinderFeature(0, 10, 20, 0.1));
    const Profile cut = gridOf(0, 0.01, 1001, 9.5);
    // Source: derived (Pappus: annulus 9.5..10 over 10 mm).
    CHECK(overcutVolumeMm3(nominalOnGrid(part, cut), cut) ==
          Approx(kPi * (100 - 9.5 * 9.5) * 10).epsilon(1e-9));
    CHECK(leftoverVolumeMm3(nominalOnGrid(part, cut), cut) == 0);
    part.features.push_back(cylinderFeature(10, 20, 24, 0.1));
    const auto corners = internalCorners(part);
    REQUIRE(corners.size() == 1);
    CHECK(corners[0].feature == 0);
    CHECK(corners[0].zMm == 10);
    CHECK(corners[0].atFeatureEnd);
    CHECK(corners[0].interiorAngleRad == Approx(kPi / 2)); // derived: a square shoulder
}

TEST_CASE("inside: left on is metal within the drawn bore; outside features are not the bore",
          "[compare][inside]") {
    Part part;
    Feature outside;
    outside.kind = FeatureKind::Cylinder;
    outside.zStartMm = 0;
    outside.zEndMm = 40;
    outside.diameterMm = 38;
    Feature socket;
    socket.kind = FeatureKind::Cone;
    socket.side = Side::Inside;
    socket.zStartMm = 0;
    socket.zEndMm = 30;
    socket.cone = Cone{0.0, 24.0, std::atan(1.0 / 20.0), Widens::TowardTailstock};
    part.features = {outside, socket};
    Profile grid;
    grid.z0Mm = 0;
    grid.dzMm = 1;
    grid.radiusMm.assign(41, 0.0);
    const Profile drawnBore = nominalOnGrid(part, grid, Side::Inside);
    CHECK(drawnBore.radiusMm[10] == Approx(12.0 - 10.0 / 20.0));   // derived: 1:10 on diameter
    CHECK(std::isnan(drawnBore.radiusMm[35]));                     // past the socket
    CHECK(nominalOnGrid(part, grid).radiusMm[10] == Approx(19.0)); // outside unchanged
    // A bore 0.01 mm small on radius leaves 0.01·cos θ on; 0.02 large overcuts 0.02·cos θ.
    const double cosT = std::cos(std::atan(1.0 / 20.0));
    Profile small = drawnBore, large = drawnBore;
    for (std::size_t i = 0; i <= 30; ++i) {
        small.radiusMm[i] -= 0.01;
        large.radiusMm[i] += 0.02;
    }
    const auto leftOn = normalDeviation(part, drawnBore, small, Side::Inside);
    const auto overcut = normalDeviation(part, drawnBore, large, Side::Inside);
    CHECK(leftOn[10] == Approx(0.01 * cosT));
    CHECK(overcut[10] == Approx(-0.02 * cosT));
    CHECK(std::isnan(leftOn[35]));
    const DeviationExtremes e = deviationExtremes(leftOn);
    CHECK(e.leftOnMm == Approx(0.01 * cosT));
    CHECK(e.overcutMm == Approx(0.0).margin(1e-15));
}
