#pragma once
// The printable set-up sheet for a planned cone: the order of operations with every pass's dial
// readings (turns and divisions, and the direction to approach them from), the checks before the
// finishing pass, the expected roughness and the safety cautions, in the scene's units. Plain
// text and self-contained HTML (no scripts, no network). No VTK here: the documents room.
#include "swarf/sim/cut.h"
#include "swarf/sim/planner.h"

#include <string>

namespace swarf::io {

/// A dial reading for people: "−13.950 mm (−7 turns + 2.5 div)" in the scene's units.
std::string dialReadingText(const Slide& slide, double readingMm, Units units);

/// The set-up sheet as plain text (UTF-8, lines of at most about 100 characters). `proof`, if
/// given, is the kernel's result for plan.scene and is summarised as the plan's own check.
std::string setupSheetText(const ConePlan& plan, const CutResult* proof = nullptr);

/// The same sheet as one self-contained HTML page, laid out for printing on A4 or Letter.
std::string setupSheetHtml(const ConePlan& plan, const CutResult* proof = nullptr);

} // namespace swarf::io
