// Extreme but valid scenes (tests/extreme_scenes/): each `swarf run` either finishes with its
// files and a sensible verdict, or is refused with exit 2 before anything is written, naming the
// key to change and a figure that would fit. Never std::bad_alloc, never exit 70.
//
// One test case per scene, so ctest runs them side by side.
#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <sys/wait.h>
#include <unistd.h>

namespace fs = std::filesystem;

namespace {

struct Run {
    int exitCode = -1;
    std::string err;
    fs::path out;
};

std::string slurp(const fs::path& path) {
    std::ifstream in(path);
    std::stringstream ss;
    ss << in.rdbuf();
    return ss.str();
}

// swarf run on tests/extreme_scenes/NAME.toml into a fresh folder; stderr kept.
Run runExtreme(const std::string& name, const std::string& env = "",
               const std::string& extra = "") {
    Run r;
    r.out = fs::temp_directory_path() / ("swarf-extreme-" + name + "-" + std::to_string(getpid()));
    fs::remove_all(r.out);
    const fs::path scene = fs::path(SWARF_TEST_DATA_DIR) / "extreme_scenes" / (name + ".toml");
    const fs::path errFile = r.out.string() + ".stderr";
    const std::string cmd = env + " '" + std::string(SWARF_BINARY) + "' run '" + scene.string() +
                            "' --out '" + r.out.string() + "' " + extra + " >/dev/null 2>'" +
                            errFile.string() + "'";
    const int status = std::system(cmd.c_str());
    r.exitCode = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
    r.err = slurp(errFile);
    fs::remove(errFile);
    return r;
}

nlohmann::json finished(const Run& r) {
    INFO(r.err);
    REQUIRE(r.exitCode <= 1); // 0 in tolerance, 1 out of tolerance: both are results
    REQUIRE(fs::exists(r.out / "result.json"));
    CHECK(fs::exists(r.out / "as-cut.step"));
    CHECK(fs::exists(r.out / "part.png"));
    CHECK(r.err.find("internal error") == std::string::npos);
    return nlohmann::json::parse(slurp(r.out / "result.json"));
}

// The arc cusp of a nose radius r fed f a revolution: r - sqrt(r^2 - f^2/4).
// Source: common practice (plain geometry of one arc repeated every feed).
double cuspMm(double rMm, double fMm) {
    return rMm - std::sqrt(rMm * rMm - fMm * fMm / 4);
}

} // namespace

TEST_CASE("extreme: 3600 samples round the part finish, with the surface as triangles",
          "[cli][extreme]") {
    const Run r = runExtreme("angle-samples-3600", "", "--surface-stl");
    const auto j = finished(r);
    CHECK(j["surface"]["angle_samples"] == 3600);
    CHECK(fs::file_size(r.out / "surface.stl") > 0);
    fs::remove_all(r.out);
}

TEST_CASE("extreme: a bar a metre out of the chuck finishes", "[cli][extreme]") {
    const Run r = runExtreme("bar-1m");
    const auto j = finished(r);
    CHECK(j["profile"]["samples"].get<double>() > 400000);
    CHECK(j["verdict"] == "in_tolerance");
    fs::remove_all(r.out);
}

TEST_CASE("extreme: a 0.05 degree cone finishes with its half angle", "[cli][extreme]") {
    const Run r = runExtreme("cone-0.05deg");
    const auto j = finished(r);
    bool seen = false;
    for (const auto& f : j["features"])
        if (f["kind"] == "cone") {
            seen = true;
            CHECK(f["as_cut_half_angle_deg"].get<double>() == Approx(0.05).margin(0.005));
        }
    CHECK(seen);
    fs::remove_all(r.out);
}

TEST_CASE("extreme: an 89 degree cone finishes with its half angle", "[cli][extreme]") {
    const Run r = runExtreme("cone-89deg");
    const auto j = finished(r);
    bool seen = false;
    for (const auto& f : j["features"])
        if (f["kind"] == "cone") {
            seen = true;
            CHECK(f["as_cut_half_angle_deg"].get<double>() == Approx(89).margin(0.1));
        }
    CHECK(seen);
    fs::remove_all(r.out);
}

TEST_CASE("extreme: a finish at 0.005 mm a revolution finishes with marks of its arc cusp",
          "[cli][extreme]") {
    const Run r = runExtreme("feed-0.005");
    const auto j = finished(r);
    // Nose radius 0.4 mm (the scene), feed 0.005 mm: a cusp of 0.0078 µm.
    CHECK(j["roughness"]["rt_um"].get<double>() == Approx(cuspMm(0.4, 0.005) * 1000).epsilon(0.01));
    fs::remove_all(r.out);
}

TEST_CASE("extreme: the fine 50 mm cone (0.02 mm/rev, 0.0005 mm step, 1440 angles) finishes",
          "[cli][extreme]") {
    const Run r = runExtreme("fine-cone");
    const auto j = finished(r);
    CHECK(j["profile"]["step_mm"].get<double>() == Approx(0.0005));
    CHECK(j["surface"]["angle_samples"] == 1440);
    CHECK(j["verdict"] == "in_tolerance");
    fs::remove_all(r.out);
}

TEST_CASE("extreme: a plan of 500 passes is refused at the 201st, before any work",
          "[cli][extreme]") {
    // A scene holds at most 200 passes (scenes/README.md, "Size of a plan").
    const Run r = runExtreme("passes-500");
    INFO(r.err);
    CHECK(r.exitCode == 2);
    CHECK(r.err.find("passes-500.toml:") != std::string::npos);
    CHECK(r.err.find("plan.pass[201]: expected at most 200 passes in a plan (this one has 500)") !=
          std::string::npos);
    CHECK_FALSE(fs::exists(r.out));
}

TEST_CASE("extreme: a scene the machine cannot hold is refused first, with what would fit",
          "[cli][extreme]") {
    // Capped at 8 GB, so the refusal does not depend on the machine running the test.
    const Run r = runExtreme("refused-memory", "SWARF_MEMORY_MB=8000");
    INFO(r.err);
    CHECK(r.exitCode == 2);
    CHECK(r.err.find("refused-memory.toml:") != std::string::npos);
    CHECK(r.err.find("sim.profile_step") != std::string::npos);
    CHECK(r.err.find("fits") != std::string::npos);
    CHECK_FALSE(fs::exists(r.out)); // nothing written, not even the folder
}

TEST_CASE("extreme: the fine cone on a small machine is refused with the step that would fit",
          "[cli][extreme]") {
    // SWARF_MEMORY_MB caps what the run may count on, as a smaller machine would have.
    const Run r = runExtreme("fine-cone", "SWARF_MEMORY_MB=350");
    INFO(r.err);
    CHECK(r.exitCode == 2);
    CHECK(r.err.find("sim.profile_step = 0.0005") != std::string::npos);
    CHECK(r.err.find("or more fits") != std::string::npos);
    CHECK_FALSE(fs::exists(r.out));
}
