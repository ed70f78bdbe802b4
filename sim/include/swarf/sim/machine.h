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
#include <string>
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

/// How far (mm of radius) a boring bar backs off the wall between passes: toward the work's
/// axis, half the shank's clearance in the stock's hole with the tip at `tipXMm` (so the back of
/// the bar stays off the far wall), at least 0.05 mm and at most one turn of the cross-slide.
/// Precondition: scene.tool.kind == BoringBar.
double boringBackOffMm(const Scene& scene, double tipXMm);

/// The cross-slide reading a boring bar is backed off to after a pass (Pass::retractToMm not
/// given): boringBackOffMm toward the axis from the larger of the two readings (inside, a larger
/// reading is further from the wall).
double boringRetractReadingMm(const Scene& scene, double tipXMm, double endCrossMm,
                              double nextCrossMm);

/// Where pass i's retract_to may stand: a turning tool backs out, no further in than the pass
/// ends or the next pass starts (at most `limitMm`); a boring bar comes off the wall toward the
/// centre, no nearer the wall than either (at least `limitMm`).
struct RetractLimit {
    double limitMm = 0;
    bool atLeast = false; ///< true: retract_to ≥ limitMm (a boring bar); false: ≤ limitMm
    bool allows(double retractMm) const {
        return atLeast ? retractMm >= limitMm - 1e-9 : retractMm <= limitMm + 1e-9;
    }
    /// What a retract_to must be, in words, for an error (`limitText`: the limit as written).
    std::string expected(const std::string& limitText) const;
};
RetractLimit retractLimit(const Plan& plan, std::size_t i, bool boringBar);

/// The cross-slide reading a pass starts at (a cross-slide pass: its `from`), and ends at.
double passStartCrossMm(const Pass& pass);
double passEndCrossMm(const Pass& pass);

/// The moves between passes, in the order they are made (see the file comment). Empty for a
/// scene without passes; CNC paths have none of their own.
std::vector<BetweenMove> betweenPassMoves(const Scene& scene);

} // namespace swarf
