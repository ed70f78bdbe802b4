#include "swarf/geometry/run_solids.h"

#include "occt_support.h"

#include "swarf/geometry/hollow.h"
#include "swarf/geometry/step_file.h"
#include "swarf/geometry/surface_stl.h"

#include <BRepPrimAPI_MakeCylinder.hxx>
#include <gp_Ax2.hxx>

#include <algorithm>
#include <filesystem>

namespace swarf::geometry {
namespace {

// A cylinder around everything between two planes, to cut the drawing's extent out.
Solid slab(double z0Mm, double z1Mm, double radiusMm) {
    return guarded("drawing extent", [&] {
        BRepPrimAPI_MakeCylinder cyl(gp_Ax2(gp_Pnt(0, 0, z0Mm), gp_Dir(0, 0, 1)), radiusMm,
                                     z1Mm - z0Mm);
        cyl.Build();
        require(cyl.IsDone() == Standard_True, "drawing extent", "making the cylinder failed");
        return wrap(cyl.Shape());
    });
}

// Inside work: the bar less its hole, the as-cut part less the as-cut bore, the drawing (its
// outside features, or the bar over the drawing's extent) less the drawn bore.
RunSolids makeHollowRunSolids(const Scene& scene, const CutResult& result,
                              const ProfileFitOptions& fit) {
    RunSolids s;
    s.stock = stockSolid(scene.stock);
    if (const Solid hole = holeSolid(scene.stock); !hole.empty())
        s.stock = s.stock.minus(hole);
    s.asCut = asCutSolid(scene.stock, result.asCut, fit);
    double boreFitErrorMm = 0;
    for (const Solid& piece : boreSolids(scene.stock, result.bore, fit, &boreFitErrorMm))
        s.asCut.solid = s.asCut.solid.minus(piece);
    s.asCut.maxFitErrorMm = std::max(s.asCut.maxFitErrorMm, boreFitErrorMm);
    const Part outside = outsidePart(scene.part);
    double rMax = scene.stock.diameterMm / 2;
    for (double r : result.asCut.radiusMm)
        rMax = std::max(rMax, r);
    const double z0 = scene.part.zMinMm(), z1 = scene.part.zMaxMm();
    s.nominal =
        outside.features.empty() ? slab(z0, z1, scene.stock.diameterMm / 2) : nominalSolid(outside);
    if (const Solid drawn = drawnBoreSolid(scene.part); !drawn.empty())
        s.nominal = s.nominal.minus(drawn);
    const Solid extent = slab(z0, z1, rMax + 1.0);
    s.leftover = s.asCut.solid.common(extent).minus(s.nominal);
    s.overcut = s.nominal.minus(s.asCut.solid);
    s.stockVolumeMm3 = s.stock.volumeMm3();
    s.nominalVolumeMm3 = s.nominal.volumeMm3();
    s.asCutVolumeMm3 = s.asCut.solid.volumeMm3();
    s.leftoverVolumeMm3 = s.leftover.volumeMm3();
    s.overcutVolumeMm3 = s.overcut.volumeMm3();
    return s;
}

} // namespace

RunSolids makeRunSolids(const Scene& scene, const CutResult& result, const ProfileFitOptions& fit) {
    if (result.bored)
        return makeHollowRunSolids(scene, result, fit);
    RunSolids s;
    s.stock = stockSolid(scene.stock);
    s.nominal = nominalSolid(scene.part);
    s.asCut = asCutSolid(scene.stock, result.asCut, fit);
    const auto outline = nominalOutline(scene.part);
    double rMax = scene.stock.diameterMm / 2;
    for (const auto& p : outline)
        rMax = std::max(rMax, p.second);
    for (double r : result.asCut.radiusMm)
        rMax = std::max(rMax, r);
    const Solid extent = slab(outline.front().first, outline.back().first, rMax + 1.0);
    s.leftover = s.asCut.solid.common(extent).minus(s.nominal);
    s.overcut = s.nominal.minus(s.asCut.solid);
    s.stockVolumeMm3 = s.stock.volumeMm3();
    s.nominalVolumeMm3 = s.nominal.volumeMm3();
    s.asCutVolumeMm3 = s.asCut.solid.volumeMm3();
    s.leftoverVolumeMm3 = s.leftover.volumeMm3();
    s.overcutVolumeMm3 = s.overcut.volumeMm3();
    return s;
}

void takeSolidVolumes(const RunSolids& s, CutResult& result) {
    result.stockVolumeMm3 = s.stockVolumeMm3;
    result.asCutVolumeMm3 = s.asCutVolumeMm3;
    result.removedVolumeMm3 = s.stockVolumeMm3 - s.asCutVolumeMm3;
    result.leftoverVolumeMm3 = s.leftoverVolumeMm3;
    result.overcutVolumeMm3 = s.overcutVolumeMm3;
}

RunSolidsReport writeRunSolids(const Scene& scene, const CutResult& result,
                               const std::string& outDir, const RunSolidsOptions& options) {
    return writeRunSolids(makeRunSolids(scene, result, options.fit), result, outDir, options);
}

RunSolidsReport writeRunSolids(const RunSolids& s, const CutResult& result,
                               const std::string& outDir, const RunSolidsOptions& options) {
    RunSolidsReport r;
    const auto file = [&](const char* name) {
        return (std::filesystem::path(outDir) / name).string();
    };
    r.files.push_back(file("as-cut.step"));
    writeStep(r.files.back(), {{"as-cut", s.asCut.solid}});
    if (options.writeNominal) {
        r.files.push_back(file("nominal.step"));
        writeStep(r.files.back(), {{"nominal", s.nominal}});
    }
    if (options.writeLeftover && !s.leftover.empty()) {
        r.files.push_back(file("left-on.step"));
        writeStep(r.files.back(), {{"left-on", s.leftover}});
    }
    if (options.writeOvercut && !s.overcut.empty()) {
        r.files.push_back(file("overcut.step"));
        writeStep(r.files.back(), {{"overcut", s.overcut}});
    }
    if (options.writeSurfaceStl && !result.surface.empty()) {
        r.files.push_back(file("surface.stl"));
        r.surfaceTriangles = writeSurfaceStl(result.surface, r.files.back(), options.stl);
    }
    r.stockVolumeMm3 = s.stockVolumeMm3;
    r.nominalVolumeMm3 = s.nominalVolumeMm3;
    r.asCutVolumeMm3 = s.asCutVolumeMm3;
    r.leftoverVolumeMm3 = s.leftoverVolumeMm3;
    r.overcutVolumeMm3 = s.overcutVolumeMm3;
    r.fitErrorMm = s.asCut.maxFitErrorMm;
    r.lineCount = s.asCut.lineCount;
    r.arcCount = s.asCut.arcCount;
    r.splineCount = s.asCut.splineCount;
    return r;
}

} // namespace swarf::geometry
