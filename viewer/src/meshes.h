#pragma once
// Internal to the viewer (VTK types allowed here, not in viewer/include): polygon meshes of
// the part, the insert, the stock outline and the tool paths.
//
// World coordinates: X = z (axial, toward the chuck), Y = x (horizontal, operator's side),
// Z = height above the spindle axis.
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <vtkPolyData.h>
#include <vtkSmartPointer.h>

#include <vector>

namespace swarf::viewer::detail {

/// Rows of a profile to draw: sample indices i in [first, last] with stride, so that at most
/// maxRows rows are drawn; the ends are always kept.
std::vector<std::size_t> pickRows(std::size_t first, std::size_t last, std::size_t maxRows);

/// Surface of revolution of `profile` over the given rows, φ from phi0 over phiSpan (rad) in
/// nPhi steps. Point scalars "deviation" (display units, NaN off the drawing) if given.
vtkSmartPointer<vtkPolyData> revolve(const Profile& profile, const std::vector<std::size_t>& rows,
                                     const std::vector<double>* scalars, int nPhi, double phi0,
                                     double phiSpan);

/// The 3D surface with feed marks from a height map (rows subsampled to maxRows, within
/// [zFromMm, zToMm]) and columns (to maxCols), with deviation scalars from the nominal profile
/// (display-unit factor).
vtkSmartPointer<vtkPolyData> heightMapSurface(const HeightMap& map, const Profile& nominal,
                                              double zFromMm, double zToMm, std::size_t maxRows,
                                              double phi0, double phiSpan, double toDisplay,
                                              int maxCols);

/// The two faces of a cut-away wedge at φ = a and φ = b: strips between innerMm[i] and
/// outerMm[i] (radii on the samples of `grid`) where both are numbers and outer > inner.
vtkSmartPointer<vtkPolyData> wedgeFaces(const Profile& grid, const std::vector<double>& innerMm,
                                        const std::vector<double>& outerMm,
                                        const std::vector<std::size_t>& rows, double a, double b);

/// The stock outline: its silhouette in the horizontal plane and circles at both ends.
vtkSmartPointer<vtkPolyData> stockOutline(const Stock& stock);

/// The insert: its outline (z, x) about the nose centre, extruded downward by its thickness
/// from the rake face at the tip height, placed with the imaginary tip at tipZX.
vtkSmartPointer<vtkPolyData> insertSolid(const Tool& tool, const Eigen::Vector2d& tipZX);

/// Tool paths: one polyline piece per move at the tip height, cell scalar 0 done, 1 current,
/// 2 to come (relative to `pass`, `passFraction`).
vtkSmartPointer<vtkPolyData> toolPaths(const CutResult& result, const Tool& tool, int pass,
                                       double passFraction);

} // namespace swarf::viewer::detail
