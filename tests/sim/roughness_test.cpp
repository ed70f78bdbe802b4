// Tests for sim/include/swarf/sim/roughness.h.
#include "swarf/sim/roughness.h"

#include <catch2/catch.hpp>
#include <cmath>
#include <utility>
#include <vector>

using namespace swarf;

namespace {
// Ra of the arc profile by brute-force midpoint integration over one feed (derived), an
// independent check of the closed form.
double raNumeric(double f, double r) {
    const int n = 400000;
    std::vector<double> y(n);
    double mean = 0;
    for (int i = 0; i < n; ++i) {
        const double x = -f / 2 + (i + 0.5) * f / n;
        y[i] = r - std::sqrt(r * r - x * x);
        mean += y[i];
    }
    mean /= n;
    double ra = 0;
    for (double v : y)
        ra += std::fabs(v - mean);
    return ra / n;
}
} // namespace

TEST_CASE("R2 check values", "[roughness]") {
    // Source: references R2 (El-Hofy Rt = f²/(8r); exact arc cusp; Boothroyd Ra 0.0321 f²/r,
    // from memory in the reference; exact arc Ra): f 0.2 mm, r 0.8 mm.
    CHECK(rtApproxMm(0.2, 0.8) * 1000 == Approx(6.250).margin(5e-4));
    CHECK(rtExactMm(0.2, 0.8) * 1000 == Approx(6.275).margin(5e-4));
    CHECK(raApproxMm(0.2, 0.8) * 1000 == Approx(1.605).margin(5e-4));
    CHECK(raExactMm(0.2, 0.8) * 1000 == Approx(1.609).margin(5e-4));
    // Source: references R2: f 0.1 mm, r 0.4 mm.
    CHECK(rtApproxMm(0.1, 0.4) * 1000 == Approx(3.125).margin(5e-4));
    CHECK(rtExactMm(0.1, 0.4) * 1000 == Approx(3.137).margin(5e-4));
    CHECK(raApproxMm(0.1, 0.4) * 1000 == Approx(0.8025).margin(5e-5));
}

TEST_CASE("exact Ra coefficient: 0.03217 at f 0.2, r 0.8; f²/(18√3 r) for small feeds",
          "[roughness]") {
    // Source: references R2: the exact arc profile gives 0.03217 f²/r (for its f 0.2, r 0.8).
    const double f = 0.2, r = 0.8;
    CHECK(raExactMm(f, r) / (f * f / r) == Approx(0.03217).margin(1e-5));
    // derived: the parabola's Ra is f²/(18√3 r); the arc approaches it as f/r → 0.
    CHECK(raExactMm(0.001, 10.0) / (0.001 * 0.001 / 10.0) ==
          Approx(1.0 / (18.0 * std::sqrt(3.0))).epsilon(1e-6));
}

TEST_CASE("exact Ra agrees with numeric integration of the arc", "[roughness]") {
    // derived: independent midpoint integration.
    const std::vector<std::pair<double, double>> cases{
        {0.2, 0.8}, {0.1, 0.4}, {0.5, 0.4}, {0.75, 0.4}, {0.05, 2.4}};
    for (auto [f, r] : cases) {
        INFO("f " << f << " r " << r);
        CHECK(raExactMm(f, r) == Approx(raNumeric(f, r)).epsilon(1e-6));
    }
}

TEST_CASE("roughness properties", "[roughness]") {
    // derived: exact Rt is above the parabola's, both grow with feed and fall with radius.
    for (double f : {0.05, 0.1, 0.3}) {
        CHECK(rtExactMm(f, 0.8) > rtApproxMm(f, 0.8));
        CHECK(rtExactMm(f, 0.8) < rtExactMm(f * 1.1, 0.8));
        CHECK(rtExactMm(f, 0.8) > rtExactMm(f, 1.2));
        CHECK(raExactMm(f, 0.8) < rtExactMm(f, 0.8));
    }
    // derived: a feed of 2r leaves cusps as high as the radius.
    CHECK(rtExactMm(1.5999999, 0.8) == Approx(0.8).margin(1e-3));
}
