#pragma once
// report.html: the verdict, the set-up figures, the findings, the pictures and the per-pass
// table in one self-contained page (no scripts, fonts or anything else from the network).
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <string>

namespace swarf::io {

/// The pictures a report shows: PNG files (full paths or names in the report's folder), each
/// empty when there is none. The report refers to them by file name, relative to its folder.
struct ReportPictures {
    std::string part;         ///< the whole part, oblique
    std::string cone;         ///< the main cone filling the picture
    std::string section;      ///< the half profile with the deviation magnified
    std::string chart;        ///< deviation along the cone
    std::string marks;        ///< close-up of the feed marks at the gauge plane
    std::string marksSection; ///< the section of that stretch
};

/// The report's HTML text. `pictures` may be null: no pictures section.
std::string reportHtml(const Scene& scene, const CutResult& result,
                       const ReportPictures* pictures = nullptr);

/// Writes outDir/report.html atomically (creating outDir if needed) and returns its path.
/// Throws OutputError if it cannot be written.
std::string writeReport(const Scene& scene, const CutResult& result, const std::string& outDir,
                        const ReportPictures* pictures = nullptr);

} // namespace swarf::io
