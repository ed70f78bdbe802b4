#pragma once
// Internal to the viewer (VTK types allowed here, not in viewer/include): polygon meshes of
// the part, the insert, the stock outline and the tool paths.
//
// World coordinates: X = z (axial, toward the chuck), Y = x (horizontal, operator's side),
// Z = height above the spindle axis.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"
#include "swarf/viewer/trace.h"

#include <vtkFloatArray.h>
#include <vtkPoints.h>
#include <vtkPolyData.h>
#include <vtkSmartPointer.h>

#include <vector>

namespace swarf::viewer::detail {

/// Unit normals of a grid of nr rows (along the axis) by nc columns (around it), by central
/// differences (one-sided at the edges; around the part when `wraps`): out of the part, or
/// toward the axis when `towardAxis` (a bore seen from inside).
vtkSmartPointer<vtkFloatArray> gridNormals(vtkPoints* points, vtkIdType nr, int nc, bool wraps,
                                           bool towardAxis);

/// Surface of revolution of `profile` over the given rows, φ from phi0 over phiSpan (rad) in
/// nPhi steps. Point scalars "deviation" (display units, NaN off the drawing) if given. With
/// `inward` the faces and normals point toward the axis (a bore's wall, seen from inside).
vtkSmartPointer<vtkPolyData> revolve(const Profile& profile, const std::vector<std::size_t>& rows,
                                     const std::vector<double>* scalars, int nPhi, double phi0,
                                     double phiSpan, bool inward = false);

/// The finished surface with its feed marks over [zFromMm, zToMm], the whole way round: `rows`
/// rows evenly spread in z; columns every fineStepRad within ±fineHalfWidthRad of
/// φ = fineCentreRad (where the close-up looks), every coarseStride-th step elsewhere (the rest
/// of the ring, off the picture until the view is turned). The grid is filled from the kernel's
/// surface for this patch only.
/// Each point stands reliefFactor times its true height above the smooth swept surface `smooth`
/// (the exact profile), so that marks a micrometre high can be seen; its scalar is the true
/// signed deviation normal to the drawing in display units (mm times toDisplay), NaN off it.
vtkSmartPointer<vtkPolyData> feedMarkPatch(const FeedMarkSurface& surface, const Profile& smooth,
                                           const Part& part, double zFromMm, double zToMm,
                                           std::size_t rows, double fineCentreRad,
                                           double fineHalfWidthRad, double fineStepRad,
                                           int coarseStride, double reliefFactor, double toDisplay);

/// The two faces of a cut-away wedge at φ = a and φ = b: strips between innerMm[i] and
/// outerMm[i] (radii on the samples of `grid`) where both are numbers and outer > inner.
vtkSmartPointer<vtkPolyData> wedgeFaces(const Profile& grid, const std::vector<double>& innerMm,
                                        const std::vector<double>& outerMm,
                                        const std::vector<std::size_t>& rows, double a, double b);

/// The stock outline: its silhouette in the horizontal plane and circles at both ends.
vtkSmartPointer<vtkPolyData> stockOutline(const Stock& stock);

/// Three chuck jaws gripping the bar behind the jaws' face (z ≥ Stock::jawZMm()), at 90°, 210°
/// and 330° round the axis: plain blocks, sized from the bar for orientation only.
vtkSmartPointer<vtkPolyData> chuckJaws(const Stock& stock);

/// The insert: its outline (z, x) about the nose centre, extruded downward by its thickness
/// from the rake face at the tip height, placed with the imaginary tip at the origin (move the
/// actor to the tip's (z, x)).
vtkSmartPointer<vtkPolyData> insertSolid(const Tool& tool);

/// Tool paths: one polyline piece per move at the tip height, cell scalar 0 done, 1 current,
/// 2 to come (relative to `pass`, `passFraction`).
vtkSmartPointer<vtkPolyData> toolPaths(const CutResult& result, const Tool& tool, int pass,
                                       double passFraction);

} // namespace swarf::viewer::detail
