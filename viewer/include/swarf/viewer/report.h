#pragma once
// report.html: the verdict, the set-up figures, the findings, the pictures and the per-pass
// table in one self-contained page (no scripts, fonts or anything else from the network).
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"
#include "swarf/viewer/snapshots.h"

#include <string>

namespace swarf::viewer {

/// Writes outDir/report.html atomically and returns its path. `pictures` (may be null: no
/// pictures) names PNG files, shown by their file name relative to outDir. Creates outDir if
/// needed. Throws OutputError if it cannot be written.
std::string writeReport(const Scene& scene, const CutResult& result, const std::string& outDir,
                        const SnapshotReport* pictures = nullptr);

/// The report's HTML text (what writeReport writes), for tests and other callers.
std::string reportHtml(const Scene& scene, const CutResult& result,
                       const SnapshotReport* pictures = nullptr);

} // namespace swarf::viewer
