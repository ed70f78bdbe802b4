#pragma once
// The kernel's result as files: result.json and profile.csv (documented in sim/io/RESULTS.md).
// Lengths in mm, volumes in mm³, roughness in µm, whatever the scene's units. Both files are
// written atomically (name.tmp, then rename); a failure throws OutputError and leaves no file.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <string>

namespace swarf::io {

/// The JSON text of result.json for a scene and its simulated cut.
std::string resultJson(const Scene& scene, const CutResult& result);

/// The CSV text of profile.csv: z_mm, nominal_radius_mm, as_cut_radius_mm, deviation_mm, one row
/// per sample of the exact profile; empty cells where the drawing says nothing.
std::string profileCsv(const CutResult& result);

/// Writes result.json to `path` atomically. Throws OutputError.
void writeResultJson(const std::string& path, const Scene& scene, const CutResult& result);

/// Writes profile.csv to `path` atomically. Throws OutputError.
void writeProfileCsv(const std::string& path, const CutResult& result);

/// Per pass: the metal it removed (mm³) and the deepest radial cut it made (mm), from the
/// profiles before and after it.
struct PassSummary {
    double removedMm3 = 0;
    double maxRadialDepthMm = 0;
};
/// One PassSummary per pass of the plan.
std::vector<PassSummary> summarisePasses(const CutResult& result);

} // namespace swarf::io
