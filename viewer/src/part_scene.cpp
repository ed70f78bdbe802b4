// Everything drawn for a scene and its result, updated to one moment (see part_scene.h).
//
// Speed: llvmpipe (software OpenGL) shades every pixel on the CPU, so what is drawn is kept to
// what the screen can show: the part from the rows that keep its corners and colours (a few
// hundred, not the profile's tens of thousands), 72 columns round; what does not change with
// the moment (the drawing's ghost, the stock outline, the jaws, the insert's shape) is built
// once; the section and chart get min/max-decimated lines.
#include "part_scene.h"

#include "meshes.h"
#include "plots.h"

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

namespace {

constexpr double kDeg = kPi / 180.0;
// The cut-away: the quarter of the part facing up (φ from 45° to 135°, φ measured from the
// operator's side toward the top) is left out so the section shows.
constexpr double kCutFrom = 45 * kDeg, kCutTo = 135 * kDeg;
// The whole part: at least this many rows evenly, more where corners or colours need them.
constexpr std::size_t kBaseRows = 240, kMaxRows = 1500;
constexpr int kColumns = 72; // round the part (5°): the silhouette is within 0.1 px of round
// The close-up: rows across the stretch (ten per feed mark: fewer show as facets, more cost
// frames in software OpenGL, measured in swarf_bench); every column of the 3D map
// within 20° of where it looks (the picture shows about 15°), every fourth elsewhere.
constexpr std::size_t kCloseRows = 400;
constexpr int kCloseColumns = 120, kCloseCoarseStride = 4;
constexpr double kCloseFineHalfWidth = 20 * kDeg;
// Where the close-up looks along the surface: from the operator's side, a little above, square
// to the axis, so that the marks stand as teeth along the top edge.
const Eigen::Vector3d kCloseDir = Eigen::Vector3d(0, 1.0, 0.35).normalized();
const double kCloseLimb = kPi - std::atan2(1.0, 0.35);
// Points of the section's and chart's lines (min/max pairs): about two per pixel column.
constexpr std::size_t kSectionPoints = 2400, kChartPoints = 1200;

vtkSmartPointer<vtkActor> makeActor(vtkSmartPointer<vtkPolyDataMapper>& mapper) {
    mapper = vtkSmartPointer<vtkPolyDataMapper>::New();
    auto actor = vtkSmartPointer<vtkActor>::New();
    actor->SetMapper(mapper);
    return actor;
}

// Moves and shifts the camera, keeping its direction, so that the points `pts` project into
// the rectangle [x0, x1] × [y0, y1] of the viewport (view coordinates, −1..1): the part stays
// clear of the panel, the slider and the colour bar.
void fitPoints(vtkRenderer* ren, const std::vector<Eigen::Vector3d>& pts, double viewAngleDeg,
               double x0, double x1, double y0, double y1) {
    if (pts.empty())
        return;
    vtkCamera* cam = ren->GetActiveCamera();
    cam->SetWindowCenter(0, 0);
    ren->ComputeAspect(); // the viewport's shape now, not at the last frame
    double b[6] = {HUGE_VAL, -HUGE_VAL, HUGE_VAL, -HUGE_VAL, HUGE_VAL, -HUGE_VAL};
    for (const auto& p : pts)
        for (int a = 0; a < 3; ++a) {
            b[2 * a] = std::min(b[2 * a], p[a]);
            b[2 * a + 1] = std::max(b[2 * a + 1], p[a]);
        }
    ren->ResetCamera(b); // (this sets the view angle to 30°)
    if (viewAngleDeg != cam->GetViewAngle()) {
        // Same picture size with the other lens: move back by the ratio of the tangents.
        const double k =
            std::tan(0.5 * cam->GetViewAngle() * kDeg) / std::tan(0.5 * viewAngleDeg * kDeg);
        cam->SetViewAngle(viewAngleDeg);
        cam->Dolly(1 / k);
    }
    double wc[2] = {0, 0};
    for (int it = 0; it < 6; ++it) {
        double lo[2] = {HUGE_VAL, HUGE_VAL}, hi[2] = {-HUGE_VAL, -HUGE_VAL};
        for (const auto& p : pts) {
            ren->SetWorldPoint(p.x(), p.y(), p.z(), 1);
            ren->WorldToView();
            const double* v = ren->GetViewPoint();
            for (int a = 0; a < 2; ++a) {
                lo[a] = std::min(lo[a], v[a]);
                hi[a] = std::max(hi[a], v[a]);
            }
        }
        const double s = std::min((x1 - x0) / std::max(hi[0] - lo[0], 1e-9),
                                  (y1 - y0) / std::max(hi[1] - lo[1], 1e-9));
        // Dolly, not zoom: the lens (view angle) stays as the view chose it.
        if (std::fabs(s - 1) > 1e-4)
            cam->Dolly(s);
        // With window centre wc a point shows at v = u − wc, u its place without a shift; the
        // zoom scales u by about s. Put the points' centre at the rectangle's.
        const double c[2] = {0.5 * (lo[0] + hi[0]), 0.5 * (lo[1] + hi[1])};
        const double want[2] = {0.5 * (x0 + x1), 0.5 * (y0 + y1)};
        for (int a = 0; a < 2; ++a)
            wc[a] = s * (c[a] + wc[a]) - want[a];
        cam->SetWindowCenter(wc[0], wc[1]);
    }
    ren->ResetCameraClippingRange();
}

// Points round a circle of radius r at axial position z (world: X = z).
void addCircle(std::vector<Eigen::Vector3d>& pts, double z, double r, int n = 24) {
    for (int k = 0; k < n; ++k) {
        const double phi = 2 * kPi * k / n;
        pts.emplace_back(z, r * std::cos(phi), r * std::sin(phi));
    }
}

const char* kHelp =
    "Keys\n"
    "  Right / Left      next / previous pass (whole passes)\n"
    "  Up / Down         scrub forward / back within a pass (1/20 pass)\n"
    "  Home / End        before the first pass / the finished part\n"
    "  1 2 3 4           view: front (operator), top, end (from tailstock), oblique\n"
    "  5                 the cone filling the view\n"
    "  c                 close-up at the gauge plane: the feed marks, raised to be seen\n"
    "  r                 reset: whole part, oblique view\n"
    "  x                 cut-away quarter on/off\n"
    "  g                 nominal cone (ghost) on/off\n"
    "  l                 leftover metal (in the cut-away) on/off\n"
    "  o                 stock outline on/off\n"
    "  j                 chuck jaws on/off\n"
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

const char* helpText() {
    return kHelp;
}

struct PartScene::Impl {
    explicit Impl(std::shared_ptr<const CutResult> r) : held(std::move(r)), result(*held) {}
    Scene scene;
    // Shared, not copied: the finished part's 3D surface alone is a few hundred MB.
    std::shared_ptr<const CutResult> held;
    const CutResult& result;
    DeviationScale scale;
    MomentView moment;
    Layers layers;
    CloseUp close;
    bool closeUp = false;
    double magnification = 200;
    double coneZ0 = 0, coneZ1 = 0; // the main cone's extent (or the part's)
    DeviationTrace sectionTrace;
    // The finished part's line along the 3D surface, whole cone and close-up, every row: worked
    // out once (a few hundred thousand rows), then decimated for each view.
    DeviationTrace finishedLine[2];
    bool finishedLineReady[2] = {false, false};
    std::size_t partPolygons = 0;

