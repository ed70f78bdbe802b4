// Tests of ISO 1832 insert letters and codes, ISO 5608 holder letters, and nose radius limits.
#include "swarf/io/insert_codes.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>
#include <string>

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
    // derived: a 55° rhombus with a 9.525 mm (3/8 in) inscribed circle has 9.525 / sin 55° =
    // 11.63 mm edges; the size code 11 is that truncated (common practice: catalogues print
    // l = 11.6 for this insert, from memory).
    CHECK(d->inscribedCircleMm == 9.525);
    CHECK(d->edgeLengthMm == Approx(11.628).margin(5e-4));
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

TEST_CASE("ISO 1832 size codes: the edge length from the inscribed circle, every shape",
          "[io][insert]") {
    const double deg = std::numbers::pi / 180;
    // Source: a tool maker's general catalogue (tests/REFERENCES.md, "Insert size codes"): size
    // codes by inscribed circle for C, S and T inserts.
    struct Row {
        double icMm;
        int c, s, t;
    };
    for (const Row& r : {Row{6.35, 6, 6, 11}, Row{7.94, 8, 7, 13}, Row{9.525, 9, 9, 16},
                         Row{12.7, 12, 12, 22}, Row{15.875, 16, 15, 27}}) {
        INFO("IC " << r.icMm);
        CHECK(inscribedCircleOfSizeCodeMm('C', r.c) == r.icMm);
        CHECK(inscribedCircleOfSizeCodeMm('S', r.s) == r.icMm);
        CHECK(inscribedCircleOfSizeCodeMm('T', r.t) == r.icMm);
    }
    // from memory (common catalogue designations), each with its inscribed circle, and the
    // edge length derived from it by plane geometry (the test's own formulas, derived):
    struct Insert {
        const char* code;
        double icMm, edgeMm;
    };
    const double rho = 12.7 / 2;
    for (const Insert& i :
         {Insert{"CNMG 120408", 12.7, 12.7 / std::sin(80 * deg)},   // 12.90
          Insert{"CCMT 09T304", 9.525, 9.525 / std::sin(80 * deg)}, // 9.67
          Insert{"DNMG 150608", 12.7, 12.7 / std::sin(55 * deg)},   // 15.50
          Insert{"DCMT 070204", 6.35, 6.35 / std::sin(55 * deg)},   // 7.75
          Insert{"ECMT 130408", 12.7, 12.7 / std::sin(75 * deg)},   // 13.15
          Insert{"SNMG 120408", 12.7, 12.7},
          Insert{"TNMG 160408", 9.525, 9.525 * std::sqrt(3.0)},     // 16.50
          Insert{"TCMT 110204", 6.35, 6.35 * std::sqrt(3.0)},       // 11.00
          Insert{"VBMT 160404", 9.525, 9.525 / std::sin(35 * deg)}, // 16.61
          Insert{"VCMT 110304", 6.35, 6.35 / std::sin(35 * deg)},   // 11.07
          // a trigon: six sides, corners of 80° and 160° in turn, all tangent to the circle
          Insert{"WNMG 080408", 12.7, rho / std::tan(40 * deg) + rho / std::tan(80 * deg)},
          Insert{"WNMG 060408", 9.525,
                 9.525 / 2 / std::tan(40 * deg) + 9.525 / 2 / std::tan(80 * deg)},
          Insert{"RCMT 10T3M0", 10.0, 10.0}, // round: the size code is the diameter
          Insert{"RCMT 1204M0", 12.0, 12.0}}) {
        INFO(i.code);
        const auto c = parseInsertCode(i.code);
        REQUIRE(c);
        CHECK(c->inscribedCircleMm == i.icMm);
        CHECK(c->edgeLengthMm == Approx(i.edgeMm).epsilon(1e-12));
        // ISO 1832: the size code is the edge length (to 0.1 mm, as tabulated) truncated to
        // whole millimetres (from memory).
        CHECK(static_cast<int>(std::round(c->edgeLengthMm * 10) / 10) ==
              std::stoi(std::string(i.code).substr(5, 2)));
    }
    // derived: the regular polygons' sides from their inscribed circle.
    CHECK(*edgeLengthFromInscribedCircleMm('H', 10) == Approx(10 * std::tan(30 * deg)));
    CHECK(*edgeLengthFromInscribedCircleMm('O', 10) == Approx(10 * std::tan(22.5 * deg)));
    CHECK(*edgeLengthFromInscribedCircleMm('P', 10) == Approx(10 * std::tan(36 * deg)));
    CHECK(*edgeLengthFromInscribedCircleMm('M', 10) == Approx(10 / std::sin(86 * deg)));
    // A parallelogram's edge is not fixed by its circle: the code's whole millimetres.
    CHECK_FALSE(edgeLengthFromInscribedCircleMm('K', 9.525).has_value());
    const auto k = parseInsertCode("KNUX 160405");
    REQUIRE(k);
    CHECK(k->edgeLengthMm == 16);
    // No insert of these shapes has these sizes.
    CHECK_FALSE(parseInsertCode("DCMT 10T304").has_value());
    CHECK_FALSE(parseInsertCode("SNMG 130408").has_value());
    // The inverse, for the nose-radius limit: a trigon's circle from its edge (derived).
    CHECK(inscribedCircleMm('W', 80 * deg, rho / std::tan(40 * deg) + rho / std::tan(80 * deg)) ==
          Approx(12.7));
}
