#pragma once
// One part of an error budget: the scene as it might really be set up, drawn from its
// [uncertainty] (uncertainty.h). The random numbers are counter based: each comes from a hash of
// (seed, sample, source, index) alone, so the parts of a budget are the same however many
// threads make them, and a run with one source on draws that source exactly as the run with all
// of them does (the one-at-a-time runs of budget.h rely on it).
#include "swarf/sim/scene.h"
#include "swarf/sim/uncertainty.h"

#include <cstdint>
#include <vector>

namespace swarf {

/// A number in [0, 1) for (seed, sample, source, index): a hash of the four (splitmix64 steps),
/// with 53 bits.
double budgetUniform(std::uint64_t seed, std::uint64_t sample, BudgetSource source,
                     std::uint64_t index);

/// A standard normal number for (seed, sample, source, index), from the uniforms at 2·index and
/// 2·index + 1 (Box–Muller).
double budgetNormal(std::uint64_t seed, std::uint64_t sample, BudgetSource source,
                    std::uint64_t index);

/// The scene as sample `sample` of a budget makes it, with only `sources` drawn (the others
/// stay as the scene gives them). Per source (scenes/README.md, [uncertainty]):
///   compound angle: setup.compoundErrorRad + sd·N;
///   readings: every dial reading of every manual pass (the fixed slides' readings, the moving
///     slide's from and to) + e·(2U − 1), each drawn apart;
///   backlash unknown: the slide's backlash b′ = b·U for the whole part, and at each pass the
///     slide taken up or not (even odds): a fixed reading not taken up sits b′ further along its
///     increasing direction; a moving slide not taken up starts b′ further along, and one wound
///     with its reading decreasing lags b′ at the end; the machine model then sees no backlash
///     on that slide (the draw has placed it);
///   tip height: tool.tipHeightMm + sd·N;
///   nose radius: tool.noseRadiusMm + t·(2U − 1) for an ISO class tolerance t, else + sd·N,
///     never below 1 µm;
///   measuring: setup.zeroDiameterMm + sd·N.
/// CNC path passes have no dials and are left as they are. Precondition: a validated scene.
Scene perturbScene(const Scene& scene, std::uint64_t seed, std::uint64_t sample,
                   const std::vector<BudgetSource>& sources);

} // namespace swarf
