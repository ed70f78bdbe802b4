// Polygon meshes for the viewer (see meshes.h).
#include "meshes.h"

#include "swarf/sim/compare.h"
#include "swarf/sim/tool_outline.h"

#include <vtkCellArray.h>
#include <vtkCellData.h>
#include <vtkFloatArray.h>
#include <vtkPointData.h>
#include <vtkPoints.h>
#include <vtkUnsignedCharArray.h>

#include <algorithm>
#include <cmath>

namespace swarf::viewer::detail {

namespace {

constexpr double kTwoPi = 2 * kPi;

bool fullTurn(double span) {
    return span >= kTwoPi - 1e-9;
}

// Slope dr/dz of a profile at sample i from its neighbours.
double slopeAt(const Profile& p, std::size_t i) {
    const auto& r = p.radiusMm;
    const std::size_t n = r.size();
    if (n < 2 || p.dzMm <= 0)
        return 0;
    const std::size_t a = i > 0 ? i - 1 : i;
    const std::size_t b = i + 1 < n ? i + 1 : i;
    if (a == b)
        return 0;
    const double s = (r[b] - r[a]) / (static_cast<double>(b - a) * p.dzMm);
    return std::isfinite(s) ? s : 0;
}

} // namespace

vtkSmartPointer<vtkFloatArray> gridNormals(vtkPoints* points, vtkIdType nr, int nc, bool wraps,
                                           bool towardAxis) {
    auto normals = vtkSmartPointer<vtkFloatArray>::New();
    normals->SetNumberOfComponents(3);
    normals->SetNumberOfTuples(points->GetNumberOfPoints());
    for (vtkIdType i = 0; i < nr; ++i)
        for (int c = 0; c < nc; ++c) {
            double p0[3], p1[3], q0[3], q1[3];
            points->GetPoint((i > 0 ? i - 1 : i) * nc + c, p0);
            points->GetPoint((i + 1 < nr ? i + 1 : i) * nc + c, p1);
            points->GetPoint(i * nc + (wraps ? (c + nc - 1) % nc : (c > 0 ? c - 1 : c)), q0);
            points->GetPoint(i * nc + (wraps ? (c + 1) % nc : (c + 1 < nc ? c + 1 : c)), q1);
            // a: along the axis, b: around it; b × a points out of the part, a × b toward the axis.
            const double a[3] = {p1[0] - p0[0], p1[1] - p0[1], p1[2] - p0[2]};
            const double b[3] = {q1[0] - q0[0], q1[1] - q0[1], q1[2] - q0[2]};
            const double sign = towardAxis ? 1.0 : -1.0;
            double n[3] = {sign * (a[1] * b[2] - a[2] * b[1]), sign * (a[2] * b[0] - a[0] * b[2]),
                           sign * (a[0] * b[1] - a[1] * b[0])};
            const double len = std::sqrt(n[0] * n[0] + n[1] * n[1] + n[2] * n[2]);
            if (len > 0)
                for (double& v : n)
                    v /= len;
            normals->SetTuple(i * nc + c, n);
        }
    return normals;
}

vtkSmartPointer<vtkPolyData> revolve(const Profile& profile, const std::vector<std::size_t>& rows,
                                     const std::vector<double>* scalars, int nPhi, double phi0,
                                     double phiSpan, bool inward) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    if (rows.size() < 2 || nPhi < 2)
        return pd;
    const bool full = fullTurn(phiSpan);
    const int cols = full ? nPhi : nPhi + 1;
    auto points = vtkSmartPointer<vtkPoints>::New();
    points->SetNumberOfPoints(static_cast<vtkIdType>(rows.size()) * cols);
    auto normals = vtkSmartPointer<vtkFloatArray>::New();
    normals->SetNumberOfComponents(3);
    normals->SetNumberOfTuples(points->GetNumberOfPoints());
    vtkSmartPointer<vtkFloatArray> dev;
    if (scalars) {
        dev = vtkSmartPointer<vtkFloatArray>::New();
        dev->SetName("deviation");
        dev->SetNumberOfTuples(points->GetNumberOfPoints());
    }
    std::vector<double> cosPhi(cols), sinPhi(cols);
    for (int j = 0; j < cols; ++j) {
        const double phi = phi0 + phiSpan * j / nPhi;
        cosPhi[j] = std::cos(phi);
        sinPhi[j] = std::sin(phi);
    }
    vtkIdType id = 0;
    for (std::size_t i : rows) {
        const double z = profile.zAt(i);
        const double r = std::max(0.0, profile.radiusMm[i]);
        const double s = slopeAt(profile, i);
        const double k = (inward ? -1.0 : 1.0) / std::sqrt(1 + s * s);
        const double d = scalars ? (*scalars)[i] : 0;
        for (int j = 0; j < cols; ++j, ++id) {
            points->SetPoint(id, z, r * cosPhi[j], r * sinPhi[j]);
            normals->SetTuple3(id, -s * k, cosPhi[j] * k, sinPhi[j] * k);
            if (dev)
                dev->SetValue(id, static_cast<float>(d));
        }
    }
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    const int quadCols = full ? cols : cols - 1;
    for (std::size_t i = 0; i + 1 < rows.size(); ++i) {
        for (int j = 0; j < quadCols; ++j) {
            const int j1 = (j + 1) % cols;
            const vtkIdType a = static_cast<vtkIdType>(i) * cols + j;
            const vtkIdType b = static_cast<vtkIdType>(i) * cols + j1;
            // Counter-clockwise seen from outside (z along, then φ): front faces outward; the
            // other way round for a bore.
            const vtkIdType out[4] = {a, b, b + cols, a + cols};
            const vtkIdType in[4] = {a, a + cols, b + cols, b};
            polys->InsertNextCell(4, inward ? in : out);
        }
    }
    pd->SetPoints(points);
    pd->SetPolys(polys);
    pd->GetPointData()->SetNormals(normals);
    if (dev)
        pd->GetPointData()->SetScalars(dev);
    return pd;
}

