#pragma once
// compare.html of `swarf run SCENE --compare OTHER --out DIR`: the two runs side by side (both
// verdicts, the figures at the gauge plane and their difference, the main cones' half angles,
// both pictures, and both deviation charts drawn to one scale) in one self-contained page. Each
// run's own files (result.json, report.html, the pictures) are in its subfolder of DIR; the page
// links to them.
#include "swarf/io/report.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <string>

namespace swarf::io {

/// One side of the comparison.
struct CompareSide {
    const Scene* scene = nullptr;      ///< not null
    const CutResult* result = nullptr; ///< not null
    std::string folder;                ///< its subfolder of the page's folder ("scene", "other")
    const ReportPictures* pictures = nullptr; ///< its pictures (in `folder`), or null: none
};

/// The subfolders `swarf run --compare` writes each run into, and the page's name.
inline constexpr const char* kCompareSceneFolder = "scene";
inline constexpr const char* kCompareOtherFolder = "other";
inline constexpr const char* kCompareReportName = "compare.html";

/// The deviation range both charts of the page are drawn to, in the page's small units (µm or
/// thou): from the least to the largest deviation of either run over its main cone
/// (Scene::workedCone), the tolerance bands included, padded by 8 %. One range for both, so that
/// the same height on either chart is the same deviation.
struct CompareChartRange {
    double loSmall = -1, hiSmall = 1;
};

/// The range of the two runs' charts (above), in units `u`.
CompareChartRange compareChartRange(const CompareSide& first, const CompareSide& second, Units u);

/// One run's chart as inline SVG: its deviation normal to the surface along its main cone (the
/// marked surface's: compare.h, markedDeviation; a bore's for a bored part) over `range`, with
/// its tolerance band. The <svg> element carries `id`, class "deviation-chart" and the range in
/// `data-lo` and `data-hi`.
std::string compareChartSvg(const CompareSide& side, const CompareChartRange& range, Units u,
                            const std::string& id);

/// The page's HTML: `first` is the scene, `second` the one it is compared with; differences are
/// first less second. The gauge-diameter difference carries its value in mm in the cell's
/// `data-mm` attribute (full precision, for programs).
std::string compareReportHtml(const CompareSide& first, const CompareSide& second);

/// Writes outDir/compare.html atomically (creating outDir if needed) and returns its path.
/// Throws OutputError if it cannot be written.
std::string writeCompareReport(const CompareSide& first, const CompareSide& second,
                               const std::string& outDir);

} // namespace swarf::io
