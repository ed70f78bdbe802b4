// The interactive window (see viewer.h): layout, slider, keys.
#include "swarf/viewer/viewer.h"

#include "fp_traps.h"
#include "part_scene.h"
#include "png_file.h"
#include "swarf/sim/error.h"
#include "x_connection.h"

#include <vtkCallbackCommand.h>
#include <vtkCamera.h>
#include <vtkCommand.h>
#include <vtkInteractorStyleTrackballCamera.h>
#include <vtkNew.h>
#include <vtkObjectFactory.h>
#include <vtkProperty2D.h>
#include <vtkRenderWindow.h>
#include <vtkRenderWindowInteractor.h>
#include <vtkRenderer.h>
#include <vtkSliderRepresentation2D.h>
#include <vtkSliderWidget.h>
#include <vtkTextProperty.h>

#include <fmt/format.h>

#include <algorithm>
#include <cctype>
#include <cmath>
#include <filesystem>
#include <functional>

namespace swarf::viewer {

namespace {

// Window layout (normalized): the 3D part on top, the section and the chart underneath.
constexpr double kSplitY = 0.34;

} // namespace

struct ViewerSession::Impl {
    std::unique_ptr<detail::PartScene> part;
    vtkSmartPointer<vtkRenderWindow> window;
    vtkSmartPointer<vtkRenderWindowInteractor> interactor;
    vtkSmartPointer<vtkSliderWidget> slider;
    vtkSmartPointer<vtkSliderRepresentation2D> sliderRep;
    int snapshotCount = 0;