    vtkSmartPointer<vtkRenderer> main;
    vtkSmartPointer<vtkColorTransferFunction> lut;
    std::unique_ptr<SectionView> sectionView;
    std::unique_ptr<DeviationChart> chartView;

    vtkSmartPointer<vtkPolyDataMapper> partMapper, ghostMapper, leftoverMapper, coreMapper,
        stockMapper, jawsMapper, insertMapper, pathMapper;
    vtkSmartPointer<vtkActor> partActor, ghostActor, leftoverActor, coreActor, stockActor,
        jawsActor, insertActor, pathActor;
    vtkSmartPointer<vtkScalarBarActor> scalarBar;
    vtkSmartPointer<vtkTextActor> panel, help, status, closeLabel;
    vtkSmartPointer<vtkLight> light;

    void buildLut();
    void buildMain();
    void buildGhost();
    void update();
    void updatePart();
    void updatePlots();
    void applyLayers();
    std::string panelText() const;
    std::string closeUpText() const;
};

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
    lut->SetAnnotation(vtkVariant(band), fmt::format("+{:.3g} tol", band));
    lut->SetAnnotation(vtkVariant(-band), fmt::format("-{:.3g} tol", band));
    lut->SetAnnotation(vtkVariant(0.0), "0");
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

    for (auto* a : {partActor.Get(), leftoverActor.Get(), coreActor.Get(), stockActor.Get(),
                    jawsActor.Get(), insertActor.Get(), pathActor.Get(), ghostActor.Get()})
        main->AddActor(a);

