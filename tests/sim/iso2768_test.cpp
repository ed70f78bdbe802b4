// Tests for sim/include/swarf/sim/iso2768.h.
#include "swarf/sim/iso2768.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>

using namespace swarf;

TEST_CASE("ISO 2768-1 linear tolerances, 0.5 to 400 mm", "[iso2768]") {
    // Representative sizes inside each band and at its upper limit (limits belong to the band).
    const double sizes[5][2] = {
        {1.0, 3.0}, {4.0, 6.0}, {10.0, 30.0}, {50.0, 120.0}, {200.0, 400.0}};
    // Source: references R9 (ISO 2768-1), bands 0.5–3/3–6/6–30/30–120/120–400 mm.
    const double f[5] = {0.05, 0.05, 0.1, 0.15, 0.2};
    const double m[5] = {0.1, 0.1, 0.2, 0.3, 0.5};
    const double c[5] = {0.2, 0.3, 0.5, 0.8, 1.2};
    const double v[5] = {-1, 0.5, 1.0, 1.5, 2.5};
    for (int band = 0; band < 5; ++band) {
        for (double size : sizes[band]) {
            INFO("size " << size);
            CHECK(*iso2768LinearToleranceMm(Iso2768::f, size) == Approx(f[band]));
            CHECK(*iso2768LinearToleranceMm(Iso2768::m, size) == Approx(m[band]));
            CHECK(*iso2768LinearToleranceMm(Iso2768::c, size) == Approx(c[band]));
            if (v[band] < 0)
                CHECK_FALSE(
                    iso2768LinearToleranceMm(Iso2768::v, size)); // Source: references R9 ("–")
            else
                CHECK(*iso2768LinearToleranceMm(Iso2768::v, size) == Approx(v[band]));
        }
    }
    // Just over a band limit is the next band. Source: references R9.
    CHECK(*iso2768LinearToleranceMm(Iso2768::m, 30.001) == Approx(0.3));
    CHECK(*iso2768LinearToleranceMm(Iso2768::c, 3.001) == Approx(0.3));
}

TEST_CASE("ISO 2768-1 linear tolerances beyond 400 mm and out of range", "[iso2768]") {
    // from memory (ISO 2768-1 table 1): 400–1000, 1000–2000, 2000–4000 mm.
    CHECK(*iso2768LinearToleranceMm(Iso2768::f, 500) == Approx(0.3));
    CHECK(*iso2768LinearToleranceMm(Iso2768::m, 1500) == Approx(1.2));
    CHECK(*iso2768LinearToleranceMm(Iso2768::c, 3000) == Approx(4.0));
    CHECK(*iso2768LinearToleranceMm(Iso2768::v, 4000) == Approx(8.0));
    CHECK_FALSE(iso2768LinearToleranceMm(Iso2768::f, 3000));
    // Header contract: empty above 4000 mm; below 0.5 mm the drawing must state a tolerance.
    CHECK_FALSE(iso2768LinearToleranceMm(Iso2768::m, 4000.5));
    CHECK_FALSE(iso2768LinearToleranceMm(Iso2768::m, 0.3));
}

TEST_CASE("ISO 2768-1 angular tolerances", "[iso2768]") {
    const double legs[5] = {10.0, 50.0, 120.0, 400.0, 1000.0}; // each at its band's upper limit
    const double legsInside[5] = {5.0, 20.0, 80.0, 200.0, 401.0};
    // Source: references R9, by shorter leg ≤10/10–50/50–120/120–400/>400 mm, in minutes.
    const double fm[5] = {60, 30, 20, 10, 5};
    const double c[5] = {90, 60, 30, 15, 10};
    const double v[5] = {180, 120, 60, 30, 20};
    for (int b = 0; b < 5; ++b) {
        for (double leg : {legs[b], legsInside[b]}) {
            INFO("leg " << leg);
            CHECK(iso2768AngularToleranceRad(Iso2768::f, leg) == Approx(degToRad(fm[b] / 60)));
            CHECK(iso2768AngularToleranceRad(Iso2768::m, leg) == Approx(degToRad(fm[b] / 60)));
            CHECK(iso2768AngularToleranceRad(Iso2768::c, leg) == Approx(degToRad(c[b] / 60)));
            CHECK(iso2768AngularToleranceRad(Iso2768::v, leg) == Approx(degToRad(v[b] / 60)));
        }
    }
}

TEST_CASE("ISO 2768 class letters", "[iso2768]") {
    for (Iso2768 c : {Iso2768::f, Iso2768::m, Iso2768::c, Iso2768::v})
        CHECK(parseIso2768(iso2768Name(c)) == c);
    CHECK(parseIso2768("M") == Iso2768::m);
    CHECK_FALSE(parseIso2768("k"));
    CHECK_FALSE(parseIso2768("mm"));
    CHECK_FALSE(parseIso2768(""));
}
