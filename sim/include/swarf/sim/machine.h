#pragma once
// The machine model: dial readings to imaginary-tip positions (scenes/README.md, [setup]).
//
// With slide travels c (cross, toward the axis), p (compound, along its ways) and s (saddle,
// toward the chuck), all in mm of slide travel measured from the zero readings, the imaginary
// tip is at
//     z = zeroZ + s + p·a·cos α,   x = zeroDiameter/2 − c − p·sin α,
// where α is the compound's true angle from the spindle axis (Setup::compoundAxisAngleRad) and a =
// +1 if the compound advances toward the chuck (−1 toward the tailstock). A cross-slide reading on
// a diameter dial is twice its travel. Backlash: the slide sits somewhere in a gap of width b
// behind the handwheel; when the handwheel moves, the slide is dragged along only once the gap is
// closed, so its travel is clamp(previous travel, w, w + b) for handwheel position w (in travel
// mm). At the zero readings each slide has last moved with its reading increasing (travel = w).
// Setup::approach says how the readings set before each pass are reached: Approach::InOrder
// dials them in pass order (the rule above, so a slide that reverses lags), Approach::TakeUp
// winds back past each and comes up to it (travel = w). In both, the slide that moves during a
// pass follows the rule above from its start reading.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <Eigen/Core>

namespace swarf {

/// Slide travel (mm) after the handwheel moves to travel-equivalent position `handwheelMm`,
/// given the travel before and the slide's backlash (mm, ≥ 0).
double followWithBacklash(double travelBeforeMm, double handwheelMm, double backlashMm);

/// Imaginary tip (z, x) in mm for slide travels in mm (not readings), as in the file comment.
Eigen::Vector2d tipFromTravels(const Setup& setup, double crossTravelMm, double compoundTravelMm,
                               double saddleTravelMm);

/// Travel in mm of slide for a cross-slide reading (halved on a diameter dial).
double crossTravelFromReading(const Setup& setup, double readingMm);

} // namespace swarf
