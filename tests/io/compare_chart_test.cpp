// compare.html's charts (swarf/io/compare_report.h): the two runs' deviation drawn to one range,
// so that the same height is the same deviation on both.
#include "swarf/io/compare_report.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/kernel.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <sstream>
#include <string>

using namespace swarf;

namespace {

// The chart's plot area (compare_chart.cpp): 260 px high, 14 above and 44 below.
constexpr double kTopPx = 14, kPlotPx = 260 - 14 - 44;

// The text of attribute `name` (name="...") after `from` in `svg`; empty if there is none. Plain
// string search: std::regex recurses once per character and a polyline of thousands of points
// overflows the stack under the sanitizers.
std::string attribute(const std::string& svg, const std::string& name, std::size_t from = 0) {
    const std::string key = name + "=\"";
    const std::size_t at = svg.find(key, from);
    if (at == std::string::npos)
        return "";
    const std::size_t begin = at + key.size(), end = svg.find('"', begin);
    return end == std::string::npos ? "" : svg.substr(begin, end - begin);
}

// The largest deviation a chart draws, read back from its polyline through the range it states.
double largestDrawn(const std::string& svg) {
    const std::string loText = attribute(svg, "data-lo"), hiText = attribute(svg, "data-hi");
    REQUIRE_FALSE(loText.empty());
    REQUIRE_FALSE(hiText.empty());
    const double lo = std::stod(loText), hi = std::stod(hiText);
    const std::string pts = attribute(svg, "points");
    REQUIRE_FALSE(pts.empty());
    double top = 1e9;
    // "x,y x,y ...": the smallest y is the highest point drawn.
    std::istringstream in(pts);
    std::string pair;
    while (in >> pair) {
        const std::size_t comma = pair.find(',');
        REQUIRE(comma != std::string::npos);
        top = std::min(top, std::stod(pair.substr(comma + 1)));
    }
    return hi - (top - kTopPx) / kPlotPx * (hi - lo);
}

// The largest marked deviation over the main cone, µm.
double largestDeviationUm(const Scene& s, const CutResult& r) {
    const Feature* cone = s.part.mainCone();
    const std::vector<double> dev = markedDeviation(r.deviationMm, r.crestDeviationMm);
    double top = -1e9;
    for (std::size_t i = 0; i < dev.size(); ++i) {
        const double z = r.asCut.zAt(i);
        if (z >= cone->zStartMm && z <= cone->zEndMm && std::isfinite(dev[i]))
            top = std::max(top, dev[i] * 1000);
    }
    return top;
}

} // namespace

TEST_CASE("compare.html draws both charts to one range", "[io][compare]") {
    const std::string dir = SWARF_SCENES_DIR;
    const Scene wrong = io::readScene(dir + "/fixture-arbor-no-offset.toml");
    const Scene right = io::readScene(dir + "/fixture-arbor.toml");
    const CutResult rw = simulate(wrong), rr = simulate(right);
    const io::CompareSide a{&wrong, &rw, "scene", nullptr}, b{&right, &rr, "other", nullptr};

    const io::CompareChartRange range = io::compareChartRange(a, b, Units::Mm);
    const io::CompareChartRange swapped = io::compareChartRange(b, a, Units::Mm);
    CHECK(range.loSmall == swapped.loSmall);
    CHECK(range.hiSmall == swapped.hiSmall);
    // The range holds both runs' deviation and both tolerance bands.
    const double mistakeUm = largestDeviationUm(wrong, rw), rightUm = largestDeviationUm(right, rr);
    CHECK(range.hiSmall >= mistakeUm);
    CHECK(range.hiSmall >= rightUm);
    CHECK(range.loSmall <= -normalBandMm(*right.part.mainCone()) * 1000);
    // derived from references R1: the tip on the drawn line leaves ΔX·cos θ normal to the
    // surface, 19.5 µm for r = 0.4 mm on a 1:10 cone; the arbor done right stays in its band.
    CHECK(mistakeUm == Approx(19.5).margin(1.5));
    CHECK(rightUm < 10.0);

    // Each chart, read back through the range it states, draws its own run's deviation: the
    // same height is the same deviation on both (to a pixel of the plot).
    const std::string left = io::compareChartSvg(a, range, Units::Mm, "chart-left");
    const std::string other = io::compareChartSvg(b, range, Units::Mm, "chart-right");
    const double umPerPx = (range.hiSmall - range.loSmall) / kPlotPx;
    CHECK(std::fabs(largestDrawn(left) - mistakeUm) <= umPerPx);
    CHECK(std::fabs(largestDrawn(other) - rightUm) <= umPerPx);
    // The mistake's line stands higher than the right one's by their difference in deviation.
    CHECK(largestDrawn(left) - largestDrawn(other) ==
          Approx(mistakeUm - rightUm).margin(2 * umPerPx));
}
