// Everything drawn for a scene and its result, updated to one moment (see part_scene.h).
#include "part_scene.h"

#include "meshes.h"

#include <vtkActor.h>
#include <vtkAxis.h>
#include <vtkCamera.h>
#include <vtkCellArray.h>
#include <vtkCellData.h>
#include <vtkChartXY.h>
#include <vtkColorTransferFunction.h>
#include <vtkContextActor.h>
#include <vtkContextScene.h>
#include <vtkFloatArray.h>
#include <vtkLookupTable.h>
#include <vtkNew.h>
#include <vtkPen.h>
#include <vtkPlot.h>
#include <vtkPointData.h>
#include <vtkPoints.h>
#include <vtkPolyData.h>
#include <vtkPolyDataMapper.h>
#include <vtkProperty.h>
#include <vtkRenderer.h>
#include <vtkScalarBarActor.h>
#include <vtkTable.h>
#include <vtkTextActor.h>
#include <vtkTextProperty.h>
#include <vtkUnsignedCharArray.h>
#include <vtkVariant.h>

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <cstdlib>

namespace swarf::viewer::detail {

namespace {

constexpr double kDeg = kPi / 180.0;
// The cut-away: the quarter of the part facing up (φ from 45° to 135°, φ measured from the
// operator's side toward the top) is left out so the section shows.
constexpr double kCutFrom = 45 * kDeg, kCutTo = 135 * kDeg;
constexpr std::size_t kCoarseRows = 1500;
constexpr std::size_t kFineRows = 6000;

vtkSmartPointer<vtkActor> makeActor(vtkSmartPointer<vtkPolyDataMapper>& mapper) {
    mapper = vtkSmartPointer<vtkPolyDataMapper>::New();
    auto actor = vtkSmartPointer<vtkActor>::New();
    actor->SetMapper(mapper);
    return actor;
}

const char* kHelp =
    "Keys\n"
    "  Right / Left      next / previous pass (whole passes)\n"
    "  Up / Down         scrub forward / back within a pass (1/20 pass)\n"
    "  Home / End        before the first pass / the finished part\n"
    "  1 2 3 4           view: front (operator), top, end (from tailstock), oblique\n"
    "  c                 close-up of the cone (feed marks)\n"
    "  r                 reset: whole part, oblique view\n"
    "  x                 cut-away quarter on/off\n"
    "  g                 nominal cone (ghost) on/off\n"
    "  l                 leftover metal (in the cut-away) on/off\n"
    "  o                 stock outline on/off\n"
    "  t                 insert on/off\n"
    "  p                 tool paths on/off\n"
    "  b                 colour bar on/off\n"
    "  m / M             section magnification up / down\n"
    "  s                 save a snapshot PNG in the current folder\n"
    "  h or ?            this help on/off\n"
    "  q or Esc          quit\n"
    "Mouse: left drag rotate, middle drag (or Shift+left) pan, wheel or right drag zoom.\n"
    "Slider at the bottom: drag to any moment of the plan.";

} // namespace

const char* helpText() { return kHelp; }

struct PartScene::Impl {
    Scene scene;
    CutResult result;
    DeviationScale scale;
    MomentView moment;
    Layers layers;
    bool fine = false;
    double magnification = 200;
    double coneZ0 = 0, coneZ1 = 0;  // the main cone's extent (or the part's)
    std::size_t coneI0 = 0, coneI1 = 0;  // its samples on the result's grid

    vtkSmartPointer<vtkRenderer> main, section, chart;
    vtkSmartPointer<vtkColorTransferFunction> lut;

    vtkSmartPointer<vtkPolyDataMapper> partMapper, ghostMapper, leftoverMapper, coreMapper,
        stockMapper, insertMapper, pathMapper, secAsCutMapper, secRefMapper;
    vtkSmartPointer<vtkActor> partActor, ghostActor, leftoverActor, coreActor, stockActor,
        insertActor, pathActor, secAsCutActor, secRefActor;
    vtkSmartPointer<vtkScalarBarActor> scalarBar;
    vtkSmartPointer<vtkTextActor> panel, help, status, secTitle;
    vtkSmartPointer<vtkChartXY> chartItem;
    vtkSmartPointer<vtkTable> table;

