#pragma once
// Internal to the viewer (VTK types allowed): the meshes of inside work, besides the surfaces of
// revolution meshes.h makes: the boring bar's shank, the ring of an end face between the bore
// and the outside, and two meshes joined into one.
//
// World coordinates as meshes.h: X = z (axial, toward the chuck), Y = x (horizontal, operator's
// side), Z = height above the spindle axis.
#include "swarf/sim/cut.h"
#include "swarf/sim/inside_kernel.h"
#include "swarf/sim/scene.h"

#include <vector>

#include <vtkPolyData.h>
#include <vtkSmartPointer.h>

namespace swarf::viewer::detail {

/// The boring bar's shank at its real size: a round bar of tool.barDiameterMm, its axis
/// barAxisBehindTipMm(tool) behind the imaginary tip (toward the work's axis) at the tip
/// height, running from just behind the tip back toward the tailstock by tool.overhangMm (the
/// holder's face). Placed with the imaginary tip at the origin (move the actor to the tip's
/// (z, x), as the insert). Capped at both ends; `sides` facets round (≥ 3). Empty for a tool
/// that is not a boring bar.
vtkSmartPointer<vtkPolyData> boringBarShank(const Tool& tool, int sides = 32);

/// The ring of an end face at axial position zMm, from radius innerMm to outerMm (mm, inner may
/// be 0: a disc), φ from phi0 over phiSpan (rad) in nPhi steps, facing −z if `facingFree` (the
/// free end) else +z. Empty if outer ≤ inner. Point normals set; no scalars.
vtkSmartPointer<vtkPolyData> endRing(double zMm, double innerMm, double outerMm, int nPhi,
                                     double phi0, double phiSpan, bool facingFree);

/// A stretch of the finished bore with its feed marks, seen from inside: rows evenly spread over
/// [zFromMm, zToMm] (`rows` ≥ 2), columns every stepRad over phiSpanRad from phi0Rad, filled from
/// the bore's feed-mark surface `marks`. Each point stands reliefFactor times its true height
/// above the swept bore `smooth` (toward the axis: the marks' crests stand inward), so that marks
/// a micrometre high can be seen; its scalar is the true signed deviation from the drawn bore
/// (compare.h, Side::Inside: + left on within it) in display units (mm times toDisplay), NaN off
/// the inside drawing. Faces and normals point toward the axis.
vtkSmartPointer<vtkPolyData> boreMarkPatch(const BoreMarks& marks, const Profile& smooth,
                                           const Part& part, double zFromMm, double zToMm,
                                           std::size_t rows, double phi0Rad, double phiSpanRad,
                                           double stepRad, double reliefFactor, double toDisplay);

/// The points and polygons of `a` and `b` in one mesh (point data is not kept: for the plain
/// coloured meshes, the cut-away faces and the rings).
vtkSmartPointer<vtkPolyData> joinMeshes(vtkPolyData* a, vtkPolyData* b);

} // namespace swarf::viewer::detail
