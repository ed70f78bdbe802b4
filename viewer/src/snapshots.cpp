// Headless PNG pictures of a result (see snapshots.h).
#include "swarf/viewer/snapshots.h"

#include "part_scene.h"
#include "png_file.h"
#include "swarf/io/output_file.h"
#include "swarf/sim/error.h"
#include "x_connection.h"

#include <vtkNew.h>
#include <vtkRenderWindow.h>
#include <vtkRenderer.h>

#include <algorithm>
#include <filesystem>
#include <functional>

namespace swarf::viewer {

namespace {

// Renders one renderer alone into an off-screen window of the given size and writes it.
void shoot(vtkRenderer* renderer, int w, int h, const std::string& path,
           const std::function<void()>& beforeRender = {}) {
    vtkNew<vtkRenderWindow> window;
    window->SetDisplayId(detail::sharedDisplayConnection());
    window->SetOffScreenRendering(1);
    window->SetSize(w, h);
    window->SetMultiSamples(4);
    const double* vp = renderer->GetViewport();
    const double saved[4] = {vp[0], vp[1], vp[2], vp[3]};
    renderer->SetViewport(0, 0, 1, 1);
    window->AddRenderer(renderer);
    if (beforeRender)
        beforeRender();
    detail::writeWindowPng(window, path);
    window->RemoveRenderer(renderer);
    renderer->SetViewport(saved[0], saved[1], saved[2], saved[3]);
    window->Finalize();
}

} // namespace

SnapshotReport renderSnapshots(const Scene& scene, const CutResult& result,
                               const std::string& outDir, const SnapshotOptions& options) {
    io::makeOutputFolder(outDir);
    namespace fs = std::filesystem;
    const int w = std::max(64, options.widthPx), h = std::max(64, options.heightPx);
    SnapshotReport rep;
    rep.widthPx = w;
    rep.heightPx = h;
    rep.part = (fs::path(outDir) / "part.png").string();
    rep.cone = (fs::path(outDir) / "cone.png").string();
    rep.section = (fs::path(outDir) / "section.png").string();
    rep.chart = (fs::path(outDir) / "chart.png").string();
    rep.marks = (fs::path(outDir) / "marks.png").string();
    rep.marksSection = (fs::path(outDir) / "marks-section.png").string();

    // The result outlives this call: share it without a copy or an owner.
    detail::PartScene part(scene,
                           std::shared_ptr<const CutResult>(&result, [](const CutResult*) {}),
                           options.magnification);
    part.setTextScale(h);
    // The whole part, oblique, with the cut-away, stock outline, insert and paths.
    shoot(part.main(), w, h, rep.part, [&] { part.view(detail::View::Iso); });
    rep.partLabel = part.panelText();

    // The cone filling the picture: the deviation colours, nothing in front of them (a bored
    // part keeps its cut-away: the bore's colours show through it).
    detail::Layers close = part.layers();
    close.cutaway = result.bored;
    close.ghost = false;
    close.paths = false;
    close.stock = false;
    close.insert = false;
    close.jaws = false;
    part.setLayers(close);
    shoot(part.main(), w, h, rep.cone, [&] { part.view(detail::View::Cone); });

    // The feed marks at the gauge plane, raised to be seen; the section and chart of the same
    // stretch.
    part.setCloseUp(true);
    shoot(part.main(), w, h, rep.marks, [&] { part.view(detail::View::CloseUp); });
    rep.marksLabel = part.closeUpText();
    shoot(part.section(), w, std::max(64, h / 2), rep.marksSection, [&] { part.resetSection(); });
    part.setCloseUp(false);

    shoot(part.section(), w, std::max(64, h / 2), rep.section, [&] { part.resetSection(); });
    shoot(part.chart(), w, std::max(64, h / 2), rep.chart);
    rep.heightPx = h;
    return rep;
}

} // namespace swarf::viewer
