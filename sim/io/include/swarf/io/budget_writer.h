#pragma once
// The documents of `swarf budget`: budget.json (documented field by field in sim/io/BUDGET.md)
// and the budget's report page, report.html.
#include "swarf/sim/budget.h"
#include "swarf/sim/scene.h"

#include <string>

namespace swarf::io {

/// budget.json's text (format "swarf budget", version 1; lengths mm, angles degrees).
/// `planned` says the passes came from the planner, the scene having none.
std::string budgetJson(const Scene& scene, const Budget& budget, bool planned = false);

/// Writes budgetJson to `path` atomically. Throws OutputError.
void writeBudgetJson(const std::string& path, const Scene& scene, const Budget& budget,
                     bool planned = false);

/// The budget's page: the sentence, the spread of the gauge diameter and the half angle, the
/// sources and their shares, the histogram (`histogramPng`, a file name in the page's folder;
/// empty: none) and the cautions. Self-contained (no scripts, no network).
std::string budgetHtml(const Scene& scene, const Budget& budget, const std::string& histogramPng,
                       bool planned = false);

/// Writes budgetHtml as outDir/report.html atomically and returns its path. Throws OutputError.
std::string writeBudgetReport(const Scene& scene, const Budget& budget, const std::string& outDir,
                              const std::string& histogramPng, bool planned = false);

/// One line per source for people, in the scene's units: "the compound setting: ± 35 µm sd
/// alone, 70 % of the spread".
std::string sourceLine(const Scene& scene, const SourceShare& share);

/// What the source's key in [uncertainty] says, in the scene's units: "sd 5′", "± 0.010 mm",
/// "unknown, 0 to 0.050 mm", "ISO class M: ± 0.080 mm".
std::string sourceStated(const Scene& scene, BudgetSource source);

} // namespace swarf::io
