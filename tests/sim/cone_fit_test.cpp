// Tests for sim/include/swarf/sim/cone_fit.h: the cone as measured.
#include "swarf/sim/cone.h"
#include "swarf/sim/cone_fit.h"
#include "swarf/sim/roll_check.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

namespace {

Cone cone(double gaugeZ, double gaugeD, double halfDeg, Widens w) {
    Cone c;
    c.gaugeZMm = gaugeZ;
    c.gaugeDiameterMm = gaugeD;
    c.halfAngleRad = degToRad(halfDeg);
    c.widens = w;
    return c;
}

DiameterReading dia(double z, double d, double u = 0.002) {
    DiameterReading r;
    r.zMm = z;
    r.valueMm = d;
    r.uncertaintyMm = u;
    return r;
}

} // namespace

TEST_CASE("two diameters over a length give the angle", "[cone_fit]") {
    // Source: references R10: tan θ = (D2 − D1) / (2 (z2 − z1)). 1:20 on diameter over 50 mm:
    // 2.5 mm, θ = atan(1/40) = 1.43209°, references R3 (ISO 296: 1.43210°).
    const Cone drawing = cone(60, 24, 1.4321, Widens::TowardChuck);
    Measurements m;
    m.diameters = {dia(10, 21.5), dia(60, 24.0)};
    const ConeFit f = fitCone(drawing, m);
    REQUIRE(f.ok);
    CHECK(radToDeg(f.halfAngleRad) == Approx(1.43209618).margin(1e-7));
    CHECK(f.gaugeDiameterMm == Approx(24.0).margin(1e-9));
    for (const FitResidual& r : f.residuals)
        CHECK(r.residualMm == Approx(0).margin(1e-9)); // two readings, two unknowns
    // derived: each reading uncertain by u, the angle by √2 u / (2 L) cos²θ.
    const double t = std::tan(f.halfAngleRad);
    CHECK(f.halfAngleSdRad ==
          Approx(std::sqrt(2.0) * 0.002 / (2 * 50) / (1 + t * t)).epsilon(1e-6));
}

TEST_CASE("a cone widening toward the tailstock fits the other way round", "[cone_fit]") {
    // derived: D(z) = D0 − 2 tan θ (z − zg) when the diameter grows toward the free end.
    const Cone drawing = cone(0, 30, 5.0, Widens::TowardTailstock);
    const double t = std::tan(degToRad(5.2));
    Measurements m;
    m.diameters = {dia(5, 30.1 - 2 * t * 5), dia(25, 30.1 - 2 * t * 25)};
    const ConeFit f = fitCone(drawing, m);
    REQUIRE(f.ok);
    CHECK(radToDeg(f.halfAngleRad) == Approx(5.2).margin(1e-9));
    CHECK(f.gaugeDiameterMm == Approx(30.1).margin(1e-9));
}

TEST_CASE("readings over rolls fit the cone, both directions of the formula", "[cone_fit]") {
    // Source: references R6: M = D + d (1 + sec θ), and back D = M − d (1 + sec θ).
    const Cone drawing = cone(60, 24, 1.4321, Widens::TowardChuck);
    const double th = degToRad(1.45), d = 8.0;
    auto dAt = [&](double z) { return 24.05 + 2 * std::tan(th) * (z - 60); };
    Measurements m;
    RollsReading r;
    r.rollDiameterMm = d;
    r.zMm = {12, 45};
    r.readingMm = {readingOverRollsMm(dAt(12), d, th), readingOverRollsMm(dAt(45), d, th)};
    r.uncertaintyMm = 0.003;
    m.rolls = {r};
    CHECK(diameterFromRollReadingMm(r.readingMm[0], d, th) == Approx(dAt(12)).margin(1e-12));
    const ConeFit f = fitCone(drawing, m);
    REQUIRE(f.ok);
    CHECK(radToDeg(f.halfAngleRad) == Approx(1.45).margin(1e-9));
    CHECK(f.gaugeDiameterMm == Approx(24.05).margin(1e-9));
}

