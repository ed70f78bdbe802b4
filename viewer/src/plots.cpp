// The section and the deviation chart (see plots.h).
#include "plots.h"

#include <vtkActor.h>
#include <vtkAxis.h>
#include <vtkCamera.h>
#include <vtkCellArray.h>
#include <vtkCellData.h>
#include <vtkChartXY.h>
#include <vtkColorTransferFunction.h>
#include <vtkContextActor.h>
#include <vtkContextScene.h>
#include <vtkFloatArray.h>
#include <vtkNew.h>
#include <vtkPen.h>
#include <vtkPlot.h>
#include <vtkPointData.h>
#include <vtkPoints.h>
#include <vtkPolyData.h>
#include <vtkPolyDataMapper.h>
#include <vtkProperty.h>
#include <vtkRenderer.h>
#include <vtkTable.h>
#include <vtkTextActor.h>
#include <vtkTextProperty.h>
#include <vtkUnsignedCharArray.h>

#include <fmt/format.h>

#include <algorithm>
#include <cmath>
#include <tuple>

namespace swarf::viewer::detail {

SectionView::SectionView(vtkColorTransferFunction* lut, const DeviationScale& scale)
    : scale_(scale) {
    renderer_ = vtkSmartPointer<vtkRenderer>::New();
    // Dark, so that the near-zero (light grey) colour of the as-cut line shows.
    renderer_->SetBackground(0.16, 0.18, 0.22);
    refMapper_ = vtkSmartPointer<vtkPolyDataMapper>::New();
    refMapper_->SetScalarModeToUseCellData();
    refMapper_->SetColorModeToDirectScalars();
    refActor_ = vtkSmartPointer<vtkActor>::New();
    refActor_->SetMapper(refMapper_);
    refActor_->GetProperty()->SetLineWidth(2);
    refActor_->GetProperty()->LightingOff();
    cutMapper_ = vtkSmartPointer<vtkPolyDataMapper>::New();
    cutMapper_->SetLookupTable(lut);
    cutMapper_->UseLookupTableScalarRangeOn();
    cutMapper_->SetScalarModeToUsePointData();
    cutActor_ = vtkSmartPointer<vtkActor>::New();
    cutActor_->SetMapper(cutMapper_);
    cutActor_->GetProperty()->SetLineWidth(3);
    cutActor_->GetProperty()->LightingOff();
    twinMapper_ = vtkSmartPointer<vtkPolyDataMapper>::New();
    twinMapper_->ScalarVisibilityOff();
    twinActor_ = vtkSmartPointer<vtkActor>::New();
    twinActor_->SetMapper(twinMapper_);
    twinActor_->GetProperty()->SetColor(0.78, 0.68, 0.92); // the twin: plain violet-grey
    twinActor_->GetProperty()->SetLineWidth(2);
    twinActor_->GetProperty()->LightingOff();
    renderer_->AddActor(refActor_);
    renderer_->AddActor(twinActor_);
    renderer_->AddActor(cutActor_);
    renderer_->GetActiveCamera()->ParallelProjectionOn();
    title_ = vtkSmartPointer<vtkTextActor>::New();
    title_->GetTextProperty()->SetFontSize(15);
    title_->GetTextProperty()->SetColor(1, 1, 1);
    title_->GetPositionCoordinate()->SetCoordinateSystemToNormalizedViewport();
    title_->GetTextProperty()->SetVerticalJustificationToTop();
    title_->GetPositionCoordinate()->SetValue(0.01, 0.97);
    renderer_->AddViewProp(title_);
    for (auto [actor, text, x, right] : {std::tuple{&leftEnd_, "<- datum face", 0.01, false},
                                         std::tuple{&rightEnd_, "chuck ->", 0.99, true}}) {
        *actor = vtkSmartPointer<vtkTextActor>::New();
        (*actor)->SetInput(text);
        (*actor)->GetTextProperty()->SetColor(0.85, 0.85, 0.85);
        (*actor)->GetTextProperty()->SetFontSize(13);
        (*actor)->GetTextProperty()->SetVerticalJustificationToBottom();
        if (right)
            (*actor)->GetTextProperty()->SetJustificationToRight();
        (*actor)->GetPositionCoordinate()->SetCoordinateSystemToNormalizedViewport();
        (*actor)->GetPositionCoordinate()->SetValue(x, 0.02);
        renderer_->AddViewProp(*actor);
    }
}

SectionView::~SectionView() = default;

void SectionView::show(const DeviationTrace& t, double magnification, const std::string& where,
                       bool unrolled, const DeviationTrace* twin) {
    auto base = [&](std::size_t i) { return unrolled ? 0.0 : t.nominalMm[i]; };
    auto refPoints = vtkSmartPointer<vtkPoints>::New();
    auto refLines = vtkSmartPointer<vtkCellArray>::New();
    auto refColours = vtkSmartPointer<vtkUnsignedCharArray>::New();
    refColours->SetNumberOfComponents(3);
    const std::size_t n = t.zMm.size();
    // The drawing and its band: straight wherever the drawing is, so only the ends of each run
    // and its corners are needed; every trace point is cheap enough.
    for (double offset : {0.0, scale_.bandMm, -scale_.bandMm}) {
        std::vector<vtkIdType> ids;
        auto flush = [&] {
            if (ids.size() > 1) {
                refLines->InsertNextCell(static_cast<vtkIdType>(ids.size()), ids.data());
                if (offset == 0)
                    refColours->InsertNextTuple3(90, 220, 120); // the drawing
                else
                    refColours->InsertNextTuple3(235, 200, 60); // the band
            }
            ids.clear();
        };
        for (std::size_t i = 0; i < n; ++i) {
            if (std::isnan(t.nominalMm[i])) {
                flush();
                continue;
            }
            ids.push_back(
                refPoints->InsertNextPoint(t.zMm[i], base(i) + magnification * offset, 0));
        }
        flush();
    }
    auto cutPoints = vtkSmartPointer<vtkPoints>::New();
    auto cutLines = vtkSmartPointer<vtkCellArray>::New();
    auto cutDev = vtkSmartPointer<vtkFloatArray>::New();
    cutDev->SetName("deviation");
    const double clampMm = 1.5 * scale_.limitMm;
    const double inward = t.inside ? -1.0 : 1.0;
    bool offScale = false;
    std::vector<vtkIdType> ids;
    auto flush = [&] {
        if (ids.size() > 1)
            cutLines->InsertNextCell(static_cast<vtkIdType>(ids.size()), ids.data());
        ids.clear();
    };
    // The twin's line, the same way against its own drawing (laid flat too when unrolled).
    auto twinPoints = vtkSmartPointer<vtkPoints>::New();
    auto twinLines = vtkSmartPointer<vtkCellArray>::New();
    if (twin) {
        std::vector<vtkIdType> tids;
        for (std::size_t i = 0; i <= twin->zMm.size(); ++i) {
            const bool end = i == twin->zMm.size();
            if (end || std::isnan(twin->deviationMm[i]) || std::isnan(twin->nominalMm[i])) {
                if (tids.size() > 1)
                    twinLines->InsertNextCell(static_cast<vtkIdType>(tids.size()), tids.data());
                tids.clear();
                continue;
            }
            const double shown = std::clamp(twin->deviationMm[i], -clampMm, clampMm);
            offScale = offScale || shown != twin->deviationMm[i];
            tids.push_back(
                twinPoints->InsertNextPoint(twin->zMm[i],
                                            (unrolled ? 0.0 : twin->nominalMm[i]) +
                                                (twin->inside ? -1 : 1) * magnification * shown,
                                            0.005));
        }
    }
    auto twinPoly = vtkSmartPointer<vtkPolyData>::New();
    twinPoly->SetPoints(twinPoints);
    twinPoly->SetLines(twinLines);
    twinMapper_->SetInputData(twinPoly);
    twinActor_->SetVisibility(twin != nullptr);
    for (std::size_t i = 0; i < n; ++i) {
        const double d = t.deviationMm[i];
        if (std::isnan(d) || std::isnan(t.nominalMm[i])) {
            flush();
            continue;
        }
        const double shown = std::clamp(d, -clampMm, clampMm);
        offScale = offScale || shown != d;
        // Inside, metal left on stands within the drawn bore: toward the axis.
        ids.push_back(
            cutPoints->InsertNextPoint(t.zMm[i], base(i) + inward * magnification * shown, 0.01));
        cutDev->InsertNextValue(static_cast<float>(scale_.toDisplay(d)));
    }
    flush();
    auto ref = vtkSmartPointer<vtkPolyData>::New();
    ref->SetPoints(refPoints);
    ref->SetLines(refLines);
    ref->GetCellData()->SetScalars(refColours);
    refMapper_->SetInputData(ref);
    auto cut = vtkSmartPointer<vtkPolyData>::New();
    cut->SetPoints(cutPoints);
    cut->SetLines(cutLines);
    cut->GetPointData()->SetScalars(cutDev);
    cutMapper_->SetInputData(cut);
    // Two short lines: the picture is half a window wide.
    title_->SetInput(
        fmt::format("{}{}{}, deviation x{:g}{}\ngreen: drawing   yellow: tolerance +/-{}   "
                    "coloured: as cut{}{}",
                    t.inside ? "Section of the bore (axis below)" : "Section",
                    where.empty() ? "" : " " + where, unrolled ? " laid flat" : "", magnification,
                    t.feedMarks ? ", feed marks on the operator's side" : "",
                    formatSmallLength(scale_.bandMm, scale_.units), twin ? "   violet: twin" : "",
                    offScale ? " (flat at the edge: off the scale)" : "")
            .c_str());
}

void SectionView::fit(bool toLine) {
    double bounds[6];
    vtkPolyDataMapper* m = toLine ? cutMapper_.Get() : refMapper_.Get();
    m->Update();
    m->GetInput()->GetBounds(bounds);
    if (!(bounds[1] > bounds[0]))
        return;
    const double pad = (toLine ? 0.6 : 0.25) * std::max(bounds[3] - bounds[2], 1e-3);
    bounds[2] -= pad;
    bounds[3] += pad;
    vtkCamera* cam = renderer_->GetActiveCamera();
    const double cx = 0.5 * (bounds[0] + bounds[1]), cy = 0.5 * (bounds[2] + bounds[3]);
    cam->SetFocalPoint(cx, cy, 0);
    cam->SetPosition(cx, cy, 100);
    cam->SetViewUp(0, 1, 0);
    renderer_->ResetCamera(bounds);
    cam->ParallelProjectionOn();
    // Fit the section's extent into the viewport in both directions.
    double aspect[2] = {1, 1};
    renderer_->ComputeAspect(); // the viewport's shape now, not at the last frame
    renderer_->GetAspect(aspect);
    const double w = bounds[1] - bounds[0], h = bounds[3] - bounds[2];
    cam->SetParallelScale(0.55 * std::max(h, w / std::max(aspect[0], 1e-3)));
}

void SectionView::setFontSize(int px) {
    title_->GetTextProperty()->SetFontSize(px);
    leftEnd_->GetTextProperty()->SetFontSize(px);
    rightEnd_->GetTextProperty()->SetFontSize(px);
}

DeviationChart::DeviationChart(const DeviationScale& scale, Units units)
    : scale_(scale), units_(units) {
    renderer_ = vtkSmartPointer<vtkRenderer>::New();
    renderer_->SetBackground(1, 1, 1);
    table_ = vtkSmartPointer<vtkTable>::New();
    for (const char* name : {"z", "deviation", "+tol", "-tol"}) {
        vtkNew<vtkFloatArray> col;
        col->SetName(name);
        table_->AddColumn(col);
    }
    chart_ = vtkSmartPointer<vtkChartXY>::New();
    chart_->GetTitleProperties()->SetFontSize(15);
    chart_->SetShowLegend(true);
    chart_->GetAxis(vtkAxis::BOTTOM)
        ->SetTitle(fmt::format("datum face <-  z ({})  -> chuck", unitName(units)));
    chart_->GetAxis(vtkAxis::LEFT)->SetTitle(fmt::format("deviation ({})", scale.displayUnit()));
    const double l = scale.toDisplay(scale.limitMm);
    chart_->GetAxis(vtkAxis::LEFT)->SetBehavior(vtkAxis::FIXED);
    chart_->GetAxis(vtkAxis::LEFT)->SetRange(-l, l);
    auto* dev = chart_->AddPlot(vtkChart::LINE);
    dev->SetInputData(table_, 0, 1);
    dev->SetColor(180, 30, 40, 255);
    dev->SetWidth(2);
    for (int col : {2, 3}) {
        auto* band = chart_->AddPlot(vtkChart::LINE);
        band->SetInputData(table_, 0, col);
        band->SetColor(60, 60, 60, 255);
        band->GetPen()->SetLineType(vtkPen::DASH_LINE);
    }
    // The twin's line (key w): its own table, its own z samples.
    twinTable_ = vtkSmartPointer<vtkTable>::New();
    for (const char* name : {"z", "twin"}) {
        vtkNew<vtkFloatArray> col;
        col->SetName(name);
        twinTable_->AddColumn(col);
    }
    twinPlot_ = chart_->AddPlot(vtkChart::LINE);
    twinPlot_->SetInputData(twinTable_, 0, 1);
    twinPlot_->SetColor(150, 120, 190, 255);
    twinPlot_->SetWidth(2);
    twinPlot_->SetVisible(false);
    vtkNew<vtkContextActor> actor;
    actor->GetScene()->AddItem(chart_);
    renderer_->AddActor(actor);
    actor->GetScene()->SetRenderer(renderer_);
}

DeviationChart::~DeviationChart() = default;

void DeviationChart::show(const DeviationTrace& t, const std::string& where, bool fitToTrace,
                          const DeviationTrace* twin) {
    const double l = scale_.toDisplay(scale_.limitMm);
    const double band = scale_.toDisplay(scale_.bandMm);
    const double zScale = fromMm(1.0, units_);
    std::vector<std::size_t> keep;
    double worst = 0, lo = HUGE_VAL, hi = -HUGE_VAL;
    for (std::size_t i = 0; i < t.zMm.size(); ++i)
        if (!std::isnan(t.deviationMm[i])) {
            keep.push_back(i);
            const double d = scale_.toDisplay(t.deviationMm[i]);
            worst = std::max(worst, std::fabs(d));
            lo = std::min(lo, d);
            hi = std::max(hi, d);
        }
    // The arrays are filled directly: going through vtkVariant per cell costs more than the
    // rest of a slider step.
    auto column = [&](int c) { return vtkFloatArray::SafeDownCast(table_->GetColumn(c)); };
    const auto rows = static_cast<vtkIdType>(keep.size());
    for (int c = 0; c < 4; ++c)
        column(c)->SetNumberOfTuples(rows);
    for (vtkIdType k = 0; k < rows; ++k) {
        const std::size_t i = keep[static_cast<std::size_t>(k)];
        column(0)->SetValue(k, static_cast<float>(t.zMm[i] * zScale));
        column(1)->SetValue(k, static_cast<float>(scale_.toDisplay(t.deviationMm[i])));
        column(2)->SetValue(k, static_cast<float>(band));
        column(3)->SetValue(k, static_cast<float>(-band));
    }
    for (int c = 0; c < 4; ++c)
        column(c)->Modified();
    table_->Modified();
    {
        auto twinColumn = [&](int c) {
            return vtkFloatArray::SafeDownCast(twinTable_->GetColumn(c));
        };
        std::vector<std::size_t> twinKeep;
        if (twin)
            for (std::size_t i = 0; i < twin->zMm.size(); ++i)
                if (!std::isnan(twin->deviationMm[i])) {
                    twinKeep.push_back(i);
                    const double d = scale_.toDisplay(twin->deviationMm[i]);
                    worst = std::max(worst, std::fabs(d));
                    lo = std::min(lo, d);
                    hi = std::max(hi, d);
                }
        const auto twinRows = static_cast<vtkIdType>(twinKeep.size());
        for (int c = 0; c < 2; ++c)
            twinColumn(c)->SetNumberOfTuples(twinRows);
        for (vtkIdType k = 0; k < twinRows; ++k) {
            const std::size_t i = twinKeep[static_cast<std::size_t>(k)];
            twinColumn(0)->SetValue(k, static_cast<float>(twin->zMm[i] * zScale));
            twinColumn(1)->SetValue(k, static_cast<float>(scale_.toDisplay(twin->deviationMm[i])));
        }
        for (int c = 0; c < 2; ++c)
            twinColumn(c)->Modified();
        twinTable_->Modified();
        twinPlot_->SetVisible(twinRows > 0);
    }
    chart_->SetTitle(fmt::format(
        "Deviation along the {}{} ({}): above 0 metal left on, below 0 overcut",
        t.inside ? "bore" : "cone", where.empty() ? "" : " " + where, scale_.displayUnit()));
    chart_->RecalculateBounds();
    if (fitToTrace && hi >= lo) {
        const double pad = std::max(0.25 * (hi - lo), 1e-3 * l);
        chart_->GetAxis(vtkAxis::LEFT)->SetRange(lo - pad, hi + pad);
    } else {
        const double range = std::max(l, 1.1 * worst);
        chart_->GetAxis(vtkAxis::LEFT)->SetRange(-range, range);
    }
}

void DeviationChart::setFontSize(int px) {
    chart_->GetTitleProperties()->SetFontSize(px);
}

std::size_t DeviationChart::pointCount() const {
    return static_cast<std::size_t>(table_->GetNumberOfRows());
}

} // namespace swarf::viewer::detail