vtkSmartPointer<vtkPolyData> feedMarkPatch(const FeedMarkSurface& surface, const Profile& smooth,
                                           const Part& part, double zFromMm, double zToMm,
                                           std::size_t maxRows, double fineCentreRad,
                                           double fineHalfWidthRad, double fineStepRad,
                                           int coarseStride, double reliefFactor,
                                           double toDisplay) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    if (surface.empty() || maxRows < 2 || !(zToMm > zFromMm) || !(fineStepRad > 0))
        return pd;
    std::vector<double> rowZ(maxRows);
    for (std::size_t i = 0; i < maxRows; ++i)
        rowZ[i] =
            zFromMm + (zToMm - zFromMm) * static_cast<double>(i) / static_cast<double>(maxRows - 1);
    // Columns: a whole number of fine steps round, all of them near where the view looks.
    const int steps = std::max(3, static_cast<int>(std::lround(kTwoPi / fineStepRad)));
    std::vector<double> colPhi;
    for (int j = 0; j < steps; ++j) {
        const double phi = kTwoPi * j / steps;
        const double off = std::remainder(phi - fineCentreRad, kTwoPi);
        if (std::fabs(off) <= fineHalfWidthRad || j % std::max(coarseStride, 1) == 0)
            colPhi.push_back(phi);
    }
    const SurfaceGrid map = surface.grid(rowZ, colPhi);
    const int nc = map.nPhi;
    const auto nr = static_cast<vtkIdType>(map.nz);
    auto points = vtkSmartPointer<vtkPoints>::New();
    points->SetNumberOfPoints(nr * nc);
    auto dev = vtkSmartPointer<vtkFloatArray>::New();
    dev->SetName("deviation");
    dev->SetNumberOfTuples(points->GetNumberOfPoints());
    std::vector<double> cosPhi(static_cast<std::size_t>(nc)), sinPhi(static_cast<std::size_t>(nc));
    for (int c = 0; c < nc; ++c) {
        cosPhi[static_cast<std::size_t>(c)] = std::cos(colPhi[static_cast<std::size_t>(c)]);
        sinPhi[static_cast<std::size_t>(c)] = std::sin(colPhi[static_cast<std::size_t>(c)]);
    }
    vtkIdType id = 0;
    for (int i = 0; i < map.nz; ++i) {
        const double z = map.rowZ(i);
        const double base = smooth.radiusMm.empty() ? 0.0 : smooth.radiusAt(z);
        for (int c = 0; c < nc; ++c, ++id) {
            const double r = map.at(i, c);
            // The marks stand above the swept envelope; raise that height only.
            const double shown = smooth.radiusMm.empty() ? r : base + reliefFactor * (r - base);
            points->SetPoint(id, z, shown * cosPhi[static_cast<std::size_t>(c)],
                             shown * sinPhi[static_cast<std::size_t>(c)]);
            dev->SetValue(id, static_cast<float>(normalDeviationAt(part, z, r) * toDisplay));
        }
    }
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    polys->AllocateExact((nr - 1) * nc, 4 * (nr - 1) * nc);
    for (vtkIdType i = 0; i + 1 < nr; ++i)
        for (int c = 0; c < nc; ++c) {
            const vtkIdType a = i * nc + c, b = i * nc + (c + 1) % nc;
            const vtkIdType quad[4] = {a, b, b + nc, a + nc};
            polys->InsertNextCell(4, quad);
        }
    // Normals from the grid, outward: around the part it wraps.
    const auto normals = gridNormals(points, nr, nc, true, false);
    pd->SetPoints(points);
    pd->SetPolys(polys);
    pd->GetPointData()->SetNormals(normals);
    pd->GetPointData()->SetScalars(dev);
    return pd;
}

