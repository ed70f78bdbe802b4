// Fitting a sampled outline with lines, arcs and B-splines. The kernel's profile is exact at its
// samples; between them it is made of straight moves' envelopes (lines) and nose arcs (circles)
// when the tool is on centre, and of other curves (a tool off centre cuts hyperbolas). Lines
// and circles are recognised first; whatever is left is fitted by B-splines, refined until the
// farthest sample is within the allowed error.
#include "profile_fit.h"

#include "occt_support.h"

#include <BRepBuilderAPI_MakeEdge.hxx>
#include <BRepBuilderAPI_MakeFace.hxx>
#include <BRepBuilderAPI_MakeVertex.hxx>
#include <BRepBuilderAPI_MakeWire.hxx>
#include <BRepPrimAPI_MakeRevol.hxx>
#include <BRep_Tool.hxx>
#include <GC_MakeArcOfCircle.hxx>
#include <GeomAPI_PointsToBSpline.hxx>
#include <GeomAPI_ProjectPointOnCurve.hxx>
#include <Geom_BSplineCurve.hxx>
#include <Geom_TrimmedCurve.hxx>
#include <TColgp_Array1OfPnt.hxx>
#include <gp_Ax1.hxx>

#include <algorithm>
#include <cmath>
#include <numbers>
#include <utility>

namespace swarf::geometry {
namespace {

// Distance of sample k from the chord through samples i and j.
double chordDistance(const std::vector<double>& z, const std::vector<double>& x, std::size_t i,
                     std::size_t j, std::size_t k) {
    const double dz = z[j] - z[i], dx = x[j] - x[i];
    const double len = std::hypot(dz, dx);
    if (len == 0)
        return std::hypot(z[k] - z[i], x[k] - x[i]);
    return std::abs(dz * (x[k] - x[i]) - dx * (z[k] - z[i])) / len;
}

class Fitter {
  public:
    Fitter(const std::vector<double>& z, const std::vector<double>& x, const ProfileFitOptions& o)
        : z_(z), x_(x), opt_(o), vertices_(z.size()) {}

    EdgeChain run() {
        const std::vector<std::size_t> breaks = simplifyOutline(z_, x_, opt_.lineToleranceMm);
        const auto longEnough = [&](std::size_t k) {
            return breaks[k + 1] - breaks[k] >= static_cast<std::size_t>(opt_.minLineIntervals);
        };
        std::size_t k = 0;
        while (k + 1 < breaks.size()) {
            if (longEnough(k)) {
                addLine(breaks[k], breaks[k + 1]);
                ++k;
                continue;
            }
            std::size_t j = k;
            while (j + 1 < breaks.size() && !longEnough(j))
                ++j;
            fitStretch(breaks[k], breaks[j]);
            k = j;
        }
        chain_.first = vertex(0);
        chain_.last = vertex(z_.size() - 1);
        return std::move(chain_);
    }

  private:
    gp_Pnt point(std::size_t i) const { return profilePoint(z_[i], x_[i]); }

    const TopoDS_Vertex& vertex(std::size_t i) {
        if (vertices_[i].IsNull())
            vertices_[i] = BRepBuilderAPI_MakeVertex(point(i)).Vertex();
        return vertices_[i];
    }

    void addLine(std::size_t i, std::size_t j) {
        for (std::size_t k = i + 1; k < j; ++k)
            chain_.maxErrorMm = std::max(chain_.maxErrorMm, chordDistance(z_, x_, i, j, k));
        BRepBuilderAPI_MakeEdge edge(vertex(i), vertex(j));
        require(edge.IsDone() == Standard_True, "as-cut outline",
                "could not make a straight edge at z = " + std::to_string(z_[i]) + " mm");
        chain_.edges.push_back(edge.Edge());
        ++chain_.lines;
    }

    bool addCurve(const Handle(Geom_Curve) & curve, std::size_t i, std::size_t j) {
        BRepBuilderAPI_MakeEdge edge(curve, vertex(i), vertex(j));
        if (edge.IsDone() != Standard_True)
            return false;
        chain_.edges.push_back(edge.Edge());
        return true;
    }

