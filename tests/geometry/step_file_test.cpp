#include "swarf/geometry/step_file.h"

#include "swarf/geometry/revolve.h"

#include "profiles.h"

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <iostream>
#include <sstream>

using namespace swarf;
using namespace swarf::geometry;
using Catch::Matchers::WithinAbs;
using Catch::Matchers::WithinRel;
namespace fs = std::filesystem;

namespace {
fs::path freshDir(const std::string& name) {
    const fs::path dir = fs::temp_directory_path() / ("swarf-geometry-test-" + name);
    fs::remove_all(dir);
    fs::create_directories(dir);
    return dir;
}
} // namespace

TEST_CASE("as-cut STEP file reads back as one valid solid", "[geometry][step]") {
    const fs::path dir = freshDir("step");
    const Profile profile = testprofiles::taperProfile(); // a 60 mm stick-out, datum face at 0
    const FittedSolid asCut = profileSolid(profile);
    const std::string path = (dir / "as-cut.step").string();

    // Nothing from the modeller on the console.
    std::ostringstream captured;
    std::streambuf* old = std::cout.rdbuf(captured.rdbuf());
    writeStep(path, {{"as-cut", asCut.solid}});
    const Solid back = readStep(path);
    std::cout.rdbuf(old);
    CHECK(captured.str().empty());

    CHECK(fs::exists(path));
    CHECK_FALSE(fs::exists(path + ".tmp"));
    {
        std::ifstream in(path);
        std::stringstream text;
        text << in.rdbuf();
        CHECK(text.str().find("ISO-10303-21") != std::string::npos);
        CHECK(text.str().find("'as-cut'") != std::string::npos); // the product's name
        CHECK(text.str().find(".MILLI.") != std::string::npos);  // lengths in mm
    }
    REQUIRE(back.solidCount() == 1);
    CHECK(back.isValid());
    // The kernel's volume is the frustum sum over the samples.
    CHECK_THAT(back.volumeMm3(), WithinRel(profile.volumeMm3(), 1e-6));
    // Gauge plane z = 40: 29.000 mm by construction of the test profile (derived).
    const auto r = back.radiusAtZ(40.0);
    REQUIRE(r.has_value());
    CHECK_THAT(2 * *r, WithinAbs(2 * profile.radiusAt(40.0), 1e-3));
    CHECK_THAT(2 * *r, WithinAbs(29.0, 1e-3));
    // The bounding box spans the profile: the stock's stick-out, 60 mm.
    const BoxMm b = back.bounds();
    CHECK_THAT(b.zMin, WithinAbs(0.0, 1e-6));
    CHECK_THAT(b.zMax, WithinAbs(60.0, 1e-6));
    CHECK_THAT(b.zMax - b.zMin, WithinAbs(60.0, 1e-6));
    CHECK_THAT(b.xMax, WithinAbs(15.0, 1e-6));
}

TEST_CASE("several named solids go into one STEP file", "[geometry][step]") {
    const fs::path dir = freshDir("step-named");
    Stock stock;
    stock.diameterMm = 20;
    stock.stickOutMm = 40;
    const Solid bar = stockSolid(stock);
    const Solid cut = polylineSolid({{0, 8}, {40, 8}});
    const std::string path = (dir / "two.step").string();
    writeStep(path, {{"bar", bar}, {"turned", cut}});
    const Solid back = readStep(path);
    CHECK(back.solidCount() == 2);
    // derived: two closed-form cylinders.
    CHECK_THAT(back.volumeMm3(), WithinRel(kPi * (100.0 + 64.0) * 40.0, 1e-9));
}

TEST_CASE("a STEP file that cannot be written leaves nothing behind", "[geometry][step]") {
    const fs::path dir = freshDir("step-bad");
    const std::string path = (dir / "no-such-folder" / "as-cut.step").string();
    const Solid cut = polylineSolid({{0, 8}, {40, 8}});
    CHECK_THROWS_AS(writeStep(path, {{"as-cut", cut}}), OutputError);
    CHECK_FALSE(fs::exists(path));
    CHECK_FALSE(fs::exists(path + ".tmp"));
    CHECK_THROWS_AS(writeStep((dir / "empty.step").string(), {}), GeometryError);
    CHECK_THROWS_AS(readStep((dir / "missing.step").string()), GeometryError);
}
