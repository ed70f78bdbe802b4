// Inside work in a PartScene (see part_scene_impl.h): the hollow part at the moment, its outside
// from the as-cut profile and its bore from the as-cut bore, each coloured by its own deviation
// on the one colour scale (+ metal left on, inside as outside: within the drawn bore), the end
// faces as rings, the cut-away faces through the wall; in the close-up, a stretch of the bore's
// far wall, seen through the near half, with its feed marks raised at the finished part.
#include "bore_meshes.h"
#include "meshes.h"
#include "part_scene_impl.h"

#include <vtkActor.h>
#include <vtkDataArray.h>
#include <vtkPointData.h>
#include <vtkPolyData.h>
#include <vtkPolyDataMapper.h>

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf::viewer::detail {

double closeBoreCentreRad() {
    // Square to the view: the wall whose inward normal looks back at the camera.
    return std::atan2(-kCloseDir.z(), -kCloseDir.y());
}

vtkSmartPointer<vtkPolyData> PartScene::Impl::boredSurface(const std::vector<double>& outerDev) {
    const Profile& p = moment.profile;
    const std::size_t n = p.radiusMm.size();
    const double toDisp = scale.toDisplay(1.0);
    const double nan = std::numeric_limits<double>::quiet_NaN();
    // The bore on the profile's samples (the kernel keeps both on one grid); none: solid.
    Profile b = moment.bore;
    if (b.radiusMm.size() != n) {
        b = p;
        std::fill(b.radiusMm.begin(), b.radiusMm.end(), 0.0);
    }
    std::vector<double> boreDev(n, nan);
    for (std::size_t i = 0; i < std::min(n, moment.boreDeviationMm.size()); ++i)
        boreDev[i] = moment.boreDeviationMm[i] * toDisp;
    const double tolR = 2e-4 * std::max(scene.stock.diameterMm, 1.0);
    const double tolD = 0.02 * scale.toDisplay(scale.limitMm);
    auto empty = [] { return vtkSmartPointer<vtkPolyData>::New(); };
    if (closeUp) {
        auto index = [&](double z) {
            return static_cast<std::size_t>(
                std::clamp(std::round((z - p.z0Mm) / p.dzMm), 0.0, static_cast<double>(n - 1)));
        };
        boreMapper->SetInputData(empty());
        const double phi0 = closeBoreCentreRad() - 0.5 * kPi;
        if (moment.finished && result.rtUm > 0) {
            // The finished stretch with its feed marks raised, as outside.
            if (!boreMarks)
                boreMarks = std::make_unique<BoreMarks>(boreFeedMarks(scene));
            return boreMarkPatch(*boreMarks, result.bore, scene.part, close.zFromMm, close.zToMm,
                                 kCloseRows, phi0, kPi, kCloseFineStep, close.reliefFactor, toDisp);
        }
        const auto rows = pickRows(index(close.zFromMm), index(close.zToMm), kCloseRows);
        return revolve(b, rows, &boreDev, kCloseColumns / 2, closeBoreCentreRad() - 0.5 * kPi, kPi,
                       true);
    }
    const auto rowsOut = profileRows(p, &outerDev, 0, n - 1, kBaseRows, tolR, tolD, kMaxRows);
    const auto rowsIn = profileRows(b, &boreDev, 0, n - 1, kBaseRows, tolR, tolD, kMaxRows);
    const double phi0 = layers.cutaway ? kCutTo : 0.0;
    const double span = layers.cutaway ? 2 * kPi - (kCutTo - kCutFrom) : 2 * kPi;
    const int cols = layers.cutaway ? kColumns * 3 / 4 : kColumns;
    boreMapper->SetInputData(revolve(b, rowsIn, &boreDev, cols, phi0, span, true));
    const auto rings = joinMeshes(
        endRing(p.zAt(0), b.radiusMm[0], p.radiusMm[0], cols, phi0, span, true),
        endRing(p.zAt(n - 1), b.radiusMm[n - 1], p.radiusMm[n - 1], cols, phi0, span, false));

    // The cut-away faces through the wall: the metal between the drawn bore and the drawn
    // outside (grey), and what is left on either side of the drawing (amber).
    std::vector<std::size_t> rows;
    std::set_union(rowsOut.begin(), rowsOut.end(), rowsIn.begin(), rowsIn.end(),
                   std::back_inserter(rows));
    const bool sameGrid = result.nominal.radiusMm.size() == n;
    const bool sameBoreGrid = result.boreNominal.radiusMm.size() == n;
    std::vector<double> nominal(n), coreIn(n), coreOut(n), leftOut(n, nan), leftInLo(n, nan),
        leftInHi(n, nan);
    for (std::size_t i = 0; i < n; ++i) {
        nominal[i] = sameGrid ? result.nominal.radiusMm[i] : result.nominal.radiusAt(p.zAt(i));
        const double bn =
            sameBoreGrid ? result.boreNominal.radiusMm[i] : result.boreNominal.radiusAt(p.zAt(i));
        const double r = p.radiusMm[i], rb = b.radiusMm[i];
        coreOut[i] = std::isnan(nominal[i]) ? r : std::min(r, nominal[i]);
        coreIn[i] = std::isnan(bn) ? rb : std::max(rb, bn);
        if (!std::isnan(nominal[i]) && r > nominal[i])
            leftOut[i] = r;
        if (!std::isnan(bn) && rb < bn) {
            leftInLo[i] = rb;
            leftInHi[i] = bn;
        }
    }
    leftoverMapper->SetInputData(
        joinMeshes(wedgeFaces(p, nominal, leftOut, rows, kCutFrom, kCutTo),
                   wedgeFaces(p, leftInLo, leftInHi, rows, kCutFrom, kCutTo)));
    coreMapper->SetInputData(
        joinMeshes(wedgeFaces(p, coreIn, coreOut, rows, kCutFrom, kCutTo), rings));
    return revolve(p, rowsOut, &outerDev, cols, phi0, span);
}

std::vector<Eigen::Vector3d> PartScene::drawnBore() const {
    std::vector<Eigen::Vector3d> out;
    vtkPolyData* pd = impl_->boreMapper->GetInput();
    if (!pd || !pd->GetPoints())
        return out;
    vtkDataArray* dev = pd->GetPointData()->GetScalars();
    for (vtkIdType i = 0; i < pd->GetNumberOfPoints(); ++i) {
        double q[3];
        pd->GetPoint(i, q);
        out.emplace_back(q[0], std::hypot(q[1], q[2]),
                         dev ? dev->GetTuple1(i) : std::numeric_limits<double>::quiet_NaN());
    }
    return out;
}

std::vector<double> PartScene::barBounds() const {
    vtkPolyData* pd = impl_->barMapper->GetInput();
    if (!pd || pd->GetNumberOfPoints() == 0)
        return {};
    double b[6];
    impl_->barActor->GetBounds(b);
    return {b, b + 6};
}

} // namespace swarf::viewer::detail
