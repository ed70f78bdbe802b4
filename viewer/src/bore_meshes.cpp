// The meshes of inside work (see bore_meshes.h).
#include "bore_meshes.h"

#include "swarf/sim/boring_checks.h"

#include <vtkCellArray.h>
#include <vtkFloatArray.h>
#include <vtkIdList.h>
#include <vtkPointData.h>
#include <vtkPoints.h>

#include <algorithm>
#include <cmath>
#include <vector>

namespace swarf::viewer::detail {

vtkSmartPointer<vtkPolyData> boringBarShank(const Tool& tool, int sides) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    if (tool.kind != ToolKind::BoringBar || !(tool.barDiameterMm > 0) || !(tool.overhangMm > 0))
        return pd;
    sides = std::max(sides, 3);
    const double r = 0.5 * tool.barDiameterMm;
    const double axisY = -barAxisBehindTipMm(tool), axisZ = tool.tipHeightMm;
    // The shank ends a little behind the tip, where the insert sits in its pocket; the holder's
    // face is `overhang` back from the tip.
    const double zFront = -std::min(0.5, 0.1 * tool.overhangMm), zBack = -tool.overhangMm;
    auto points = vtkSmartPointer<vtkPoints>::New();
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    for (double z : {zBack, zFront})
        for (int j = 0; j < sides; ++j) {
            const double phi = 2 * kPi * j / sides;
            points->InsertNextPoint(z, axisY + r * std::cos(phi), axisZ + r * std::sin(phi));
        }
    for (vtkIdType j = 0; j < sides; ++j) {
        const vtkIdType j1 = (j + 1) % sides;
        const vtkIdType quad[4] = {j, j1, sides + j1, sides + j};
        polys->InsertNextCell(4, quad);
    }
    std::vector<vtkIdType> cap(static_cast<std::size_t>(sides));
    for (vtkIdType j = 0; j < sides; ++j)
        cap[static_cast<std::size_t>(j)] = sides - 1 - j; // the holder's end, facing −z
    polys->InsertNextCell(sides, cap.data());
    for (vtkIdType j = 0; j < sides; ++j)
        cap[static_cast<std::size_t>(j)] = sides + j; // the end at the insert, facing +z
    polys->InsertNextCell(sides, cap.data());
    pd->SetPoints(points);
    pd->SetPolys(polys);
    return pd;
}

vtkSmartPointer<vtkPolyData> endRing(double zMm, double innerMm, double outerMm, int nPhi,
                                     double phi0, double phiSpan, bool facingFree) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    if (!(outerMm > innerMm) || nPhi < 2)
        return pd;
    const double inner = std::max(0.0, innerMm);
    const bool full = phiSpan >= 2 * kPi - 1e-9;
    const int cols = full ? nPhi : nPhi + 1;
    auto points = vtkSmartPointer<vtkPoints>::New();
    auto normals = vtkSmartPointer<vtkFloatArray>::New();
    normals->SetNumberOfComponents(3);
    for (int j = 0; j < cols; ++j) {
        const double phi = phi0 + phiSpan * j / nPhi;
        for (double r : {inner, outerMm}) {
            points->InsertNextPoint(zMm, r * std::cos(phi), r * std::sin(phi));
            normals->InsertNextTuple3(facingFree ? -1 : 1, 0, 0);
        }
    }
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    const int quads = full ? cols : cols - 1;
    for (int j = 0; j < quads; ++j) {
        const vtkIdType a = 2 * j, b = 2 * ((j + 1) % cols);
        const vtkIdType quad[4] = {a, a + 1, b + 1, b};
        polys->InsertNextCell(4, quad);
    }
    pd->SetPoints(points);
    pd->SetPolys(polys);
    pd->GetPointData()->SetNormals(normals);
    return pd;
}

vtkSmartPointer<vtkPolyData> joinMeshes(vtkPolyData* a, vtkPolyData* b) {
    auto pd = vtkSmartPointer<vtkPolyData>::New();
    auto points = vtkSmartPointer<vtkPoints>::New();
    auto polys = vtkSmartPointer<vtkCellArray>::New();
    for (vtkPolyData* m : {a, b}) {
        if (!m || !m->GetPoints())
            continue;
        const vtkIdType base = points->GetNumberOfPoints();
        for (vtkIdType i = 0; i < m->GetNumberOfPoints(); ++i)
            points->InsertNextPoint(m->GetPoint(i));
        vtkCellArray* cells = m->GetPolys();
        if (!cells)
            continue;
        auto ids = vtkSmartPointer<vtkIdList>::New();
        for (vtkIdType c = 0; c < cells->GetNumberOfCells(); ++c) {
            cells->GetCellAtId(c, ids);
            std::vector<vtkIdType> shifted(static_cast<std::size_t>(ids->GetNumberOfIds()));
            for (vtkIdType k = 0; k < ids->GetNumberOfIds(); ++k)
                shifted[static_cast<std::size_t>(k)] = base + ids->GetId(k);
            polys->InsertNextCell(static_cast<vtkIdType>(shifted.size()), shifted.data());
        }
    }
    pd->SetPoints(points);
    pd->SetPolys(polys);
    return pd;
}

} // namespace swarf::viewer::detail
