#pragma once
// The machine model: dial readings to imaginary-tip positions (scenes/README.md, [setup]).
//
// With slide travels c (cross, toward the axis), p (compound, along its ways) and s (saddle,
// toward the chuck), all in mm of slide travel measured from the zero readings, the imaginary
// tip is at
//     z = zeroZ + s + p·a·cos α,   x = zeroDiameter/2 − c − p·b·sin α,
// where α is the compound's true angle from the spindle axis (Setup::compoundAxisAngleRad),
// a = +1 if the compound's reading increasing moves the tool toward the chuck (−1 toward the
// tailstock) and b = +1 if it moves the tool in toward the axis (−1 out). A cross-slide reading
// on a diameter dial is twice its travel. Backlash: the slide sits somewhere in a gap of width b
// behind the handwheel; when the handwheel moves, the slide is dragged along only once the gap is
// closed, so its travel is clamp(previous travel, w, w + b) for handwheel position w (in travel
// mm). At the zero readings each slide has last moved with its reading increasing (travel = w).
//
// Between two passes the tool goes back to the next start: the cross-slide is backed out (to the
// pass's retract_to), the compound and then the saddle are brought to their next readings (with
// approach = take_up: wound back past a lower reading and brought up to it; with in_order:
// dialled straight there), and the cross-slide is fed in. Before the first pass (and after a CNC
// path) the tool comes in from outside the bar at the start; after the last pass it is backed
// out. These moves are BetweenMoves: they should cut nothing (between_passes.h checks that).
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <Eigen/Core>
#include <vector>

namespace swarf {

/// Slide travel (mm) after the handwheel moves to travel-equivalent position `handwheelMm`,
/// given the travel before and the slide's backlash (mm, ≥ 0).
double followWithBacklash(double travelBeforeMm, double handwheelMm, double backlashMm);

/// The set-up as it stands during `pass`: the set-up's own, with the pass's compound setting
/// (Pass::compoundAngleRad, Pass::compoundErrorRad) in place of the set-up's where it has one.
Setup setupForPass(const Setup& setup, const Pass& pass);

/// Imaginary tip (z, x) in mm for slide travels in mm (not readings), as in the file comment.
Eigen::Vector2d tipFromTravels(const Setup& setup, double crossTravelMm, double compoundTravelMm,
                               double saddleTravelMm);

/// Travel in mm of slide for a cross-slide reading (halved on a diameter dial).
double crossTravelFromReading(const Setup& setup, double readingMm);

/// One turn of a slide's dial, mm of dial reading.
double turnMm(const Slide& slide);

/// The cross-slide reading (mm of dial) a pass is backed out to when the scene does not say
/// (Pass::retractToMm): one turn out from the smaller of `endCrossMm` (the pass's last cross-slide
/// reading) and `nextCrossMm` (the next pass's first; pass the same value when there is none).
double defaultRetractReadingMm(const Setup& setup, double endCrossMm, double nextCrossMm);

/// The cross-slide reading a pass starts at (a cross-slide pass: its `from`), and ends at.
double passStartCrossMm(const Pass& pass);
double passEndCrossMm(const Pass& pass);

/// The moves between passes, in the order they are made (see the file comment). Empty for a
/// scene without passes; CNC paths have none of their own.
std::vector<BetweenMove> betweenPassMoves(const Scene& scene);

} // namespace swarf