    scalarBar = vtkSmartPointer<vtkScalarBarActor>::New();
    scalarBar->SetLookupTable(lut);
    scalarBar->SetTitle(scale.displayUnit());
    scalarBar->SetNumberOfLabels(5);
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

void PartScene::Impl::updatePart() {
    const Profile& p = moment.profile;
    const double toDisp = scale.toDisplay(1.0);
    const std::size_t n = p.radiusMm.size();
    if (n < 2) {
        partMapper->SetInputData(vtkSmartPointer<vtkPolyData>::New());
        partPolygons = 0;
        return;
    }
    std::vector<double> devDisplay(moment.deviationMm.size());
    for (std::size_t i = 0; i < devDisplay.size(); ++i)
        devDisplay[i] = moment.deviationMm[i] * toDisp;
    // Corners within 0.02% of the bar's diameter, colours within 2% of the colour bar's half.
    const double tolR = 2e-4 * std::max(scene.stock.diameterMm, 1.0);
    const double tolD = 0.02 * scale.toDisplay(scale.limitMm);
    auto index = [&](double z) {
        return static_cast<std::size_t>(
            std::clamp(std::round((z - p.z0Mm) / p.dzMm), 0.0, static_cast<double>(n - 1)));
    };

    const HeightMap& map = result.surface;
    const bool haveMap = map.nz > 1 && map.nPhi > 2 &&
                         map.radiusMm.size() == static_cast<std::size_t>(map.nz) * map.nPhi;
    vtkSmartPointer<vtkPolyData> surface;
    if (closeUp && moment.finished && haveMap) {
        // The finished stretch with its feed marks raised.
        surface = feedMarkPatch(map, result.asCut, scene.part, close.zFromMm, close.zToMm,
                                kCloseRows, kCloseLimb, kCloseFineHalfWidth, kCloseCoarseStride,
                                close.reliefFactor, toDisp);
    } else if (closeUp) {
        const auto rows = pickRows(index(close.zFromMm), index(close.zToMm), kCloseRows);
        surface = revolve(p, rows, &devDisplay, kCloseColumns, 0, 2 * kPi);
    } else {
        const auto rows = profileRows(p, &devDisplay, 0, n - 1, kBaseRows, tolR, tolD, kMaxRows);
        const double phi0 = layers.cutaway ? kCutTo : 0.0;
        const double span = layers.cutaway ? 2 * kPi - (kCutTo - kCutFrom) : 2 * kPi;
        const int cols = layers.cutaway ? kColumns * 3 / 4 : kColumns;
        surface = revolve(p, rows, &devDisplay, cols, phi0, span);

        // The cut-away faces: leftover metal (above the drawing) and the part below it.
        const std::size_t nn = result.nominal.radiusMm.size();
        std::vector<double> nominal(n), zero(n, 0.0), coreTop(n), leftTop(n, std::nan(""));
        for (std::size_t i = 0; i < n; ++i) {
            nominal[i] =
                nn == n ? result.nominal.radiusMm[i] : result.nominal.radiusAt(p.zAt(i));
            const double r = p.radiusMm[i];
            coreTop[i] = std::isnan(nominal[i]) ? r : std::min(r, nominal[i]);
            if (!std::isnan(nominal[i]) && r > nominal[i])
                leftTop[i] = r;
        }
        leftoverMapper->SetInputData(wedgeFaces(p, nominal, leftTop, rows, kCutFrom, kCutTo));
        coreMapper->SetInputData(wedgeFaces(p, zero, coreTop, rows, kCutFrom, kCutTo));
    }
    partMapper->SetInputData(surface);
    partPolygons = static_cast<std::size_t>(surface->GetNumberOfPolys());

    insertActor->SetPosition(moment.tipZX.x(), moment.tipZX.y(), 0);
    pathMapper->SetInputData(toolPaths(result, scene.tool, moment.pass, moment.passFraction));
}

void PartScene::Impl::updatePlots() {
    const double z0 = closeUp ? close.zFromMm : coneZ0, z1 = closeUp ? close.zToMm : coneZ1;
    const std::string where = closeUp ? fmt::format("z {} to {}", formatLength(z0, scene.units),
                                                    formatLength(z1, scene.units))
                                      : "";
    DeviationTrace line;
    if (moment.finished) {
        const int k = closeUp ? 1 : 0;
        if (!finishedLineReady[k]) {
            finishedLine[k] = deviationTrace(scene, result, moment, z0, z1, 0);
            finishedLineReady[k] = true;
        }
        line = finishedLine[k];
    } else {
        line = deviationTrace(scene, result, moment, z0, z1, 0);
    }
    sectionTrace = decimateTrace(line, closeUp ? 0 : kSectionPoints);
    sectionView->show(sectionTrace, magnification, where, closeUp);
    chartView->show(decimateTrace(line, kChartPoints), where, closeUp);
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
        if (!m.passNote.empty())
            s += m.passNote + "\n";
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
        s += fmt::format("\nVerdict: {}",
                         result.withinTolerance ? "within tolerance" : "OUT OF TOLERANCE");
    return s;
}

std::string PartScene::Impl::closeUpText() const {
    const Units u = scene.units;
    std::string s = fmt::format("Close-up at the gauge plane: z {} to {}",
                                formatLength(close.zFromMm, u), formatLength(close.zToMm, u));
    const bool marks = moment.finished && result.surface.nz > 1 && result.rtUm > 0;
    if (marks)
        s += fmt::format("\nFeed marks {} apart, {} high (Rt), drawn {:g} times as high; "
                         "colours are true to scale",
                         formatLength(close.feedMmPerRev, u),
                         formatSmallLength(result.rtUm / 1000, u), close.reliefFactor);
    else if (moment.passCount == 0)
        s += "\nThe plan has no passes: nothing is cut ('swarf plan' makes them)";
    else if (!moment.finished)
        s += "\nThe feed marks are worked out for the finished part only (End shows it)";
    return s;
}

void PartScene::Impl::applyLayers() {
    const bool whole = !closeUp;
    partActor->SetVisibility(layers.part);
    ghostActor->SetVisibility(layers.ghost && whole);
    leftoverActor->SetVisibility(layers.leftover && layers.cutaway && whole);
    coreActor->SetVisibility(layers.cutaway && layers.part && whole);
    stockActor->SetVisibility(layers.stock && whole);
    jawsActor->SetVisibility(layers.jaws && whole);
    insertActor->SetVisibility(layers.insert && whole);
    pathActor->SetVisibility(layers.paths && whole);
    scalarBar->SetVisibility(layers.scalarBar);
    closeLabel->SetVisibility(closeUp);
}

void PartScene::Impl::update() {
    updatePart();
    updatePlots();
    panel->SetInput(panelText().c_str());
    closeLabel->SetInput(closeUpText().c_str());
    applyLayers();
}

PartScene::PartScene(const Scene& scene, std::shared_ptr<const CutResult> shared,
                     double magnification)
    : impl_(std::make_unique<Impl>(std::move(shared))) {
    Impl& d = *impl_;
    d.scene = scene;
    const CutResult& result = d.result;
    d.magnification = magnification;
    d.scale = deviationScale(scene, result);
    mainConeExtent(scene, result, d.coneZ0, d.coneZ1);
    d.close = closeUpOf(scene, result);
    d.buildLut();
    d.buildMain();
    d.sectionView = std::make_unique<SectionView>(d.lut, d.scale);
    d.chartView = std::make_unique<DeviationChart>(d.scale, scene.units);
    setPosition(static_cast<double>(scene.plan.passes.size()));
    view(View::Iso);
    resetSection();
}

PartScene::~PartScene() = default;

void PartScene::setPosition(double position) {
    impl_->moment = describeMoment(impl_->scene, impl_->result, position);
    impl_->update();
}

const MomentView& PartScene::moment() const {
    return impl_->moment;
}
int PartScene::passCount() const {
    return static_cast<int>(impl_->scene.plan.passes.size());
}

void PartScene::setCloseUp(bool on) {
    if (on == impl_->closeUp)
        return;
    impl_->closeUp = on;
    // The close-up looks along the surface, where a headlight leaves it dark and lights both
    // flanks of a mark alike: the light comes from above and to the tailstock side instead, and
    // an even (ambient) part keeps the surface readable.
    if (on) {
        impl_->light->SetLightTypeToCameraLight();
        impl_->light->SetPosition(-0.6, 0.6, 1.0);
        impl_->light->SetFocalPoint(0, 0, 0);
    } else {
        impl_->light->SetLightTypeToHeadlight();
    }
    impl_->partActor->GetProperty()->SetAmbient(on ? 0.3 : 0.0);
    impl_->partActor->GetProperty()->SetDiffuse(on ? 0.75 : 1.0);
    impl_->update();
    resetSection();
}

bool PartScene::closeUpOn() const {
    return impl_->closeUp;
}
const CloseUp& PartScene::closeUp() const {
    return impl_->close;
}

void PartScene::setLayers(const Layers& layers) {
    const bool cutChanged = layers.cutaway != impl_->layers.cutaway;
    impl_->layers = layers;
    if (cutChanged)
        impl_->updatePart();
    impl_->applyLayers();
}

const Layers& PartScene::layers() const {
    return impl_->layers;
}

void PartScene::setMagnification(double factor) {
    impl_->magnification = std::max(1.0, factor);
    impl_->updatePlots();
    resetSection();
}

double PartScene::magnification() const {
    return impl_->magnification;
}

void PartScene::view(View v) {
    Impl& d = *impl_;
    vtkCamera* cam = d.main->GetActiveCamera();
    const double r = d.scene.stock.diameterMm / 2;
    // The points the view must show, and the direction it looks from.
    std::vector<Eigen::Vector3d> pts;
    Eigen::Vector3d dir(-0.3, 0.85, 0.45), up(0, 0, 1);
    if (v == View::CloseUp) {
        // From the operator's side and a little above, with the top of the part against the
        // background: the raised feed marks stand out along that edge like a thread's teeth
        // and shade as bands on the surface below it.
        dir = kCloseDir;
        const double limb = kCloseLimb; // where the view grazes the surface
        const double z0 = d.close.zFromMm, z1 = d.close.zToMm, length = z1 - z0;
        for (double z : {z0, z1}) {
            const double rc = std::max(d.result.asCut.radiusAt(z), 1e-3);
            const double band = std::acos(std::clamp(1 - 0.25 * length / rc, -1.0, 1.0));
            for (double a : {limb, limb - band})
                pts.emplace_back(z, rc * std::cos(a), rc * std::sin(a));
            const double sky = rc + 0.08 * length;
            pts.emplace_back(z, sky * std::cos(limb), sky * std::sin(limb));
        }
    } else if (v == View::Cone) {
        addCircle(pts, d.coneZ0, d.result.nominal.radiusAt(d.coneZ0 + 1e-6));
        addCircle(pts, d.coneZ1, d.result.nominal.radiusAt(d.coneZ1 - 1e-6));
        for (auto& p : pts)
            if (!p.allFinite())
                p = Eigen::Vector3d(p.x(), 0, 0);
    } else {
        // The bar from its free end to the jaws, the jaws, and the tool's travel.
        const double zEnd = std::min(d.scene.stock.freeEndZMm(), d.coneZ0);
        addCircle(pts, zEnd, r);
        addCircle(pts, d.scene.stock.jawZMm(), r);
        if (d.layers.jaws) {
            double bounds[6];
            d.jawsActor->GetMapper()->GetInput()->GetBounds(bounds);
            for (int k = 0; k < 8; ++k)
                pts.emplace_back(bounds[k & 1], bounds[2 + ((k >> 1) & 1)],
                                 bounds[4 + ((k >> 2) & 1)]);
        }
        // The tool's travel, with the insert's own size about each end of a move.
        double ib[6];
        d.insertMapper->GetInput()->GetBounds(ib);
        for (const ToolMove& m : d.result.moves)
            for (const Eigen::Vector2d& t : {m.tipFrom, m.tipTo})
                if (t.allFinite() && t.y() < 3 * r)
                    for (int k = 0; k < 8; ++k)
                        pts.emplace_back(t.x() + ib[k & 1], t.y() + ib[2 + ((k >> 1) & 1)],
                                         ib[4 + ((k >> 2) & 1)]);
    }
    switch (v) {
    case View::Front:
        dir = {0, 1, 0};
        break; // the operator's side: chuck on the left
    case View::Top:
        dir = {0, 0, 1};
        up = {0, -1, 0};
        break;
    case View::End:
        dir = {-1, 0, 0};
        break; // from the tailstock
    default:
        break;
    }
    Eigen::Vector3d c = Eigen::Vector3d::Zero();
    for (const auto& p : pts)
        c += p;
    c /= static_cast<double>(std::max<std::size_t>(pts.size(), 1));
    cam->SetFocalPoint(c.x(), c.y(), c.z());
    cam->SetPosition(c.x() + dir.x(), c.y() + dir.y(), c.z() + dir.z());
    cam->SetViewUp(up.x(), up.y(), up.z());
    cam->ParallelProjectionOff();
    // Clear of the panel (top left), the slider (bottom) and the colour bar (right). The
    // close-up from afar with a narrow lens: a few millimetres of a bar tens of millimetres
    // across look as they are, not bent by perspective.
    fitPoints(d.main, pts, v == View::CloseUp ? 3.0 : 30.0, -0.94, 0.72, -0.60, 0.50);
}

void PartScene::resetSection() {
    impl_->sectionView->fit(impl_->closeUp);
}

vtkRenderer* PartScene::main() const {
    return impl_->main;
}
vtkRenderer* PartScene::section() const {
    return impl_->sectionView->renderer();
}
vtkRenderer* PartScene::chart() const {
    return impl_->chartView->renderer();
}

void PartScene::setHelpVisible(bool on) {
    impl_->help->SetVisibility(on);
}
bool PartScene::helpVisible() const {
    return impl_->help->GetVisibility() != 0;
}
void PartScene::setTextScale(int heightPx) {
    const int big = std::clamp(heightPx / 45, 10, 18), small = std::clamp(heightPx / 55, 9, 15);
    impl_->panel->GetTextProperty()->SetFontSize(big);
    impl_->help->GetTextProperty()->SetFontSize(big);
    impl_->status->GetTextProperty()->SetFontSize(small);
    impl_->closeLabel->GetTextProperty()->SetFontSize(small);
    impl_->sectionView->setFontSize(small);
    impl_->chartView->setFontSize(small);
    for (auto* tp :
         {impl_->scalarBar->GetTitleTextProperty(), impl_->scalarBar->GetLabelTextProperty(),
          impl_->scalarBar->GetAnnotationTextProperty()})
        tp->SetFontSize(small);
}

void PartScene::setStatus(const std::string& text) {
    impl_->status->SetInput(text.c_str());
}
std::string PartScene::panelText() const {
    return impl_->panelText();
}
const DeviationScale& PartScene::scale() const {
    return impl_->scale;
}
std::size_t PartScene::partPolygons() const {
    return impl_->partPolygons;
}
const DeviationTrace& PartScene::sectionTrace() const {
    return impl_->sectionTrace;
}

std::vector<Eigen::Vector2d> PartScene::drawnSection() const {
    std::vector<Eigen::Vector2d> out;
    vtkPolyData* pd = impl_->partMapper->GetInput();
    if (!pd || !pd->GetPoints())
        return out;
    // The first meridian is the first point of each row: the rows are laid out one after the
    // other, so a new row starts where z changes.
    double prevZ = std::nan("");
    for (vtkIdType i = 0; i < pd->GetNumberOfPoints(); ++i) {
        double q[3];
        pd->GetPoint(i, q);
        if (q[0] == prevZ)
            continue;
        prevZ = q[0];
        out.emplace_back(q[0], std::hypot(q[1], q[2]));
    }
    return out;
}

} // namespace swarf::viewer::detail
