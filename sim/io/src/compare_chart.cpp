// The deviation charts of compare.html (compare_report.h): both runs' deviation along their main
// cone, drawn to one range so that the same height means the same deviation. Inline SVG: no
// scripts, no network.
#include "swarf/io/compare_report.h"

#include "swarf/io/html.h"
#include "swarf/sim/causes.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/units.h"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>

namespace swarf::io {

namespace {

// One run's chart line: (z, deviation in the page's small units) over its main cone, the
// marked surface's (crests where they stand further out than the valleys sink in), and the
// half band of its tolerance, normal to the surface.
struct ChartLine {
    std::vector<std::pair<double, double>> points;
    double bandSmall = 0;
    double zFrom = 0, zTo = 0;
};

ChartLine chartLine(const CompareSide& side, Units u) {
    ChartLine line;
    const Scene& s = *side.scene;
    const CutResult& r = *side.result;
    const Feature* cone = s.workedCone();
    if (!cone)
        return line;
    const bool inside = cone->side == Side::Inside;
    const Profile& grid = inside ? r.bore : r.asCut;
    const std::vector<double> dev =
        markedDeviation(inside ? r.boreDeviationMm : r.deviationMm,
                        inside ? r.boreCrestDeviationMm : r.crestDeviationMm);
    line.bandSmall = toSmallUnits(normalBandMm(*cone), u);
    line.zFrom = cone->zStartMm;
    line.zTo = cone->zEndMm;
    for (std::size_t i = 0; i < dev.size() && i < grid.radiusMm.size(); ++i) {
        const double z = grid.zAt(i);
        if (z < cone->zStartMm || z > cone->zEndMm || !std::isfinite(dev[i]))
            continue;
        line.points.emplace_back(z, toSmallUnits(dev[i], u));
    }
    // A few hundred points are plenty for a chart 300 pixels wide.
    const std::size_t step = std::max<std::size_t>(1, line.points.size() / 600);
    if (step > 1) {
        std::vector<std::pair<double, double>> fewer;
        for (std::size_t i = 0; i < line.points.size(); i += step)
            fewer.push_back(line.points[i]);
        line.points = fewer;
    }
    return line;
}

std::string chartSvg(const ChartLine& line, const CompareChartRange& range, Units u,
                     const char* id) {
    const double w = 460, h = 260, left = 60, right = 12, top = 14, bottom = 44;
    const double lo = range.loSmall, hi = range.hiSmall;
    const double z0 = line.zFrom, z1 = std::max(line.zTo, line.zFrom + 1e-9);
    auto X = [&](double z) { return left + (z - z0) / (z1 - z0) * (w - left - right); };
    auto Y = [&](double v) { return top + (hi - v) / (hi - lo) * (h - top - bottom); };
    std::string s =
        fmt::format("<svg xmlns=\"http://www.w3.org/2000/svg\" id=\"{}\" class=\"deviation-chart\" "
                    "data-lo=\"{:.9g}\" data-hi=\"{:.9g}\" width=\"{}\" height=\"{}\" "
                    "font-family=\"sans-serif\" font-size=\"12\">\n",
                    id, lo, hi, w, h);
    s += fmt::format("<rect x=\"{:.1f}\" y=\"{:.1f}\" width=\"{:.1f}\" height=\"{:.1f}\" "
                     "fill=\"#e6f2e6\"/>\n",
                     left, Y(line.bandSmall), w - left - right,
                     Y(-line.bandSmall) - Y(line.bandSmall));
    s += fmt::format("<line x1=\"{:.1f}\" x2=\"{:.1f}\" y1=\"{:.1f}\" y2=\"{:.1f}\" "
                     "stroke=\"#555\" stroke-dasharray=\"4 3\"/>\n",
                     left, w - right, Y(0), Y(0));
    // Zero, the range's ends and the band's edges, each where it stands clear of those before.
    std::vector<double> ticks;
    for (double v : {0.0, range.loSmall, range.hiSmall, -line.bandSmall, line.bandSmall})
        if (std::none_of(ticks.begin(), ticks.end(),
                         [&](double t) { return std::fabs(Y(t) - Y(v)) < 15; }))
            ticks.push_back(v);
    for (double v : ticks)
        s += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"end\">{:.1f}</text>\n",
                         left - 6, Y(v) + 4, v);
    std::string pts;
    for (const auto& [z, v] : line.points)
        pts += fmt::format("{:.1f},{:.1f} ", X(z), Y(v));
    if (!pts.empty())
        s += "<polyline fill=\"none\" stroke=\"#b02a2a\" stroke-width=\"2\" points=\"" + pts +
             "\"/>\n";
    s += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"middle\">z, {} ({} to {}); "
                     "deviation normal to the surface, {}</text>\n",
                     (left + w - right) / 2, h - 22, unitName(u), formatLengthNumber(z0, u),
                     formatLengthNumber(z1, u), smallUnitName(u));
    s += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"middle\">+: metal left on; "
                     "green: the tolerance band; one scale on both</text>\n",
                     (left + w - right) / 2, h - 6);
    return s + "</svg>\n";
}

} // namespace

CompareChartRange compareChartRange(const CompareSide& first, const CompareSide& second, Units u) {
    double lo = 0, hi = 0;
    for (const CompareSide* side : {&first, &second}) {
        const ChartLine line = chartLine(*side, u);
        lo = std::min(lo, -line.bandSmall);
        hi = std::max(hi, line.bandSmall);
        for (const auto& [z, v] : line.points) {
            lo = std::min(lo, v);
            hi = std::max(hi, v);
        }
    }
    if (hi - lo <= 0) {
        lo = -1;
        hi = 1;
    }
    const double pad = 0.08 * (hi - lo);
    return {lo - pad, hi + pad};
}

std::string compareChartSvg(const CompareSide& side, const CompareChartRange& range, Units u,
                            const std::string& id) {
    return chartSvg(chartLine(side, u), range, u, id.c_str());
}

} // namespace swarf::io
