#pragma once
// Reading a scene file (TOML). Format documented key by key in scenes/README.md.
#include "swarf/sim/scene.h"

#include <string>

namespace swarf::io {

/// Reads and validates a scene file. Lengths are converted to mm and angles to radians once,
/// here. Throws InputError (file:line:column, key, value, expected) on any bad input: an
/// unknown key (with a did-you-mean), a missing key, a wrong type, a value out of range, or
/// contradicting values.
Scene readScene(const std::string& path);

/// The same from text in memory; `fileName` is used in messages.
Scene readSceneText(const std::string& text, const std::string& fileName);

} // namespace swarf::io
