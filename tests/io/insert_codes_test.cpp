// Tests of ISO 1832 insert letters and codes, ISO 5608 holder letters, and nose radius limits.
#include "swarf/io/insert_codes.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

using namespace swarf::io;

TEST_CASE("ISO 1832 shape letters give the included angle", "[io][insert]") {
    // Source: references R8
    CHECK(shapeIncludedAngleDeg('C') == 80.0);
    CHECK(shapeIncludedAngleDeg('D') == 55.0);
    CHECK(shapeIncludedAngleDeg('E') == 75.0);
    CHECK(shapeIncludedAngleDeg('S') == 90.0);
    CHECK(shapeIncludedAngleDeg('T') == 60.0);
    CHECK(shapeIncludedAngleDeg('V') == 35.0);
    CHECK(shapeIncludedAngleDeg('W') == 80.0);
    CHECK(shapeIncludedAngleDeg('K') == 55.0); // from memory (parallelogram K, 55°)
    CHECK(shapeIncludedAngleDeg('d') == 55.0);
    CHECK_FALSE(shapeIncludedAngleDeg('X').has_value());
}

TEST_CASE("ISO 5608 holder letters give the entering angle", "[io][insert]") {
    // Source: references R8 (manufacturers' tables)
    CHECK(holderEnteringAngleDeg('A') == 90.0);
    CHECK(holderEnteringAngleDeg('B') == 75.0);
    CHECK(holderEnteringAngleDeg('D') == 45.0);
    CHECK(holderEnteringAngleDeg('E') == 60.0);
    CHECK(holderEnteringAngleDeg('J') == 93.0);
    CHECK(holderEnteringAngleDeg('K') == 75.0);
    CHECK(holderEnteringAngleDeg('L') == 95.0);
    CHECK(holderEnteringAngleDeg('N') == 63.0);
    CHECK(holderEnteringAngleDeg('S') == 45.0);
    CHECK(holderEnteringAngleDeg('Y') == 85.0);
    // Source: references R8 (from memory there)
    CHECK(holderEnteringAngleDeg('Q') == 107.5);
    CHECK(holderEnteringAngleDeg('P') == 117.5);
    CHECK(holderEnteringAngleDeg('V') == 72.5);
    CHECK_FALSE(holderEnteringAngleDeg('Z').has_value());
}

TEST_CASE("ISO 1832 designations", "[io][insert]") {
    auto d = parseInsertCode("DCMT 11T304");
    REQUIRE(d);
    CHECK(d->shape == 'D');
    CHECK(d->edgeLengthMm == 11);
    CHECK(d->thicknessMm == Approx(3.97));
    CHECK(d->noseRadiusMm == Approx(0.4)); // Source: references R8 (code 04 → 0.4 mm)
    auto c = parseInsertCode("cnmg120408-pm");
    REQUIRE(c);
    CHECK(c->shape == 'C');
    CHECK(c->noseRadiusMm == Approx(0.8)); // Source: references R8 (code 08 → 0.8 mm)
    auto r = parseInsertCode("RCMT 10T3M0");
    REQUIRE(r);
    CHECK(r->noseRadiusMm == Approx(5.0));
    CHECK_FALSE(parseInsertCode("DCMT").has_value());
    CHECK_FALSE(parseInsertCode("XCMT 11T304").has_value());
    CHECK_FALSE(parseInsertCode("DCMT 11X304").has_value());
}

TEST_CASE("largest nose radius an insert can have", "[io][insert]") {
    const double deg = std::numbers::pi / 180;
    // derived: a 55° rhombus with 11 mm edges has an inscribed circle 11·sin 55° across
    CHECK(inscribedCircleMm('D', 55 * deg, 11) == Approx(11 * std::sin(55 * deg)));
    CHECK(maxNoseRadiusMm('D', 55 * deg, 11) == Approx(11 * std::sin(55 * deg) / 2));
    // derived: an equilateral triangle of side l has an inscribed circle l/√3 across
    CHECK(inscribedCircleMm('T', 60 * deg, 16.5) == Approx(16.5 / std::sqrt(3.0)));
    // derived: a narrow corner limits by tangent length: r ≤ l·tan(ε/2) for 35° and l = 2
    CHECK(maxNoseRadiusMm('V', 35 * deg, 2) ==
          Approx(std::min(2 * std::sin(35 * deg) / 2, 2 * std::tan(17.5 * deg))));
    CHECK(maxNoseRadiusMm('R', 180 * deg, 10) == Approx(5));
}
