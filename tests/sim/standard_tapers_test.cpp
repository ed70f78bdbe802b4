// Tests for lookupStandardTaper / standardTaperNames (sim/include/swarf/sim/cone.h,
// sim/src/standard_tapers.cpp).
#include "swarf/sim/cone.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

namespace {
double dms(double d, double m, double s) {
    return degToRad(d + m / 60.0 + s / 3600.0);
}
double includedOf(const StandardTaper& t) {
    return 2.0 * halfAngleFromTaperRate(t.taperRate);
}
constexpr double kArcSec = 3.14159265358979323846 / 180.0 / 3600.0;
} // namespace

TEST_CASE("Morse 0-6 ratios, taper per foot, gauge diameters and included angles", "[taper]") {
    struct Row {
        int size;
        double k, tpf, gaugeIn;
        double d, m, s;
    };
    // Source: references R3 (Morse ratios GOST 25307-82; gauge D1 Machinery's Handbook).
    const Row rows[] = {
        {0, 19.212, 0.62460, 0.3561, 2, 58, 53.8}, {1, 20.047, 0.59858, 0.475, 2, 51, 26.9},
        {2, 20.020, 0.59941, 0.700, 2, 51, 40.8},  {3, 19.922, 0.60235, 0.938, 2, 52, 31.5},
        {4, 19.254, 0.62326, 1.231, 2, 58, 30.4},  {5, 19.002, 0.63151, 1.748, 3, 0, 52.4},
        {6, 19.180, 0.62565, 2.494, 2, 59, 11.7},
    };
    for (const auto& r : rows) {
        INFO("Morse " << r.size);
        auto t = lookupStandardTaper("Morse " + std::to_string(r.size));
        REQUIRE(t);
        CHECK(t->name == "Morse " + std::to_string(r.size));
        CHECK(1.0 / t->taperRate == Approx(r.k).margin(1e-9));
        // The table's taper per foot is rounded from the exact ratio: agree to 1.5e-5 in/ft.
        CHECK(12.0 * t->taperRate == Approx(r.tpf).margin(1.5e-5));
        REQUIRE(t->gaugeDiameterMm);
        CHECK(*t->gaugeDiameterMm == Approx(r.gaugeIn * kMmPerInch).margin(1e-9));
        // The table's angles are to 0.1″ from the unrounded ratio: agree within 0.06″.
        CHECK(std::fabs(includedOf(*t) - dms(r.d, r.m, r.s)) < 0.06 * kArcSec);
    }
}

TEST_CASE("forgiving names", "[taper]") {
    for (const char* n :
         {"morse3", "MT3", "Morse 3", "mt 3", "Morse #3", "morse no. 3", "MORSE-3"}) {
        INFO(n);
        auto t = lookupStandardTaper(n);
        REQUIRE(t);
        CHECK(t->name == "Morse 3");
    }
    for (const char* n : {"metric 80", "Metric80", "ME 80"}) {
        INFO(n);
        auto t = lookupStandardTaper(n);
        REQUIRE(t);
        CHECK(t->name == "Metric 80");
        // derived: ISO 296 gauge diameter equals the size in mm.
        CHECK(*t->gaugeDiameterMm == 80.0);
    }
    CHECK(lookupStandardTaper("7:24")->name == "7:24");
    CHECK(lookupStandardTaper("npt")->name == "NPT");
    CHECK(lookupStandardTaper("Jarno 6")->name == "Jarno 6");
    CHECK(lookupStandardTaper("B&S 7")->name == "B&S 7");
    CHECK(lookupStandardTaper("Brown & Sharpe 7")->name == "B&S 7");
    CHECK(lookupStandardTaper("1:10")->name == "1:10");
    CHECK(lookupStandardTaper("7:24 40")->name == "7:24 size 40");
    CHECK(lookupStandardTaper("SK 40")->name == "7:24 size 40");
}

TEST_CASE("unknown names are empty", "[taper]") {
    for (const char* n : {"", "morse", "Morse 7", "morse -1", "metric 81", "Jarno 1", "Jarno 21",
                          "B&S 19", "1:7", "1:", "fancy", "7:25", "Morse 3x"}) {
        INFO(n);
        CHECK_FALSE(lookupStandardTaper(n));
    }
}

