#pragma once
// The documents of `swarf correct`: correction.json (field by field in sim/io/CORRECTION.md) and
// the set-up sheet for the rest of the job (text and self-contained HTML, with the cautions).
#include "swarf/sim/correction.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <string>
#include <vector>

namespace swarf::io {

/// correction.json's text (format "swarf correct", version 1; lengths mm, angles degrees).
/// `after` is the kernel's result for c.corrected (the verdict after correction).
std::string correctionJson(const Scene& plan, const Measurements& m, const Correction& c,
                           const CutResult& after);

/// One section of the sheet: a heading and its lines (in the scene's units).
struct SheetPart {
    std::string heading;
    std::vector<std::string> lines;
};

/// The sheet for the rest of the job, as sections: the cone as measured against the drawing and
/// the plan, before and after correction; the compound; the remaining passes in handwheel
/// numbers; the residuals; the cautions.
std::vector<SheetPart> correctionSheet(const Scene& plan, const Measurements& m,
                                       const Correction& c, const CutResult& after);

/// The sheet as plain text (UTF-8).
std::string correctionSheetText(const std::vector<SheetPart>& sheet, const std::string& title);
/// The sheet as one self-contained HTML page; `chartSvg` (may be empty) follows its first
/// section.
std::string correctionSheetHtml(const std::vector<SheetPart>& sheet, const std::string& title,
                                const std::string& chartSvg = "");

/// The before-and-after chart as inline SVG: the cone's diameter minus the drawing's along the
/// cone for the plan after the pass measured, the cone as measured and the corrected job's end
/// (`after`, the kernel's result for c.corrected), with the tolerance band; empty when there is
/// no fit.
std::string correctionChartSvg(const Scene& plan, const Correction& c, const CutResult& after);

/// Residuals for people: "diameter[1] at z 10.000 mm: +0.0012 mm (0.6 u)", one line each.
std::vector<std::string> residualLines(const ConeFit& fit, Units units);

} // namespace swarf::io
