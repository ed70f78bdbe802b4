#pragma once
// Writing a scene back as TOML (the format of scenes/README.md), in the scene's own units, so
// that readScene reads back the same values: the planner's output goes through `swarf run`.
#include "swarf/sim/scene.h"

#include <string>
#include <vector>

namespace swarf::io {

/// The scene as TOML text: every length in scene.units, angles in degrees, each pass with its
/// readings. `headerComments` are written first as "# ..." lines (one per entry). Values are
/// written with 12 significant digits, so readScene gives them back to about 1e-12 relative.
std::string sceneToToml(const Scene& scene, const std::vector<std::string>& headerComments = {});

/// Writes sceneToToml(scene, headerComments) to `path` atomically: to "path.tmp" first, then
/// renamed over `path`. Throws OutputError if it cannot be written; nothing half-written stays.
void writeScene(const Scene& scene, const std::string& path,
                const std::vector<std::string>& headerComments = {});

} // namespace swarf::io
