#include "swarf/geometry/revolve.h"

#include "occt_support.h"
#include "profile_fit.h"

#include <BRepPrimAPI_MakeCylinder.hxx>
#include <BRep_Builder.hxx>
#include <TopoDS_Compound.hxx>
#include <gp_Ax2.hxx>

#include <algorithm>
#include <cmath>
#include <string>

namespace swarf::geometry {

Solid stockSolid(const Stock& stock) {
    return guarded("stock solid", [&] {
        require(stock.diameterMm > 0 && stock.stickOutMm > 0, "stock solid",
                "the bar needs a diameter and a stick-out above zero");
        BRepPrimAPI_MakeCylinder cyl(gp_Ax2(gp_Pnt(0, 0, stock.freeEndZMm()), gp_Dir(0, 0, 1)),
                                     stock.diameterMm / 2, stock.stickOutMm);
        cyl.Build();
        require(cyl.IsDone() == Standard_True, "stock solid", "making the cylinder failed");
        requireValid(cyl.Shape(), "stock solid");
        return wrap(cyl.Shape());
    });
}

namespace {
double featureRadiusAt(const Feature& f, double zMm) {
    if (f.kind == FeatureKind::Cylinder)
        return f.diameterMm / 2;
    return f.cone.diameterAt(zMm) / 2; // cone and chamfer
}
} // namespace

std::vector<std::pair<double, double>> nominalOutline(const Part& part) {
    std::vector<const Feature*> spans;
    for (const Feature& f : part.features)
        if (f.kind != FeatureKind::Face && f.zEndMm > f.zStartMm)
            spans.push_back(&f);
    std::stable_sort(spans.begin(), spans.end(),
                     [](const Feature* a, const Feature* b) { return a->zStartMm < b->zStartMm; });
    std::vector<std::pair<double, double>> pts;
    const auto add = [&](double z, double x) {
        // Faces between features come out as two points at the same z; drop exact repeats.
        if (!pts.empty() && std::abs(pts.back().first - z) < 1e-12 &&
            std::abs(pts.back().second - x) < 1e-12)
            return;
        pts.emplace_back(z, x);
    };
    for (const Feature* f : spans) {
        add(f->zStartMm, featureRadiusAt(*f, f->zStartMm));
        add(f->zEndMm, featureRadiusAt(*f, f->zEndMm));
    }
    return pts;
}

namespace {
Solid revolvePoints(const std::vector<std::pair<double, double>>& pts, const std::string& what) {
    require(pts.size() >= 2, what, "the outline needs two points or more");
    std::vector<double> z, x;
    for (const auto& [zi, xi] : pts) {
        require(std::isfinite(zi) && std::isfinite(xi) && xi >= 0, what,
                "a radius below zero or not a number at z = " + std::to_string(zi) + " mm");
        require(z.empty() || zi >= z.back(), what,
                "the outline goes back along the axis near z = " + std::to_string(zi) + " mm");
        z.push_back(zi);
        x.push_back(xi);
    }
    return wrap(revolveChain(polylineChain(z, x), what));
}
} // namespace

Solid polylineSolid(const std::vector<std::pair<double, double>>& zxPoints) {
    return revolvePoints(zxPoints, "solid of revolution");
}

Solid nominalSolid(const Part& part) {
    const auto pts = nominalOutline(part);
    require(pts.size() >= 2, "nominal part", "the drawing has no cylinder, cone or chamfer");
    for (const auto& [z, x] : pts)
        require(x > 0, "nominal part",
                "the drawing's radius is not above zero at z = " + std::to_string(z) + " mm");
    return revolvePoints(pts, "nominal part");
}

namespace {
// Samples at or below this radius (mm) are on the axis: the cut went through the centre.
constexpr double kOnAxisMm = 1e-9;

FittedSolid fitted(const Profile& profile, const ProfileFitOptions& options, const Stock* stock) {
    const std::size_t n = profile.radiusMm.size();
    require(n >= 2 && profile.dzMm > 0, "as-cut solid", "the profile needs two samples or more");
    std::vector<double> z(n), x(n);
    for (std::size_t i = 0; i < n; ++i) {
        z[i] = profile.zAt(i);
        x[i] = profile.radiusMm[i];
        require(std::isfinite(x[i]) && x[i] >= 0, "as-cut solid",
                "the profile's radius is not a number ≥ 0 at z = " + std::to_string(z[i]) + " mm");
    }
    // Where the cut reaches the axis the part comes apart: one solid per stretch of material,
    // each from the axis sample before it to the axis sample after it.
    FittedSolid out;
    out.sampleCount = static_cast<int>(n);
    TopoDS_Compound pieces;
    BRep_Builder builder;
    builder.MakeCompound(pieces);
    int pieceCount = 0;
    TopoDS_Shape single;
    std::size_t i = 0;
    while (i < n) {
        while (i < n && x[i] <= kOnAxisMm)
            ++i;
        if (i == n)
            break;
        std::size_t j = i;
        while (j + 1 < n && x[j + 1] > kOnAxisMm)
            ++j;
        const std::size_t a = i > 0 ? i - 1 : 0, b = j + 1 < n ? j + 1 : j;
        i = j + 1;
        if (b == a)
            continue; // a single sample: no length
        const std::vector<double> zs(z.begin() + a, z.begin() + b + 1);
        std::vector<double> xs(x.begin() + a, x.begin() + b + 1);
        for (double& v : xs)
            v = v <= kOnAxisMm ? 0.0 : v;
        EdgeChain chain = fitOutline(zs, xs, options);
        // The bar beyond the profile, up to the jaws, was not touched.
        if (stock && b == n - 1 && stock->jawZMm() > z.back() + 1e-9)
            extendChain(chain, stock->jawZMm(), stock->diameterMm / 2);
        single = revolveChain(chain, "as-cut solid");
        builder.Add(pieces, single);
        ++pieceCount;
        out.maxFitErrorMm = std::max(out.maxFitErrorMm, chain.maxErrorMm);
        out.lineCount += chain.lines;
        out.arcCount += chain.arcs;
        out.splineCount += chain.splines;
    }
    require(pieceCount > 0, "as-cut solid", "the profile has no material (every radius is 0)");
    out.solid = wrap(pieceCount == 1 ? single : TopoDS_Shape(pieces));
    return out;
}
} // namespace

FittedSolid profileSolid(const Profile& profile, const ProfileFitOptions& options) {
    return fitted(profile, options, nullptr);
}

FittedSolid asCutSolid(const Stock& stock, const Profile& asCut, const ProfileFitOptions& options) {
    return fitted(asCut, options, &stock);
}

} // namespace swarf::geometry
