// Tests of swarf/viewer/trace.h: which rows draw the part, the decimated deviation line of the
// section and chart, and the close-up stretch.
#include "swarf/viewer/trace.h"

#include "support/synthetic.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/kernel.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <limits>

using namespace swarf;

namespace {

// Largest distance, in radius, between a profile and the polyline through the chosen rows.
double chordError(const Profile& p, const std::vector<std::size_t>& rows) {
    double worst = 0;
    for (std::size_t k = 0; k + 1 < rows.size(); ++k) {
        const std::size_t a = rows[k], b = rows[k + 1];
        for (std::size_t i = a; i <= b; ++i) {
            const double t = b > a ? static_cast<double>(i - a) / static_cast<double>(b - a) : 0.0;
            const double line = p.radiusMm[a] + (p.radiusMm[b] - p.radiusMm[a]) * t;
            worst = std::max(worst, std::fabs(p.radiusMm[i] - line));
        }
    }
    return worst;
}

Profile sampled(std::size_t n, double dz, const std::function<double(double)>& r) {
    Profile p;
    p.z0Mm = 0;
    p.dzMm = dz;
    for (std::size_t i = 0; i < n; ++i)
        p.radiusMm.push_back(r(p.zAt(i)));
    return p;
}

double peakToValley(const viewer::DeviationTrace& t, double z0, double z1) {
    double lo = HUGE_VAL, hi = -HUGE_VAL;
    for (std::size_t i = 0; i < t.zMm.size(); ++i)
        if (t.zMm[i] >= z0 && t.zMm[i] <= z1 && !std::isnan(t.deviationMm[i])) {
            lo = std::min(lo, t.deviationMm[i]);
            hi = std::max(hi, t.deviationMm[i]);
        }
    return hi - lo;
}

} // namespace

TEST_CASE("pickRows keeps both ends and at most the rows asked for", "[viewer][trace]") {
    for (std::size_t last : {0u, 1u, 7u, 999u, 31000u})
        for (std::size_t maxRows : {2u, 3u, 10u, 240u}) {
            const auto rows = viewer::pickRows(0, last, maxRows);
            INFO("last " << last << " max " << maxRows);
            REQUIRE(!rows.empty());
            CHECK(rows.front() == 0);
            CHECK(rows.back() == last);
            CHECK(rows.size() <= std::max<std::size_t>(maxRows, 2));
            CHECK(std::is_sorted(rows.begin(), rows.end()));
            CHECK(std::adjacent_find(rows.begin(), rows.end()) == rows.end());
        }
    CHECK(viewer::pickRows(5, 4, 10).empty());
}

TEST_CASE("profileRows keeps corners and steps within the tolerance", "[viewer][trace]") {
    const double tol = 0.006;
    // Invented shapes: a cone into a shoulder (a step), a cone with a chamfer, a wavy bar.
    const std::vector<Profile> shapes = {
        sampled(31001, 0.002, [](double z) { return z < 50 ? 12 + 0.05 * z : 15.0; }),
        sampled(20001, 0.002, [](double z) { return z < 1 ? 10 + z : 11 + 0.02 * (z - 1); }),
        sampled(10001, 0.01, [](double z) { return 15 + 0.2 * std::sin(z); }),
    };
    for (std::size_t s = 0; s < shapes.size(); ++s) {
        const Profile& p = shapes[s];
        const auto rows =
            viewer::profileRows(p, nullptr, 0, p.radiusMm.size() - 1, 50, tol, 1, 5000);
        INFO("shape " << s << ": " << rows.size() << " rows");
        CHECK(chordError(p, rows) <= tol + 1e-12);
        CHECK(rows.front() == 0);
        CHECK(rows.back() == p.radiusMm.size() - 1);
        CHECK(rows.size() < p.radiusMm.size() / 10); // far fewer than the samples
    }
    // The 0.5 mm step between z = 49.998 and 50 is drawn by the rows on both sides of it.
    const auto rows = viewer::profileRows(shapes[0], nullptr, 0, 31000, 50, tol, 1, 5000);
    CHECK(std::find(rows.begin(), rows.end(), 24999u) != rows.end());
    CHECK(std::find(rows.begin(), rows.end(), 25000u) != rows.end());
    // The budget is a hard limit.
    CHECK(viewer::profileRows(shapes[2], nullptr, 0, 10000, 10, 1e-9, 1, 64).size() <= 64);
}

TEST_CASE("profileRows keeps colours: the deviation between rows is within its tolerance",
          "[viewer][trace]") {
    // A straight cone whose deviation changes sharply at z = 20 (a step in the plan), NaN (off
    // the drawing) past z = 40.
    const Profile p = sampled(30001, 0.002, [](double z) { return 10 + 0.05 * z; });
    std::vector<double> dev(p.radiusMm.size());
    for (std::size_t i = 0; i < dev.size(); ++i) {
        const double z = p.zAt(i);
        dev[i] = z > 40 ? std::numeric_limits<double>::quiet_NaN() : (z < 20 ? 10.0 : -5.0);
    }
    const auto rows = viewer::profileRows(p, &dev, 0, dev.size() - 1, 20, 0.01, 0.4, 5000);
    // Between two kept rows with numbers, every sample is within 0.4 of the straight line.
    double worst = 0;
    for (std::size_t k = 0; k + 1 < rows.size(); ++k) {
        const std::size_t a = rows[k], b = rows[k + 1];
        if (std::isnan(dev[a]) || std::isnan(dev[b]))
            continue;
        for (std::size_t i = a; i <= b; ++i) {
            const double t = static_cast<double>(i - a) / static_cast<double>(b - a);
            worst = std::max(worst, std::fabs(dev[i] - (dev[a] + (dev[b] - dev[a]) * t)));
        }
    }
    CHECK(worst <= 0.4);
    // The edge of the drawing (z = 40) is kept on both sides.
    CHECK(std::find(rows.begin(), rows.end(), 20000u) != rows.end());
    CHECK(std::find(rows.begin(), rows.end(), 20001u) != rows.end());
}