    void syncSlider() {
        if (sliderRep)
            sliderRep->SetValue(part->moment().position);
    }
    void go(double position) {
        part->setPosition(position);
        syncSlider();
    }
    /// Acts on a key; false if the window has no use for it.
    bool onKey(const std::string& key, bool shift);
    void afterCameraMove();
    bool zoomHintShown = false;
};

// After the mouse has turned or zoomed the 3D view: once one feed mark of the finished part
// would span several pixels, say how to see the marks (the whole part is drawn from the swept
// profile, which has none).
void ViewerSession::Impl::afterCameraMove() {
    const double f = part->closeUp().feedMmPerRev;
    bool hint = false;
    if (f > 0 && part->moment().finished && !part->closeUpOn()) {
        vtkRenderer* ren = part->main();
        double fp[3];
        ren->GetActiveCamera()->GetFocalPoint(fp);
        double a[3], b[3];
        ren->SetWorldPoint(fp[0], fp[1], fp[2], 1);
        ren->WorldToDisplay();
        ren->GetDisplayPoint(a);
        ren->SetWorldPoint(fp[0] + f, fp[1], fp[2], 1);
        ren->WorldToDisplay();
        ren->GetDisplayPoint(b);
        hint = std::hypot(b[0] - a[0], b[1] - a[1]) > 6;
    }
    if (hint == zoomHintShown)
        return;
    zoomHintShown = hint;
    part->setStatus(hint ? "Zoomed in: press c for the feed marks at the gauge plane" : "");
}

// The interaction style: trackball camera for the mouse, our keys instead of VTK's defaults.
class SwarfStyle : public vtkInteractorStyleTrackballCamera {
  public:
    static SwarfStyle* New();
    vtkTypeMacro(SwarfStyle, vtkInteractorStyleTrackballCamera);
    std::function<void(const std::string&, bool)> onKey;
    void OnKeyPress() override {
        if (!onKey)
            return;
        vtkRenderWindowInteractor* rwi = this->Interactor;
        const std::string key = rwi->GetKeySym() ? rwi->GetKeySym() : "";
        onKey(key, rwi->GetShiftKey() != 0);
    }
    // VTK's own single-letter keys (wireframe, stereo, pick, ...) are switched off.
    void OnChar() override {}
};
vtkStandardNewMacro(SwarfStyle);

bool ViewerSession::Impl::onKey(const std::string& key, bool shift) {
    using detail::View;
    const MomentView& m = part->moment();
    const double pos = m.position;
    const int n = part->passCount();
    detail::Layers layers = part->layers();
    bool layersChanged = false;
    std::string status;
    if (key == "Right")
        go(std::min<double>(n, std::floor(pos + 1e-9) + 1));
    else if (key == "Left")
        go(std::max(0.0, std::ceil(pos - 1e-9) - 1));
    else if (key == "Up")
        go(std::min<double>(n, pos + 0.05));
    else if (key == "Down")
        go(std::max(0.0, pos - 0.05));
    else if (key == "Home")
        go(0);
    else if (key == "End")
        go(n);
    else if (key == "1" || key == "2" || key == "3" || key == "4" || key == "5") {
        part->setCloseUp(false);
        static const View views[] = {View::Front, View::Top, View::End, View::Iso, View::Cone};
        part->view(views[key[0] - '1']);
    } else if (key == "c") {
        part->setCloseUp(true);
        part->view(View::CloseUp);
    } else if (key == "r") {
        part->setCloseUp(false);
        part->view(View::Iso);
        part->resetSection();
    } else if (key == "x")
        layers.cutaway = !layers.cutaway, layersChanged = true;
    else if (key == "g")
        layers.ghost = !layers.ghost, layersChanged = true;
    else if (key == "w")
        layers.twin = !layers.twin, layersChanged = true;
    else if (key == "l")
        layers.leftover = !layers.leftover, layersChanged = true;
    else if (key == "o")
        layers.stock = !layers.stock, layersChanged = true;
    else if (key == "j")
        layers.jaws = !layers.jaws, layersChanged = true;
    else if (key == "t")
        layers.insert = !layers.insert, layersChanged = true;
    else if (key == "p")
        layers.paths = !layers.paths, layersChanged = true;
    else if (key == "b")
        layers.scalarBar = !layers.scalarBar, layersChanged = true;
    else if (key == "m" || key == "M") {
        static const double steps[] = {10, 20, 50, 100, 200, 500, 1000, 2000, 5000};
        const double cur = part->magnification();
        double next = cur;
        if (key == "m" && !shift) {
            for (double s : steps)
                if (s > cur + 1e-9) {
                    next = s;
                    break;
                }
        } else {
            for (double s : steps)
                if (s < cur - 1e-9)
                    next = s;
        }
        part->setMagnification(next);
        status = fmt::format("section magnification x{:g}", next);
    } else if (key == "s") {
        std::string name;
        do {
            name = fmt::format("swarf-view-{:03d}.png", ++snapshotCount);
        } while (std::filesystem::exists(name));
        try {
            detail::writeWindowPng(window, name);
            status = "saved " + std::filesystem::absolute(name).string();
        } catch (const Error& e) {
            status = e.what();
        }
    } else if (key == "h" || key == "question" || key == "F1")
        part->setHelpVisible(!part->helpVisible());
    else if (key == "q" || key == "Escape") {
        interactor->TerminateApp();
        return true;
    } else
        return false;
    if (layersChanged)
        part->setLayers(layers);
    part->setStatus(status);
    return true;
}

ViewerSession::ViewerSession(const Scene& scene, const CutResult& result,
                             const ViewerOptions& options)
    : ViewerSession(scene, std::make_shared<const CutResult>(result), options) {}

ViewerSession::ViewerSession(const Scene& scene, std::shared_ptr<const CutResult> result,
                             const ViewerOptions& options)
    : impl_(std::make_unique<Impl>()) {
    Impl& d = *impl_;
    d.part = std::make_unique<detail::PartScene>(scene, std::move(result), options.magnification);
    d.part->setTextScale(static_cast<int>(std::max(options.heightPx, 240) * (1 - kSplitY)));
    d.part->setNoTwinNote(options.noTwinNote);
    d.window = vtkSmartPointer<vtkRenderWindow>::New();
    d.window->SetDisplayId(detail::sharedDisplayConnection());
    d.window->SetSize(std::max(options.widthPx, 320), std::max(options.heightPx, 240));
    d.window->SetWindowName(
        ("swarf view: " + (scene.name.empty() ? scene.file : scene.name)).c_str());
    if (options.offScreen)
        d.window->SetOffScreenRendering(1);
    // No multisampling: with software OpenGL it triples the cost of every frame (measured in
    // swarf_bench); the snapshots, which are not interactive, keep it.
    d.window->SetMultiSamples(0);

    d.part->main()->SetViewport(0, kSplitY, 1, 1);
    d.part->section()->SetViewport(0, 0, 0.5, kSplitY);
    d.part->chart()->SetViewport(0.5, 0, 1, kSplitY);
    d.window->AddRenderer(d.part->main());
    d.window->AddRenderer(d.part->section());
    d.window->AddRenderer(d.part->chart());
    // The views fit their pictures to the viewports' shapes, known only now.
    d.part->view(detail::View::Iso);

    d.interactor = vtkSmartPointer<vtkRenderWindowInteractor>::New();
    d.interactor->SetRenderWindow(d.window);
    vtkNew<SwarfStyle> style;
    style->onKey = [&d](const std::string& key, bool shift) {
        d.onKey(key, shift);
        d.window->Render();
    };
    d.interactor->SetInteractorStyle(style);
    vtkNew<vtkCallbackCommand> onCamera;
    onCamera->SetClientData(&d);
    onCamera->SetCallback([](vtkObject*, unsigned long, void* client, void*) {
        auto* self = static_cast<Impl*>(client);
        self->afterCameraMove();
        self->window->Render();
    });
    style->AddObserver(vtkCommand::EndInteractionEvent, onCamera);

    // The pass slider along the bottom of the 3D view.
    d.sliderRep = vtkSmartPointer<vtkSliderRepresentation2D>::New();
    d.sliderRep->SetMinimumValue(0);
    d.sliderRep->SetMaximumValue(std::max(1, d.part->passCount()));
    d.sliderRep->SetValue(d.part->passCount());
    d.sliderRep->SetTitleText("plan: drag, or arrow keys (h: help)");
    d.sliderRep->SetTitleHeight(0.022);
    d.sliderRep->SetLabelHeight(0.022);
    d.sliderRep->SetLabelFormat("%.2f");
    // VTK 9.1 draws the slider's 2D parts offset by its renderer's viewport origin, so the ends
    // are given in normalized display units measured from that origin.
    const double sliderY = 0.09 * (1 - kSplitY);
    d.sliderRep->GetPoint1Coordinate()->SetCoordinateSystemToNormalizedDisplay();
    d.sliderRep->GetPoint1Coordinate()->SetValue(0.05, sliderY);
    d.sliderRep->GetPoint2Coordinate()->SetCoordinateSystemToNormalizedDisplay();
    d.sliderRep->GetPoint2Coordinate()->SetValue(0.82, sliderY);
    d.sliderRep->SetSliderLength(0.015);
    d.sliderRep->SetSliderWidth(0.025);
    d.sliderRep->SetTubeWidth(0.006);
    d.sliderRep->SetEndCapWidth(0.012);
    d.sliderRep->GetTubeProperty()->SetColor(0.35, 0.35, 0.4);
    d.sliderRep->GetSliderProperty()->SetColor(0.1, 0.45, 0.9);
    d.sliderRep->GetSelectedProperty()->SetColor(0.95, 0.5, 0.1);
    d.sliderRep->GetTitleProperty()->SetColor(0.1, 0.1, 0.1);
    d.sliderRep->GetTitleProperty()->ShadowOff();
    d.sliderRep->GetLabelProperty()->SetColor(0.1, 0.1, 0.1);
    d.sliderRep->GetLabelProperty()->ShadowOff();
    d.slider = vtkSmartPointer<vtkSliderWidget>::New();
    d.slider->SetInteractor(d.interactor);
    d.slider->SetRepresentation(d.sliderRep);
    d.slider->SetAnimationModeToOff();
    d.slider->SetCurrentRenderer(d.part->main());
    vtkNew<vtkCallbackCommand> onSlide;
    onSlide->SetClientData(&d);
    onSlide->SetCallback([](vtkObject* caller, unsigned long, void* client, void*) {
        auto* self = static_cast<Impl*>(client);
        auto* w = static_cast<vtkSliderWidget*>(caller);
        const double v = static_cast<vtkSliderRepresentation*>(w->GetRepresentation())->GetValue();
        self->part->setPosition(v);
    });
    d.slider->AddObserver(vtkCommand::InteractionEvent, onSlide);
    d.slider->EnabledOn();

    if (options.startPosition >= 0)
        d.go(options.startPosition);
    {
        const detail::FpTrapsOff mesa;
        d.window->Render();
        d.sliderRep->Modified();
        d.window->Render();
    }
    d.part->resetSection();
    for (const std::string& key : options.startKeys)
        d.onKey(key, false);
}

ViewerSession::~ViewerSession() {
    if (impl_ && impl_->slider)
        impl_->slider->EnabledOff();
}

void ViewerSession::setPosition(double position) {
    impl_->go(position);
}
const MomentView& ViewerSession::moment() const {
    return impl_->part->moment();
}
int ViewerSession::passCount() const {
    return impl_->part->passCount();
}
bool ViewerSession::pressKey(const std::string& key) {
    const bool shift = key.size() == 1 && std::isupper(static_cast<unsigned char>(key[0]));
    return impl_->onKey(key, shift);
}

void ViewerSession::setTwin(const TwinView& twin) {
    impl_->part->setTwin(twin.scene, twin.result, twin.name);
    if (twin.shownAtStart && !twinShown())
        pressKey("w");
}
bool ViewerSession::twinShown() const {
    return impl_->part->layers().twin;
}
bool ViewerSession::twinGhostDrawn() const {
    return impl_->part->twinDrawn();
}

void ViewerSession::render() {
    const detail::FpTrapsOff mesa;
    impl_->window->Render();
}

void ViewerSession::orbit(double degrees) {
    impl_->part->main()->GetActiveCamera()->Azimuth(degrees);
    impl_->part->main()->ResetCameraClippingRange();
}

void ViewerSession::saveSnapshot(const std::string& path) {
    detail::writeWindowPng(impl_->window, path);
}

std::vector<Eigen::Vector2d> ViewerSession::drawnSection() const {
    return impl_->part->drawnSection();
}
std::vector<Eigen::Vector3d> ViewerSession::drawnBore() const {
    return impl_->part->drawnBore();
}
std::vector<double> ViewerSession::barBounds() const {
    return impl_->part->barBounds();
}

std::string ViewerSession::panelText() const {
    return impl_->part->panelText();
}
std::string ViewerSession::closeUpText() const {
    return impl_->part->closeUpText();
}
const DeviationTrace& ViewerSession::sectionTrace() const {
    return impl_->part->sectionTrace();
}
std::size_t ViewerSession::partPolygons() const {
    return impl_->part->partPolygons();
}
bool ViewerSession::closeUpShown() const {
    return impl_->part->closeUpOn();
}

void ViewerSession::run() {
    impl_->window->Render();
    impl_->interactor->Initialize();
    impl_->interactor->Start();
}

void runViewer(const Scene& scene, std::shared_ptr<const CutResult> result,
               const ViewerOptions& options, const TwinView* twin) {
    ViewerSession session(scene, std::move(result), options);
    if (twin)
        session.setTwin(*twin);
    session.run();
}

} // namespace swarf::viewer
