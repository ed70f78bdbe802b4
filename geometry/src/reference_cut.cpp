#include "swarf/geometry/reference_cut.h"

#include "occt_support.h"

#include "swarf/geometry/hollow.h"
#include "swarf/geometry/revolve.h"
#include "swarf/sim/tool_outline.h"

#include <BRepAlgoAPI_Cut.hxx>
#include <BRepBuilderAPI_MakeFace.hxx>
#include <BRepBuilderAPI_MakePolygon.hxx>
#include <BRepPrimAPI_MakeRevol.hxx>
#include <gp_Ax1.hxx>

#include <algorithm>
#include <cmath>
#include <numbers>

namespace swarf::geometry {
namespace {

using P2 = Eigen::Vector2d; // (z, x)

double cross(const P2& o, const P2& a, const P2& b) {
    return (a.x() - o.x()) * (b.y() - o.y()) - (a.y() - o.y()) * (b.x() - o.x());
}

// Convex hull, counter-clockwise in (z, x), without collinear points (Andrew's monotone chain).
std::vector<P2> convexHull(std::vector<P2> pts) {
    std::sort(pts.begin(), pts.end(), [](const P2& a, const P2& b) {
        return a.x() < b.x() || (a.x() == b.x() && a.y() < b.y());
    });
    if (pts.size() < 3)
        return pts;
    std::vector<P2> h(2 * pts.size());
    std::size_t k = 0;
    for (const P2& p : pts) {
        while (k >= 2 && cross(h[k - 2], h[k - 1], p) <= 0)
            --k;
        h[k++] = p;
    }
    for (std::size_t i = pts.size() - 1, t = k + 1; i-- > 0;) {
        while (k >= t && cross(h[k - 2], h[k - 1], pts[i]) <= 0)
            --k;
        h[k++] = pts[i];
    }
    h.resize(k - 1);
    return h;
}

// The part of a convex polygon with x ≥ 0 (Sutherland–Hodgman against one half-plane).
std::vector<P2> clipToAxis(const std::vector<P2>& poly) {
    std::vector<P2> out;
    for (std::size_t i = 0; i < poly.size(); ++i) {
        const P2& a = poly[i];
        const P2& b = poly[(i + 1) % poly.size()];
        const bool ina = a.y() >= 0, inb = b.y() >= 0;
        if (ina)
            out.push_back(a);
        if (ina != inb) {
            const double t = a.y() / (a.y() - b.y());
            out.emplace_back(a.x() + t * (b.x() - a.x()), 0.0);
        }
    }
    return out;
}

// Maps x to sqrt(x² + h²), splitting each edge so the chords stay within chordErrorMm of the
// mapped curve. Along an edge, ρ(t) = sqrt(x(t)² + h²) has |ρ''| ≤ (dx/dt)² h² / ρ³, so a
// piece of length L departs from its chord by at most L² h² / (8 ρmin³) (derived).
std::vector<P2> offCentre(const std::vector<P2>& poly, double h, double chordErrorMm) {
    std::vector<P2> out;
    for (std::size_t i = 0; i < poly.size(); ++i) {
        const P2& a = poly[i];
        const P2& b = poly[(i + 1) % poly.size()];
        const double xNear =
            (a.y() > 0) == (b.y() > 0) ? std::min(std::abs(a.y()), std::abs(b.y())) : 0.0;
        const double rhoMin = std::hypot(xNear, h);
        const double curvature = h * h / (rhoMin * rhoMin * rhoMin);
        const double maxPiece = std::sqrt(8.0 * chordErrorMm / curvature);
        const double len = std::abs(b.y() - a.y()); // only the x extent bends
        const int n = std::clamp(static_cast<int>(std::ceil(len / maxPiece)), 1, 20000);
        for (int k = 0; k < n; ++k) {
            const P2 p = a + (b - a) * (static_cast<double>(k) / n);
            out.emplace_back(p.x(), std::hypot(p.y(), h));
        }
    }
    return out;
}

TopoDS_Shape revolvePolygon(const std::vector<P2>& poly) {
    BRepBuilderAPI_MakePolygon wire;
    for (const P2& p : poly)
        wire.Add(profilePoint(p.x(), p.y()));
    wire.Close();
    require(wire.IsDone() == Standard_True, "swept tool", "the hull polygon is degenerate");
    BRepBuilderAPI_MakeFace face(wire.Wire(), Standard_True);
    require(face.IsDone() == Standard_True, "swept tool", "the hull polygon bounds no face");
    BRepPrimAPI_MakeRevol revol(face.Face(), gp_Ax1(gp_Pnt(0, 0, 0), gp_Dir(0, 0, 1)),
                                2 * std::numbers::pi, Standard_False);
    require(revol.IsDone() == Standard_True, "swept tool", "revolving the hull failed");
    return revol.Shape();
}

std::vector<P2> sweptRegion(const ToolOutline& outline, const std::vector<P2>& polygon,
                            const ToolMove& move, double topXMm) { // topXMm: at least this high
    const P2 c0 = move.tipFrom - outline.imaginaryTip();
    const P2 c1 = move.tipTo - outline.imaginaryTip();
    std::vector<P2> pts;
    pts.reserve(2 * polygon.size() + 2);
    double zMin = 1e300, zMax = -1e300, xMax = topXMm;
    for (const P2& p : polygon)
        for (const P2& c : {c0, c1}) {
            pts.push_back(c + p);
            zMin = std::min(zMin, pts.back().x());
            zMax = std::max(zMax, pts.back().x());
            xMax = std::max(xMax, pts.back().y());
        }
    // Everything above the insert is cut away too (the chip leaves): lift the hull's top, above
    // every point of the insert so the lift adds nothing below it.
    pts.emplace_back(zMin, xMax);
    pts.emplace_back(zMax, xMax);
    return convexHull(std::move(pts));
}

// A boring tool's swept region: the insert's outline mirrored across its tip's z line (the nose
// toward the wall), at both ends of the move, and everything from it down to the axis (the hole
// and the chip), as the kernel takes the bore (sim/bore_sweep.h).
Solid boringToolSolid(const ToolOutline& outline, const std::vector<P2>& polygon,
                      const ToolMove& move, double h, const ReferenceOptions& options) {
    const P2 it = outline.imaginaryTip();
    std::vector<P2> pts;
    double zMin = 1e300, zMax = -1e300;
    for (const P2& p : polygon)
        for (const P2& tip : {move.tipFrom, move.tipTo}) {
            pts.emplace_back(tip.x() + (p.x() - it.x()), tip.y() - (p.y() - it.y()));
            zMin = std::min(zMin, pts.back().x());
            zMax = std::max(zMax, pts.back().x());
        }
    pts.emplace_back(zMin, 0.0);
    pts.emplace_back(zMax, 0.0);
    std::vector<P2> region = clipToAxis(convexHull(std::move(pts)));
    if (h != 0)
        region = offCentre(region, h, options.offCentreChordErrorMm);
    return wrap(revolvePolygon(region));
}

} // namespace

Solid sweptToolSolid(const Tool& tool, const ToolMove& move, double stockRadiusMm,
                     const ReferenceOptions& options) {
    return guarded("swept tool of a move", [&] {
        const ToolOutline outline(tool);
        const std::vector<P2> polygon = outline.polygon(options.chordErrorMm);
        const double h = tool.tipHeightMm;
        if (tool.kind == ToolKind::BoringBar)
            return boringToolSolid(outline, polygon, move, h, options);
        std::vector<P2> region = sweptRegion(outline, polygon, move, stockRadiusMm + 1.0);
        double xMin = 1e300;
        for (const P2& p : region)
            xMin = std::min(xMin, p.y());
        if (std::hypot(std::max(xMin, 0.0), h) >= stockRadiusMm)
            return Solid(); // in the air
        region = clipToAxis(region);
        if (h != 0)
            region = offCentre(region, h, options.offCentreChordErrorMm);
        return wrap(revolvePolygon(region));
    });
}

ReferenceResult referenceCut(const Scene& scene, const std::vector<ToolMove>& moves,
                             const ReferenceOptions& options) {
    ReferenceResult out;
    const double stockR = scene.stock.diameterMm / 2;
    const double zLo = scene.stock.freeEndZMm(), zHi = scene.stock.jawZMm();
    Solid part = stockSolid(scene.stock);
    if (const Solid hole = holeSolid(scene.stock); !hole.empty())
        part = part.minus(hole); // inside work: the bar as drilled
    for (const ToolMove& move : moves) {
        const Solid tool = sweptToolSolid(scene.tool, move, stockR, options);
        bool reaches = !tool.empty();
        if (reaches) {
            const BoxMm b = tool.bounds();
            reaches = b.zMax > zLo && b.zMin < zHi;
        }
        if (!reaches) {
            ++out.movesSkipped;
            continue;
        }
        part = part.minus(tool);
        ++out.movesCut;
    }
    guarded("reference cut", [&] { requireValid(part.impl().shape, "reference cut"); });
    out.asCut = part;
    out.volumeMm3 = part.volumeMm3();
    return out;
}

} // namespace swarf::geometry
