#pragma once
// Findings about the cut, each tied to the pass that caused it. These are results, not errors.
//
//   left_on          a feature keeps metal beyond its tolerance band after the last pass
//   overcut          a feature is cut below its band (scrap): the first pass that did it
//   rubbing          a move runs down toward the axis, in the tool's feed direction, steeper
//                    than the trailing edge can follow: 180° − κr − ε minus a clearance of 3°
//                    (references R8: 2–7°); against the feed direction the leading edge's κr
//                    is the limit. Plunges (no axial motion) are left out: both edges cut there.
//   jaw_crash        some part of the insert comes within kJawClearanceMm of the jaws' face
//   past_stock       the tool goes through the centre where there is metal
//   compound_travel  a compound reading beyond the compound's travel
//   depth_of_cut     the engaged edge (depth / sin κr) longer than the cutting edge
//   air_cut          a pass that removes less than kAirCutMm anywhere
//   corner_fillet    the nose radius leaves a fillet in a sharp internal corner of the drawing
//   coarse_finish    the finishing feed is more than half the nose radius (kernel.cpp)
#include "swarf/sim/compare.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <vector>

namespace swarf {

/// How close the insert may come to the jaws' face, mm (common practice: keep clear by ~1 mm).
inline constexpr double kJawClearanceMm = 1.0;
/// Clearance taken off the trailing-edge limit on a ramp, rad (references R8: 2–7°).
inline constexpr double kRampClearanceRad = 3.0 * kPi / 180.0;
/// A pass that removes less than this anywhere cuts only air, mm.
inline constexpr double kAirCutMm = 0.001;

/// The steepest ramp (rad from the axis) a move can run down toward the axis in the tool's feed
/// direction before the trailing edge rubs: π − κr − ε − clearance (references R8).
double rampLimitRad(const ToolOutline& outline);

/// All findings of a simulated plan. `features`, `deviationMm` (the valleys) and
/// `crestDeviationMm` (the feed marks' crests) come from compare.h; the sweep must have been
/// made with per-pass profiles.
std::vector<Finding>
findCutFindings(const Scene& scene, const ToolOutline& outline, const std::vector<ToolMove>& moves,
                const ExactSweep& sweep, const Profile& nominal,
                const std::vector<FeatureReport>& features, const std::vector<double>& deviationMm,
                const std::vector<double>& crestDeviationMm, const std::vector<bool>& mask);

/// The fillets the nose leaves in the drawing's internal corners (a feature's end against a
/// taller neighbour, where the drawing has a sharp corner): one corner_fillet finding each where
/// a move cut the corner, the feature is to size away from it (`features`, compare.h) and the
/// as-cut profile stands further out of the drawn corner than the feature's band, with its size
/// (the distance from the drawn corner to the as-cut surface, valueMm) and what the drawing
/// would need. `asCut` and `finalMove` per sample of the sweep.
std::vector<Finding> cornerFilletFindings(const Scene& scene, const Profile& asCut,
                                          const std::vector<int>& finalMove,
                                          const std::vector<ToolMove>& moves,
                                          const std::vector<FeatureReport>& features);

} // namespace swarf