TEST_CASE("minMaxSamples keeps the peaks and the breaks", "[viewer][trace]") {
    // 500 feed marks sampled 200 times each, decimated to 300 buckets: every bucket holds
    // several marks, and the highest and lowest values survive.
    std::vector<double> z, v;
    for (int i = 0; i <= 100000; ++i) {
        z.push_back(i * 0.0005);
        v.push_back(i == 61200 ? 1.5 : std::cos(2 * kPi * i / 200.0)); // one mark taller
    }
    v[70000] = std::numeric_limits<double>::quiet_NaN();
    const auto keep = viewer::minMaxSamples(z, v, 300);
    CHECK(keep.size() <= 2 * 300 + 8);
    CHECK(std::is_sorted(keep.begin(), keep.end()));
    CHECK(keep.front() == 0);
    CHECK(keep.back() == 100000);
    double hi = -HUGE_VAL, lo = HUGE_VAL;
    int nans = 0;
    for (std::size_t i : keep) {
        if (std::isnan(v[i])) {
            ++nans;
            continue;
        }
        hi = std::max(hi, v[i]);
        lo = std::min(lo, v[i]);
    }
    CHECK(hi == Approx(1.5).margin(1e-9)); // the one taller mark
    CHECK(lo == Approx(-1).margin(1e-9));
    CHECK(nans == 1);
    CHECK(std::find(keep.begin(), keep.end(), 69999u) != keep.end()); // the line ends at the break
    CHECK(std::find(keep.begin(), keep.end(), 70001u) != keep.end()); // and starts again after it
}

TEST_CASE("deviationTrace of a moment follows its profile; decimation keeps its extremes",
          "[viewer][trace]") {
    const Scene s = test::syntheticScene(3);
    const CutResult r = test::syntheticResult(
        s, [](int k) { return 1.0 - 0.4 * k; },
        [](double z) { return 0.001 * std::cos(2 * kPi * z / 0.1); });
    const auto m = describeMoment(s, r, 3);
    const auto full = viewer::deviationTrace(s, r, m, 0, 40, 0);
    CHECK_FALSE(full.feedMarks);      // no 3D surface in this result
    REQUIRE(full.zMm.size() >= 4000); // z = 0 to 40 on the 0.01 mm grid
    REQUIRE(full.zMm.size() <= 4001);
    for (std::size_t i = 0; i < full.zMm.size(); i += 250) {
        INFO("z " << full.zMm[i]);
        CHECK(full.nominalMm[i] == Approx(test::syntheticNominal(full.zMm[i])).margin(1e-9));
        const double cosA = std::cos(std::atan(0.05));
        CHECK(full.deviationMm[i] ==
              Approx((0.2 + 0.001 * std::cos(2 * kPi * full.zMm[i] / 0.1)) * cosA).margin(1e-9));
    }
    const auto small = viewer::decimateTrace(full, 200);
    CHECK(small.zMm.size() <= 210);
    CHECK(peakToValley(small, 0, 40) == Approx(peakToValley(full, 0, 40)).epsilon(1e-12));
}

TEST_CASE("demo scene: the finished section follows the feed marks of the finishing pass",
          "[viewer][trace][demo]") {
    const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    const CutResult r = simulate(s);
    const auto close = viewer::closeUpOf(s, r);
    // The made-up demo: gauge plane z = 40, finishing feed 0.05 mm/rev → forty marks, 2 mm.
    CHECK(close.zFromMm == Approx(39.0));
    CHECK(close.zToMm == Approx(41.0));
    CHECK(close.feedMmPerRev == Approx(0.05));
    // Marks about 0.78 µm high at 0.05 mm apart: raised to about a quarter of the pitch.
    CHECK(close.reliefFactor == 20);
    const auto m = describeMoment(s, r, static_cast<double>(s.plan.passes.size()));
    const auto line = viewer::deviationTrace(s, r, m, close.zFromMm, close.zToMm, 0);
    REQUIRE(line.feedMarks);
    CHECK(line.zMm.size() > 40 * 20); // many samples in every mark
    // Source: references R2 (exact arc cusp r − sqrt(r² − f²/4)), f 0.05 mm, r 0.4 mm (the
    // demo's finishing pass and D insert, nose radius code 04): 0.782 µm, normal to the cone.
    const double f = 0.05, rn = 0.4;
    const double cusp = rn - std::sqrt(rn * rn - f * f / 4);
    CHECK(peakToValley(line, close.zFromMm, close.zToMm) == Approx(cusp).epsilon(0.02));
    // The whole cone decimated for the chart keeps that height.
    const auto chart = viewer::decimateTrace(viewer::deviationTrace(s, r, m, 0, 50, 0), 1200);
    CHECK(chart.zMm.size() <= 1210);
    CHECK(peakToValley(chart, close.zFromMm, close.zToMm) == Approx(cusp).epsilon(0.02));
    // Before the finish there are no marks to follow: the line is the swept profile.
    CHECK_FALSE(viewer::deviationTrace(s, r, describeMoment(s, r, 2), 0, 50, 0).feedMarks);
}
