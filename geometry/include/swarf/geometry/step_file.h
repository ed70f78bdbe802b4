#pragma once
// STEP files (ISO 10303, AP214, millimetres) of solids. Frame: see solid.h.
#include "swarf/geometry/solid.h"

#include <string>
#include <vector>

namespace swarf::geometry {

/// A solid with the product name it gets in a STEP file ("as-cut", "nominal", "left-on").
struct NamedSolid {
    std::string name;
    Solid solid;
};

/// Writes the solids into one STEP file (AP214, lengths in mm), each as its own product named
/// after it. Atomic: the file is written as `path.tmp` in the same folder and renamed over
/// `path` only when complete. Empty solids are skipped. Throws OutputError if the file cannot
/// be written, GeometryError if the modeller cannot translate a solid; `path` is then untouched.
void writeStep(const std::string& path, const std::vector<NamedSolid>& solids);

/// Reads every shape of a STEP file into one Solid (a compound if there are several), in mm.
/// Throws GeometryError if the file cannot be read or translated.
Solid readStep(const std::string& path);

} // namespace swarf::geometry
