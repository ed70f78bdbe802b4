#pragma once
// Headless pictures of a result, for `swarf run` and the report: rendered off screen (under a
// virtual display where none exists) and written as PNG files.
#include "swarf/io/report.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <string>
#include <vector>

namespace swarf::viewer {

/// What to render.
struct SnapshotOptions {
    int widthPx = 1200; ///< size of each picture, pixels (≥ 64)
    int heightPx = 800;
    double magnification = 200; ///< deviation magnification of the section picture
};

/// The files written (full paths, in the order part, cone, section, chart, marks, marks
/// section: see io::ReportPictures, which the report shows) and their size.
struct SnapshotReport : io::ReportPictures {
    int widthPx = 0, heightPx = 0; ///< size of part, cone and marks; section, chart half as high
    std::string partLabel;         ///< the panel's text drawn on part.png (figures of the result)
    std::string marksLabel; ///< the label drawn on marks.png (the feed marks' pitch and height)
    /// All six paths, in the order above.
    std::vector<std::string> files() const {
        return {part, cone, section, chart, marks, marksSection};
    }
};

/// Renders the finished part into outDir as part.png, cone.png, section.png, chart.png,
/// marks.png and marks-section.png
/// (each written atomically: name.tmp, then rename). Creates outDir if needed. Precondition: an
/// X display exists (DISPLAY is set; the executable starts one, see swarf/app/display.h).
/// Throws RenderError if nothing can be rendered, OutputError if a file cannot be written.
SnapshotReport renderSnapshots(const Scene& scene, const CutResult& result,
                               const std::string& outDir, const SnapshotOptions& options = {});

} // namespace swarf::viewer