    // A stretch of short chords from sample a to sample b: one arc, or B-splines, or halves.
    void fitStretch(std::size_t a, std::size_t b) {
        if (b - a < 4) { // too few samples to fit anything: join them exactly
            for (std::size_t i = a; i < b; ++i)
                addLine(i, i + 1);
            return;
        }
        if (tryArc(a, b))
            return;
        // A nose arc often ends in a corner with the next cut: one sample off the circle.
        if (tryArc(a, b - 1, /*lineAfter=*/true))
            return;
        if (tryArc(a + 1, b, /*lineAfter=*/false, /*lineBefore=*/true))
            return;
        if (trySpline(a, b))
            return;
        const std::size_t mid = a + (b - a) / 2;
        fitStretch(a, mid);
        fitStretch(mid, b);
    }

    struct Circle {
        double zMm = 0, xMm = 0, radiusMm = 0, errorMm = 0;
        bool ok = false;
    };

    // The circle through samples a, (a+b)/2 and b, and whether every sample between lies on it.
    Circle circleThrough(std::size_t a, std::size_t b) const {
        Circle c;
        if (b < a + 4)
            return c;
        const std::size_t m = a + (b - a) / 2;
        const double ax = z_[a], ay = x_[a], bx = z_[m], by = x_[m], cx = z_[b], cy = x_[b];
        const double d = 2 * (ax * (by - cy) + bx * (cy - ay) + cx * (ay - by));
        const double chord = std::hypot(cx - ax, cy - ay);
        if (std::abs(d) < 1e-12 * chord * chord)
            return c;
        const double a2 = ax * ax + ay * ay, b2 = bx * bx + by * by, c2 = cx * cx + cy * cy;
        c.zMm = (a2 * (by - cy) + b2 * (cy - ay) + c2 * (ay - by)) / d;
        c.xMm = (a2 * (cx - bx) + b2 * (ax - cx) + c2 * (bx - ax)) / d;
        c.radiusMm = std::hypot(ax - c.zMm, ay - c.xMm);
        if (c.radiusMm > 1e3 * chord)
            return c; // nearly straight: leave it to the splines
        for (std::size_t k = a; k <= b; ++k) {
            c.errorMm = std::max(c.errorMm,
                                 std::abs(std::hypot(z_[k] - c.zMm, x_[k] - c.xMm) - c.radiusMm));
            if (c.errorMm > opt_.lineToleranceMm)
                return c;
        }
        c.ok = true;
        return c;
    }

    // One arc from a to b, with a straight edge from a − 1 before it or to b + 1 after it.
    bool tryArc(std::size_t a, std::size_t b, bool lineAfter = false, bool lineBefore = false) {
        const Circle c = circleThrough(a, b);
        if (!c.ok)
            return false;
        GC_MakeArcOfCircle arc(point(a), point(a + (b - a) / 2), point(b));
        if (!arc.IsDone())
            return false;
        BRepBuilderAPI_MakeEdge edge(arc.Value(), vertex(a), vertex(b));
        if (edge.IsDone() != Standard_True)
            return false;
        if (lineBefore)
            addLine(a - 1, a);
        chain_.edges.push_back(edge.Edge());
        if (lineAfter)
            addLine(b, b + 1);
        chain_.maxErrorMm = std::max(chain_.maxErrorMm, c.errorMm);
        ++chain_.arcs;
        return true;
    }

    // Distance from (zq, xq) to the straight pieces joining samples a..b near zq.
    double distanceToSamples(double zq, double xq, std::size_t a, std::size_t b) const {
        const auto it = std::upper_bound(z_.begin() + static_cast<std::ptrdiff_t>(a),
                                         z_.begin() + static_cast<std::ptrdiff_t>(b) + 1, zq);
        const std::size_t k = static_cast<std::size_t>(it - z_.begin());
        const std::size_t lo = k > a + 2 ? k - 2 : a, hi = std::min(b, k + 1);
        double best = 1e300;
        for (std::size_t i = lo; i < hi; ++i) {
            const double dz = z_[i + 1] - z_[i], dx = x_[i + 1] - x_[i];
            const double len2 = dz * dz + dx * dx;
            double t = len2 > 0 ? ((zq - z_[i]) * dz + (xq - x_[i]) * dx) / len2 : 0.0;
            t = std::clamp(t, 0.0, 1.0);
            best = std::min(best, std::hypot(zq - z_[i] - t * dz, xq - x_[i] - t * dx));
        }
        return best;
    }

