// Tests for sim/include/swarf/sim/sine_bar.h.
#include "swarf/sim/sine_bar.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <cmath>
#include <map>

using namespace swarf;

namespace {
// Every block of the stack is in the set, and none is used more often than the set has it.
bool blocksFromSet(const GaugeStack& s, const GaugeBlockSet& set) {
    std::map<long long, int> have;
    for (double b : set.sizes)
        ++have[std::llround(b * 1e6)];
    for (double b : s.blocks)
        if (--have[std::llround(b * 1e6)] < 0)
            return false;
    return true;
}
double sum(const std::vector<double>& v) {
    double t = 0;
    for (double x : v)
        t += x;
    return t;
}
} // namespace

TEST_CASE("R4 sine bar stacks", "[sine_bar]") {
    // Source: references R4: H = L sin θ; 5 in at 27° → 2.270 in; at 18° → 1.545 in;
    // 200 mm at 15° → 51.7638 mm.
    CHECK(sineBarStackMm(5 * kMmPerInch, degToRad(27)) / kMmPerInch == Approx(2.270).margin(5e-4));
    CHECK(sineBarStackMm(5 * kMmPerInch, degToRad(18)) / kMmPerInch == Approx(1.545).margin(5e-4));
    CHECK(sineBarStackMm(200.0, degToRad(15)) == Approx(51.7638).margin(5e-5));
    CHECK(sineBarAngleRad(200.0, sineBarStackMm(200.0, 0.3)) == Approx(0.3));
    // Source: references R4: common lengths 5 in, 10 in, 100 mm, 200 mm.
    const auto bars = commonSineBars();
    REQUIRE(bars.size() == 4);
    CHECK(bars[0].lengthMm == Approx(127.0));
    CHECK(bars[1].lengthMm == Approx(254.0));
    CHECK(bars[2].lengthMm == Approx(100.0));
    CHECK(bars[3].lengthMm == Approx(200.0));
}

TEST_CASE("common block sets", "[sine_bar]") {
    // common practice: an 81-piece inch set and an 87-piece metric set.
    const auto inch = commonInchBlockSet();
    const auto metric = commonMetricBlockSet();
    CHECK(inch.sizes.size() == 81);
    CHECK(metric.sizes.size() == 87);
    CHECK(inch.units == Units::Inch);
    CHECK(metric.units == Units::Mm);
    CHECK(std::count_if(inch.sizes.begin(), inch.sizes.end(),
                        [](double s) { return std::fabs(s - 0.1005) < 1e-9; }) == 1);
}

TEST_CASE("stacks for the R4 heights", "[sine_bar]") {
    const auto inch = commonInchBlockSet();
    const auto metric = commonMetricBlockSet();
    // Source: references R4: 5 in bar at 27° → 2.270 in (the stack is rounded to 0.0001 in).
    const double h27 = sineBarStackMm(5 * kMmPerInch, degToRad(27));
    const auto s27 = combineGaugeBlocks(h27, inch);
    REQUIRE(s27.found);
    CHECK(sum(s27.blocks) == Approx(2.2700).margin(1e-9)); // 2.26995 in rounds to 2.2700 in
    CHECK(blocksFromSet(s27, inch));
    CHECK(s27.blocks.size() == 3); // derived: 3 (e.g. 2 + 0.136 + 0.134); no two blocks make 2.2700
    CHECK(std::fabs(s27.builtMm - h27) <= s27.resolutionMm / 2 + 1e-12);
    // Source: references R4: 200 mm bar at 15° → 51.7638 mm, built to 51.764 mm.
    const auto s15 = combineGaugeBlocks(sineBarStackMm(200.0, degToRad(15)), metric);
    REQUIRE(s15.found);
    CHECK(sum(s15.blocks) == Approx(51.764).margin(1e-9));
    CHECK(blocksFromSet(s15, metric));
    CHECK(s15.resolutionMm == Approx(0.001));
    // derived: the inch set builds a metric height to the nearest 0.0001 in.
    const auto x = combineGaugeBlocks(51.7638, inch);
    REQUIRE(x.found);
    CHECK(std::fabs(x.builtMm - 51.7638) <= 0.00005 * kMmPerInch + 1e-12);
}

