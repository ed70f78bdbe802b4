// The text of the window's panels (see panel_text.h).
#include "panel_text.h"

#include "swarf/sim/causes.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/compound_sense.h"
#include "swarf/sim/result_figures.h"

#include <fmt/format.h>

#include <algorithm>
#include <cctype>
#include <cmath>

namespace swarf::viewer::detail {

namespace {

// The band the colours and figures are judged against, said as what it is: ± normal to the
// surface, beside the drawing's own ± on diameter (the cone the tool cuts, else the first
// feature's).
std::string bandWords(const Scene& scene, const DeviationScale& scale) {
    const Units u = scene.units;
    const Feature* f = scene.workedCone();
    if (!f && !scene.part.features.empty())
        f = &scene.part.features.front();
    std::string s = "band +/-" + formatSmallLength(scale.bandMm, u) + " normal to the surface";
    if (f)
        s += " (drawing +/-" + formatLength(f->toleranceMm, u) + " on diameter)";
    return s;
}

} // namespace

std::string momentPanelText(const Scene& scene, const CutResult& result, const MomentView& m,
                            const DeviationScale& scale) {
    const Units u = scene.units;
    std::string s = scene.name.empty() ? std::string("swarf") : scene.name;
    s += "\n";
    if (m.pass < 0) {
        s += fmt::format("Before pass 1 of {}: the bar as it stands\n", m.passCount);
    } else {
        const int pct = static_cast<int>(std::lround(m.passFraction * 100));
        s += fmt::format("Pass {} of {} ({}) {}\n", m.pass + 1, m.passCount, m.passKind,
                         m.passFraction >= 1 ? "done" : fmt::format("{}% through", pct));
        if (!m.passNote.empty())
            s += m.passNote + "\n";
        // Which way the tool feeds and which edge cuts (compound_sense.h).
        const Pass& pass = scene.plan.passes[static_cast<std::size_t>(m.pass)];
        std::string dir = feedDirectionWords(passFeedDirection(scene, pass));
        if (!dir.empty())
            dir[0] = static_cast<char>(std::toupper(static_cast<unsigned char>(dir[0])));
        s += dir + "\n";
        s += fmt::format("Feed {}/rev\n", formatLength(m.feedMmPerRev, u));
        // What this pass brought in (causes.h): the source and how far it moved the cone.
        for (const Cause* c : causesOfPass(result.causes, m.pass))
            s += fmt::format("Brings in {}: cone {} {} on diameter at the gauge plane\n",
                             causeLabel(c->source),
                             formatLength(std::fabs(c->gaugeDiameterChangeMm), u, Precision::Fine),
                             c->gaugeDiameterChangeMm >= 0 ? "larger" : "smaller");
    }
    const bool diamDial = scene.setup.crossDial == DialMode::Diameter;
    s += fmt::format("Cross-slide {} ({} dial)   Compound {}   Saddle {}\n",
                     formatLength(m.crossMm, u), diamDial ? "diameter" : "radius",
                     formatLength(m.compoundMm, u), formatLength(m.saddleMm, u));
    if (m.finished) {
        // The finished part: the result's own figures, as the terminal, result.json and the
        // report give them (crests of the feed marks in the left-on).
        const ResultFigures fig = resultFigures(scene, result);
        s += fmt::format("Finished: most left on {}, most overcut {} ({})\n", fig.leftOn,
                         fig.overcut, bandWords(scene, scale));
        s += fmt::format("Feed marks Rt {}, Ra {}\nVerdict: {}\n", fig.rt, fig.ra,
                         verdictWords(fig.within));
        s += "The jaws are drawn to show where the bar is held, not to size.";
        return s;
    }
    // Part-way: the swept profile now, counted as the verdict counts it (not within a nose
    // radius of an inside corner, where the nose leaves its fillet).
    DeviationExtremes now = deviationExtremes(
        m.deviationMm, verdictMask(scene.part, m.profile, scene.tool.noseRadiusMm));
    if (result.bored) {
        // The bore too, as the section and chart show it.
        const DeviationExtremes bore = deviationExtremes(m.boreDeviationMm);
        now.leftOnMm = std::max(now.leftOnMm, bore.leftOnMm);
        now.overcutMm = std::max(now.overcutMm, bore.overcutMm);
    }
    s += fmt::format("Now: most left on {}, most overcut {} ({})",
                     formatSmallLength(now.leftOnMm, u), formatSmallLength(now.overcutMm, u),
                     bandWords(scene, scale));
    return s;
}

std::string closeUpPanelText(const Scene& scene, const CutResult& result, const MomentView& moment,
                             const CloseUp& close) {
    const Units u = scene.units;
    std::string s =
        fmt::format("Close-up{} at the gauge plane: z {} to {}", result.bored ? " of the bore" : "",
                    formatLength(close.zFromMm, u), formatLength(close.zToMm, u));
    const bool marks = moment.finished && !result.surface.empty() && result.rtUm > 0;
    if (result.bored && moment.finished && result.rtUm > 0)
        s += fmt::format(
            "\nThe bore's far wall: feed marks {} apart, {} high (Rt), drawn {:g} times "
            "as high; colours are true to scale",
            formatLength(close.feedMmPerRev, u), resultFigures(scene, result).rt,
            close.reliefFactor);
    else if (result.bored && moment.finished)
        s += "\nThe bore's far wall, exact as swept";
    else if (marks)
        s += fmt::format("\nFeed marks {} apart, {} high (Rt), drawn {:g} times as high; "
                         "colours are true to scale",
                         formatLength(close.feedMmPerRev, u), resultFigures(scene, result).rt,
                         close.reliefFactor);
    else if (moment.passCount == 0)
        s += "\nThe plan has no passes: nothing is cut ('swarf plan' makes them)";
    else if (!moment.finished)
        s += "\nThe feed marks are worked out for the finished part only (End shows it)";
    return s;
}

} // namespace swarf::viewer::detail
