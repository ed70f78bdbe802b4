#pragma once
// Private to sim/io: what the set-up sheet's section builders share (setup_sheet.cpp,
// sheet_operations.cpp, sheet_matters.cpp).
#include "sheet_document.h"
#include "swarf/sim/planner.h"

#include <string>

namespace swarf::io::detail {

/// What every section builder needs: the plan, its scene, and lengths in the scene's units.
struct SheetCtx {
    const ConePlan& plan;
    const Scene& sc;
    Units u;
    const Setup& su;
    std::string L(double mm, Precision p = Precision::Normal) const {
        return formatLength(mm, u, p);
    }
    std::string feed(double mmPerRev) const { return formatLengthNumber(mmPerRev, u); }
};

/// A compact reading: "-13.950 [-7 t + 2.5]" (value in the scene's units, turns, division),
/// with no-break spaces inside the brackets.
std::string dialCell(const Slide& slide, double readingMm, Units u);

/// The order of operations: the shop's steps, each pass with the moves that bring the tool to
/// its start and back it out after, in handwheel numbers, and the table of passes.
Section operationsSection(const SheetCtx& c);

/// What matters at the check plane: the sensitivities and the corrections after a trial cut.
Section mattersSection(const SheetCtx& c);

} // namespace swarf::io::detail
