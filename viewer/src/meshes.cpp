// Polygon meshes for the viewer (see meshes.h).
#include "meshes.h"

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

bool fullTurn(double span) { return span >= kTwoPi - 1e-9; }

// Slope dr/dz of a profile at sample i from its neighbours.
double slopeAt(const Profile& p, std::size_t i) {
    const auto& r = p.radiusMm;
    const std::size_t n = r.size();
    if (n < 2 || p.dzMm <= 0) return 0;
    const std::size_t a = i > 0 ? i - 1 : i;
    const std::size_t b = i + 1 < n ? i + 1 : i;
    if (a == b) return 0;
    const double s = (r[b] - r[a]) / (static_cast<double>(b - a) * p.dzMm);
    return std::isfinite(s) ? s : 0;
}

} // namespace

std::vector<std::size_t> pickRows(std::size_t first, std::size_t last, std::size_t maxRows) {
    std::vector<std::size_t> rows;
    if (last < first) return rows;
    const std::size_t count = last - first + 1;
    const std::size_t stride = std::max<std::size_t>(1, (count + maxRows - 1) / std::max<std::size_t>(maxRows, 1));
    for (std::size_t i = first; i <= last; i += stride) rows.push_back(i);
    if (rows.back() != last) rows.push_back(last);
    return rows;
}

vtkSmartPointer<vtkPolyData> revolve(const Profile& profile, const std::vector<std::size_t>& rows,
                                     const std::vector<double>* scalars, int nPhi, double phi0,
                                     double phiSpan) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    if (rows.size() < 2 || nPhi < 2) return pd;
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
        const double k = 1 / std::sqrt(1 + s * s);
        const double d = scalars ? (*scalars)[i] : 0;
        for (int j = 0; j < cols; ++j, ++id) {
            points->SetPoint(id, z, r * cosPhi[j], r * sinPhi[j]);
            normals->SetTuple3(id, -s * k, cosPhi[j] * k, sinPhi[j] * k);
            if (dev) dev->SetValue(id, static_cast<float>(d));
        }
    }
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    const int quadCols = full ? cols : cols - 1;
    for (std::size_t i = 0; i + 1 < rows.size(); ++i) {
        for (int j = 0; j < quadCols; ++j) {
            const int j1 = (j + 1) % cols;
            const vtkIdType a = static_cast<vtkIdType>(i) * cols + j;
            const vtkIdType b = static_cast<vtkIdType>(i) * cols + j1;
            // Counter-clockwise seen from outside (z along, then φ): front faces outward.
            const vtkIdType quad[4] = {a, b, b + cols, a + cols};
            polys->InsertNextCell(4, quad);
        }
    }
    pd->SetPoints(points);
    pd->SetPolys(polys);
    pd->GetPointData()->SetNormals(normals);
    if (dev) pd->GetPointData()->SetScalars(dev);
    return pd;
}

