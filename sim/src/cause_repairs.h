#pragma once
// The parts of findCauses (swarf/sim/causes.h) private to the kernel's sources: the cone the
// causes are measured on, the finishing move at its gauge plane, and the repairs (mistakes of
// intent, mended the way the mistake suggests). causes.cpp runs them; cause_repairs.cpp defines
// them.
#include "swarf/sim/kernel.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/units.h"

#include <functional>
#include <optional>
#include <string>
#include <vector>

namespace swarf::detail {

/// What the causes are measured against: the cone the tool cuts (Scene::workedCone).
struct CauseTarget {
    int feature = -1;
    const Feature* cone = nullptr;
    double lengthMm = 0;
    bool inside = false;
};

/// The main cone the causes of `scene` are measured on; feature −1 when there is none.
CauseTarget causeTarget(const Scene& scene);

/// The finishing move at the gauge plane: the cutting move whose imaginary tip runs deepest
/// there (nearest the axis outside, furthest from it inside). Its pass and the tip's x there.
struct FinishingTip {
    int pass = -1;
    double tipXMm = 0;
};

/// The finishing move of `moves` at zMm, if any move's tip runs over it.
std::optional<FinishingTip> finishingAt(const std::vector<ToolMove>& moves, double zMm,
                                        bool inside);

/// The cone's change in words: "the cone is 0.100 mm small on diameter at the gauge plane" (for
/// a bore, "the bore is ..."), and, when the half angle moved by a second or more, its change.
std::string coneChangeWords(double dMm, double dRad, Units u, bool inside);

/// One repair: its source name, and the scene it makes from the current one (none: not a
/// candidate); the message it writes is "what happened|what to do".
struct CauseRepair {
    std::string source;
    std::function<std::optional<Scene>(const Scene&, std::string&)> make;
    /// A mistake that reads every reading another way (the compound's scale, the dial's mode)
    /// is kept only when mending it takes away at least half the cone's distance from the
    /// drawing: any change that cuts deeper brings a plan that stops short nearer, and would
    /// otherwise be named for it.
    bool explainsMost = false;
};

/// The repairs findCauses tries, in its order of preference: compound_scale, dial_mode,
/// nose_offset.
std::vector<CauseRepair> causeRepairs(const CauseTarget& target);

} // namespace swarf::detail
