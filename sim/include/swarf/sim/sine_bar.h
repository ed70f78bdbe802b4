#pragma once
// Setting an angle with a sine bar (references R4): the gauge block stack under one roll is
// H = L sin α for a bar of length L between roll centres, and a combination of blocks from a
// gauge block set that builds that stack.
#include "swarf/sim/units.h"

#include <string>
#include <vector>

namespace swarf {

/// A sine bar: its name and the distance between its roll centres.
struct SineBar {
    std::string name;    ///< e.g. "5 in"
    double lengthMm = 0; ///< between roll centres, mm
};

/// The four common lengths: 5 in, 10 in, 100 mm, 200 mm (references R4).
std::vector<SineBar> commonSineBars();

/// Stack height (mm) that tilts a bar of length barLengthMm (mm) to angleRad (rad): L sin α.
/// Precondition 0 ≤ α < π/2.
double sineBarStackMm(double barLengthMm, double angleRad);

/// The angle (rad) a stack of stackMm (mm) sets on a bar of barLengthMm (mm): asin(H / L).
double sineBarAngleRad(double barLengthMm, double stackMm);

/// A gauge block set: block sizes in the set's own unit. Each block may be used once.
struct GaugeBlockSet {
    std::string name;          ///< for people, e.g. "81-piece inch set"
    Units units = Units::Mm;   ///< the unit its sizes are written in
    std::vector<double> sizes; ///< block sizes in `units`, each > 0
};

/// A common 81-piece inch set (common practice): 0.1001–0.1009 by 0.0001, 0.101–0.149 by 0.001,
/// 0.050–0.950 by 0.050, and 1, 2, 3, 4 in.
GaugeBlockSet commonInchBlockSet();

/// A common 87-piece metric set (common practice): 1.001–1.009 by 0.001, 1.01–1.49 by 0.01,
/// 0.5–9.5 by 0.5, and 10–100 by 10 mm.
GaugeBlockSet commonMetricBlockSet();

/// A combination of blocks for a stack, or why there is none.
struct GaugeStack {
    bool found = false;
    double wantedMm = 0;        ///< the stack height asked for, mm
    double builtMm = 0;         ///< the height the blocks add up to, mm (when found)
    double resolutionMm = 0;    ///< the set's step: the wanted height is rounded to it, mm
    std::vector<double> blocks; ///< the blocks, in the set's units, largest first
    std::string reason;         ///< when not found: why (for people)
};

/// The combination of the fewest blocks from `set` that adds up to heightMm (mm) rounded to the
/// set's step (the greatest common step of its sizes, at most 1e-6 of its unit). Not found, with
/// a reason, when no subset adds up to it, when the height is ≤ 0, or when the search would need
/// more than about 2·10⁸ (blocks × height steps) (a set with a very fine step and a tall stack).
GaugeStack combineGaugeBlocks(double heightMm, const GaugeBlockSet& set);

} // namespace swarf
