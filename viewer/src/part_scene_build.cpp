// Building the scene graph of a PartScene once: the colour map, the actors of the 3D view, the
// drawing's ghost (see part_scene_impl.h).
#include "bore_meshes.h"
#include "meshes.h"
#include "part_scene_impl.h"
#include "swarf/viewer/keys.h"

#include <vtkActor.h>
#include <vtkCamera.h>
#include <vtkColorTransferFunction.h>
#include <vtkLight.h>
#include <vtkLookupTable.h>
#include <vtkNew.h>
#include <vtkPolyData.h>
#include <vtkPolyDataMapper.h>
#include <vtkProperty.h>
#include <vtkRenderer.h>
#include <vtkScalarBarActor.h>
#include <vtkTextActor.h>
#include <vtkTextProperty.h>
#include <vtkVariant.h>

#include <fmt/format.h>

#include <algorithm>
#include <cmath>

namespace swarf::viewer::detail {

vtkSmartPointer<vtkActor> makeActor(vtkSmartPointer<vtkPolyDataMapper>& mapper) {
    mapper = vtkSmartPointer<vtkPolyDataMapper>::New();
    auto actor = vtkSmartPointer<vtkActor>::New();
    actor->SetMapper(mapper);
    return actor;
}

void PartScene::Impl::buildLut() {
    const double l = scale.toDisplay(scale.limitMm);
    lut = vtkSmartPointer<vtkColorTransferFunction>::New();
    // Moreland's cool-warm diverging map (see colour_map.cpp for the source), centred on zero.
    lut->SetColorSpaceToDiverging();
    lut->AddRGBPoint(-l, 0.230, 0.299, 0.754);
    lut->AddRGBPoint(l, 0.706, 0.016, 0.150);
    lut->SetNanColor(0.62, 0.64, 0.67); // off the drawing: plain steel
    lut->ClampingOn();
    const double band = scale.toDisplay(scale.bandMm);
    // The ends say what the colours mean; the band is the tolerance normal to the surface.
    // Values beyond the ends saturate (clamped): the end labels say so.
    lut->SetAnnotation(vtkVariant(l), fmt::format("left on {:.3g}+", l));
    lut->SetAnnotation(vtkVariant(band), fmt::format("+{:.3g} band", band));
    lut->SetAnnotation(vtkVariant(0.0), "0");
    lut->SetAnnotation(vtkVariant(-band), fmt::format("-{:.3g} band", band));
    lut->SetAnnotation(vtkVariant(-l), fmt::format("overcut {:.3g}+", l));
    lut->Build();
}

void PartScene::Impl::buildMain() {
    main = vtkSmartPointer<vtkRenderer>::New();
    main->SetBackground(0.97, 0.97, 0.95);
    // One light (each light costs every lit pixel in software OpenGL): a headlight, moved aside
    // in the close-up (see setCloseUp).
    light = vtkSmartPointer<vtkLight>::New();
    light->SetLightTypeToHeadlight();
    main->AddLight(light);

    partActor = makeActor(partMapper);
    partMapper->SetLookupTable(lut);
    partMapper->UseLookupTableScalarRangeOn();
    partMapper->SetScalarModeToUsePointData();
    partMapper->ScalarVisibilityOn();
    partActor->GetProperty()->SetSpecular(0.25);
    partActor->GetProperty()->SetSpecularPower(30);
    partActor->GetProperty()->BackfaceCullingOff();

    leftoverActor = makeActor(leftoverMapper);
    leftoverActor->GetProperty()->SetColor(0.96, 0.66, 0.18); // amber: still to come off
    leftoverActor->GetProperty()->LightingOff();
    leftoverMapper->ScalarVisibilityOff();
    coreActor = makeActor(coreMapper);
    coreActor->GetProperty()->SetColor(0.55, 0.57, 0.60);
    coreActor->GetProperty()->LightingOff();
    coreMapper->ScalarVisibilityOff();

    stockActor = makeActor(stockMapper);
    stockMapper->SetInputData(stockOutline(scene.stock));
    stockActor->GetProperty()->SetColor(0.25, 0.25, 0.3);
    stockActor->GetProperty()->SetLineWidth(1.5);
    stockMapper->ScalarVisibilityOff();

    jawsActor = makeActor(jawsMapper);
    jawsMapper->SetInputData(chuckJaws(scene.stock));
    jawsActor->GetProperty()->SetColor(0.36, 0.38, 0.42);
    jawsActor->GetProperty()->SetSpecular(0.3);
    jawsMapper->ScalarVisibilityOff();

    // The insert's shape is built once; each moment only moves it.
    insertActor = makeActor(insertMapper);
    insertMapper->SetInputData(insertSolid(scene.tool));
    insertActor->GetProperty()->SetColor(0.78, 0.62, 0.16);
    insertActor->GetProperty()->SetSpecular(0.4);
    insertMapper->ScalarVisibilityOff();
    // A boring tool is the turning outline mirrored across its tip's z line (bore_sweep.h):
    // its nose points out toward the wall.
    if (scene.tool.kind == ToolKind::BoringBar)
        insertActor->SetScale(1, -1, 1);

    // Inside work: the bore's wall, coloured as the part, and the bar at its real size.
    boreActor = makeActor(boreMapper);
    boreMapper->SetLookupTable(lut);
    boreMapper->UseLookupTableScalarRangeOn();
    boreMapper->SetScalarModeToUsePointData();
    boreMapper->ScalarVisibilityOn();
    boreMapper->SetInputData(vtkSmartPointer<vtkPolyData>::New());
    boreActor->GetProperty()->SetSpecular(0.25);
    boreActor->GetProperty()->SetSpecularPower(30);
    boreActor->GetProperty()->BackfaceCullingOff();
    barActor = makeActor(barMapper);
    barMapper->SetInputData(boringBarShank(scene.tool));
    barActor->GetProperty()->SetColor(0.42, 0.45, 0.50);
    barActor->GetProperty()->SetSpecular(0.3);
    barMapper->ScalarVisibilityOff();

    pathActor = makeActor(pathMapper);
    vtkNew<vtkLookupTable> pathLut;
    pathLut->SetNumberOfTableValues(3);
    pathLut->SetTableRange(0, 2);
    pathLut->SetTableValue(0, 0.35, 0.35, 0.38, 1); // done
    pathLut->SetTableValue(1, 0.05, 0.65, 0.15, 1); // this pass
    pathLut->SetTableValue(2, 0.55, 0.65, 0.85, 1); // to come
    pathLut->Build();
    pathMapper->SetLookupTable(pathLut);
    pathMapper->SetScalarRange(0, 2);
    pathMapper->SetScalarModeToUseCellData();
    pathActor->GetProperty()->SetLineWidth(2);
    pathActor->GetProperty()->LightingOff();

    buildGhost();
    buildTwinActor();

    for (auto* a : {partActor.Get(), leftoverActor.Get(), coreActor.Get(), stockActor.Get(),
                    jawsActor.Get(), insertActor.Get(), pathActor.Get(), boreActor.Get(),
                    barActor.Get(), ghostActor.Get(), twinActor.Get()})
        main->AddActor(a);

    scalarBar = vtkSmartPointer<vtkScalarBarActor>::New();
    scalarBar->SetLookupTable(lut);
    scalarBar->SetTitle(scale.displayUnit());
    scalarBar->SetNumberOfLabels(0); // the annotations carry the numbers: no overlapping ticks
    scalarBar->DrawAnnotationsOn();
    scalarBar->SetMaximumWidthInPixels(120);
    scalarBar->GetPositionCoordinate()->SetCoordinateSystemToNormalizedViewport();
    scalarBar->GetPositionCoordinate()->SetValue(0.89, 0.12);
    scalarBar->SetWidth(0.1);
    scalarBar->SetHeight(0.62);
    for (auto* tp : {scalarBar->GetTitleTextProperty(), scalarBar->GetLabelTextProperty(),
                     scalarBar->GetAnnotationTextProperty()}) {
        tp->SetColor(0.1, 0.1, 0.1);
        tp->ShadowOff();
        tp->ItalicOff();
        tp->SetFontSize(14);
    }
    scalarBar->UnconstrainedFontSizeOn();
    main->AddViewProp(scalarBar);

    panel = vtkSmartPointer<vtkTextActor>::New();
    panel->GetTextProperty()->SetFontSize(16);
    panel->GetTextProperty()->SetColor(0.05, 0.05, 0.1);
    panel->GetTextProperty()->SetBackgroundColor(1, 1, 1);
    panel->GetTextProperty()->SetBackgroundOpacity(0.75);
    panel->GetTextProperty()->SetVerticalJustificationToTop();
    panel->GetPositionCoordinate()->SetCoordinateSystemToNormalizedViewport();
    panel->GetPositionCoordinate()->SetValue(0.01, 0.98);
    main->AddViewProp(panel);

    status = vtkSmartPointer<vtkTextActor>::New();
    status->GetTextProperty()->SetFontSize(14);
    status->GetTextProperty()->SetColor(0.1, 0.3, 0.1);
    status->GetPositionCoordinate()->SetCoordinateSystemToNormalizedViewport();
    status->GetPositionCoordinate()->SetValue(0.01, 0.13);
    main->AddViewProp(status);

    closeLabel = vtkSmartPointer<vtkTextActor>::New();
    closeLabel->GetTextProperty()->SetFontSize(14);
    closeLabel->GetTextProperty()->SetColor(0.05, 0.05, 0.1);
    closeLabel->GetTextProperty()->SetBackgroundColor(1, 1, 1);
    closeLabel->GetTextProperty()->SetBackgroundOpacity(0.75);
    closeLabel->GetPositionCoordinate()->SetCoordinateSystemToNormalizedViewport();
    closeLabel->GetPositionCoordinate()->SetValue(0.01, 0.18);
    closeLabel->VisibilityOff();
    main->AddViewProp(closeLabel);

    help = vtkSmartPointer<vtkTextActor>::New();
    help->SetInput(helpOverlayText().c_str());
    help->GetTextProperty()->SetFontFamilyToCourier();
    help->GetTextProperty()->SetFontSize(16);
    help->GetTextProperty()->SetColor(1, 1, 1);
    help->GetTextProperty()->SetBackgroundColor(0.1, 0.1, 0.15);
    help->GetTextProperty()->SetBackgroundOpacity(0.88);
    help->GetTextProperty()->SetJustificationToLeft();
    help->GetTextProperty()->SetVerticalJustificationToCentered();
    help->GetPositionCoordinate()->SetCoordinateSystemToNormalizedViewport();
    help->GetPositionCoordinate()->SetValue(0.2, 0.5);
    help->VisibilityOff();
    main->AddViewProp(help);
}

// The drawing's ghost: each run of samples where the drawing says something, revolved from the
// rows its corners need (a cone needs two). Front faces only: half the pixels to blend.
void PartScene::Impl::buildGhost() {
    ghostActor = makeActor(ghostMapper);
    ghostActor->GetProperty()->SetColor(0.95, 0.95, 1.0);
    ghostActor->GetProperty()->SetOpacity(0.18);
    ghostActor->GetProperty()->BackfaceCullingOn();
    // Drawn last in the opaque pass with blending on: one layer of front faces needs no depth
    // sorting, and it spares software OpenGL the order-independent translucency pass (about a
    // quarter of a frame, measured in swarf_bench).
    ghostActor->ForceOpaqueOn();
    ghostMapper->ScalarVisibilityOff();
    const Profile& nom = result.nominal;
    const std::size_t m = nom.radiusMm.size();
    std::size_t a = 0;
    while (a < m && std::isnan(nom.radiusMm[a]))
        ++a;
    std::size_t b = a;
    while (b < m && !std::isnan(nom.radiusMm[b]))
        ++b;
    vtkSmartPointer<vtkPolyData> ghost = vtkSmartPointer<vtkPolyData>::New();
    if (b > a + 1) {
        const double tol = 1e-4 * std::max(scene.stock.diameterMm, 1.0);
        ghost = revolve(nom, profileRows(nom, nullptr, a, b - 1, 8, tol, 1, 400), nullptr, kColumns,
                        0, 2 * kPi);
    }
    ghostMapper->SetInputData(ghost);
}

} // namespace swarf::viewer::detail
