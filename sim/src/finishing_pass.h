#pragma once
// The finishing pass of a simulated plan, and the totals of its features' verdicts: private to
// the kernel's sources (kernel.cpp defines them; the outside kernel and the inside kernel use
// them).
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/surface_roughness.h"
#include "swarf/sim/sweep.h"

#include <vector>

namespace swarf::detail {

/// The move that leaves most of the main feature's final surface (scene.part.mainCone(), else
/// the first feature that is not a face), and the longest run of its samples within the
/// feature, trimmed by two feeds and a nose radius at each end (zLo..zHi, mm). False if no move
/// leaves that surface.
bool finishingRegion(const Scene& scene, const ExactSweep& sw, const std::vector<ToolMove>& moves,
                     int& move, double& zLo, double& zHi);

/// The finishing pass's feed against the nose radius: InputError at 2r or more (a thread), a
/// coarse_finish finding above r/2 (common practice).
void checkFinishingFeed(const Scene& scene, const ToolMove& move, const Roughness& rough,
                        std::vector<Finding>& findings);

/// The result's verdict and largest left-on and overcut from its features (res.features): within
/// tolerance when there are features and every one is.
void totalFeatureVerdicts(CutResult& res);

} // namespace swarf::detail
