#pragma once
// Internal to the viewer (VTK types allowed): the two 2D views under the 3D part, each in its
// own renderer: the half section with the deviation magnified, and the chart of deviation
// along the cone. Both draw a DeviationTrace (see swarf/viewer/trace.h).
#include "swarf/viewer/colour_map.h"
#include "swarf/viewer/trace.h"

#include <vtkSmartPointer.h>

#include <string>

class vtkActor;
class vtkChartXY;
class vtkPlot;
class vtkColorTransferFunction;
class vtkPolyDataMapper;
class vtkRenderer;
class vtkTable;
class vtkTextActor;

namespace swarf::viewer::detail {

/// The half section: the drawing (green), its tolerance band (yellow) and the as-cut line
/// coloured by deviation, all with the deviation magnified, in the (z, radius) plane.
class SectionView {
  public:
    /// `lut` colours the as-cut line (display units, as `scale`).
    SectionView(vtkColorTransferFunction* lut, const DeviationScale& scale);
    ~SectionView();
    SectionView(const SectionView&) = delete;
    SectionView& operator=(const SectionView&) = delete;

    /// Draws `trace` with deviations magnified `magnification` times (> 0). `where` names the
    /// stretch in the title ("" for the whole cone). With `unrolled` the drawing is laid flat
    /// along z (a short stretch of a steep cone would otherwise be mostly its slope).
    /// `twin`, if not null, is the scene's twin's line (key w), drawn plain violet-grey the same
    /// way against its own drawing.
    void show(const DeviationTrace& trace, double magnification, const std::string& where,
              bool unrolled = false, const DeviationTrace* twin = nullptr);
    /// Fits the camera to what is drawn, with a margin: to the drawing and its band, or with
    /// `toLine` to the as-cut line alone (a close-up of its feed marks).
    void fit(bool toLine = false);
    void setFontSize(int px);
    vtkRenderer* renderer() const { return renderer_; }

  private:
    DeviationScale scale_;
    vtkSmartPointer<vtkRenderer> renderer_;
    vtkSmartPointer<vtkPolyDataMapper> refMapper_, cutMapper_, twinMapper_;
    vtkSmartPointer<vtkActor> refActor_, cutActor_, twinActor_;
    vtkSmartPointer<vtkTextActor> title_;
    /// "datum face" at the bottom left, "chuck" at the bottom right: z grows to the right here,
    /// the other way from the 3D front view, so both ends are named.
    vtkSmartPointer<vtkTextActor> leftEnd_, rightEnd_;
};

/// The chart of deviation along the cone, µm (thou): the as-cut line and the tolerance lines.
class DeviationChart {
  public:
    DeviationChart(const DeviationScale& scale, Units units);
    ~DeviationChart();
    DeviationChart(const DeviationChart&) = delete;
    DeviationChart& operator=(const DeviationChart&) = delete;

    /// Draws `trace` (NaN points left out). The vertical scale is the result's unless the
    /// trace goes beyond it (early passes): then it widens to show everything; with
    /// `fitToTrace` it spans just the trace (the feed marks of a close-up). `where` names the
    /// stretch in the title ("" for the whole cone).
    /// `twin`, if not null, is the scene's twin's line (key w), drawn beside it.
    void show(const DeviationTrace& trace, const std::string& where, bool fitToTrace = false,
              const DeviationTrace* twin = nullptr);
    void setFontSize(int px);
    vtkRenderer* renderer() const { return renderer_; }
    /// Number of points the chart's line was given (tests).
    std::size_t pointCount() const;

  private:
    DeviationScale scale_;
    Units units_;
    vtkSmartPointer<vtkRenderer> renderer_;
    vtkSmartPointer<vtkChartXY> chart_;
    vtkSmartPointer<vtkTable> table_, twinTable_;
    vtkPlot* twinPlot_ = nullptr;
};

} // namespace swarf::viewer::detail