TEST_CASE("metric 1:20 and its sizes", "[taper]") {
    for (int size : {4, 6, 80, 100, 120, 160, 200}) {
        auto t = lookupStandardTaper("metric " + std::to_string(size));
        REQUIRE(t);
        // Source: references R3, metric 1:20 (ISO 296): half angle 1.43210°, included 2°51′51.09″.
        CHECK(radToDeg(halfAngleFromTaperRate(t->taperRate)) == Approx(1.43210).margin(5e-6));
        CHECK(std::fabs(includedOf(*t) - dms(2, 51, 51.09)) < 0.005 * kArcSec);
        CHECK(*t->gaugeDiameterMm == Approx(size));
    }
}

TEST_CASE("7:24 steep taper", "[taper]") {
    auto t = lookupStandardTaper("7:24");
    REQUIRE(t);
    const double half = halfAngleFromTaperRate(t->taperRate);
    // Source: references R3, 7:24 steep taper (ISO 297): half angle 8.29714° (8°17′49.72″).
    CHECK(radToDeg(half) == Approx(8.29714).margin(5e-6));
    CHECK(std::fabs(half - dms(8, 17, 49.72)) < 0.005 * kArcSec);
    // Source: references R3: atan(7/24)/2 is wrong; pin that we do not compute that.
    CHECK(std::fabs(half - std::atan(7.0 / 24.0) / 2.0) > degToRad(0.1));
    // from memory (ISO 297): size 40 gauge diameter 44.45 mm.
    CHECK(*lookupStandardTaper("7:24 40")->gaugeDiameterMm == Approx(44.45));
    CHECK(lookupStandardTaper("7:24 40")->taperRate == t->taperRate);
}

TEST_CASE("NPT, Jarno, Brown & Sharpe", "[taper]") {
    auto npt = lookupStandardTaper("NPT");
    REQUIRE(npt);
    // Source: references R3, NPT (ASME B1.20.1): 1:16 on diameter, half angle 1.7899°.
    CHECK(npt->taperRate == Approx(1.0 / 16.0));
    CHECK(radToDeg(halfAngleFromTaperRate(npt->taperRate)) == Approx(1.7899).margin(5e-5));
    CHECK_FALSE(npt->gaugeDiameterMm);

    // Source: references R3, Jarno 0.600 in/ft, large end No./8 in.
    auto j = lookupStandardTaper("Jarno 6");
    REQUIRE(j);
    CHECK(12.0 * j->taperRate == Approx(0.600));
    CHECK(*j->gaugeDiameterMm == Approx(6.0 / 8.0 * 25.4));
    // Source: references R3: small end No./10 in, length No./2 in agree with 0.600 in/ft.
    const double large = 6.0 / 8.0, small = 6.0 / 10.0, len = 6.0 / 2.0;
    CHECK((large - small) / len == Approx(j->taperRate));

    // Source: references R3, Brown & Sharpe about 0.500 in/ft.
    auto b = lookupStandardTaper("B&S 7");
    REQUIRE(b);
    CHECK(12.0 * b->taperRate == Approx(0.500));
    CHECK_FALSE(b->gaugeDiameterMm);
}

TEST_CASE("ISO 1119 series", "[taper]") {
    // Source: references R3, ISO 1119: 1:10 → 5°43′29.3176″, 1:50 → 1°8′45.1586″,
    // 1:3 → 18°55′28.7199″ included.
    struct Row {
        const char* name;
        double d, m, s;
    };
    for (const Row& r :
         {Row{"1:10", 5, 43, 29.3176}, Row{"1:50", 1, 8, 45.1586}, Row{"1:3", 18, 55, 28.7199}}) {
        INFO(r.name);
        auto t = lookupStandardTaper(r.name);
        REQUIRE(t);
        CHECK(std::fabs(includedOf(*t) - dms(r.d, r.m, r.s)) < 0.0001 * kArcSec);
    }
}

TEST_CASE("every listed name looks up to itself", "[taper]") {
    const auto names = standardTaperNames();
    CHECK(names.size() > 40);
    for (const auto& n : names) {
        INFO(n);
        auto t = lookupStandardTaper(n);
        REQUIRE(t);
        CHECK(t->name == n);
        CHECK(t->taperRate > 0);
        CHECK_FALSE(t->note.empty());
    }
}
