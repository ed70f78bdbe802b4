// The sheet's before-and-after chart (correction_writer.h): the cone's diameter minus the
// drawing's along the cone, for the plan after the pass measured, the cone as measured, and the
// corrected job's end, with the tolerance band. An inline SVG: no scripts, no network.
#include "swarf/io/correction_writer.h"

#include "swarf/io/html.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/units.h"

#include <fmt/format.h>

#include <algorithm>
#include <cmath>

namespace swarf::io {

std::string correctionChartSvg(const Scene& plan, const Correction& c, const CutResult& after) {
    const Feature* cone = plan.part.mainCone();
    if (!cone || !c.fit.ok)
        return "";
    const Units u = plan.units;
    Scene planCut = plan;
    planCut.plan.passes.resize(static_cast<std::size_t>(c.afterPass));
    const std::vector<ToolMove> mv = planMoves(planCut);
    const Profile planned = profileUpTo(planCut, mv, mv.size());

    struct Line {
        const char* name;
        const char* colour;
        std::vector<double> y; // diameter minus the drawing's, small units
    };
    std::vector<Line> lines = {{"plan after the pass measured", "#1f5fbf", {}},
                               {"measured", "#d9730d", {}},
                               {"after correction", "#2a8a3a", {}}};
    const int n = 120;
    std::vector<double> zs;
    for (int i = 0; i <= n; ++i)
        zs.push_back(cone->zStartMm + (cone->zEndMm - cone->zStartMm) * i / n);
    const double tol = toSmallUnits(cone->toleranceMm, u);
    double lo = -tol, hi = tol;
    for (double z : zs) {
        const double d = cone->cone.diameterAt(z);
        lines[0].y.push_back(toSmallUnits(2 * planned.radiusAt(z) - d, u));
        lines[1].y.push_back(toSmallUnits(c.fit.diameterAt(z, cone->cone) - d, u));
        lines[2].y.push_back(c.scrap ? std::nan("")
                                     : toSmallUnits(2 * after.asCut.radiusAt(z) - d, u));
        for (const Line& l : lines)
            if (std::isfinite(l.y.back())) {
                lo = std::min(lo, l.y.back());
                hi = std::max(hi, l.y.back());
            }
    }
    const double pad = 0.08 * (hi - lo);
    lo -= pad;
    hi += pad;
    const double w = 640, h = 300, left = 70, right = 20, top = 20, bottom = 50;
    auto X = [&](double z) {
        return left + (z - zs.front()) / (zs.back() - zs.front()) * (w - left - right);
    };
    auto Y = [&](double v) { return top + (hi - v) / (hi - lo) * (h - top - bottom); };

    std::string s = fmt::format("<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{}\" "
                                "height=\"{}\" font-family=\"sans-serif\" font-size=\"12\">\n",
                                w, h + 20 * lines.size());
    s += fmt::format("<rect x=\"{:.1f}\" y=\"{:.1f}\" width=\"{:.1f}\" height=\"{:.1f}\" "
                     "fill=\"#eeeeee\"/>\n",
                     left, Y(tol), w - left - right, Y(-tol) - Y(tol));
    s += fmt::format("<line x1=\"{:.1f}\" x2=\"{:.1f}\" y1=\"{:.1f}\" y2=\"{:.1f}\" "
                     "stroke=\"#555\" stroke-dasharray=\"4 3\"/>\n",
                     left, w - right, Y(0), Y(0));
    for (double v : {lo + pad, 0.0, hi - pad})
        s += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"end\">{:.1f}</text>\n",
                         left - 6, Y(v) + 4, v);
    s += fmt::format("<text x=\"{:.1f}\" y=\"{:.1f}\" text-anchor=\"middle\">z from the datum "
                     "face, {} ({} to {}); diameter minus the drawing's, {}; grey: the "
                     "tolerance</text>\n",
                     (left + w - right) / 2, h - 15, unitName(u), formatLengthNumber(zs.front(), u),
                     formatLengthNumber(zs.back(), u), smallUnitName(u));
    for (std::size_t k = 0; k < lines.size(); ++k) {
        std::string pts;
        for (std::size_t i = 0; i < zs.size(); ++i)
            if (std::isfinite(lines[k].y[i]))
                pts += fmt::format("{:.1f},{:.1f} ", X(zs[i]), Y(lines[k].y[i]));
        if (!pts.empty())
            s += fmt::format("<polyline fill=\"none\" stroke=\"{}\" stroke-width=\"2\" "
                             "points=\"{}\"/>\n",
                             lines[k].colour, pts);
        s += fmt::format(
            "<rect x=\"{:.1f}\" y=\"{:.1f}\" width=\"14\" height=\"4\" "
            "fill=\"{}\"/><text x=\"{:.1f}\" y=\"{:.1f}\">{}</text>\n",
            left, h + 20.0 * k - 4, lines[k].colour, left + 20, h + 20.0 * k,
            escapeHtml(std::string(lines[k].name) + (k == 2 && c.scrap ? " (none: scrap)" : "")));
    }
    return s + "</svg>\n";
}

} // namespace swarf::io
