#pragma once
// Internal to the part_scene*.cpp files: the state of a PartScene, shared by the file that builds
// its scene graph (part_scene_build.cpp), the one that fits its camera (part_scene_camera.cpp)
// and the one that updates it to a moment (part_scene.cpp).
//
// Speed: llvmpipe (software OpenGL) shades every pixel on the CPU, so what is drawn is kept to
// what the screen can show: the part from the rows that keep its corners and colours (a few
// hundred, not the profile's tens of thousands), 72 columns round; what does not change with
// the moment (the drawing's ghost, the stock outline, the jaws, the insert's shape) is built
// once; the section and chart get min/max-decimated lines.
#include "part_scene.h"
#include "plots.h"
#include "swarf/sim/inside_kernel.h"
#include "swarf/sim/twin_difference.h"

#include <vtkActor.h>
#include <vtkColorTransferFunction.h>
#include <vtkLight.h>
#include <vtkPolyData.h>
#include <vtkPolyDataMapper.h>
#include <vtkRenderer.h>
#include <vtkScalarBarActor.h>
#include <vtkSmartPointer.h>
#include <vtkTextActor.h>

#include <Eigen/Core>
#include <cmath>
#include <memory>

namespace swarf::viewer::detail {

inline constexpr double kDeg = kPi / 180.0;
// The cut-away: the quarter of the part facing up (φ from 45° to 135°, φ measured from the
// operator's side toward the top) is left out so the section shows.
inline constexpr double kCutFrom = 45 * kDeg, kCutTo = 135 * kDeg;
// The whole part: at least this many rows evenly, more where corners or colours need them.
inline constexpr std::size_t kBaseRows = 240, kMaxRows = 1500;
inline constexpr int kColumns = 72; // round the part (5°): the silhouette is within 0.1 px of round
// The close-up: rows across the stretch (ten per feed mark: fewer show as facets, more cost
// frames in software OpenGL, measured in swarf_bench); a column every 2° within 20° of where it
// looks (the picture shows about 15°), every 8° elsewhere. The kernel's surface is sampled at
// exactly these points, whatever the scene's angle_samples.
inline constexpr std::size_t kCloseRows = 400;
inline constexpr int kCloseColumns = 120, kCloseCoarseStride = 4;
inline constexpr double kCloseFineHalfWidth = 20 * kDeg, kCloseFineStep = 2 * kDeg;
// Where the close-up looks along the surface: from the operator's side, a little above, square
// to the axis, so that the marks stand as teeth along the top edge.
inline const Eigen::Vector3d kCloseDir = Eigen::Vector3d(0, 1.0, 0.35).normalized();
inline const double kCloseLimb = kPi - std::atan2(1.0, 0.35);
// Points of the section's and chart's lines (min/max pairs): about two per pixel column.
inline constexpr std::size_t kSectionPoints = 2400, kChartPoints = 1200;

/// The middle of the bore's far wall the close-up looks at (φ, rad): square to kCloseDir.
double closeBoreCentreRad();

/// A new actor drawing through a new mapper (returned in `mapper`).
vtkSmartPointer<vtkActor> makeActor(vtkSmartPointer<vtkPolyDataMapper>& mapper);

struct PartScene::Impl {
    explicit Impl(std::shared_ptr<const CutResult> r) : held(std::move(r)), result(*held) {}
    Scene scene;
    // Shared, not copied: the result holds every profile of the plan.
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
    // Inside work: the bore's wall (coloured as the part) and the boring bar's shank.
    vtkSmartPointer<vtkPolyDataMapper> boreMapper, barMapper;
    vtkSmartPointer<vtkActor> boreActor, barActor;
    // The bore's feed marks for the close-up: swept again the first time it shows them.
    std::unique_ptr<BoreMarks> boreMarks;
    // The twin (key w): its scene and result, the difference, its finished deviation line along
    // the main cone (worked out once), and its ghost.
    struct Twin {
        Scene scene;
        std::shared_ptr<const CutResult> result;
        std::string name;
        TwinDifference difference;
        DeviationTrace line;
    };
    std::unique_ptr<Twin> twin;
    std::string noTwinNote = "no twin was given for this scene";
    vtkSmartPointer<vtkPolyDataMapper> twinMapper;
    vtkSmartPointer<vtkActor> twinActor;

    vtkSmartPointer<vtkScalarBarActor> scalarBar;
    vtkSmartPointer<vtkTextActor> panel, help, status, closeLabel;
    vtkSmartPointer<vtkLight> light;

    void buildLut();
    void buildMain();
    void buildGhost();
    void buildTwinActor();
    /// The panel: the moment's text, and with Layers::twin the twin's differences (or that
    /// there is none).
    std::string panelWithTwin() const;
    /// The twin's line for the section and chart now: null unless shown (whole cone only).
    const DeviationTrace* twinLine() const;
    void update();
    void updatePart();
    /// A bored part at the moment (part_scene_bore.cpp): returns the outside's surface
    /// (`outerDev`: its deviation per profile sample, display units) and sets the bore's wall,
    /// the end rings and the cut-away faces; in the close-up, returns the bore's stretch.
    vtkSmartPointer<vtkPolyData> boredSurface(const std::vector<double>& outerDev);
    void updatePlots();
    void applyLayers();
};

} // namespace swarf::viewer::detail
