// The camera views of a PartScene's 3D renderer, fitted clear of the panel, the slider and the
// colour bar (see part_scene.h, View).
#include "part_scene_impl.h"

#include <vtkCamera.h>
#include <vtkMapper.h>
#include <vtkPolyData.h>

#include <algorithm>
#include <cmath>

namespace swarf::viewer::detail {

namespace {

// Moves and shifts the camera, keeping its direction, so that the points `pts` project into
// the rectangle [x0, x1] × [y0, y1] of the viewport (view coordinates, −1..1): the part stays
// clear of the panel, the slider and the colour bar.
void fitPoints(vtkRenderer* ren, const std::vector<Eigen::Vector3d>& pts, double viewAngleDeg,
               double x0, double x1, double y0, double y1) {
    if (pts.empty())
        return;
    vtkCamera* cam = ren->GetActiveCamera();
    cam->SetWindowCenter(0, 0);
    ren->ComputeAspect(); // the viewport's shape now, not at the last frame
    double b[6] = {HUGE_VAL, -HUGE_VAL, HUGE_VAL, -HUGE_VAL, HUGE_VAL, -HUGE_VAL};
    for (const auto& p : pts)
        for (int a = 0; a < 3; ++a) {
            b[2 * a] = std::min(b[2 * a], p[a]);
            b[2 * a + 1] = std::max(b[2 * a + 1], p[a]);
        }
    ren->ResetCamera(b); // (this sets the view angle to 30°)
    if (viewAngleDeg != cam->GetViewAngle()) {
        // Same picture size with the other lens: move back by the ratio of the tangents.
        const double k =
            std::tan(0.5 * cam->GetViewAngle() * kDeg) / std::tan(0.5 * viewAngleDeg * kDeg);
        cam->SetViewAngle(viewAngleDeg);
        cam->Dolly(1 / k);
    }
    double wc[2] = {0, 0};
    for (int it = 0; it < 6; ++it) {
        double lo[2] = {HUGE_VAL, HUGE_VAL}, hi[2] = {-HUGE_VAL, -HUGE_VAL};
        for (const auto& p : pts) {
            ren->SetWorldPoint(p.x(), p.y(), p.z(), 1);
            ren->WorldToView();
            const double* v = ren->GetViewPoint();
            for (int a = 0; a < 2; ++a) {
                lo[a] = std::min(lo[a], v[a]);
                hi[a] = std::max(hi[a], v[a]);
            }
        }
        const double s = std::min((x1 - x0) / std::max(hi[0] - lo[0], 1e-9),
                                  (y1 - y0) / std::max(hi[1] - lo[1], 1e-9));
        // Dolly, not zoom: the lens (view angle) stays as the view chose it.
        if (std::fabs(s - 1) > 1e-4)
            cam->Dolly(s);
        // With window centre wc a point shows at v = u − wc, u its place without a shift; the
        // zoom scales u by about s. Put the points' centre at the rectangle's.
        const double c[2] = {0.5 * (lo[0] + hi[0]), 0.5 * (lo[1] + hi[1])};
        const double want[2] = {0.5 * (x0 + x1), 0.5 * (y0 + y1)};
        for (int a = 0; a < 2; ++a)
            wc[a] = s * (c[a] + wc[a]) - want[a];
        cam->SetWindowCenter(wc[0], wc[1]);
    }
    ren->ResetCameraClippingRange();
}

// Points round a circle of radius r at axial position z (world: X = z).
void addCircle(std::vector<Eigen::Vector3d>& pts, double z, double r, int n = 24) {
    for (int k = 0; k < n; ++k) {
        const double phi = 2 * kPi * k / n;
        pts.emplace_back(z, r * std::cos(phi), r * std::sin(phi));
    }
}

} // namespace

void PartScene::view(View v) {
    Impl& d = *impl_;
    vtkCamera* cam = d.main->GetActiveCamera();
    const double r = d.scene.stock.diameterMm / 2;
    // The points the view must show, and the direction it looks from.
    std::vector<Eigen::Vector3d> pts;
    Eigen::Vector3d dir(-0.3, 0.85, 0.45), up(0, 0, 1);
    if (v == View::CloseUp) {
        // From the operator's side and a little above, with the top of the part against the
        // background: the raised feed marks stand out along that edge like a thread's teeth
        // and shade as bands on the surface below it.
        dir = kCloseDir;
        const double limb = kCloseLimb; // where the view grazes the surface
        const double z0 = d.close.zFromMm, z1 = d.close.zToMm, length = z1 - z0;
        // A bore: its far wall, face on, through the near half (part_scene_bore.cpp).
        const double wall = closeBoreCentreRad();
        for (double z : d.result.bored ? std::vector<double>{z0, z1} : std::vector<double>{}) {
            const double rb = std::max(d.result.bore.radiusAt(z), 1e-3);
            const double band = std::min(0.5, 0.5 * length / rb);
            for (double a : {wall - band, wall, wall + band})
                pts.emplace_back(z, rb * std::cos(a), rb * std::sin(a));
        }
        for (double z : d.result.bored ? std::vector<double>{} : std::vector<double>{z0, z1}) {
            const double rc = std::max(d.result.asCut.radiusAt(z), 1e-3);
            const double band = std::acos(std::clamp(1 - 0.25 * length / rc, -1.0, 1.0));
            for (double a : {limb, limb - band})
                pts.emplace_back(z, rc * std::cos(a), rc * std::sin(a));
            const double sky = rc + 0.08 * length;
            pts.emplace_back(z, sky * std::cos(limb), sky * std::sin(limb));
        }
    } else if (v == View::Cone) {
        // A bored part's main cone is its bore's (trace.h): the wall round it, to the outside.
        const Profile& nom = d.result.bored ? d.result.asCut : d.result.nominal;
        addCircle(pts, d.coneZ0, nom.radiusAt(d.coneZ0 + 1e-6));
        addCircle(pts, d.coneZ1, nom.radiusAt(d.coneZ1 - 1e-6));
        for (auto& p : pts)
            if (!p.allFinite())
                p = Eigen::Vector3d(p.x(), 0, 0);
    } else {
        // The bar from its free end to the jaws, the jaws, and the tool's travel.
        const double zEnd = std::min(d.scene.stock.freeEndZMm(), d.coneZ0);
        addCircle(pts, zEnd, r);
        addCircle(pts, d.scene.stock.jawZMm(), r);
        if (d.layers.jaws) {
            double bounds[6];
            d.jawsActor->GetMapper()->GetInput()->GetBounds(bounds);
            for (int k = 0; k < 8; ++k)
                pts.emplace_back(bounds[k & 1], bounds[2 + ((k >> 1) & 1)],
                                 bounds[4 + ((k >> 2) & 1)]);
        }
        // The tool's travel, with the insert's own size about each end of a move.
        double ib[6];
        d.insertMapper->GetInput()->GetBounds(ib);
        for (const ToolMove& m : d.result.moves)
            for (const Eigen::Vector2d& t : {m.tipFrom, m.tipTo})
                if (t.allFinite() && t.y() < 3 * r)
                    for (int k = 0; k < 8; ++k)
                        pts.emplace_back(t.x() + ib[k & 1], t.y() + ib[2 + ((k >> 1) & 1)],
                                         ib[4 + ((k >> 2) & 1)]);
    }
    switch (v) {
    case View::Front:
        dir = {0, 1, 0};
        break; // the operator's side: chuck on the left
    case View::Top:
        dir = {0, 0, 1};
        up = {0, -1, 0};
        break;
    case View::End:
        dir = {-1, 0, 0};
        break; // from the tailstock
    default:
        break;
    }
    Eigen::Vector3d c = Eigen::Vector3d::Zero();
    for (const auto& p : pts)
        c += p;
    c /= static_cast<double>(std::max<std::size_t>(pts.size(), 1));
    cam->SetFocalPoint(c.x(), c.y(), c.z());
    cam->SetPosition(c.x() + dir.x(), c.y() + dir.y(), c.z() + dir.z());
    cam->SetViewUp(up.x(), up.y(), up.z());
    cam->ParallelProjectionOff();
    // Clear of the panel (top left), the slider (bottom) and the colour bar (right). The
    // close-up from afar with a narrow lens: a few millimetres of a bar tens of millimetres
    // across look as they are, not bent by perspective.
    fitPoints(d.main, pts, v == View::CloseUp ? 3.0 : 30.0, -0.94, 0.72, -0.60, 0.50);
}

} // namespace swarf::viewer::detail
