// The twin of a PartScene (key w): the as-cut part of the same job done the other way, drawn as
// a plain translucent ghost over this one, its deviation line in the section and the chart, and
// the differences in the panel (see part_scene.h; the figures come from sim/twin_difference.h).
#include "meshes.h"
#include "panel_text.h"
#include "part_scene_impl.h"
#include "swarf/sim/caution.h"

#include <vtkActor.h>
#include <vtkPolyData.h>
#include <vtkPolyDataMapper.h>
#include <vtkProperty.h>
#include <vtkTextActor.h>

#include <algorithm>
#include <cmath>
#include <string_view>
#include <utility>

namespace swarf::viewer::detail {

// The ghost's colour: a plain warm violet-grey, no deviation colours (those are this part's),
// unlike the drawing's pale ghost and the tool paths' greys and blues.
inline constexpr double kTwinRgb[3] = {0.56, 0.46, 0.66};
inline constexpr double kTwinOpacity = 0.35;

void PartScene::Impl::buildTwinActor() {
    twinActor = makeActor(twinMapper);
    twinActor->GetProperty()->SetColor(kTwinRgb[0], kTwinRgb[1], kTwinRgb[2]);
    twinActor->GetProperty()->SetOpacity(kTwinOpacity);
    twinActor->GetProperty()->BackfaceCullingOn();
    // As the drawing's ghost: one layer of front faces, blended in the opaque pass (no depth
    // sorting, no order-independent translucency pass for software OpenGL to pay for).
    twinActor->ForceOpaqueOn();
    twinMapper->ScalarVisibilityOff();
    // The twin lies within microns of this part: pulled toward the eye in the depth test so it
    // tints the part evenly instead of fighting it pixel by pixel.
    twinMapper->SetResolveCoincidentTopologyToPolygonOffset();
    twinMapper->SetRelativeCoincidentTopologyPolygonOffsetParameters(-2, -40);
    twinMapper->SetInputData(vtkSmartPointer<vtkPolyData>::New());
    twinActor->VisibilityOff();
}

std::string PartScene::Impl::panelWithTwin() const {
    std::string text = momentPanelText(scene, result, moment, scale);
    if (!layers.twin)
        return text;
    if (!twin) {
        for (const std::string& line : wrapWords("Twin: none. " + noTwinNote, 90))
            text += "\n" + line;
        return text;
    }
    std::string diff =
        twinDifferenceText(scene, twin->difference, "Twin (violet ghost): " + twin->name);
    // The window's font has no prime marks: minutes and seconds as ' and ".
    for (const auto& [from, to] : {std::pair{"′", "'"}, std::pair{"″", "\""}})
        for (auto at = diff.find(from); at != std::string::npos; at = diff.find(from, at))
            diff.replace(at, std::string_view(from).size(), to);
    return text + "\n" + diff;
}

const DeviationTrace* PartScene::Impl::twinLine() const {
    if (!twin || !layers.twin || closeUp || twin->line.zMm.empty())
        return nullptr;
    return &twin->line;
}

void PartScene::setTwin(const Scene& twinScene, std::shared_ptr<const CutResult> twinResult,
                        const std::string& name) {
    Impl& d = *impl_;
    auto t = std::make_unique<Impl::Twin>();
    t->scene = twinScene;
    t->result = std::move(twinResult);
    t->name = name;
    const CutResult& tr = *t->result;
    t->difference = twinDifference(d.scene, d.result, t->scene, tr);
    // The twin's finished part along this scene's main cone, at the section's resolution.
    const MomentView finished =
        describeMoment(t->scene, tr, static_cast<double>(t->scene.plan.passes.size()));
    t->line = decimateTrace(deviationTrace(t->scene, tr, finished, d.coneZ0, d.coneZ1, 0),
                            kSectionPoints);
    // The ghost: the twin's exact as-cut profile, revolved from the rows its corners need.
    const Profile& p = tr.asCut;
    vtkSmartPointer<vtkPolyData> ghost = vtkSmartPointer<vtkPolyData>::New();
    if (p.radiusMm.size() >= 2) {
        const double tol = 2e-4 * std::max(t->scene.stock.diameterMm, 1.0);
        ghost = revolve(
            p, profileRows(p, nullptr, 0, p.radiusMm.size() - 1, kBaseRows, tol, 1, kMaxRows),
            nullptr, kColumns, 0, 2 * kPi);
    }
    d.twinMapper->SetInputData(ghost);
    d.twin = std::move(t);
    d.update();
}

bool PartScene::hasTwin() const {
    return impl_->twin != nullptr;
}

void PartScene::setNoTwinNote(const std::string& note) {
    impl_->noTwinNote = note;
    impl_->panel->SetInput(impl_->panelWithTwin().c_str());
}

std::size_t PartScene::twinPolygons() const {
    vtkPolyData* pd = impl_->twinMapper->GetInput();
    return pd ? static_cast<std::size_t>(pd->GetNumberOfPolys()) : 0;
}

bool PartScene::twinDrawn() const {
    return impl_->twinActor->GetVisibility() != 0 && twinPolygons() > 0;
}

} // namespace swarf::viewer::detail
