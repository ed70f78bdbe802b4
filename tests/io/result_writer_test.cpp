// Tests for sim/io/include/swarf/io/result_writer.h: the fields of result.json and profile.csv.
#include "swarf/io/result_writer.h"

#include "swarf/io/scene_reader.h"
#include "swarf/sim/error.h"
#include "swarf/sim/kernel.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <filesystem>
#include <fstream>
#include <sstream>

using namespace swarf;

TEST_CASE("result.json holds the listed fields in mm", "[result_writer]") {
    Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor-no-offset.toml");
    s.sim.angleSamples = 12;
    const CutResult r = simulate(s);
    const auto j = nlohmann::json::parse(io::resultJson(s, r));
    CHECK(j["verdict"] == "out_of_tolerance");
    CHECK(j["gauge"]["plane_z_mm"].get<double>() == Approx(40.0));
    CHECK(j["gauge"]["nominal_diameter_mm"].get<double>() == Approx(29.0));
    CHECK(j["gauge"]["as_cut_diameter_mm"].get<double>() == Approx(r.gaugeAsCutDiameterMm));
    CHECK(j["deviation"]["max_left_on_mm"].get<double>() == Approx(r.maxLeftOnMm));
    CHECK(j["deviation"]["max_overcut_mm"].get<double>() == Approx(r.maxOvercutMm));
    CHECK(j["volume"]["removed_mm3"].get<double>() ==
          Approx(j["volume"]["stock_mm3"].get<double>() - j["volume"]["as_cut_mm3"].get<double>()));
    CHECK(j["roughness"].contains("rt_um"));
    CHECK(j["roughness"].contains("ra_um"));
    REQUIRE(j["findings"].size() == r.findings.size());
    REQUIRE_FALSE(j["findings"].empty());
    CHECK(j["findings"][0]["kind"] == "left_on");
    CHECK(j["findings"][0]["pass"] == 3);
    CHECK(j["passes"].size() == s.plan.passes.size());
    CHECK(j["features"].size() == s.part.features.size());
    // Per-pass removed volumes add up to the whole (derived).
    double sum = 0;
    for (const auto& p : j["passes"])
        sum += p["removed_mm3"].get<double>();
    CHECK(sum == Approx(r.removedVolumeMm3).epsilon(1e-9));
}

TEST_CASE("profile.csv has one row per sample and empty cells off the drawing", "[result_writer]") {
    Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    s.sim.angleSamples = 4;
    const CutResult r = simulate(s);
    std::istringstream in(io::profileCsv(r));
    std::string line;
    std::getline(in, line);
    CHECK(line == "z_mm,nominal_radius_mm,as_cut_radius_mm,deviation_mm,crest_radius_mm,"
                  "crest_deviation_mm");
    std::size_t rows = 0, empty = 0;
    while (std::getline(in, line)) {
        ++rows;
        if (line.find(",,") != std::string::npos)
            ++empty;
    }
    CHECK(rows == r.asCut.radiusMm.size());
    CHECK(empty > 0); // past the drawing's end (z > 80), toward the jaws
}

TEST_CASE("result files are written whole or not at all", "[result_writer]") {
    Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    s.sim.angleSamples = 4;
    const CutResult r = simulate(s);
    const auto dir = std::filesystem::temp_directory_path() / "swarf-result-writer-test";
    std::filesystem::create_directories(dir);
    const std::string path = (dir / "result.json").string();
    io::writeResultJson(path, s, r);
    CHECK(std::filesystem::exists(path));
    CHECK_FALSE(std::filesystem::exists(path + ".tmp"));
    CHECK_THROWS_AS(io::writeResultJson((dir / "no-such-dir" / "result.json").string(), s, r),
                    OutputError);
}