    void buildLut();
    void buildMain();
    void buildSection();
    void buildChart();
    void update();
    void updatePart();
    void updateSection();
    void updateChart();
    void applyLayers();
    std::string panelText() const;
};

void PartScene::Impl::buildLut() {
    const double l = scale.toDisplay(scale.limitMm);
    lut = vtkSmartPointer<vtkColorTransferFunction>::New();
    // Moreland's cool-warm diverging map (see colour_map.cpp for the source), centred on zero.
    lut->SetColorSpaceToDiverging();
    lut->AddRGBPoint(-l, 0.230, 0.299, 0.754);
    lut->AddRGBPoint(l, 0.706, 0.016, 0.150);
    lut->SetNanColor(0.62, 0.64, 0.67);  // off the drawing: plain steel
    lut->ClampingOn();
    const double band = scale.toDisplay(scale.bandMm);
    lut->SetAnnotation(vtkVariant(band), fmt::format("+{:.3g} tol", band));
    lut->SetAnnotation(vtkVariant(-band), fmt::format("-{:.3g} tol", band));
    lut->SetAnnotation(vtkVariant(0.0), "0");
    lut->Build();
}

void PartScene::Impl::buildMain() {
    main = vtkSmartPointer<vtkRenderer>::New();
    main->SetBackground(0.97, 0.97, 0.95);

    partActor = makeActor(partMapper);
    partMapper->SetLookupTable(lut);
    partMapper->UseLookupTableScalarRangeOn();
    partMapper->SetScalarModeToUsePointData();
    partMapper->ScalarVisibilityOn();
    partActor->GetProperty()->SetSpecular(0.25);
    partActor->GetProperty()->SetSpecularPower(30);
    partActor->GetProperty()->BackfaceCullingOff();

    ghostActor = makeActor(ghostMapper);
    ghostActor->GetProperty()->SetColor(0.95, 0.95, 1.0);
    ghostActor->GetProperty()->SetOpacity(0.18);
    ghostMapper->ScalarVisibilityOff();

    leftoverActor = makeActor(leftoverMapper);
    leftoverActor->GetProperty()->SetColor(0.96, 0.66, 0.18);  // amber: still to come off
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

    insertActor = makeActor(insertMapper);
    insertActor->GetProperty()->SetColor(0.78, 0.62, 0.16);
    insertActor->GetProperty()->SetSpecular(0.4);
    insertMapper->ScalarVisibilityOff();

    pathActor = makeActor(pathMapper);
    vtkNew<vtkLookupTable> pathLut;
    pathLut->SetNumberOfTableValues(3);
    pathLut->SetTableRange(0, 2);
    pathLut->SetTableValue(0, 0.35, 0.35, 0.38, 1);  // done
    pathLut->SetTableValue(1, 0.05, 0.65, 0.15, 1);  // this pass
    pathLut->SetTableValue(2, 0.55, 0.65, 0.85, 1);  // to come
    pathLut->Build();
    pathMapper->SetLookupTable(pathLut);
    pathMapper->SetScalarRange(0, 2);
    pathMapper->SetScalarModeToUseCellData();
    pathActor->GetProperty()->SetLineWidth(2);
    pathActor->GetProperty()->LightingOff();

    for (auto* a : {partActor.Get(), ghostActor.Get(), leftoverActor.Get(), coreActor.Get(),
                    stockActor.Get(), insertActor.Get(), pathActor.Get()})
        main->AddActor(a);

    scalarBar = vtkSmartPointer<vtkScalarBarActor>::New();
    scalarBar->SetLookupTable(lut);
    scalarBar->SetTitle(scale.displayUnit());
    scalarBar->SetNumberOfLabels(5);
    scalarBar->DrawAnnotationsOn();
    scalarBar->SetMaximumWidthInPixels(120);
    scalarBar->GetPositionCoordinate()->SetCoordinateSystemToNormalizedViewport();
    scalarBar->GetPositionCoordinate()->SetValue(0.89, 0.08);
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

    help = vtkSmartPointer<vtkTextActor>::New();
    help->SetInput(kHelp);
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

void PartScene::Impl::buildSection() {
    section = vtkSmartPointer<vtkRenderer>::New();
    // Dark, so that the near-zero (light grey) colour of the as-cut line shows.
    section->SetBackground(0.16, 0.18, 0.22);
    secRefActor = makeActor(secRefMapper);
    secRefMapper->SetScalarModeToUseCellData();
    secRefMapper->SetColorModeToDirectScalars();
    secRefActor->GetProperty()->SetLineWidth(2);
    secRefActor->GetProperty()->LightingOff();
    secAsCutActor = makeActor(secAsCutMapper);
    secAsCutMapper->SetLookupTable(lut);
    secAsCutMapper->UseLookupTableScalarRangeOn();
    secAsCutMapper->SetScalarModeToUsePointData();
    secAsCutActor->GetProperty()->SetLineWidth(4);
    secAsCutActor->GetProperty()->LightingOff();
    section->AddActor(secRefActor);
    section->AddActor(secAsCutActor);
    section->GetActiveCamera()->ParallelProjectionOn();
    secTitle = vtkSmartPointer<vtkTextActor>::New();
    secTitle->GetTextProperty()->SetFontSize(15);
    secTitle->GetTextProperty()->SetColor(1, 1, 1);
    secTitle->GetPositionCoordinate()->SetCoordinateSystemToNormalizedViewport();
    secTitle->GetPositionCoordinate()->SetValue(0.01, 0.9);
    section->AddViewProp(secTitle);
}

void PartScene::Impl::buildChart() {
    chart = vtkSmartPointer<vtkRenderer>::New();
    chart->SetBackground(1, 1, 1);
    table = vtkSmartPointer<vtkTable>::New();
    for (const char* name : {"z", "deviation", "+tol", "-tol"}) {
        vtkNew<vtkFloatArray> col;
        col->SetName(name);
        table->AddColumn(col);
    }
    chartItem = vtkSmartPointer<vtkChartXY>::New();
    chartItem->SetTitle(fmt::format("Deviation along the cone ({}): above 0 metal left on, below 0 overcut",
                                    scale.displayUnit()));
    chartItem->GetTitleProperties()->SetFontSize(15);
    chartItem->SetShowLegend(true);
    chartItem->GetAxis(vtkAxis::BOTTOM)->SetTitle(
        fmt::format("z from the datum face toward the chuck ({})", unitName(scene.units)));
    chartItem->GetAxis(vtkAxis::LEFT)->SetTitle(fmt::format("deviation ({})", scale.displayUnit()));
    const double l = scale.toDisplay(scale.limitMm);
    chartItem->GetAxis(vtkAxis::LEFT)->SetBehavior(vtkAxis::FIXED);
    chartItem->GetAxis(vtkAxis::LEFT)->SetRange(-l, l);
    auto* dev = chartItem->AddPlot(vtkChart::LINE);
    dev->SetInputData(table, 0, 1);
    dev->SetColor(180, 30, 40, 255);
    dev->SetWidth(2);
    auto* hi = chartItem->AddPlot(vtkChart::LINE);
    hi->SetInputData(table, 0, 2);
    hi->SetColor(60, 60, 60, 255);
    hi->GetPen()->SetLineType(vtkPen::DASH_LINE);
    auto* lo = chartItem->AddPlot(vtkChart::LINE);
    lo->SetInputData(table, 0, 3);
    lo->SetColor(60, 60, 60, 255);
    lo->GetPen()->SetLineType(vtkPen::DASH_LINE);
    vtkNew<vtkContextActor> actor;
    actor->GetScene()->AddItem(chartItem);
    chart->AddActor(actor);
    actor->GetScene()->SetRenderer(chart);
}

void PartScene::Impl::updatePart() {
    const Profile& p = moment.profile;
    const double toDisp = scale.toDisplay(1.0);
    const double phi0 = layers.cutaway ? kCutTo : 0.0;
    const double span = layers.cutaway ? 2 * kPi - (kCutTo - kCutFrom) : 2 * kPi;
    std::vector<double> devDisplay(moment.deviationMm.size());
    for (std::size_t i = 0; i < devDisplay.size(); ++i)
        devDisplay[i] = moment.deviationMm[i] * toDisp;
    const std::size_t n = p.radiusMm.size();
    if (n < 2) {
        partMapper->SetInputData(vtkSmartPointer<vtkPolyData>::New());
        return;
    }
    std::vector<std::size_t> rows;
    if (fine) {
        const std::size_t i0 = std::min(coneI0, n - 1), i1 = std::min(coneI1, n - 1);
        rows = pickRows(i0, std::max(i0, i1), kFineRows);
    } else {
        rows = pickRows(0, n - 1, kCoarseRows);
    }
    const HeightMap& map = result.surface;
    if (moment.finished && map.nz > 1 && map.nPhi > 2 &&
        map.radiusMm.size() == static_cast<std::size_t>(map.nz) * map.nPhi) {
        // The finished part: the kernel's 3D surface, feed marks included.
        const double z0 = fine ? coneZ0 : p.z0Mm, z1 = fine ? coneZ1 : p.zAt(n - 1);
        partMapper->SetInputData(heightMapSurface(map, result.nominal, z0, z1,
                                                  fine ? kFineRows : kCoarseRows, phi0, span,
                                                  toDisp, fine ? 360 : 120));
    } else {
        partMapper->SetInputData(revolve(p, rows, &devDisplay, fine ? 180 : 96, phi0, span));
    }

    // The cut-away faces: leftover metal (above the drawing) and the part below it.
    const std::size_t nn = result.nominal.radiusMm.size();
    std::vector<double> nominal(n, std::nan("")), zero(n, 0.0), coreTop(n), leftTop(n, std::nan(""));
    for (std::size_t i = 0; i < n; ++i) {
        nominal[i] = nn == n ? result.nominal.radiusMm[i] : profileRadiusAt(result.nominal, p.zAt(i));
        const double r = p.radiusMm[i];
        coreTop[i] = std::isnan(nominal[i]) ? r : std::min(r, nominal[i]);
        if (!std::isnan(nominal[i]) && r > nominal[i]) leftTop[i] = r;
    }
    const auto allRows = pickRows(0, n - 1, kCoarseRows);
    leftoverMapper->SetInputData(wedgeFaces(p, nominal, leftTop, allRows, kCutFrom, kCutTo));
    coreMapper->SetInputData(wedgeFaces(p, zero, coreTop, allRows, kCutFrom, kCutTo));

    // The nominal ghost, drawn over each run of samples where the drawing says something.
    const Profile& nom = result.nominal;
    vtkSmartPointer<vtkPolyData> ghost = vtkSmartPointer<vtkPolyData>::New();
    {
        std::size_t a = 0;
        const std::size_t m = nom.radiusMm.size();
        while (a < m && std::isnan(nom.radiusMm[a])) ++a;
        std::size_t b = a;
        while (b < m && !std::isnan(nom.radiusMm[b])) ++b;
        if (b > a + 1) ghost = revolve(nom, pickRows(a, b - 1, 400), nullptr, 72, 0, 2 * kPi);
    }
    ghostMapper->SetInputData(ghost);

    insertMapper->SetInputData(insertSolid(scene.tool, moment.tipZX));
    pathMapper->SetInputData(toolPaths(result, scene.tool, moment.pass, moment.passFraction));
}

void PartScene::Impl::updateSection() {
    // Reference lines (nominal, tolerance band, magnified) and the as-cut line, over the cone.
    const Profile& p = moment.profile;
    const std::size_t n = p.radiusMm.size();
    auto refPoints = vtkSmartPointer<vtkPoints>::New();
    auto refLines = vtkSmartPointer<vtkCellArray>::New();
    auto refColours = vtkSmartPointer<vtkUnsignedCharArray>::New();
    refColours->SetNumberOfComponents(3);
    auto cutPoints = vtkSmartPointer<vtkPoints>::New();
    auto cutLines = vtkSmartPointer<vtkCellArray>::New();
    auto cutDev = vtkSmartPointer<vtkFloatArray>::New();
    cutDev->SetName("deviation");
    const double clampMm = 1.5 * scale.limitMm;
    bool offScale = false;
    const std::size_t i0 = std::min(coneI0, n ? n - 1 : 0), i1 = std::min(coneI1, n ? n - 1 : 0);
    const auto rows = pickRows(i0, std::max(i0, i1), 4000);
    const std::size_t nn = result.nominal.radiusMm.size();
    auto nominalAt = [&](std::size_t i) {
        return nn == n ? result.nominal.radiusMm[i] : profileRadiusAt(result.nominal, p.zAt(i));
    };
    for (double offset : {0.0, scale.bandMm, -scale.bandMm}) {
        std::vector<vtkIdType> ids;
        for (std::size_t i : rows) {
            const double rn = nominalAt(i);
            if (std::isnan(rn)) continue;
            ids.push_back(refPoints->InsertNextPoint(p.zAt(i), rn + magnification * offset, 0));
        }
        if (ids.size() > 1) {
            refLines->InsertNextCell(static_cast<vtkIdType>(ids.size()), ids.data());
            if (offset == 0)
                refColours->InsertNextTuple3(90, 220, 120);  // the drawing
            else
                refColours->InsertNextTuple3(235, 200, 60);  // the tolerance band
        }
    }
    std::vector<vtkIdType> ids;
    auto flush = [&] {
        if (ids.size() > 1) cutLines->InsertNextCell(static_cast<vtkIdType>(ids.size()), ids.data());
        ids.clear();
    };
    for (std::size_t i : rows) {
        const double rn = nominalAt(i);
        const double d = i < moment.deviationMm.size() ? moment.deviationMm[i] : std::nan("");
        if (std::isnan(rn) || std::isnan(d)) {
            flush();
            continue;
        }
        const double shown = std::clamp(d, -clampMm, clampMm);
        offScale = offScale || shown != d;
        ids.push_back(cutPoints->InsertNextPoint(p.zAt(i), rn + magnification * shown, 0.01));
        cutDev->InsertNextValue(static_cast<float>(scale.toDisplay(d)));
    }
    flush();
    auto ref = vtkSmartPointer<vtkPolyData>::New();
    ref->SetPoints(refPoints);
    ref->SetLines(refLines);
    ref->GetCellData()->SetScalars(refColours);
    secRefMapper->SetInputData(ref);
    auto cut = vtkSmartPointer<vtkPolyData>::New();
    cut->SetPoints(cutPoints);
    cut->SetLines(cutLines);
    cut->GetPointData()->SetScalars(cutDev);
    secAsCutMapper->SetInputData(cut);
    secTitle->SetInput(
        fmt::format("Section, deviation x{:g}   green: drawing   yellow: tolerance +/-{}   "
                    "coloured: as cut{}",
                    magnification, formatSmallLength(scale.bandMm, scale.units),
                    offScale ? " (off the scale where flat at the edge)" : "")
            .c_str());
}

void PartScene::Impl::updateChart() {
    const Profile& p = moment.profile;
    const std::size_t n = p.radiusMm.size();
    const double l = scale.toDisplay(scale.limitMm);
    const double band = scale.toDisplay(scale.bandMm);
    const double zScale = fromMm(1.0, scene.units);
    std::vector<std::size_t> keep;
    if (n > 0) {
        const std::size_t i0 = std::min(coneI0, n - 1), i1 = std::min(coneI1, n - 1);
        for (std::size_t i : pickRows(i0, std::max(i0, i1), 3000))
            if (i < moment.deviationMm.size() && !std::isnan(moment.deviationMm[i])) keep.push_back(i);
    }
    // The scale is the result's unless this moment goes beyond it (early passes): then it widens
    // to show everything, and the tolerance lines close up around zero.
    double worst = 0;
    for (std::size_t i : keep) worst = std::max(worst, std::fabs(scale.toDisplay(moment.deviationMm[i])));
    const double range = std::max(l, 1.1 * worst);
    table->SetNumberOfRows(static_cast<vtkIdType>(keep.size()));
    for (std::size_t k = 0; k < keep.size(); ++k) {
        const auto row = static_cast<vtkIdType>(k);
        const std::size_t i = keep[k];
        table->SetValue(row, 0, vtkVariant(static_cast<float>(p.zAt(i) * zScale)));
        const double d = scale.toDisplay(moment.deviationMm[i]);
        table->SetValue(row, 1, vtkVariant(static_cast<float>(d)));
        table->SetValue(row, 2, vtkVariant(static_cast<float>(band)));
        table->SetValue(row, 3, vtkVariant(static_cast<float>(-band)));
    }
    table->Modified();
    chartItem->RecalculateBounds();
    chartItem->GetAxis(vtkAxis::LEFT)->SetRange(-range, range);
}

std::string PartScene::Impl::panelText() const {
    const MomentView& m = moment;
    const Units u = scene.units;
    std::string s = scene.name.empty() ? std::string("swarf") : scene.name;
    s += "\n";
    if (m.pass < 0) {
        s += fmt::format("Before pass 1 of {}: the bar as it stands\n", m.passCount);
    } else {
        const int pct = static_cast<int>(std::lround(m.passFraction * 100));
        s += fmt::format("Pass {} of {} ({}) {}\n", m.pass + 1, m.passCount, m.passKind,
                         m.passFraction >= 1 ? "done" : fmt::format("{}% through", pct));
        if (!m.passNote.empty()) s += m.passNote + "\n";
        s += fmt::format("Feed {}/rev\n", formatLength(m.feedMmPerRev, u));
    }
    const bool diamDial = scene.setup.crossDial == DialMode::Diameter;
    s += fmt::format("Cross-slide {} ({} dial)   Compound {}   Saddle {}\n",
                     formatLength(m.crossMm, u), diamDial ? "diameter" : "radius",
                     formatLength(m.compoundMm, u), formatLength(m.saddleMm, u));
    double worstLeft = 0, worstOver = 0;
    for (double d : m.deviationMm)
        if (!std::isnan(d)) {
            worstLeft = std::max(worstLeft, d);
            worstOver = std::max(worstOver, -d);
        }
    s += fmt::format("Now: most left on {}, most overcut {} (tolerance +/-{})",
                     formatSmallLength(worstLeft, u), formatSmallLength(worstOver, u),
                     formatSmallLength(scale.bandMm, u));
    if (m.finished)
        s += fmt::format("\nVerdict: {}", result.withinTolerance ? "within tolerance" : "OUT OF TOLERANCE");
    return s;
}

void PartScene::Impl::applyLayers() {
    partActor->SetVisibility(layers.part);
    ghostActor->SetVisibility(layers.ghost);
    leftoverActor->SetVisibility(layers.leftover && layers.cutaway);
    coreActor->SetVisibility(layers.cutaway && layers.part);
    stockActor->SetVisibility(layers.stock);
    insertActor->SetVisibility(layers.insert);
    pathActor->SetVisibility(layers.paths);
    scalarBar->SetVisibility(layers.scalarBar);
}

void PartScene::Impl::update() {
    updatePart();
    updateSection();
    updateChart();
    panel->SetInput(panelText().c_str());
    applyLayers();
}

PartScene::PartScene(const Scene& scene, const CutResult& result, double magnification)
    : impl_(std::make_unique<Impl>()) {
    Impl& d = *impl_;
    d.scene = scene;
    d.result = result;
    d.magnification = magnification;
    d.scale = deviationScale(scene, result);
    // The main cone's extent (the first cone feature), else the whole drawing.
    d.coneZ0 = scene.part.features.empty() ? result.asCut.z0Mm : scene.part.features.front().zStartMm;
    d.coneZ1 = scene.part.features.empty() ? result.asCut.zAt(result.asCut.radiusMm.size())
                                           : scene.part.features.back().zEndMm;
    for (const Feature& f : scene.part.features)
        if (f.kind == FeatureKind::Cone) {
            d.coneZ0 = f.zStartMm;
            d.coneZ1 = f.zEndMm;
            break;
        }
    const Profile& g = result.asCut.radiusMm.empty() ? result.stock : result.asCut;
    auto index = [&](double z) {
        if (g.dzMm <= 0) return std::size_t{0};
        return static_cast<std::size_t>(std::max(0.0, std::round((z - g.z0Mm) / g.dzMm)));
    };
    d.coneI0 = index(d.coneZ0);
    d.coneI1 = index(d.coneZ1);
    d.buildLut();
    d.buildMain();
    d.buildSection();
    d.buildChart();
    setPosition(static_cast<double>(scene.plan.passes.size()));
    view(View::Iso);
    resetSection();
}

PartScene::~PartScene() = default;

void PartScene::setPosition(double position) {
    impl_->moment = describeMoment(impl_->scene, impl_->result, position);
    impl_->update();
}

const MomentView& PartScene::moment() const { return impl_->moment; }
int PartScene::passCount() const { return static_cast<int>(impl_->scene.plan.passes.size()); }

void PartScene::setFine(bool fine) {
    if (fine == impl_->fine) return;
    impl_->fine = fine;
    impl_->updatePart();
}

void PartScene::setLayers(const Layers& layers) {
    const bool cutChanged = layers.cutaway != impl_->layers.cutaway;
    impl_->layers = layers;
    if (cutChanged) impl_->updatePart();
    impl_->applyLayers();
}

const Layers& PartScene::layers() const { return impl_->layers; }

void PartScene::setMagnification(double factor) {
    impl_->magnification = std::max(1.0, factor);
    impl_->updateSection();
    resetSection();
}

double PartScene::magnification() const { return impl_->magnification; }

void PartScene::view(View v) {
    Impl& d = *impl_;
    vtkCamera* cam = d.main->GetActiveCamera();
    double bounds[6];
    const double r = d.scene.stock.diameterMm / 2;
    if (v == View::Cone) {
        double rMax = 0;
        const Profile& nom = d.result.nominal;
        for (double x : nom.radiusMm)
            if (!std::isnan(x)) rMax = std::max(rMax, x);
        if (rMax <= 0) rMax = r;
        bounds[0] = d.coneZ0;
        bounds[1] = d.coneZ1;
        bounds[2] = -rMax;
        bounds[3] = rMax;
        bounds[4] = -rMax;
        bounds[5] = rMax;
    } else {
        bounds[0] = std::min(d.scene.stock.freeEndZMm(), d.coneZ0);
        bounds[1] = d.scene.stock.jawZMm();
        bounds[2] = -r;
        bounds[3] = r * 1.6;  // room for the tool on the operator's side
        bounds[4] = -r;
        bounds[5] = r;
    }
    const double cz = 0.5 * (bounds[0] + bounds[1]);
    cam->SetFocalPoint(cz, 0, 0);
    cam->SetViewUp(0, 0, 1);
    switch (v) {
    case View::Front: cam->SetPosition(cz, 1, 0); break;  // the operator's side: chuck on the left
    case View::Top: cam->SetPosition(cz, 0, 1); cam->SetViewUp(0, -1, 0); break;
    case View::End: cam->SetPosition(cz - 1, 0, 0); break;  // from the tailstock
    case View::Iso:
    case View::Cone: cam->SetPosition(cz - 0.35, 0.8, 0.55); break;
    }
    cam->ParallelProjectionOff();
    d.main->ResetCamera(bounds);
    cam->Zoom(v == View::Cone ? 1.25 : 1.3);
    d.main->ResetCameraClippingRange();
}

void PartScene::resetSection() {
    Impl& d = *impl_;
    double bounds[6];
    d.secRefMapper->Update();
    d.secRefMapper->GetInput()->GetBounds(bounds);
    if (!(bounds[1] > bounds[0])) return;
    const double pad = 0.25 * std::max(bounds[3] - bounds[2], 1e-3);
    bounds[2] -= pad;
    bounds[3] += pad;
    vtkCamera* cam = d.section->GetActiveCamera();
    cam->SetFocalPoint(0.5 * (bounds[0] + bounds[1]), 0.5 * (bounds[2] + bounds[3]), 0);
    cam->SetPosition(0.5 * (bounds[0] + bounds[1]), 0.5 * (bounds[2] + bounds[3]), 100);
    cam->SetViewUp(0, 1, 0);
    d.section->ResetCamera(bounds);
    cam->ParallelProjectionOn();
    // Fit the section's extent into the viewport in both directions.
    double aspect[2] = {1, 1};
    d.section->GetAspect(aspect);
    const double w = bounds[1] - bounds[0], h = bounds[3] - bounds[2];
    cam->SetParallelScale(0.55 * std::max(h, w / std::max(aspect[0], 1e-3)));
}

vtkRenderer* PartScene::main() const { return impl_->main; }
vtkRenderer* PartScene::section() const { return impl_->section; }
vtkRenderer* PartScene::chart() const { return impl_->chart; }

void PartScene::setHelpVisible(bool on) { impl_->help->SetVisibility(on); }
bool PartScene::helpVisible() const { return impl_->help->GetVisibility() != 0; }
void PartScene::setTextScale(int heightPx) {
    const int big = std::clamp(heightPx / 45, 10, 18), small = std::clamp(heightPx / 55, 9, 15);
    impl_->panel->GetTextProperty()->SetFontSize(big);
    impl_->help->GetTextProperty()->SetFontSize(big);
    impl_->status->GetTextProperty()->SetFontSize(small);
    impl_->secTitle->GetTextProperty()->SetFontSize(small);
    impl_->chartItem->GetTitleProperties()->SetFontSize(small);
    for (auto* tp : {impl_->scalarBar->GetTitleTextProperty(), impl_->scalarBar->GetLabelTextProperty(),
                     impl_->scalarBar->GetAnnotationTextProperty()})
        tp->SetFontSize(small);
}

void PartScene::setStatus(const std::string& text) { impl_->status->SetInput(text.c_str()); }
std::string PartScene::panelText() const { return impl_->panelText(); }
const DeviationScale& PartScene::scale() const { return impl_->scale; }

std::vector<Eigen::Vector2d> PartScene::drawnSection() const {
    std::vector<Eigen::Vector2d> out;
    vtkPolyData* pd = impl_->partMapper->GetInput();
    if (!pd || !pd->GetPoints()) return out;
    // The first meridian is the first point of each row: the rows are laid out one after the
    // other, so a new row starts where z changes.
    double prevZ = std::nan("");
    for (vtkIdType i = 0; i < pd->GetNumberOfPoints(); ++i) {
        double q[3];
        pd->GetPoint(i, q);
        if (q[0] == prevZ) continue;
        prevZ = q[0];
        out.emplace_back(q[0], std::hypot(q[1], q[2]));
    }
    return out;
}

} // namespace swarf::viewer::detail
