#pragma once
// The interactive window: the as-cut part coloured by deviation, the pass slider with the dial
// readings, the magnified section and the deviation chart. Keys are listed in viewer/KEYS.md
// and by the help key in the window.
#include "swarf/sim/cut.h"
#include "swarf/sim/moment.h"
#include "swarf/sim/scene.h"
#include "swarf/viewer/trace.h"

#include <Eigen/Core>
#include <memory>
#include <string>
#include <vector>

namespace swarf::viewer {

/// Options of the window.
struct ViewerOptions {
    double magnification = 200; ///< deviation magnification of the section view (> 0)
    /// Window size, pixels. Software OpenGL draws every pixel on the CPU: at 1280×800 the demo
    /// turns at over 30 frames a second under Xvfb, at 1600×1000 at about 28 (swarf_bench).
    int widthPx = 1280;
    int heightPx = 800;
    double startPosition = -1; ///< slider position to open at; < 0: the finished part
    bool offScreen = false;    ///< render off screen (benchmarks, tests); still needs a display
    /// Keys pressed, in order, once the window is built (as pressKey takes them), e.g. "1" to
    /// open on the front view or "c" on the close-up; `swarf view --camera` fills it.
    std::vector<std::string> startKeys;
    /// What the panel says when key w is pressed and the scene has no twin: how to give one.
    std::string noTwinNote = "no twin was given for this scene";
};

/// A scene's twin (the same job done the other way: the mistake and its correction), simulated
/// with the same kernel, to show as a ghost with the differences (key w).
struct TwinView {
    Scene scene;
    std::shared_ptr<const CutResult> result; ///< not null
    std::string name;                        ///< how the panel names it (its file)
    bool shownAtStart = false;               ///< open with the ghost on (as if w were pressed)
};

/// One open viewer: the window, its renderers and the current moment. Not copyable. All calls
/// from the thread that made it. An X display must exist (DISPLAY set; the
/// executable starts one, see swarf/app/display.h).
class ViewerSession {
  public:
    /// Builds the window for a scene and its result (the result is copied).
    ViewerSession(const Scene& scene, const CutResult& result, const ViewerOptions& options = {});
    /// The same, sharing the result instead of copying it (it holds every profile of the
    /// plan). Precondition: result is not null.
    ViewerSession(const Scene& scene, std::shared_ptr<const CutResult> result,
                  const ViewerOptions& options = {});
    ~ViewerSession();
    ViewerSession(const ViewerSession&) = delete;
    ViewerSession& operator=(const ViewerSession&) = delete;

    /// Moves the slider to `position` (see MomentView) and updates the drawn data; does not
    /// render.
    void setPosition(double position);
    /// The moment shown now.
    const MomentView& moment() const;
    /// Number of passes (the slider's upper end).
    int passCount() const;
    /// Acts as if `key` had been pressed in the window (X key names: "Right", "Home", "h", "M",
    /// ...; see keys.h), without drawing. Returns false, doing nothing, for a key the window has
    /// no use for. For tests and demos.
    bool pressKey(const std::string& key);
    /// Gives the scene's twin (key w shows it); with twin.shownAtStart the ghost is on now.
    void setTwin(const TwinView& twin);
    /// True while the twin's layer is on (key w): the ghost and differences, or, without a
    /// twin, the panel's note that there is none.
    bool twinShown() const;
    /// True while the twin's ghost is drawn in the 3D view (tests).
    bool twinGhostDrawn() const;
    /// Draws one frame.
    void render();
    /// Turns the 3D camera about the vertical by `degrees` (benchmarks, demos).
    void orbit(double degrees);
    /// Writes the whole window as a PNG (atomically). Throws OutputError.
    void saveSnapshot(const std::string& path);
    /// The part mesh handed to VTK, read back along one meridian: (z, radius) per drawn row,
    /// mm. Lets tests check what is drawn without looking at pixels.
    std::vector<Eigen::Vector2d> drawnSection() const;
    /// A bored part's wall as drawn now: (z, radius, deviation in µm or thou, NaN off the inside
    /// drawing) of every point handed to VTK; empty for outside work and in the close-up. Lets
    /// tests check the bore's colours without pixels.
    std::vector<Eigen::Vector3d> drawnBore() const;
    /// The boring bar's shank as drawn now, world bounds (xmin, xmax, ymin, ymax, zmin, zmax; mm,
    /// x along the axis, y toward the operator, z up); empty for a turning tool.
    std::vector<double> barBounds() const;
    /// The panel's text now (top left of the 3D view): pass, readings and, at the finished part,
    /// the result's figures. For tests: the same text the pictures carry.
    std::string panelText() const;
    /// The close-up's label now (pitch and height of the feed marks, relief factor).
    std::string closeUpText() const;
    /// The deviation line handed to the section view now (its close-up stretch after key c).
    const DeviationTrace& sectionTrace() const;
    /// Number of polygons of the part surface handed to VTK now (what each frame must draw).
    std::size_t partPolygons() const;
    /// True while the close-up of the feed marks is shown (key c; 1–5 and r leave it).
    bool closeUpShown() const;
    /// Runs the interactive loop until the window is closed.
    void run();

  private:
    struct Impl;
    std::unique_ptr<Impl> impl_;
};

/// Opens the window for a scene and its result (and its twin, if not null) and returns when it is
/// closed. Precondition: an X display exists. Throws RenderError if it cannot be opened.
void runViewer(const Scene& scene, std::shared_ptr<const CutResult> result,
               const ViewerOptions& options = {}, const TwinView* twin = nullptr);

} // namespace swarf::viewer
