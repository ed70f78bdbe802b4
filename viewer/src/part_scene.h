#pragma once
// Internal to the viewer (VTK types allowed): everything drawn for one scene and result, in
// three renderers (the 3D part, the magnified section, the deviation chart), updated to one
// moment of the plan. Used by the window, the snapshots and the benchmark.
#include "swarf/sim/cut.h"
#include "swarf/sim/moment.h"
#include "swarf/sim/scene.h"
#include "swarf/viewer/colour_map.h"
#include "swarf/viewer/trace.h"

#include <vtkSmartPointer.h>

#include <memory>
#include <string>

class vtkRenderer;
class vtkRenderWindow;

namespace swarf::viewer::detail {

/// Which layers of the 3D view are shown.
struct Layers {
    bool part = true, ghost = true, leftover = true, stock = true, insert = true, paths = true,
         scalarBar = true, cutaway = true, jaws = true;
    /// The twin's as-cut part as a ghost, its line in the section and chart, and the
    /// differences in the panel (key w); without a twin the panel says there is none.
    bool twin = false;
};

/// Standard camera views of the 3D renderer: the whole part from the operator's side (chuck on
/// the left), from above, from the tailstock, obliquely; the main cone filling the view; the
/// close-up of the feed marks at the gauge plane (see setCloseUp).
enum class View { Front, Top, End, Iso, Cone, CloseUp };

class PartScene {
  public:
    /// Builds every actor; the moment starts at the end of the plan. The result is shared, not
    /// copied (precondition: not null).
    PartScene(const Scene& scene, std::shared_ptr<const CutResult> result, double magnification);
    ~PartScene();
    PartScene(const PartScene&) = delete;
    PartScene& operator=(const PartScene&) = delete;

    /// Moves to slider position `position` (see MomentView) and updates every actor's data.
    void setPosition(double position);
    const MomentView& moment() const;
    int passCount() const;

    /// The close-up draws only a short stretch of the cone at the gauge plane (closeUp()), with
    /// the feed marks of the finished part raised to be seen, and the section and chart follow
    /// that stretch; otherwise the whole part is drawn from the exact profile, with only as many
    /// rows as keep its corners and colours true.
    void setCloseUp(bool on);
    bool closeUpOn() const;
    const CloseUp& closeUp() const;
    void setLayers(const Layers& layers);
    const Layers& layers() const;
    void setMagnification(double factor);
    double magnification() const;

    void view(View v);   ///< sets the 3D camera
    void resetSection(); ///< fits the section camera to what it shows

    vtkRenderer* main() const;
    vtkRenderer* section() const;
    vtkRenderer* chart() const;

    /// Gives the scene's twin (the same job done the other way, simulated with the same kernel)
    /// to show as a ghost when Layers::twin is on; `name` names it in the panel. The result is
    /// shared (precondition: not null). Does not switch the layer on.
    void setTwin(const Scene& twin, std::shared_ptr<const CutResult> twinResult,
                 const std::string& name);
    bool hasTwin() const;
    /// What the panel says when Layers::twin is on and there is no twin (how to give one).
    void setNoTwinNote(const std::string& note);
    /// Number of polygons of the twin's ghost as handed to VTK (0 without a twin), and whether
    /// it is drawn now (tests).
    std::size_t twinPolygons() const;
    bool twinDrawn() const;
    /// Sizes the text for a picture or window `heightPx` pixels high.
    void setTextScale(int heightPx);
    void setHelpVisible(bool on);
    bool helpVisible() const;
    /// Shows a one-line message in the 3D view (e.g. "saved ..."); empty hides it.
    void setStatus(const std::string& text);
    /// Text of the panel with the pass, the note, the dial readings and the figures, as drawn.
    std::string panelText() const;
    /// Text of the close-up's label (the feed marks' pitch, height and relief), as drawn.
    std::string closeUpText() const;
    const DeviationScale& scale() const;
    /// The part mesh as handed to VTK, read back along its first meridian: (z, radius) of every
    /// drawn row, mm. For tests: the rendered part's profile.
    std::vector<Eigen::Vector2d> drawnSection() const;
    /// A bored part's wall as handed to VTK: (z, radius, deviation in display units; NaN off
    /// the inside drawing) of every point; empty for outside work and in the close-up (where the
    /// part surface is the bore's stretch). For tests: the colours the bore is drawn in.
    std::vector<Eigen::Vector3d> drawnBore() const;
    /// World bounds (xmin, xmax, ymin, ymax, zmin, zmax; mm, X along the axis) of the boring
    /// bar's shank as drawn now, or empty when there is none (outside work). Tests.
    std::vector<double> barBounds() const;
    /// Number of polygons of the part surface as handed to VTK (benchmarks, tests).
    std::size_t partPolygons() const;
    /// The deviation line handed to the section now (tests).
    const DeviationTrace& sectionTrace() const;

  private:
    struct Impl;
    std::unique_ptr<Impl> impl_;
};

} // namespace swarf::viewer::detail
