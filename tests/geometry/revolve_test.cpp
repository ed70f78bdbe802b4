#include "swarf/geometry/revolve.h"

#include "profiles.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

using namespace swarf;
using namespace swarf::geometry;
using Catch::Matchers::WithinAbs;
using Catch::Matchers::WithinRel;

namespace {

// Closed-form volume of a frustum of radii r0, r1 and length L: πL(r0² + r0·r1 + r1²)/3.
double frustumMm3(double r0, double r1, double len) {
    return kPi * len * (r0 * r0 + r0 * r1 + r1 * r1) / 3.0;
}

Part taperPart() {
    Part part;
    Feature cone;
    cone.kind = FeatureKind::Cone;
    cone.zStartMm = 0;
    cone.zEndMm = 50;
    cone.cone.gaugeZMm = 40;
    cone.cone.gaugeDiameterMm = 29;
    cone.cone.halfAngleRad = std::atan(0.05); // 1:10 on diameter
    cone.cone.widens = Widens::TowardChuck;
    Feature bar;
    bar.kind = FeatureKind::Cylinder;
    bar.zStartMm = 50;
    bar.zEndMm = 80;
    bar.diameterMm = 30;
    part.features = {cone, bar};
    return part;
}
} // namespace

TEST_CASE("stock solid is the stick-out cylinder", "[geometry][revolve]") {
    Stock stock;
    stock.diameterMm = 30;
    stock.lengthMm = 150;
    stock.stickOutMm = 85;
    stock.faceAllowanceMm = 1.5;
    const Solid s = stockSolid(stock);
    REQUIRE(s.isValid());
    REQUIRE(s.solidCount() == 1);
    // derived: closed-form cylinder volume πR²L over the stick-out only.
    CHECK_THAT(s.volumeMm3(), WithinRel(kPi * 15.0 * 15.0 * 85.0, 1e-9));
    const BoxMm b = s.bounds();
    CHECK_THAT(b.zMin, WithinAbs(-1.5, 1e-7));
    CHECK_THAT(b.zMax, WithinAbs(83.5, 1e-7));
    CHECK_THAT(b.xMax, WithinAbs(15.0, 1e-7));
}

TEST_CASE("nominal solid follows the drawing's cone and cylinder", "[geometry][revolve]") {
    const Part part = taperPart();
    const auto outline = nominalOutline(part);
    REQUIRE(outline.size() == 3); // the cone's two ends and the bar's end (shared point dropped)
    CHECK_THAT(outline[0].second, WithinAbs(12.5, 1e-12));
    CHECK_THAT(outline[1].second, WithinAbs(15.0, 1e-12));
    const Solid s = nominalSolid(part);
    REQUIRE(s.isValid());
    REQUIRE(s.solidCount() == 1);
    // derived: closed-form frustum πL(R² + Rr + r²)/3 plus cylinder πR²L.
    const double expected = frustumMm3(12.5, 15.0, 50.0) + kPi * 15.0 * 15.0 * 30.0;
    CHECK_THAT(s.volumeMm3(), WithinRel(expected, 1e-9));
    // The gauge plane: 29.000 mm at z = 40 as the feature says.
    const auto r = s.radiusAtZ(40.0);
    REQUIRE(r.has_value());
    CHECK_THAT(2 * *r, WithinAbs(29.0, 1e-9));
}

TEST_CASE("nominal solid: a step between two cylinders is a face", "[geometry][revolve]") {
    Part part;
    Feature a, b;
    a.kind = b.kind = FeatureKind::Cylinder;
    a.zStartMm = 0, a.zEndMm = 10, a.diameterMm = 10;
    b.zStartMm = 10, b.zEndMm = 30, b.diameterMm = 20;
    part.features = {a, b};
    const Solid s = nominalSolid(part);
    REQUIRE(s.isValid());
    // derived: two closed-form cylinders.
    CHECK_THAT(s.volumeMm3(), WithinRel(kPi * (25.0 * 10 + 100.0 * 20), 1e-9));
}

TEST_CASE("as-cut solid of lines and a nose arc", "[geometry][revolve]") {
    const Profile p = testprofiles::taperProfile();
    const FittedSolid f = profileSolid(p);
    REQUIRE(f.solid.isValid());
    REQUIRE(f.solid.solidCount() == 1);
    CHECK(f.maxFitErrorMm <= 0.5e-3);
    CHECK(f.arcCount >= 1); // the nose arc is recognised as a circle
    CHECK(f.splineCount == 0);
    CHECK(f.lineCount <= 6);
    // The solid's volume against the profile's frustum sum.
    CHECK_THAT(f.solid.volumeMm3(), WithinRel(p.volumeMm3(), 1e-6));
    // Independent of the fit: sections of the solid against the closed-form outline.
    for (double z : {0.5, 20.0, 40.0, 49.0011, 49.05, 49.1, 49.15, 49.19, 55.0, 59.0}) {
        const auto r = f.solid.radiusAtZ(z);
        REQUIRE(r.has_value());
        INFO("z = " << z);
        CHECK_THAT(*r, WithinAbs(testprofiles::taperRadius(z), 0.5e-3));
    }
}

