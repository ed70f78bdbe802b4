// What a run will hold in memory (see run_budget.h).
#include "swarf/sim/run_budget.h"

#include "swarf/sim/kernel.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <string>

namespace swarf {
namespace {

// Measured on this project's scenes (peak resident set, rounded up).
constexpr double kProcessBytes = 80e6;     // the program and its libraries
constexpr double kPicturesBytes = 220e6;   // software OpenGL and the windows it draws in
constexpr double kKernelPerSample = 200;   // profiles, deviations, crests, masks, the sweep
constexpr double kFilesPerSample = 120;    // profile.csv's text, result.json
constexpr double kSolidsPerSample = 160;   // the modeller's fit of the profile
constexpr double kPicturesPerSample = 120; // the moment's profiles, the traces
constexpr double kPerPassPerSample = 8;    // the profile after each pass
constexpr double kPerMoveBytes = 16e3;     // a move's feed-mark profile and sweep

double perSample(const RunOutputs& o, std::size_t passes) {
    return kKernelPerSample + kPerPassPerSample * static_cast<double>(passes) +
           (o.files ? kFilesPerSample : 0) + (o.solids ? kSolidsPerSample : 0) +
           (o.pictures ? kPicturesPerSample : 0);
}

double fixedBytes(const RunOutputs& o, std::size_t moves) {
    return kProcessBytes + (o.pictures ? kPicturesBytes : 0) +
           kPerMoveBytes * static_cast<double>(moves);
}

std::string gigabytes(double bytes) {
    char buf[32];
    std::snprintf(buf, sizeof buf, bytes >= 1e9 ? "%.1f GB" : "%.0f MB",
                  bytes >= 1e9 ? bytes / 1e9 : bytes / 1e6);
    return buf;
}

} // namespace

RunEstimate estimateRun(const Scene& scene, const RunOutputs& outputs) {
    const ToolOutline outline(scene.tool);
    const std::vector<ToolMove> moves = planMoves(scene);
    RunEstimate e;
    e.samples = sampleExtent(scene, outline, moves).count;
    e.passes = scene.plan.passes.size();
    e.bytes = fixedBytes(outputs, moves.size()) +
              static_cast<double>(e.samples) * perSample(outputs, e.passes);
    return e;
}

void requireFits(const Scene& scene, const RunOutputs& outputs, double availableBytes) {
    const RunEstimate e = estimateRun(scene, outputs);
    if (e.bytes <= availableBytes)
        return;
    const Units u = scene.units;
    const double length = static_cast<double>(e.samples - 1) * scene.sim.profileStepMm;
    const double fixed = e.bytes - static_cast<double>(e.samples) * perSample(outputs, e.passes);
    const double room = availableBytes - fixed;
    std::string advice;
    // The coarsest step that fits, rounded up to a tenth of a micron.
    const double nFit = room / perSample(outputs, e.passes);
    const double step = nFit > 2 ? std::ceil(length / (nFit - 1) * 1e4) / 1e4 : HUGE_VAL;
    if (step <= 1.0) {
        advice = "a profile_step of " + formatLength(step, u, 4) + " or more fits";
    } else {
        // Even the coarsest step does not: fewer passes.
        const double n1 = length / 1.0 + 1;
        const double perPass = (room / n1 - perSample(outputs, 0)) / kPerPassPerSample;
        advice = perPass >= 1
                     ? "no step up to 1 mm fits with so many passes; at most " +
                           std::to_string(static_cast<long long>(perPass)) + " passes fit at 1 mm"
                     : "the machine has too little memory free for this scene at all";
    }
    if (outputs.pictures)
        advice += " (without pictures, about " + gigabytes(kPicturesBytes) + " less is needed)";
    char samples[64];
    std::snprintf(samples, sizeof samples, "%zu", e.samples);
    char value[64];
    std::snprintf(value, sizeof value, "%.6g", fromMm(scene.sim.profileStepMm, u));
    throw InputError(scene.sim.where, "sim.profile_step", value,
                     "expected a step whose samples fit in memory: " + std::string(samples) +
                         " samples over " + formatLength(length, u, 0) +
                         " with the profile after " + "each of " + std::to_string(e.passes) +
                         " passes need about " + gigabytes(e.bytes) + ", and " +
                         gigabytes(availableBytes) + " is free; " + advice);
}

} // namespace swarf
