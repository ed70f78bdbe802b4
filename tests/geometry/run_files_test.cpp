// `swarf run` on every scene: the volumes in result.json are those of the STEP solids it wrote,
// read back by the solid modeller (as-cut, left-on, overcut), to 1e-6 relative.
#include "swarf/geometry/step_file.h"
#include "swarf/io/scene_reader.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <string>
#include <vector>

using namespace swarf;
using Catch::Matchers::WithinAbs;
using Catch::Matchers::WithinRel;
namespace fs = std::filesystem;

namespace {

std::vector<fs::path> sceneFiles() {
    std::vector<fs::path> files;
    for (const auto& e : fs::directory_iterator(SWARF_SCENES_DIR))
        if (e.path().extension() == ".toml")
            files.push_back(e.path());
    std::sort(files.begin(), files.end());
    return files;
}

// The volume of a STEP file's solids, 0 if swarf did not write it (no such metal).
double stepVolume(const fs::path& path) {
    return fs::exists(path) ? geometry::readStep(path.string()).volumeMm3() : 0.0;
}

} // namespace

TEST_CASE("result.json gives the volumes of the STEP solids written", "[geometry][run][step]") {
    int checked = 0;
    for (const fs::path& scene : sceneFiles()) {
        INFO(scene.filename().string());
        const fs::path dir =
            fs::temp_directory_path() / ("swarf-run-files-" + scene.stem().string());
        fs::remove_all(dir);
        const std::string cmd = std::string("'") + SWARF_BINARY + "' run '" + scene.string() +
                                "' --out '" + dir.string() + "' --no-pictures >/dev/null 2>&1";
        REQUIRE(std::system(cmd.c_str()) == 0);
        std::ifstream in(dir / "result.json");
        const nlohmann::json j = nlohmann::json::parse(in);
        const auto& v = j.at("volume");
        // The stock and as-cut solids run from the bar's free end to the jaws' face.
        const Scene s = io::readScene(scene.string());
        CHECK(v.at("from_z_mm").get<double>() == s.stock.freeEndZMm());
        CHECK(v.at("to_z_mm").get<double>() == s.stock.jawZMm());
        const double asCut = stepVolume(dir / "as-cut.step");
        CHECK_THAT(v.at("as_cut_mm3").get<double>(), WithinRel(asCut, 1e-6));
        // Leftover and overcut: the solids' own volumes (none written where there is none).
        const double left = stepVolume(dir / "left-on.step");
        const double over = stepVolume(dir / "overcut.step");
        CHECK_THAT(v.at("left_on_mm3").get<double>(), WithinRel(left, 1e-6) || WithinAbs(0, 1e-9));
        CHECK_THAT(v.at("overcut_mm3").get<double>(), WithinRel(over, 1e-6) || WithinAbs(0, 1e-9));
        if (left == 0)
            CHECK(v.at("left_on_mm3").get<double>() == Approx(0).margin(1e-6));
        if (over == 0)
            CHECK(v.at("overcut_mm3").get<double>() == Approx(0).margin(1e-6));
        // The stock: a cylinder over the stick-out, less the drilled hole for inside work, a
        // cylinder from the free end to its bottom or the jaws (derived).
        const double r = s.stock.diameterMm / 2, rh = s.stock.boreDiameterMm / 2;
        const double holeLength =
            std::min(s.stock.boreBottomZMm(), s.stock.jawZMm()) - s.stock.freeEndZMm();
        const double hole = s.stock.hasBore() ? std::acos(-1.0) * rh * rh * holeLength : 0.0;
        CHECK_THAT(v.at("stock_mm3").get<double>(),
                   WithinRel(std::acos(-1.0) * r * r * s.stock.stickOutMm - hole, 1e-9));
        CHECK_THAT(v.at("removed_mm3").get<double>(),
                   WithinAbs(v.at("stock_mm3").get<double>() - asCut, 1e-6 * asCut));
        fs::remove_all(dir);
        ++checked;
    }
    CHECK(checked >= 19);
}
