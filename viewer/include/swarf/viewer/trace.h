#pragma once
// What the viewer draws along the cone, without any VTK type: which profile rows make the 3D
// part, the deviation line of the section and the chart (with the feed marks where the kernel's
// 3D surface has them), and the stretch of the cone the close-up shows. The window, the
// snapshots and the tests all go through these, so tests can check the drawn data directly.
#include "swarf/sim/cut.h"
#include "swarf/sim/moment.h"
#include "swarf/sim/scene.h"

#include <cstddef>
#include <vector>

namespace swarf::viewer {

/// Sample indices i in [first, last], at most maxRows of them (≥ 2), evenly strided; both ends
/// kept. Empty if last < first.
std::vector<std::size_t> pickRows(std::size_t first, std::size_t last, std::size_t maxRows);

/// Rows of `profile` to draw the part from: about `baseRows` evenly spaced, plus the rows that
/// keep every corner and step sharp: between two kept rows, the straight line may be off the
/// profile by at most `toleranceMm` in radius, and off `deviationMm` (per sample, may be null;
/// NaN ignored) by at most `deviationToleranceMm`. At most `maxRows` rows (then the tolerances
/// are not met everywhere). Indices increase; both ends kept.
std::vector<std::size_t> profileRows(const Profile& profile, const std::vector<double>* deviationMm,
                                     std::size_t first, std::size_t last, std::size_t baseRows,
                                     double toleranceMm, double deviationToleranceMm,
                                     std::size_t maxRows);

/// Indices into `values` (ordered by increasing `zMm`, same length) that keep the shape of the
/// line at a coarser resolution: the z range is split into `buckets` equal intervals and each
/// keeps its lowest and highest value, in their order along z, so that peaks (feed marks, a
/// step) survive. A NaN value is kept once per run, so that the line breaks there.
std::vector<std::size_t> minMaxSamples(const std::vector<double>& zMm,
                                       const std::vector<double>& values, std::size_t buckets);

/// A line along the drawing between two planes: z, the drawing's radius there, and the signed
/// deviation normal to the drawing (+ left on, − overcut; NaN where the line breaks: off the
/// drawing).
struct DeviationTrace {
    std::vector<double> zMm, nominalMm, deviationMm;
    /// True if it follows the kernel's 3D surface along one meridian (φ = 0, the operator's
    /// side), feed marks included; false if it follows the moment's axisymmetric profile.
    bool feedMarks = false;
    /// True if it follows a bore (a bored result): the drawing is the drawn bore and + left on
    /// is metal within it, toward the axis.
    bool inside = false;
};

/// The deviation line at a moment over [zFromMm, zToMm], with at most about `maxPoints` points
/// (min/max decimated, see minMaxSamples; 0: every sample). At the finished part it follows the
/// 3D surface (feed marks) along φ = 0 where the result has one, sampled at the rows that
/// resolve the marks (FeedMarkSurface::markRows, at most 400 000), else the moment's profile.
/// A bored result's line follows the moment's bore against the drawn bore (inside = true).
DeviationTrace deviationTrace(const Scene& scene, const CutResult& result, const MomentView& moment,
                              double zFromMm, double zToMm, std::size_t maxPoints);

/// `trace` with at most about `maxPoints` points (min/max decimated, see minMaxSamples); the
/// same trace if it has no more than that or maxPoints is 0.
DeviationTrace decimateTrace(const DeviationTrace& trace, std::size_t maxPoints);

/// The stretch of the cone that the close-up shows: about forty feed marks of the finishing
/// pass around the gauge plane (clamped to the cone), and how much the feed marks are raised
/// to be seen.
struct CloseUp {
    double zFromMm = 0, zToMm = 0;
    double feedMmPerRev = 0; ///< feed of the last pass (0 if none)
    /// The feed marks are drawn `reliefFactor` times their height above the smooth swept
    /// surface (1: true to scale). Chosen so that the marks stand about a quarter of their pitch
    /// high; 1 where there are no marks.
    double reliefFactor = 1;
};

/// The close-up of a result: the main cone (first cone feature, else the first feature) around
/// its gauge plane.
CloseUp closeUpOf(const Scene& scene, const CutResult& result);

/// The z extent of the main cone (a bored result: its first inside cone; else the first cone
/// feature; else the whole drawing; else the result's grid), mm.
void mainConeExtent(const Scene& scene, const CutResult& result, double& zFromMm, double& zToMm);

} // namespace swarf::viewer