vtkSmartPointer<vtkPolyData> heightMapSurface(const HeightMap& map, const Profile& nominal,
                                              double zFromMm, double zToMm, std::size_t maxRows,
                                              double phi0, double phiSpan, double toDisplay,
                                              int maxCols) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    if (map.nz < 2 || map.nPhi < 3) return pd;
    auto rowZ = [&](int i) { return map.rowZ(i); };
    int first = 0, last = map.nz - 1;
    while (first < last && rowZ(first) < zFromMm) ++first;
    while (last > first && rowZ(last) > zToMm) --last;
    const auto rows = pickRows(static_cast<std::size_t>(first), static_cast<std::size_t>(last), maxRows);
    // Columns inside [phi0, phi0 + span], in order around.
    const bool full = fullTurn(phiSpan);
    std::vector<int> cols;
    for (int j = 0; j < map.nPhi; ++j) {
        const double phi = kTwoPi * j / map.nPhi;
        const double rel = std::fmod(phi - phi0 + 2 * kTwoPi, kTwoPi);
        if (full || rel <= phiSpan + 1e-9) cols.push_back(j);
    }
    if (!full) {
        // Start the run at phi0 so that the columns are contiguous around the turn.
        std::sort(cols.begin(), cols.end(), [&](int a, int b) {
            auto rel = [&](int j) { return std::fmod(kTwoPi * j / map.nPhi - phi0 + 2 * kTwoPi, kTwoPi); };
            return rel(a) < rel(b);
        });
    }
    // Fewer columns for a whole-part view: keep every stride-th, and the run's last one.
    const int stride = std::max(1, (static_cast<int>(cols.size()) + maxCols - 1) / std::max(maxCols, 1));
    if (stride > 1) {
        std::vector<int> kept;
        for (std::size_t c = 0; c < cols.size(); c += static_cast<std::size_t>(stride)) kept.push_back(cols[c]);
        if (!full && kept.back() != cols.back()) kept.push_back(cols.back());
        cols = kept;
    }
    const int nc = static_cast<int>(cols.size());
    auto points = vtkSmartPointer<vtkPoints>::New();
    points->SetNumberOfPoints(static_cast<vtkIdType>(rows.size()) * nc);
    auto dev = vtkSmartPointer<vtkFloatArray>::New();
    dev->SetName("deviation");
    dev->SetNumberOfTuples(points->GetNumberOfPoints());
    vtkIdType id = 0;
    for (std::size_t ri = 0; ri < rows.size(); ++ri) {
        const int i = static_cast<int>(rows[ri]);
        const double z = rowZ(i);
        // Nominal radius and slope here, for the normal deviation.
        const double rn = [&] {
            if (nominal.radiusMm.empty()) return std::nan("");
            const double u = (z - nominal.z0Mm) / nominal.dzMm;
            if (u < 0 || u > static_cast<double>(nominal.radiusMm.size() - 1)) return std::nan("");
            const auto k = std::min(static_cast<std::size_t>(u), nominal.radiusMm.size() - 2);
            const double t = u - static_cast<double>(k);
            return nominal.radiusMm[k] * (1 - t) + nominal.radiusMm[k + 1] * t;
        }();
        double cosA = 1;
        if (!std::isnan(rn) && nominal.radiusMm.size() > 2) {
            const double u = (z - nominal.z0Mm) / nominal.dzMm;
            const auto k = std::clamp<std::size_t>(static_cast<std::size_t>(std::max(0.0, u)), 0, nominal.radiusMm.size() - 1);
            const double s = slopeAt(nominal, k);
            cosA = 1 / std::sqrt(1 + s * s);
        }
        for (int c = 0; c < nc; ++c, ++id) {
            const int j = cols[c];
            const double phi = kTwoPi * j / map.nPhi;
            const double r = map.at(i, j);
            points->SetPoint(id, z, r * std::cos(phi), r * std::sin(phi));
            const double d = std::isnan(rn) ? std::nan("") : (r - rn) * cosA * toDisplay;
            dev->SetValue(id, static_cast<float>(d));
        }
    }
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    const int quadCols = full ? nc : nc - 1;
    for (std::size_t i = 0; i + 1 < rows.size(); ++i)
        for (int c = 0; c < quadCols; ++c) {
            const int c1 = (c + 1) % nc;
            const vtkIdType a = static_cast<vtkIdType>(i) * nc + c;
            const vtkIdType b = static_cast<vtkIdType>(i) * nc + c1;
            const vtkIdType quad[4] = {a, b, b + nc, a + nc};
            polys->InsertNextCell(4, quad);
        }
    // Normals from the grid: cross product of the axial and circumferential differences.
    auto normals = vtkSmartPointer<vtkFloatArray>::New();
    normals->SetNumberOfComponents(3);
    normals->SetNumberOfTuples(points->GetNumberOfPoints());
    const auto nr = static_cast<vtkIdType>(rows.size());
    for (vtkIdType i = 0; i < nr; ++i)
        for (int c = 0; c < nc; ++c) {
            double p0[3], p1[3], q0[3], q1[3];
            points->GetPoint((i > 0 ? i - 1 : i) * nc + c, p0);
            points->GetPoint((i + 1 < nr ? i + 1 : i) * nc + c, p1);
            const int cPrev = full ? (c + nc - 1) % nc : std::max(c - 1, 0);
            const int cNext = full ? (c + 1) % nc : std::min(c + 1, nc - 1);
            points->GetPoint(i * nc + cPrev, q0);
            points->GetPoint(i * nc + cNext, q1);
            const double a[3] = {p1[0] - p0[0], p1[1] - p0[1], p1[2] - p0[2]};
            const double b[3] = {q1[0] - q0[0], q1[1] - q0[1], q1[2] - q0[2]};
            // φ direction × z direction points outward.
            double n[3] = {b[1] * a[2] - b[2] * a[1], b[2] * a[0] - b[0] * a[2],
                           b[0] * a[1] - b[1] * a[0]};
            const double len = std::sqrt(n[0] * n[0] + n[1] * n[1] + n[2] * n[2]);
            if (len > 0)
                for (double& v : n) v /= len;
            normals->SetTuple(i * nc + c, n);
        }
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
        const vtkIdType ids[4] = {points->InsertNextPoint(z0, 0, 0),
                                  points->InsertNextPoint(z0, side * r, 0),
                                  points->InsertNextPoint(z1, side * r, 0),
                                  points->InsertNextPoint(z1, 0, 0)};
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

vtkSmartPointer<vtkPolyData> insertSolid(const Tool& tool, const Eigen::Vector2d& tipZX) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    const ToolOutline outline(tool);
    const std::vector<Eigen::Vector2d> poly = outline.polygon(1e-3);
    if (poly.size() < 3) return pd;
    const Eigen::Vector2d centre = tipZX - outline.imaginaryTip();
    const double top = tool.tipHeightMm;
    const double bottom = top - std::max(tool.thicknessMm, 0.1);
    auto points = vtkSmartPointer<vtkPoints>::New();
    const auto n = static_cast<vtkIdType>(poly.size());
    for (double h : {top, bottom})
        for (const auto& p : poly) points->InsertNextPoint(centre.x() + p.x(), centre.y() + p.y(), h);
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    std::vector<vtkIdType> face(static_cast<std::size_t>(n));
    for (vtkIdType k = 0; k < n; ++k) face[static_cast<std::size_t>(k)] = k;
    polys->InsertNextCell(n, face.data());  // rake face
    for (vtkIdType k = 0; k < n; ++k) face[static_cast<std::size_t>(k)] = 2 * n - 1 - k;
    polys->InsertNextCell(n, face.data());  // underside, reversed
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
        if (m.pass < pass || (m.pass == pass && passFraction >= 1)) s = 0;
        else if (m.pass == pass) s = 1;
        state->InsertNextValue(s);
    }
    pd->SetPoints(points);
    pd->SetLines(lines);
    pd->GetCellData()->SetScalars(state);
    return pd;
}

} // namespace swarf::viewer::detail
