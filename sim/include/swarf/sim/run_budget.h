#pragma once
// What a run will hold in memory, estimated from the scene before any work is done, so that a
// scene the machine cannot hold is refused with the key to change and the figure that would
// fit, rather than failing part way.
//
// The kernel keeps a handful of profiles on the axial samples (stock, drawing, as cut, crests,
// two deviations, the crests on the feed-mark surface) and the as-cut profile after every pass;
// `swarf run` adds profile.csv's text and the solid modeller's fit, the pictures and the window
// a few more profiles and a fixed amount for rendering. The feed-mark surface itself is one
// profile a feed per move: small. The figures below are measured (peak resident memory under
// /usr/bin/time -v, see DEVELOPERS.md) and rounded up.
#include "swarf/sim/scene.h"

#include <cstddef>

namespace swarf {

/// What the run makes besides the kernel's result.
struct RunOutputs {
    bool files = true;    ///< result.json and profile.csv (swarf run)
    bool solids = true;   ///< the STEP solids
    bool pictures = true; ///< the pictures, or the window
};

/// The estimate.
struct RunEstimate {
    std::size_t samples = 0; ///< axial samples of the exact profile
    std::size_t passes = 0;  ///< passes of the plan (each keeps a profile)
    double bytes = 0;        ///< peak memory, all told
};

/// The estimate for a validated scene (with its plan).
RunEstimate estimateRun(const Scene& scene, const RunOutputs& outputs);

/// Throws InputError (exit code 2) if estimateRun needs more than availableBytes: at the key
/// sim.profile_step, with the samples and passes, the memory needed and free, and the coarsest
/// step that would fit (or, if no step up to 1 mm fits, how many passes would).
void requireFits(const Scene& scene, const RunOutputs& outputs, double availableBytes);

} // namespace swarf
