#pragma once
// The kernel for inside work: a plan cut with a boring bar (tool.kind = BoringBar).
//
// The sweep inside is the sweep outside seen from the wall. A boring tool's outline is the
// turning outline mirrored across its tip's z line (bore_sweep.h); taking x' = C − x (C a length
// larger than any x the tool reaches) turns it back into the turning outline at tip C − x, the
// hole of radius R into "stock" of radius C − √(R² − h²), and the as-cut bore, the largest of the
// hole and every move's upper envelope, into the smallest: the outside kernel's own exact
// per-column sweep, per-pass profiles and feed-mark surface (feed_marks.h), run on that twin
// with the tip on centre. Each radius is then brought back, x = C − x' and R = √(x² + h²): the
// mapping is monotonic, so it commutes with the largest and the smallest and the tip height
// gives the hyperboloid exactly (h the bar's axis height, where its tip sits).
//
// The result (cut.h, CutResult): the outside stays the bar (`asCut` = `stock`, compared with the
// outside features); the bore, its crests, the drawn bore and the inside deviations are in the
// `bore…` fields; features of both sides are reported; the gauge is the first inside cone's.
// Findings: those of the moves (rubbing, depth of cut, air cut, jaw, compound travel, found on
// the twin), left on and overcut per side, the finishing feed, and the boring findings
// (boring_findings.h), and the moves between passes (`between`: the bar comes off the wall
// toward the centre, machine.h) checked against the metal on the twin, as outside.
#include "swarf/sim/kernel.h"

namespace swarf {

/// The whole kernel for a scene whose tool is a boring bar. Precondition: the scene is valid
/// and tool.kind == BoringBar (simulate() calls it for such a scene).
CutResult simulateInside(const Scene& scene, const ProgressFn& progress = {});

/// The length C of the twin above for a scene, mm: the bar's diameter plus 10 mm, beyond any x
/// a boring tool reaches in the bar.
double insideTwinOffsetMm(const Scene& scene);

/// A move of the boring tool as the twin's turning tool makes it: tip x → C − x.
ToolMove insideTwinMove(const ToolMove& m, double c);

/// A radius x' on the twin back to the bore's radius: x = C − x', R = √(x² + h²) for a tip h
/// off centre; 0 where x ≤ 0 (no hole).
double boreRadiusFromTwin(double twinX, double c, double h);

/// Samples of the bore that count toward the verdict: not within one nose radius of an inside
/// face (the bottom or a step keeps the nose's radius in its corner).
std::vector<bool> insideVerdictMask(const Part& part, const Profile& grid, double noseRadiusMm);

} // namespace swarf
