#pragma once
// The solids of one run (stock, drawing, as cut, leftover, overcut) and the files `swarf run`
// writes from them.
#include "swarf/geometry/revolve.h"
#include "swarf/geometry/solid.h"
#include "swarf/geometry/surface_stl.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/scene.h"

#include <string>
#include <vector>

namespace swarf::geometry {

/// The solids of a run. Leftover and overcut are taken where the drawing has features
/// (between Part::features' first start and last end): beyond them the drawing says nothing.
struct RunSolids {
    Solid stock;       ///< the bar's stick-out
    Solid nominal;     ///< the part as drawn
    FittedSolid asCut; ///< asCutSolid(): the kernel's profile, then the bar to the jaws
    Solid leftover;    ///< as cut minus nominal, within the drawing's extent: metal still to cut
    Solid overcut;     ///< nominal minus as cut: metal cut away that the drawing wanted
    double stockVolumeMm3 = 0, nominalVolumeMm3 = 0, asCutVolumeMm3 = 0;
    double leftoverVolumeMm3 = 0, overcutVolumeMm3 = 0;
};

/// Builds the run's solids from a validated scene and the kernel's result (its asCut profile).
/// Throws GeometryError if the modeller fails.
RunSolids makeRunSolids(const Scene& scene, const CutResult& result,
                        const ProfileFitOptions& fit = {});

/// Sets the result's volumes to those of the solids (what result.json then reports, so that it
/// agrees with the STEP files): stock, as cut, removed, left on (leftover) and overcut.
void takeSolidVolumes(const RunSolids& solids, CutResult& result);

/// Which files writeRunSolids() writes.
struct RunSolidsOptions {
    ProfileFitOptions fit;
    bool writeNominal = true;     ///< nominal.step
    bool writeLeftover = true;    ///< left-on.step (only if metal is left on)
    bool writeOvercut = true;     ///< overcut.step (only if there is an overcut)
    bool writeSurfaceStl = false; ///< surface.stl: the 3D surface with feed marks (large)
    SurfaceStlOptions stl;        ///< how finely surface.stl is meshed
};

/// What writeRunSolids() made.
struct RunSolidsReport {
    std::vector<std::string> files; ///< paths written, as-cut.step first
    double stockVolumeMm3 = 0, nominalVolumeMm3 = 0, asCutVolumeMm3 = 0;
    double leftoverVolumeMm3 = 0, overcutVolumeMm3 = 0;
    double fitErrorMm = 0; ///< largest distance of a profile sample from the solid
    int lineCount = 0, arcCount = 0, splineCount = 0;
    std::size_t surfaceTriangles = 0; ///< triangles in surface.stl (0 if not written)
};

/// Writes `as-cut.step` (one solid, product "as-cut") into outDir, and as the options say
/// `nominal.step`, `left-on.step`, `overcut.step` (one solid each, named alike) and
/// `surface.stl`. All STEP files are AP214 in mm, frame as in solid.h. Each file is written
/// atomically. outDir must exist. Throws GeometryError if the modeller fails and OutputError
/// if a file cannot be written.
RunSolidsReport writeRunSolids(const Scene& scene, const CutResult& result,
                               const std::string& outDir, const RunSolidsOptions& options = {});

/// The same for solids made already (makeRunSolids with options.fit); `result` gives the
/// surface for surface.stl.
RunSolidsReport writeRunSolids(const RunSolids& solids, const CutResult& result,
                               const std::string& outDir, const RunSolidsOptions& options = {});

} // namespace swarf::geometry