TEST_CASE("a ring gauge's stand-off s moves the gauge diameter by 2 s tan θ", "[cone_fit]") {
    // derived (plain geometry; references R10): the gauge's diameter Dg sits s further along,
    // so the diameter at the drawing's gauge plane differs from Dg by 2 s tan θ.
    const Cone drawing = cone(50, 20, 2.0, Widens::TowardChuck);
    for (double s : {-0.4, 0.0, 0.25, 1.0}) {
        Measurements m;
        GaugeReading g;
        g.gaugeDiameterMm = 20.0;
        g.referenceZMm = 50;
        g.standOffMm = s;
        g.uncertaintyMm = 0.02;
        m.gauges = {g};
        IndicatorReading ind; // the angle from an indicator along the axis: Δ = L tan θ
        ind.travelMm = 40;
        ind.changeMm = 40 * std::tan(degToRad(2.0));
        ind.uncertaintyMm = 0.005;
        m.indicators = {ind};
        const ConeFit f = fitCone(drawing, m);
        REQUIRE(f.ok);
        INFO("s = " << s);
        CHECK(radToDeg(f.halfAngleRad) == Approx(2.0).margin(1e-9));
        CHECK(20.0 - f.gaugeDiameterMm == Approx(2 * s * std::tan(degToRad(2.0))).margin(1e-9));
    }
}

TEST_CASE("an indicator run on the compound reads L (cos α tan θ − sin α)", "[cone_fit]") {
    // Source: references R10 (derived): along the axis (α = 0) it reads L tan θ; run at the
    // cone's own angle it reads nothing.
    const Cone drawing = cone(0, 10, 3.0, Widens::TowardChuck);
    const double th = degToRad(3.1);
    Measurements m;
    m.diameters = {dia(5, 10 + 2 * std::tan(th) * 5)};
    IndicatorReading a;
    a.travelMm = 50;
    a.lineAngleRad = degToRad(3.0);
    a.changeMm = 50 * (std::cos(a.lineAngleRad) * std::tan(th) - std::sin(a.lineAngleRad));
    a.uncertaintyMm = 0.005;
    m.indicators = {a};
    const ConeFit f = fitCone(drawing, m);
    REQUIRE(f.ok);
    CHECK(radToDeg(f.halfAngleRad) == Approx(3.1).margin(1e-9));
    CHECK(a.changeMm == Approx(50 * std::sin(th - a.lineAngleRad) / std::cos(th)).margin(1e-12));
}

TEST_CASE("more readings than unknowns: residuals show a bad one", "[cone_fit]") {
    // common practice: a reading more than three uncertainties off the rest is suspect.
    const Cone drawing = cone(60, 24, 1.4321, Widens::TowardChuck);
    const double t = std::tan(degToRad(1.4321));
    Measurements m;
    for (double z : {10.0, 25.0, 40.0, 55.0})
        m.diameters.push_back(dia(z, 24 + 2 * t * (z - 60)));
    SECTION("consistent set") {
        const ConeFit f = fitCone(drawing, m);
        REQUIRE(f.ok);
        CHECK(f.chiSquare == Approx(0).margin(1e-9));
    }
    SECTION("one reading 0.02 mm off") {
        m.diameters[2].valueMm += 0.02;
        const ConeFit f = fitCone(drawing, m);
        CHECK_FALSE(f.ok);
        CHECK_THAT(f.problem, Catch::Contains("diameter[3]"));
        REQUIRE(f.residuals.size() == 4);
        CHECK(std::fabs(f.residuals[2].normalised()) > kMaxNormalisedResidual);
    }
}

TEST_CASE("a contradictory set is refused", "[cone_fit]") {
    const Cone drawing = cone(60, 24, 1.4321, Widens::TowardChuck);
    SECTION("two diameters narrowing toward the chuck") {
        Measurements m;
        m.diameters = {dia(10, 24.0), dia(60, 23.0)};
        const ConeFit f = fitCone(drawing, m);
        CHECK_FALSE(f.ok);
        CHECK_THAT(f.problem, Catch::Contains("narrow"));
        CHECK(f.residuals.size() == 2);
    }
    SECTION("an angle far off the drawing's") {
        Measurements m;
        m.diameters = {dia(10, 12.0), dia(60, 24.0)}; // 6.8° half angle against 1.43°
        const ConeFit f = fitCone(drawing, m);
        CHECK_FALSE(f.ok);
        CHECK_THAT(f.problem, Catch::Contains("more than 5°"));
    }
    SECTION("one plane only") {
        Measurements m;
        m.diameters = {dia(30, 22.5), dia(30, 22.5)};
        CHECK_THAT(fitCone(drawing, m).problem, Catch::Contains("not the angle"));
    }
    SECTION("an angle only") {
        Measurements m;
        IndicatorReading a;
        a.travelMm = 10;
        a.changeMm = 0.25;
        a.uncertaintyMm = 0.005;
        m.indicators = {a};
        CHECK_THAT(fitCone(drawing, m).problem, Catch::Contains("nothing gives a size"));
    }
}
