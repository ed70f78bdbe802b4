#pragma once
// Private to geometry/src: a sampled outline (z_i, x_i) turned into a chain of modeller edges
// (straight segments, circular arcs, B-splines) in the XZ plane, and outlines closed to the
// axis and revolved into solids.
#include "swarf/geometry/revolve.h"

#include <TopoDS_Edge.hxx>
#include <TopoDS_Shape.hxx>
#include <TopoDS_Vertex.hxx>

#include <string>
#include <vector>

namespace swarf::geometry {

/// An open chain of edges from the first sample to the last, with the fit's figures.
struct EdgeChain {
    std::vector<TopoDS_Edge> edges;
    TopoDS_Vertex first, last;
    double maxErrorMm = 0;
    int lines = 0, arcs = 0, splines = 0;
};

/// Fits the samples (z[i], x[i]), i = 0..n−1, n ≥ 2, as documented for profileSolid().
EdgeChain fitOutline(const std::vector<double>& zMm, const std::vector<double>& xMm,
                     const ProfileFitOptions& options);

/// Straight segments through the points (no fit).
EdgeChain polylineChain(const std::vector<double>& zMm, const std::vector<double>& xMm);

/// Continues the chain from its last point straight out (or in) to x = xMm, then along the
/// axis to z = zEndMm at that x. Precondition: zEndMm > the chain's last z.
void extendChain(EdgeChain& chain, double zEndMm, double xMm);

/// Closes the chain with straight lines down to the axis at both ends and along the axis, and
/// revolves the face 360° about Z. Checks the solid is valid; throws GeometryError otherwise.
TopoDS_Shape revolveChain(const EdgeChain& chain, const std::string& what);

/// The points of a Douglas–Peucker simplification of the samples within toleranceMm: indices
/// into the samples, increasing, first 0 and last n−1.
std::vector<std::size_t> simplifyOutline(const std::vector<double>& zMm,
                                         const std::vector<double>& xMm, double toleranceMm);

} // namespace swarf::geometry
