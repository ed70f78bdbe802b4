#pragma once
// Inside work: the stock's hole (a drilled or pre-bored bore from the free end), features on
// the inside of it (side = "inside") and the boring bar that cuts them. The one definition of
// whether they hang together (a wall between the bore and the outside, a bar that fits the hole
// it has to enter), of the notes on a boring set-up, and of the refusal of the commands that do
// not simulate inside work yet.
#include "swarf/sim/scene.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace swarf {

/// Common practice for a steel boring bar: an overhang of more than about four bar diameters
/// chatters (carbide or damped bars go further). Used for a note, not an error.
inline constexpr double kSteelBarOverhangDiameters = 4.0;

/// One thing about a scene's inside work that does not hang together.
struct InsideWorkProblem {
    std::string key;      ///< the dotted key to blame, as the scene writes it ("tool.min_bore")
    std::string value;    ///< the value, as a person would write it, in the scene's units
    std::string expected; ///< "expected ..." text
    SourceLoc where;      ///< the best location the scene's values know (a table's start)
};

/// The first problem with the scene's inside work, or empty when there is none (or no inside
/// work). Checks, in order:
/// - the hole: smaller than the bar, no deeper than the bar is long;
/// - each inside feature: on stock with a hole, within the hole's depth, no smaller than the
///   hole (cutting cannot close it), smaller than the bar and than every outside feature it runs
///   under (a wall stays);
/// - each outside feature where the hole runs: larger than the hole;
/// - a boring bar: on stock with a hole, `min_bore` at least the bar diameter and no more than
///   the smallest drawn inside diameter (the bar must reach every surface it cuts), its axis
///   height less than the hole's radius;
/// - a turning tool on a part whose features are all inside.
/// Lengths in the scene's units. The reader places the problem at the key's own line and column.
std::optional<InsideWorkProblem> insideWorkProblem(const Scene& scene);

/// Throws InputError for insideWorkProblem (at the table the scene's values know); called by
/// Scene::validate.
void validateInsideWork(const Scene& scene);

/// True if the scene has any inside work: a hole in the stock, an inside feature or a boring bar.
bool hasInsideWork(const Scene& scene);

/// Throws InputError (exit code 2, nothing written) naming the first piece of inside work, for
/// a command (`command` = "run", "view", "plan", "budget") that does not simulate inside work
/// yet; returns when there is none.
void refuseInsideWork(const Scene& scene, std::string_view command);

/// Notes on a boring set-up (sceneNotes): an overhang of more than kSteelBarOverhangDiameters
/// bar diameters; a boring bar with no inside feature to cut. Lengths in the scene's units.
std::vector<std::string> insideWorkNotes(const Scene& scene);

} // namespace swarf