    bool trySpline(std::size_t a, std::size_t b) {
        const int n = static_cast<int>(b - a + 1);
        TColgp_Array1OfPnt pts(1, n);
        for (int k = 0; k < n; ++k)
            pts.SetValue(k + 1, point(a + static_cast<std::size_t>(k)));
        Handle(Geom_BSplineCurve) curve;
        try {
            GeomAPI_PointsToBSpline fit(pts, 3, 8, GeomAbs_C2, opt_.splineToleranceMm);
            if (!fit.IsDone())
                return false;
            curve = fit.Curve();
        } catch (const Standard_Failure&) {
            return false; // refine instead
        }
        // The ends must be the samples themselves, so neighbouring pieces share them.
        if (curve->StartPoint().Distance(point(a)) > 1e-8 ||
            curve->EndPoint().Distance(point(b)) > 1e-8)
            return false;
        double err = 0;
        GeomAPI_ProjectPointOnCurve proj;
        for (std::size_t k = a + 1; k < b; ++k) {
            const gp_Pnt p = point(k);
            proj.Init(p, curve);
            double dk = std::min(p.Distance(curve->StartPoint()), p.Distance(curve->EndPoint()));
            if (proj.NbPoints() > 0)
                dk = std::min(dk, proj.LowerDistance());
            err = std::max(err, dk);
            if (err > opt_.maxFitErrorMm)
                return false;
        }
        // Between the samples too: a spline forced round a sharp corner can loop away from
        // the outline and back, passing every sample. Walk the curve: it must keep going
        // toward the chuck and stay near the straight pieces joining the samples.
        const int steps = 4 * (n - 1);
        double zPrev = -1e300;
        for (int k = 0; k <= steps; ++k) {
            const double u = curve->FirstParameter() +
                             (curve->LastParameter() - curve->FirstParameter()) * k / steps;
            const gp_Pnt q = curve->Value(u);
            if (q.Z() < zPrev - 1e-9)
                return false; // folds back along the axis
            zPrev = q.Z();
            err = std::max(err, distanceToSamples(q.Z(), q.X(), a, b));
            if (err > opt_.maxFitErrorMm)
                return false;
        }
        if (!addCurve(curve, a, b))
            return false;
        chain_.maxErrorMm = std::max(chain_.maxErrorMm, err);
        ++chain_.splines;
        return true;
    }

