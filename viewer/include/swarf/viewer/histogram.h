#pragma once
// The picture of an error budget: a histogram of the gauge diameters of the parts drawn, as the
// difference from the drawing in µm (thou for inch scenes), with the tolerance band marked.
// Rendered off screen; needs an X display (the executable starts one, see swarf/app/display.h).
#include "swarf/sim/budget.h"
#include "swarf/sim/scene.h"

#include <string>

namespace swarf::viewer {

/// Bins of a histogram: `counts[k]` values fell in [loMm + k·widthMm, loMm + (k+1)·widthMm).
struct HistogramBins {
    double loMm = 0, widthMm = 0;
    std::vector<int> counts;
};

/// Bins the budget's gauge diameters minus the drawing's into about `bins` bins over a range
/// that holds every value and the tolerance band with a margin. Every value lands in a bin.
HistogramBins binGaugeDiameters(const Budget& budget, int bins = 50);

/// Renders the histogram of `budget` (title, bars, the band ±t dashed, the drawing's diameter
/// and the mean marked) to `path` as a PNG of widthPx × heightPx, atomically. Throws RenderError
/// if nothing can be rendered, OutputError if the file cannot be written.
void renderBudgetHistogram(const Scene& scene, const Budget& budget, const std::string& path,
                           int widthPx = 1200, int heightPx = 650);

} // namespace swarf::viewer
