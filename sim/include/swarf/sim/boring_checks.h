#pragma once
// Geometric checks of a boring bar in its hole, at one tool position: how far the bar's shank
// clears the bore behind the insert, and how far the tool runs past the bottom of a blind hole.
// Pure geometry, values in and out; boring_findings.h turns them into findings of simulate().
//
// Where the shank sits: a maker's `min_bore` is the smallest bore the bar enters with its tip on
// the wall; there the back of the shank touches the opposite wall, so the bar's axis lies
// min_bore − bar_diameter/2 behind the tip, toward the work's axis (derived).
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

namespace swarf {

/// Horizontal distance from a boring bar's imaginary tip back to the bar's axis, mm:
/// min_bore − bar_diameter / 2. Precondition: tool.kind == BoringBar, validated.
double barAxisBehindTipMm(const Tool& tool);

/// Clearance (mm) between a boring bar's shank and a bore of radius `boreRadiusMm` in one cross
/// section, with the imaginary tip at horizontal distance `tipXMm` from the work's axis and the
/// bar's axis at the tool's tip height: R − |(tipX − reach, h)| − bar_diameter/2. Negative: the
/// shank is in the wall by that much (it rubs). Precondition as barAxisBehindTipMm.
double barWallClearanceMm(const Tool& tool, double tipXMm, double boreRadiusMm);

/// The tightest place of the shank along a bore, for the tip at (tipZ, tipX).
struct BarClearance {
    double clearanceMm = 0; ///< least clearance over the bore's samples behind the tip, mm
    double zMm = 0;         ///< where, mm
};

/// The least barWallClearanceMm over the samples of `bore` (the bore's radius as it stands)
/// from the stock's free end to the tip's z: the shank runs out of the hole toward the
/// tailstock. Samples with a radius of 0 (solid) count as no hole. The clearance is +inf when
/// no sample lies there.
BarClearance barClearanceAlongBore(const Scene& scene, const Profile& bore, double tipZMm,
                                   double tipXMm);

/// How far (mm) the insert reaches past the bottom of the stock's blind hole with the imaginary
/// tip at z (its leading point is `leadPastTipMm` beyond the tip toward the chuck); ≤ 0 when it
/// stays short of it, and for a hole through the work (where there is no bottom).
double pastBoreBottomMm(const Scene& scene, double tipZMm, double leadPastTipMm);

} // namespace swarf