    const std::vector<double>& z_;
    const std::vector<double>& x_;
    ProfileFitOptions opt_;
    std::vector<TopoDS_Vertex> vertices_;
    EdgeChain chain_;
};

} // namespace

std::vector<std::size_t> simplifyOutline(const std::vector<double>& z, const std::vector<double>& x,
                                         double toleranceMm) {
    const std::size_t n = z.size();
    std::vector<char> keep(n, 0);
    keep[0] = keep[n - 1] = 1;
    std::vector<std::pair<std::size_t, std::size_t>> todo{{0, n - 1}};
    while (!todo.empty()) {
        const auto [i, j] = todo.back();
        todo.pop_back();
        double worst = -1;
        std::size_t at = i;
        for (std::size_t k = i + 1; k < j; ++k) {
            const double d = chordDistance(z, x, i, j, k);
            if (d > worst)
                worst = d, at = k;
        }
        if (worst > toleranceMm) {
            keep[at] = 1;
            todo.emplace_back(i, at);
            todo.emplace_back(at, j);
        }
    }
    std::vector<std::size_t> out;
    for (std::size_t i = 0; i < n; ++i)
        if (keep[i])
            out.push_back(i);
    return out;
}

EdgeChain fitOutline(const std::vector<double>& zMm, const std::vector<double>& xMm,
                     const ProfileFitOptions& options) {
    return guarded("fitting the as-cut outline", [&] { return Fitter(zMm, xMm, options).run(); });
}

EdgeChain polylineChain(const std::vector<double>& zMm, const std::vector<double>& xMm) {
    return guarded("outline", [&] {
        EdgeChain chain;
        std::vector<TopoDS_Vertex> v;
        for (std::size_t i = 0; i < zMm.size(); ++i)
            v.push_back(BRepBuilderAPI_MakeVertex(profilePoint(zMm[i], xMm[i])).Vertex());
        for (std::size_t i = 0; i + 1 < v.size(); ++i) {
            BRepBuilderAPI_MakeEdge edge(v[i], v[i + 1]);
            require(edge.IsDone() == Standard_True, "outline",
                    "two outline points coincide at z = " + std::to_string(zMm[i]) + " mm");
            chain.edges.push_back(edge.Edge());
            ++chain.lines;
        }
        chain.first = v.front();
        chain.last = v.back();
        return chain;
    });
}

void extendChain(EdgeChain& chain, double zEndMm, double xMm) {
    guarded("as-cut outline", [&] {
        const gp_Pnt last = BRep_Tool::Pnt(chain.last);
        TopoDS_Vertex v = chain.last;
        if (std::abs(last.X() - xMm) > 1e-9) {
            const TopoDS_Vertex up =
                BRepBuilderAPI_MakeVertex(profilePoint(last.Z(), xMm)).Vertex();
            chain.edges.push_back(BRepBuilderAPI_MakeEdge(v, up).Edge());
            v = up;
        }
        const TopoDS_Vertex end = BRepBuilderAPI_MakeVertex(profilePoint(zEndMm, xMm)).Vertex();
        chain.edges.push_back(BRepBuilderAPI_MakeEdge(v, end).Edge());
        chain.last = end;
    });
}

TopoDS_Shape revolveChain(const EdgeChain& chain, const std::string& what) {
    return guarded(what, [&] {
        const gp_Pnt p0 = BRep_Tool::Pnt(chain.first), p1 = BRep_Tool::Pnt(chain.last);
        require(p1.Z() > p0.Z(), what, "the outline has no length along the axis");
        BRepBuilderAPI_MakeWire wire;
        // Down to the axis at the chuck end, back along the axis, up at the free end; an end
        // already on the axis needs no line.
        const double onAxisMm = 1e-9;
        TopoDS_Vertex a0 = chain.first, a1 = chain.last;
        if (std::hypot(p0.X(), p0.Y()) > onAxisMm)
            a0 = BRepBuilderAPI_MakeVertex(gp_Pnt(0, 0, p0.Z())).Vertex();
        if (std::hypot(p1.X(), p1.Y()) > onAxisMm)
            a1 = BRepBuilderAPI_MakeVertex(gp_Pnt(0, 0, p1.Z())).Vertex();
        if (!a0.IsSame(chain.first))
            wire.Add(BRepBuilderAPI_MakeEdge(a0, chain.first).Edge());
        for (const TopoDS_Edge& e : chain.edges)
            wire.Add(e);
        if (!a1.IsSame(chain.last))
            wire.Add(BRepBuilderAPI_MakeEdge(chain.last, a1).Edge());
        wire.Add(BRepBuilderAPI_MakeEdge(a1, a0).Edge());
        require(wire.IsDone() == Standard_True, what, "the outline does not close");
        BRepBuilderAPI_MakeFace face(wire.Wire(), Standard_True);
        require(face.IsDone() == Standard_True, what, "the outline does not bound a flat face");
        BRepPrimAPI_MakeRevol revol(face.Face(), gp_Ax1(gp_Pnt(0, 0, 0), gp_Dir(0, 0, 1)),
                                    2 * std::numbers::pi, Standard_False);
        require(revol.IsDone() == Standard_True, what, "revolving the outline failed");
        requireValid(revol.Shape(), what);
        return revol.Shape();
    });
}

} // namespace swarf::geometry
