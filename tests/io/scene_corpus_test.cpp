// The scene corpus: simulate every scene in scenes/ and check what its [expect] table declares
// (verdict, findings that must be raised, or none at all). Also: the same scene gives the same
// numbers on every run, and the demo's good plan raises no finding.
#include "swarf/io/result_writer.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/kernel.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <filesystem>
#include <string>

namespace fs = std::filesystem;
using namespace swarf;

TEST_CASE("every scene in scenes/ gives what it expects", "[corpus][kernel]") {
    int checked = 0;
    std::vector<fs::path> files;
    for (const auto& e : fs::directory_iterator(SWARF_SCENES_DIR))
        if (e.path().extension() == ".toml")
            files.push_back(e.path());
    std::sort(files.begin(), files.end());
    for (const fs::path& p : files) {
        const Scene s = io::readScene(p.string());
        if (s.plan.passes.empty())
            continue; // planning scenes: `swarf plan` makes their plan
        INFO(p.filename().string());
        const CutResult r = simulate(s);
        ++checked;
        if (s.expect.withinTolerance)
            CHECK(r.withinTolerance == *s.expect.withinTolerance);
        for (const std::string& kind : s.expect.findings) {
            INFO("expected finding " << kind);
            const bool found =
                std::any_of(r.findings.begin(), r.findings.end(),
                            [&](const Finding& f) { return kind == findingKindName(f.kind); });
            CHECK(found);
        }
        if (s.expect.noFindings) {
            for (const Finding& f : r.findings)
                INFO(findingKindName(f.kind) << ": " << f.message);
            CHECK(r.findings.empty());
        }
        // Removed volume is stock minus as-cut on the same samples (property).
        CHECK(r.removedVolumeMm3 == Approx(r.stockVolumeMm3 - r.asCutVolumeMm3));
        CHECK(r.removedVolumeMm3 >= 0);
    }
    CHECK(checked >= 8);
}

TEST_CASE("the demo's plan raises no finding and is in tolerance", "[corpus][kernel]") {
    const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/fixture-arbor.toml");
    const CutResult r = simulate(s);
    for (const Finding& f : r.findings)
        INFO(findingKindName(f.kind) << ": " << f.message);
    CHECK(r.findings.empty());
    CHECK(r.withinTolerance);
}

TEST_CASE("the same scene gives the same numbers on every run", "[corpus][kernel]") {
    Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/finding-overcut.toml");
    const CutResult a = simulate(s), b = simulate(s);
    CHECK(a.asCut.radiusMm == b.asCut.radiusMm);
    CHECK(a.surface.radiusMm == b.surface.radiusMm);
    CHECK(a.surface.zMm == b.surface.zMm);
    CHECK(io::resultJson(s, a) == io::resultJson(s, b));
    CHECK(io::profileCsv(a) == io::profileCsv(b));
}
