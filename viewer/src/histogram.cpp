// The histogram picture of an error budget (see histogram.h).
#include "swarf/viewer/histogram.h"

#include "png_file.h"
#include "x_connection.h"

#include <vtkAxis.h>
#include <vtkChartXY.h>
#include <vtkContextActor.h>
#include <vtkContextScene.h>
#include <vtkFloatArray.h>
#include <vtkNew.h>
#include <vtkPen.h>
#include <vtkPlot.h>
#include <vtkPlotBar.h>
#include <vtkRenderWindow.h>
#include <vtkRenderer.h>
#include <vtkTable.h>
#include <vtkTextProperty.h>

#include <fmt/format.h>

#include <algorithm>
#include <cmath>

namespace swarf::viewer {

namespace {

// A two-column table (x, y) of the given points.
vtkSmartPointer<vtkTable> pointsTable(const char* name, const std::vector<double>& x,
                                      const std::vector<double>& y) {
    auto t = vtkSmartPointer<vtkTable>::New();
    vtkNew<vtkFloatArray> cx, cy;
    cx->SetName((std::string(name) + " x").c_str());
    cy->SetName(name);
    t->AddColumn(cx);
    t->AddColumn(cy);
    t->SetNumberOfRows(static_cast<vtkIdType>(x.size()));
    for (std::size_t i = 0; i < x.size(); ++i) {
        t->SetValue(static_cast<vtkIdType>(i), 0, static_cast<float>(x[i]));
        t->SetValue(static_cast<vtkIdType>(i), 1, static_cast<float>(y[i]));
    }
    return t;
}

} // namespace

HistogramBins binGaugeDiameters(const Budget& b, int bins) {
    HistogramBins h;
    const double t = std::max(b.toleranceMm, 1e-6);
    double lo = -1.3 * t, hi = 1.3 * t;
    for (double d : b.gaugeDiametersMm) {
        lo = std::min(lo, d - b.nominalDiameterMm);
        hi = std::max(hi, d - b.nominalDiameterMm);
    }
    const double margin = 0.03 * (hi - lo);
    lo -= margin;
    hi += margin;
    bins = std::max(1, bins);
    h.loMm = lo;
    h.widthMm = (hi - lo) / bins;
    h.counts.assign(static_cast<std::size_t>(bins), 0);
    for (double d : b.gaugeDiametersMm) {
        const auto k = static_cast<long>(std::floor((d - b.nominalDiameterMm - lo) / h.widthMm));
        ++h.counts[static_cast<std::size_t>(std::clamp(k, 0L, static_cast<long>(bins) - 1))];
    }
    return h;
}

void renderBudgetHistogram(const Scene& scene, const Budget& b, const std::string& path,
                           int widthPx, int heightPx) {
    const Units u = scene.units;
    const double toShow = toSmallUnits(1.0, u); // mm → µm or thou
    const HistogramBins h = binGaugeDiameters(b);
    int top = 1;
    std::vector<double> x, y;
    for (std::size_t k = 0; k < h.counts.size(); ++k) {
        x.push_back((h.loMm + (static_cast<double>(k) + 0.5) * h.widthMm) * toShow);
        y.push_back(h.counts[k]);
        top = std::max(top, h.counts[k]);
    }
    vtkNew<vtkChartXY> chart;
    chart->SetTitle(fmt::format(
        "Gauge diameter of {} parts drawn (drawing {}): {:.1f} % within -/+ {}; the whole cone "
        "within tolerance: {:.1f} %",
        b.samples, formatLength(b.nominalDiameterMm, u, Precision::Fine),
        100.0 * b.pGaugeInTolerance, formatSmallLength(b.toleranceMm, u), 100.0 * b.pInTolerance));
    chart->GetTitleProperties()->SetFontSize(18);
    chart->SetShowLegend(true);
    chart->SetBarWidthFraction(0.95f);
    chart->GetAxis(vtkAxis::BOTTOM)
        ->SetTitle(fmt::format("gauge diameter minus the drawing ({})", smallUnitName(u)));
    chart->GetAxis(vtkAxis::LEFT)->SetTitle("parts");
    chart->GetAxis(vtkAxis::BOTTOM)->GetTitleProperties()->SetFontSize(15);
    chart->GetAxis(vtkAxis::LEFT)->GetTitleProperties()->SetFontSize(15);
    chart->GetAxis(vtkAxis::BOTTOM)->GetLabelProperties()->SetFontSize(13);
    chart->GetAxis(vtkAxis::LEFT)->GetLabelProperties()->SetFontSize(13);

    auto bars = pointsTable("parts", x, y);
    vtkPlot* bar = chart->AddPlot(vtkChart::BAR);
    bar->SetInputData(bars, 0, 1);
    bar->SetColor(90, 120, 170, 255);

    // Vertical marks: the band's edges, the drawing and the mean.
    const double yTop = 1.08 * top;
    std::vector<vtkSmartPointer<vtkTable>> keep;
    auto mark = [&](const char* name, double atMm, unsigned char r, unsigned char g,
                    unsigned char bl, bool dashed) {
        keep.push_back(pointsTable(name, {atMm * toShow, atMm * toShow}, {0.0, yTop}));
        vtkPlot* p = chart->AddPlot(vtkChart::LINE);
        p->SetInputData(keep.back(), 0, 1);
        p->SetColor(r, g, bl, 255);
        p->SetWidth(2.5);
        if (dashed)
            p->GetPen()->SetLineType(vtkPen::DASH_LINE);
    };
    const std::string band = "tolerance -/+ " + formatSmallLength(b.toleranceMm, u);
    mark(band.c_str(), -b.toleranceMm, 200, 40, 40, true);
    mark((band + " ").c_str(), b.toleranceMm, 200, 40, 40, true);
    mark("drawing", 0.0, 40, 150, 70, false);
    mark("mean", b.gaugeDiameterMm.mean - b.nominalDiameterMm, 20, 20, 20, true);
    // One legend entry for the band's two edges.
    chart->GetPlot(2)->SetLabel("");
    chart->GetPlot(2)->SetLegendVisibility(false);

    chart->GetAxis(vtkAxis::LEFT)->SetBehavior(vtkAxis::FIXED);
    chart->GetAxis(vtkAxis::LEFT)->SetRange(0, 1.15 * top);
    chart->GetAxis(vtkAxis::BOTTOM)->SetBehavior(vtkAxis::FIXED);
    chart->GetAxis(vtkAxis::BOTTOM)
        ->SetRange(h.loMm * toShow,
                   (h.loMm + h.widthMm * static_cast<double>(h.counts.size())) * toShow);

    vtkNew<vtkRenderer> renderer;
    renderer->SetBackground(1, 1, 1);
    vtkNew<vtkContextActor> actor;
    actor->GetScene()->AddItem(chart);
    renderer->AddActor(actor);
    actor->GetScene()->SetRenderer(renderer);
    vtkNew<vtkRenderWindow> window;
    window->SetDisplayId(detail::sharedDisplayConnection());
    window->SetOffScreenRendering(1);
    window->SetSize(std::max(64, widthPx), std::max(64, heightPx));
    window->SetMultiSamples(4);
    window->AddRenderer(renderer);
    detail::writeWindowPng(window, path);
    window->RemoveRenderer(renderer);
    window->Finalize();
}

} // namespace swarf::viewer
