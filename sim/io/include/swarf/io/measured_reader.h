#pragma once
// Reading MEASURED.toml: what was measured on the part after a pass (scenes/MEASURED.md, key by
// key). Lengths in the scene's units unless the file says `units`; converted to mm once here.
#include "swarf/sim/measurement.h"
#include "swarf/sim/scene.h"

#include <string>

namespace swarf::io {

/// Reads and checks the measurement file at `path` against the scene the plan came from (its
/// units, its passes, its cone). Throws InputError (file:line:column, key, value, expected) on
/// any bad input: a missing or unknown key, a value out of range, a pass the scene does not
/// have, a plane off the cone, a file with no measurement in it.
Measurements readMeasurements(const std::string& path, const Scene& scene);

/// The same from text already read; `fileName` is used in messages.
Measurements readMeasurementsText(const std::string& text, const std::string& fileName,
                                  const Scene& scene);

} // namespace swarf::io
