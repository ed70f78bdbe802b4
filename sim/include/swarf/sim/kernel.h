#pragma once
// The cutting kernel's entry points. Pure functions on a validated Scene.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <cstddef>
#include <functional>
#include <vector>

namespace swarf {

/// Progress callback: fraction done in [0, 1]. May be called from one thread only.
using ProgressFn = std::function<void(double)>;

/// Machine model: the plan's dial readings to imaginary-tip moves, with the compound angle as
/// set (its error included), diameter or radius dials, backlash and slide reversals.
std::vector<ToolMove> planMoves(const Scene& scene);

/// Exact axisymmetric profile after the first `count` moves, the last of them only `fraction`
/// (0..1) of the way along. Samples as in simulate(). Used to step through a plan.
Profile profileUpTo(const Scene& scene, const std::vector<ToolMove>& moves, std::size_t count,
                    double fraction = 1.0);

/// The whole kernel: moves, exact profile, 3D surface with feed marks, comparison with the
/// drawing, findings and verdict.
CutResult simulate(const Scene& scene, const ProgressFn& progress = {});

} // namespace swarf
