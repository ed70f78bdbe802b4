// Every scene in scenes/: the kernel against the reference path (solid booleans), and the
// as-cut STEP file read back against the kernel.
#include "swarf/geometry/hollow.h"
#include "swarf/geometry/reference_cut.h"
#include "swarf/geometry/run_solids.h"
#include "swarf/geometry/step_file.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/planner.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <filesystem>
#include <vector>

using namespace swarf;
using namespace swarf::geometry;
using Catch::Matchers::WithinAbs;
using Catch::Matchers::WithinRel;
namespace fs = std::filesystem;

namespace {
std::vector<std::string> sceneFiles() {
    std::vector<std::string> files;
    for (const auto& e : fs::directory_iterator(SWARF_SCENES_DIR))
        if (e.path().extension() == ".toml")
            files.push_back(e.path().string());
    std::sort(files.begin(), files.end());
    return files;
}

// The drawing's main cone, or its first chamfer.
const Feature* mainSlope(const Part& part) {
    if (const Feature* f = part.mainCone())
        return f;
    for (const Feature& f : part.features)
        if (f.kind == FeatureKind::Chamfer)
            return &f;
    return nullptr;
}

// The number of separate pieces in a profile: stretches with radius above 0 (derived).
int pieces(const Profile& p) {
    int count = 0;
    bool inside = false;
    for (double r : p.radiusMm) {
        if (r > 1e-9 && !inside)
            ++count;
        inside = r > 1e-9;
    }
    return count;
}

// Scenes written for `swarf plan` have no passes: plan them, so there is a cut to check.
Scene withPasses(const Scene& scene) {
    if (!scene.plan.passes.empty())
        return scene;
    const ConePlan plan = planCone(scene);
    return plan.planned ? plan.scene : scene;
}

// The kernel samples the profile only as far as the tool reaches (plus 1 mm); the bar from
// there to the jaws is uncut: the profile's volume plus that closed-form cylinder (derived).
// The kernel's own as-cut volume covers the same stick-out.
double kernelVolumeToJaws(const Scene& scene, const CutResult& kernel) {
    if (kernel.bored)
        return kernel.asCutVolumeMm3; // bar less bore: its own closed form (inside_kernel.cpp)
    const Profile& asCut = kernel.asCut;
    const double zEnd = asCut.zAt(asCut.radiusMm.size() - 1);
    const double r = scene.stock.diameterMm / 2;
    const double v = asCut.volumeMm3() + kPi * r * r * std::max(0.0, scene.stock.jawZMm() - zEnd);
    CHECK_THAT(kernel.asCutVolumeMm3, WithinRel(v, 1e-12));
    return v;
}
} // namespace

TEST_CASE("scenes: reference path, kernel and STEP file agree",
          "[geometry][reference][step][scenes]") {
    const auto files = sceneFiles();
    REQUIRE_FALSE(files.empty());
    for (const std::string& file : files) {
        SECTION(fs::path(file).filename().string()) {
            const Scene scene = withPasses(io::readScene(file));
            const CutResult kernel = simulate(scene);
            INFO(kernel.moves.size() << " moves");
            const ReferenceResult ref = referenceCut(scene, kernel.moves);
            REQUIRE(ref.asCut.isValid());
            // The limits: volume within 1e-4 relative, profile within 1 µm.
            CHECK_THAT(ref.volumeMm3, WithinRel(kernelVolumeToJaws(scene, kernel), 1e-4));
            // Inside work is checked on the bore: the solid's inner radius against the kernel's.
            const bool bored = kernel.bored;
            const Feature* cone = bored ? scene.part.mainInsideCone() : mainSlope(scene.part);
            REQUIRE(cone != nullptr);
            const Profile& side = bored ? kernel.bore : kernel.asCut;
            auto radiusOf = [bored](const Solid& solid, double z) {
                return bored ? innerRadiusAtZ(solid, z) : solid.radiusAtZ(z);
            };
            const auto gauge = radiusOf(ref.asCut, kernel.gaugeZMm);
            REQUIRE(gauge.has_value());
            CHECK_THAT(*gauge, WithinAbs(side.radiusAt(kernel.gaugeZMm), 1e-3));
            const double z0 = std::max(cone->zStartMm, side.z0Mm);
            for (int k = 0; k <= 20; ++k) {
                // Off the sample grid on purpose: the kernel's radius is interpolated there.
                const double z = z0 + 0.013 + (cone->zEndMm - z0 - 0.026) * k / 20.0;
                const auto r = radiusOf(ref.asCut, z);
                REQUIRE(r.has_value());
                INFO("z = " << z);
                CHECK_THAT(*r, WithinAbs(side.radiusAt(z), 1e-3));
            }

            // The as-cut STEP file read back against the kernel.
            const fs::path dir = fs::temp_directory_path() /
                                 ("swarf-geometry-scene-" + fs::path(file).stem().string());
            fs::remove_all(dir);
            fs::create_directories(dir);
            const RunSolidsReport report = writeRunSolids(scene, kernel, dir.string());
            REQUIRE(report.files.front() == (dir / "as-cut.step").string());
            CHECK(report.fitErrorMm <= 0.5e-3);
            const Solid back = readStep(report.files.front());
            // One solid, unless the cut went through the centre and parted the bar.
            REQUIRE(back.solidCount() == (bored ? 1 : pieces(kernel.asCut)));
            CHECK(back.isValid());
            CHECK_THAT(back.volumeMm3(), WithinRel(kernelVolumeToJaws(scene, kernel), 1e-6));
            const BoxMm b = back.bounds();
            CHECK_THAT(b.zMin, WithinAbs(scene.stock.freeEndZMm(), 1e-6));
            CHECK_THAT(b.zMax, WithinAbs(scene.stock.jawZMm(), 1e-6));
            const auto rGauge = radiusOf(back, kernel.gaugeZMm);
            REQUIRE(rGauge.has_value());
            CHECK_THAT(2 * *rGauge, WithinAbs(kernel.gaugeAsCutDiameterMm, 1e-3));
            // Leftover and overcut add up where the drawing has features (derived: volumes of
            // disjoint solids add): as cut = nominal + leftover − overcut there.
            const RunSolids solids = makeRunSolids(scene, kernel);
            const double rBig = scene.stock.diameterMm; // beyond any radius of the part
            const Solid extent =
                polylineSolid({{scene.part.zMinMm(), rBig}, {scene.part.zMaxMm(), rBig}});
            const double asCutThere = solids.asCut.solid.common(extent).volumeMm3();
            CHECK_THAT(solids.nominalVolumeMm3 + solids.leftoverVolumeMm3 - solids.overcutVolumeMm3,
                       WithinRel(asCutThere, 1e-7));
            CHECK(solids.leftoverVolumeMm3 >= 0);
            CHECK(solids.overcutVolumeMm3 >= 0);
        }
    }
}