TEST_CASE("every stack of the four bars over a sweep of angles", "[sine_bar]") {
    const auto inch = commonInchBlockSet();
    const auto metric = commonMetricBlockSet();
    for (const auto& bar : commonSineBars()) {
        const auto& set = bar.name.find("in") != std::string::npos ? inch : metric;
        for (double deg : {1.0, 1.4321, 2.8624, 5.0, 8.29714, 14.04, 30.0, 45.0, 60.0}) {
            INFO(bar.name << " " << deg << "°");
            const double h = sineBarStackMm(bar.lengthMm, degToRad(deg));
            const auto s = combineGaugeBlocks(h, set);
            // derived: the common sets build every step from about 0.2 in and 3 mm up; below
            // that some heights have no combination (see the next test case).
            if (fromMm(h, set.units) < (set.units == Units::Inch ? 0.2 : 3.0))
                continue;
            REQUIRE(s.found);
            CHECK(blocksFromSet(s, set));
            CHECK(std::fabs(s.builtMm - h) <= s.resolutionMm / 2 + 1e-9);
        }
    }
}

TEST_CASE("no combination gives a clear result", "[sine_bar]") {
    const GaugeBlockSet tiny{"test set", Units::Mm, {1.0, 2.0, 5.0}};
    const auto a = combineGaugeBlocks(4.0, tiny);
    CHECK_FALSE(a.found);
    CHECK_FALSE(a.reason.empty());
    const auto b = combineGaugeBlocks(100.0, tiny);
    CHECK_FALSE(b.found);
    CHECK(b.reason.find("taller") != std::string::npos);
    CHECK_FALSE(combineGaugeBlocks(0.0, tiny).found);
    CHECK_FALSE(combineGaugeBlocks(3.0, GaugeBlockSet{"empty", Units::Mm, {}}).found);
    CHECK_FALSE(combineGaugeBlocks(3.0, GaugeBlockSet{"bad", Units::Mm, {1.0, -2.0}}).found);
    // derived: 100 mm bar at 1° → 1.745 mm: the 87-piece set needs 1.005 for the last digit
    // and has nothing for the 0.740 left.
    const auto d = combineGaugeBlocks(sineBarStackMm(100.0, degToRad(1)), commonMetricBlockSet());
    CHECK_FALSE(d.found);
    CHECK(d.reason.find("no combination") != std::string::npos);
    const auto c = combineGaugeBlocks(8.0, tiny);
    REQUIRE(c.found);
    CHECK(c.blocks == std::vector<double>{5.0, 2.0, 1.0});
}

TEST_CASE("fewest blocks (checked by brute force on a small set)", "[sine_bar]") {
    const GaugeBlockSet set{"test set", Units::Mm, {1.005, 1.01, 1.02, 1.05, 1.5, 2.0, 3.0, 4.5}};
    const int n = static_cast<int>(set.sizes.size());
    for (int mask = 1; mask < (1 << n); ++mask) {
        double h = 0;
        int count = 0;
        for (int i = 0; i < n; ++i)
            if (mask & (1 << i))
                h += set.sizes[i], ++count;
        int fewest = count;
        for (int m2 = 1; m2 < (1 << n); ++m2) {
            double h2 = 0;
            int c2 = 0;
            for (int i = 0; i < n; ++i)
                if (m2 & (1 << i))
                    h2 += set.sizes[i], ++c2;
            if (std::fabs(h2 - h) < 1e-9)
                fewest = std::min(fewest, c2);
        }
        const auto s = combineGaugeBlocks(h, set);
        REQUIRE(s.found);
        CHECK(static_cast<int>(s.blocks.size()) == fewest);
        CHECK(sum(s.blocks) == Approx(h).margin(1e-9));
    }
}