vtkSmartPointer<vtkPolyData> wedgeFaces(const Profile& grid, const std::vector<double>& innerMm,
                                        const std::vector<double>& outerMm,
                                        const std::vector<std::size_t>& rows, double a, double b) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    auto points = vtkSmartPointer<vtkPoints>::New();
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    for (double phi : {a, b}) {
        const double c = std::cos(phi), s = std::sin(phi);
        // Strips over runs of rows where the outer radius is above the inner one.
        vtkIdType prevLo = -1, prevHi = -1;
        for (std::size_t i : rows) {
            const double ri = innerMm[i], ro = outerMm[i];
            if (std::isnan(ri) || std::isnan(ro) || ro - ri <= 1e-6) {
                prevLo = prevHi = -1;
                continue;
            }
            const double z = grid.zAt(i);
            const vtkIdType lo = points->InsertNextPoint(z, ri * c, ri * s);
            const vtkIdType hi = points->InsertNextPoint(z, ro * c, ro * s);
            if (prevLo >= 0) {
                const vtkIdType quad[4] = {prevLo, lo, hi, prevHi};
                polys->InsertNextCell(4, quad);
            }
            prevLo = lo;
            prevHi = hi;
        }
    }
    pd->SetPoints(points);
    pd->SetPolys(polys);
    return pd;
}

vtkSmartPointer<vtkPolyData> stockOutline(const Stock& stock) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    auto points = vtkSmartPointer<vtkPoints>::New();
    auto lines = vtkSmartPointer<vtkCellArray>::New();
    const double r = stock.diameterMm / 2;
    const double z0 = stock.freeEndZMm(), z1 = stock.jawZMm();
    // Silhouette in the horizontal plane (both sides).
    for (double side : {1.0, -1.0}) {
        const vtkIdType ids[4] = {
            points->InsertNextPoint(z0, 0, 0), points->InsertNextPoint(z0, side * r, 0),
            points->InsertNextPoint(z1, side * r, 0), points->InsertNextPoint(z1, 0, 0)};
        lines->InsertNextCell(4, ids);
    }
    // Circles at the free end and at the jaws.
    constexpr int kN = 96;
    for (double z : {z0, z1}) {
        std::vector<vtkIdType> ids;
        for (int j = 0; j <= kN; ++j) {
            const double phi = kTwoPi * j / kN;
            ids.push_back(points->InsertNextPoint(z, r * std::cos(phi), r * std::sin(phi)));
        }
        lines->InsertNextCell(static_cast<vtkIdType>(ids.size()), ids.data());
    }
    pd->SetPoints(points);
    pd->SetLines(lines);
    return pd;
}

