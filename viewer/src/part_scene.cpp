// A PartScene updated to one moment of the plan: the part's surface, the cut-away, the insert
// and the paths, the section and the chart, the panel (see part_scene.h; the scene graph is
// built in part_scene_build.cpp, the camera fitted in part_scene_camera.cpp).
#include "part_scene_impl.h"

#include "meshes.h"
#include "panel_text.h"

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

    vtkSmartPointer<vtkPolyData> surface;
    if (result.bored) {
        surface = boredSurface(devDisplay);
    } else if (closeUp && moment.finished && !result.surface.empty()) {
        // The finished stretch with its feed marks raised.
        surface = feedMarkPatch(result.surface, result.asCut, scene.part, close.zFromMm,
                                close.zToMm, kCloseRows, kCloseLimb, kCloseFineHalfWidth,
                                kCloseFineStep, kCloseCoarseStride, close.reliefFactor, toDisp);
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
            nominal[i] = nn == n ? result.nominal.radiusMm[i] : result.nominal.radiusAt(p.zAt(i));
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
    barActor->SetPosition(moment.tipZX.x(), moment.tipZX.y(), 0);
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
    const DeviationTrace* twinTrace = twinLine();
    sectionView->show(sectionTrace, magnification, where, closeUp, twinTrace);
    DeviationTrace twinChart;
    if (twinTrace)
        twinChart = decimateTrace(*twinTrace, kChartPoints);
    chartView->show(decimateTrace(line, kChartPoints), where, closeUp,
                    twinTrace ? &twinChart : nullptr);
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
    boreActor->SetVisibility(layers.part && whole && result.bored);
    barActor->SetVisibility(layers.insert && whole && result.bored);
    pathActor->SetVisibility(layers.paths && whole);
    twinActor->SetVisibility(layers.twin && twin && whole);
    scalarBar->SetVisibility(layers.scalarBar);
    closeLabel->SetVisibility(closeUp);
}

void PartScene::Impl::update() {
    updatePart();
    updatePlots();
    panel->SetInput(panelWithTwin().c_str());
    closeLabel->SetInput(closeUpPanelText(scene, result, moment, close).c_str());
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
    const bool twinChanged = layers.twin != impl_->layers.twin;
    impl_->layers = layers;
    if (cutChanged)
        impl_->updatePart();
    if (twinChanged) {
        impl_->updatePlots();
        impl_->panel->SetInput(impl_->panelWithTwin().c_str());
    }
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
    const char* t = impl_->panel->GetInput();
    return t ? t : "";
}
std::string PartScene::closeUpText() const {
    const char* t = impl_->closeLabel->GetInput();
    return t ? t : "";
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