TEST_CASE("as-cut solid off centre is fitted within 0.5 um", "[geometry][revolve]") {
    // A tip 0.5 mm above centre turns the cone into a hyperboloid and the nose arc into
    // another curve: straight only piecewise, not circular.
    const double h = 0.5;
    const Profile p = testprofiles::taperProfile(h);
    const FittedSolid f = profileSolid(p);
    REQUIRE(f.solid.isValid());
    CHECK(f.lineCount > 2);
    CHECK(f.maxFitErrorMm <= 0.5e-3);
    CHECK_THAT(f.solid.volumeMm3(), WithinRel(p.volumeMm3(), 1e-6));
    for (double z = 0.25; z < 60; z += 2.5) {
        const auto r = f.solid.radiusAtZ(z);
        REQUIRE(r.has_value());
        INFO("z = " << z);
        CHECK_THAT(*r, WithinAbs(testprofiles::taperRadius(z, h), 0.5e-3));
    }
}

TEST_CASE("a wavy profile is refined until every sample is within 0.5 um", "[geometry][revolve]") {
    // 3 µm waves every 0.1 mm: nothing straight, nothing circular.
    const auto wave = [](double z) { return 10.0 + 0.003 * std::sin(2 * kPi * z / 0.1); };
    const Profile p = testprofiles::sampled(wave, 0.0, 2.0, 0.002);
    const FittedSolid f = profileSolid(p);
    REQUIRE(f.solid.isValid());
    CHECK(f.maxFitErrorMm <= 0.5e-3);
    CHECK(f.splineCount >= 1);
    for (double z = 0.013; z < 2.0; z += 0.1) {
        const auto r = f.solid.radiusAtZ(z);
        REQUIRE(r.has_value());
        CHECK_THAT(*r, WithinAbs(wave(z), 0.5e-3));
    }
}

TEST_CASE("a curve running into a sharp step is fitted without loops", "[geometry][revolve]") {
    // A curved flank (a parabola: not a line, not a circle) that steps 0.4 mm up to the bar
    // between two samples, as a tool off centre leaves at a shoulder. A smooth spline forced
    // round that corner loops away between the samples; the fit must not keep such a piece.
    const auto shape = [](double z) { return z < 1.0 ? 9.2 + 0.3 * z * z : 10.0; };
    const Profile p = testprofiles::sampled(shape, 0.0, 1.5, 0.002);
    const FittedSolid f = profileSolid(p);
    REQUIRE(f.solid.isValid());
    CHECK(f.maxFitErrorMm <= 0.5e-3);
    CHECK_THAT(f.solid.volumeMm3(), WithinRel(p.volumeMm3(), 1e-6));
    for (double z = 0.0013; z < 0.998; z += 0.0037) {
        const auto r = f.solid.radiusAtZ(z);
        REQUIRE(r.has_value());
        INFO("z = " << z);
        CHECK_THAT(*r, WithinAbs(p.radiusAt(z), 0.5e-3));
    }
}

TEST_CASE("a profile cut through the centre comes apart in two solids", "[geometry][revolve]") {
    Profile p;
    p.dzMm = 1;
    p.radiusMm = {5, 5, 0, 0, 5, 5};
    const FittedSolid f = profileSolid(p);
    CHECK(f.solid.solidCount() == 2);
    CHECK(f.solid.isValid());
    // derived: each piece is a 5 mm cylinder 1 mm long and a cone 1 mm long: π·25·(1 + 1/3).
    CHECK_THAT(f.solid.volumeMm3(), WithinRel(2 * kPi * 25.0 * (1.0 + 1.0 / 3.0), 1e-9));
    CHECK_THAT(f.solid.volumeMm3(), WithinRel(p.volumeMm3(), 1e-9));
    Profile bad = p;
    bad.radiusMm[1] = -1;
    CHECK_THROWS_AS(profileSolid(bad), GeometryError);
    bad.radiusMm.assign(4, 0.0);
    CHECK_THROWS_AS(profileSolid(bad), GeometryError);
}