vtkSmartPointer<vtkPolyData> chuckJaws(const Stock& stock) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    auto points = vtkSmartPointer<vtkPoints>::New();
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    const double r = stock.diameterMm / 2;
    const double depth = std::clamp(0.4 * r, 5.0, 25.0);      // radial, outside the bar
    const double length = std::clamp(0.8 * r, 10.0, 40.0);    // along the axis, into the chuck
    const double halfWidth = std::clamp(0.35 * r, 3.0, 20.0); // across
    const double z0 = stock.jawZMm(), z1 = z0 + length;
    for (double deg : {90.0, 210.0, 330.0}) {
        const double phi = deg * kPi / 180;
        const double ux = std::cos(phi), uy = std::sin(phi); // radial
        const double vx = -uy, vy = ux;                      // across
        const vtkIdType base = points->GetNumberOfPoints();
        for (double z : {z0, z1})
            for (double rr : {r, r + depth})
                for (double w : {-halfWidth, halfWidth})
                    points->InsertNextPoint(z, rr * ux + w * vx, rr * uy + w * vy);
        // Corner k = 4·(z index) + 2·(radial index) + (across index).
        const int faces[6][4] = {{0, 2, 3, 1}, {4, 5, 7, 6}, {0, 1, 5, 4},
                                 {2, 6, 7, 3}, {0, 4, 6, 2}, {1, 3, 7, 5}};
        for (const auto& f : faces) {
            const vtkIdType quad[4] = {base + f[0], base + f[1], base + f[2], base + f[3]};
            polys->InsertNextCell(4, quad);
        }
    }
    pd->SetPoints(points);
    pd->SetPolys(polys);
    return pd;
}

vtkSmartPointer<vtkPolyData> insertSolid(const Tool& tool) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    const ToolOutline outline(tool);
    const std::vector<Eigen::Vector2d> poly = outline.polygon(1e-3);
    if (poly.size() < 3)
        return pd;
    const Eigen::Vector2d centre = -outline.imaginaryTip();
    const double top = tool.tipHeightMm;
    const double bottom = top - std::max(tool.thicknessMm, 0.1);
    auto points = vtkSmartPointer<vtkPoints>::New();
    const auto n = static_cast<vtkIdType>(poly.size());
    for (double h : {top, bottom})
        for (const auto& p : poly)
            points->InsertNextPoint(centre.x() + p.x(), centre.y() + p.y(), h);
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    std::vector<vtkIdType> face(static_cast<std::size_t>(n));
    for (vtkIdType k = 0; k < n; ++k)
        face[static_cast<std::size_t>(k)] = k;
    polys->InsertNextCell(n, face.data()); // rake face
    for (vtkIdType k = 0; k < n; ++k)
        face[static_cast<std::size_t>(k)] = 2 * n - 1 - k;
    polys->InsertNextCell(n, face.data()); // underside, reversed
    for (vtkIdType k = 0; k < n; ++k) {
        const vtkIdType k1 = (k + 1) % n;
        const vtkIdType quad[4] = {k, n + k, n + k1, k1};
        polys->InsertNextCell(4, quad);
    }
    pd->SetPoints(points);
    pd->SetPolys(polys);
    return pd;
}

vtkSmartPointer<vtkPolyData> toolPaths(const CutResult& result, const Tool& tool, int pass,
                                       double passFraction) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    auto points = vtkSmartPointer<vtkPoints>::New();
    auto lines = vtkSmartPointer<vtkCellArray>::New();
    auto state = vtkSmartPointer<vtkUnsignedCharArray>::New();
    state->SetName("state");
    const double h = tool.tipHeightMm;
    for (const ToolMove& m : result.moves) {
        const vtkIdType ids[2] = {points->InsertNextPoint(m.tipFrom.x(), m.tipFrom.y(), h),
                                  points->InsertNextPoint(m.tipTo.x(), m.tipTo.y(), h)};
        lines->InsertNextCell(2, ids);
        unsigned char s = 2;
        if (m.pass < pass || (m.pass == pass && passFraction >= 1))
            s = 0;
        else if (m.pass == pass)
            s = 1;
        state->InsertNextValue(s);
    }
    pd->SetPoints(points);
    pd->SetLines(lines);
    pd->GetCellData()->SetScalars(state);
    return pd;
}

} // namespace swarf::viewer::detail
