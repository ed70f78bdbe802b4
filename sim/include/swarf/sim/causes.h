#pragma once
// What moved the cone: the error of the main cone at its gauge plane (on diameter) and of its
// half angle, attributed to its sources by counterfactual runs of the exact-profile kernel
// (budget.h: partOutcome), one source at a time. Two kinds (sim/io/RESULTS.md, "causes"):
//   removal: an imperfection the machine model has explicitly (tip height, a slide's backlash,
//     the compound's angle error) is set to zero and the scene run again;
//   repair: a mistake of intent, where the readings or a setting are wrong and the scene cannot
//     say what was meant (nose-radius offset missing or wrong, compound set on the other
//     scale's reading, cross-slide dial read in the other mode), is mended the way the mistake
//     suggests, on the scene with every removal made, and kept only when it brings the cone
//     nearer the drawing (the rule in findCauses).
// The cone is the drawing's main outside cone, or, for a part bored with a boring bar, its main
// inside cone (the bore: its gauge diameter is the bore's, metal left on makes it small).
// A straight edge of the insert found rubbing (findings.h, rubbing) is a removal too: the run
// again with the insert reduced to its nose (a round insert of the same radius).
// The feed marks' crests are named apart (they do not move the swept envelope the gauge
// diameter is taken on), and whatever the named causes leave is `other`.
#include "swarf/sim/scene.h"

#include <string>
#include <vector>

namespace swarf {

struct CutResult;

/// One source of the cone's error.
struct Cause {
    /// Our own snake_case name: nose_offset, tip_height, cross_backlash, compound_backlash,
    /// saddle_backlash, compound_angle, compound_scale, dial_mode, trailing_edge, leading_edge,
    /// feed_marks, other.
    std::string source;
    /// The gauge diameter with the source minus without it, mm (+: the source made the cone
    /// larger there). feed_marks: what the crests add on diameter for a gauge that touches
    /// them, 2·Rt/cos θ.
    double gaugeDiameterChangeMm = 0;
    /// The fitted half angle with the source minus without it, rad (+: steeper).
    double halfAngleChangeRad = 0;
    /// The pass that brought it in (0-based; the finishing pass at the gauge plane), −1: none.
    int pass = -1;
    /// One plain sentence for people, in the scene's units: what happened, how much it moved
    /// the cone, what to do.
    std::string message;
};

/// The causes of the main cone's error in `result` (the run of `scene`; its findings say whether
/// an edge rubbed, its roughness whether the feed marks matter), sorted by size: the
/// gauge-diameter change over the tolerance plus the half-angle change over the angle
/// tolerance, largest first. Empty when the drawing has no cone or the plan no passes. A
/// source is listed only when it moves the gauge diameter by 0.1 µm or more, or the half angle
/// by as much over the cone's length. Costs one exact-profile run per source present, plus one
/// per repair tried. Precondition: a validated scene, and `result` simulated from it.
std::vector<Cause> findCauses(const Scene& scene, const CutResult& result);

/// Every source name a cause may have, in the order RESULTS.md lists them.
const std::vector<std::string>& causeSourceNames();

/// A source for people ("the nose-radius offset", "the cross-slide's backlash", ...); the
/// snake_case name stays in result.json. An unknown name is returned as it is.
std::string causeLabel(const std::string& source);

/// The causes that name pass `pass` (0-based), in the order of `causes`.
std::vector<const Cause*> causesOfPass(const std::vector<Cause>& causes, int pass);

} // namespace swarf
