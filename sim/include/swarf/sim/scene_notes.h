#pragma once
// Notes on a valid scene: things worth a second look that are not errors (`swarf check` prints
// them). Among them the plausible-unit notes: a number that makes sense only in another unit
// or another quantity (a tolerance of 15 for 0.015, a feed per minute for a feed per rev).
#include "swarf/sim/scene.h"

#include <string>
#include <vector>

namespace swarf {

/// A feed per revolution above this (mm) is worth a note: turning feeds are tenths of a mm.
inline constexpr double kPlausibleFeedMmPerRev = 1.0;

/// The notes on a validated scene, each one sentence for people, lengths in the scene's units:
/// - a stick-out of more than about three diameters with no tailstock;
/// - with a cone: a compound whose sense cannot cut it, or cuts it with the trailing edge (with
///   what to change), and a compound angle that looks read off the other scale;
/// - with compound passes: a compound angle off the main cone's half angle by more than its
///   angle tolerance, a cone longer than the compound can travel in one stroke;
/// - a given tolerance larger than a tenth of its feature's diameter (a wrong unit?);
/// - a feed per revolution above kPlausibleFeedMmPerRev in the plan or in [planning] (a feed per
///   minute?);
/// - a stick-out too short for the tool to finish the part's last feature without its insert
///   coming within kJawClearanceMm of the jaws;
/// - a boring bar's overhang and a boring bar with nothing to bore (insideWorkNotes).
/// First, what the reader noticed (Scene::readNotes: an old name accepted).
/// Empty when nothing is worth a note.
std::vector<std::string> sceneNotes(const Scene& scene);

} // namespace swarf
