// Every place shows the figures result.json holds, on every scene: report.html, the window's
// panel at the finished part and the close-up's label (the same text the pictures carry; the
// pictures' own labels are checked on two scenes). The terminal is checked in
// tests/cli/run_cli_test.cpp.
#include "swarf/app/display.h"
#include "swarf/io/report.h"
#include "swarf/io/result_writer.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/planner.h"
#include "swarf/viewer/snapshots.h"
#include "swarf/viewer/viewer.h"

#include <catch2/catch.hpp>
#include <nlohmann/json.hpp>

#include <algorithm>
#include <filesystem>
#include <string>
#include <vector>

using namespace swarf;
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

// The figures as result.json holds them, formatted for people in the scene's units.
struct Expected {
    std::string leftOn, overcut, rt, ra;
    std::vector<std::pair<std::string, std::string>> features; // left on, overcut
};

Expected fromJson(const Scene& s, const CutResult& r) {
    const nlohmann::json j = nlohmann::json::parse(io::resultJson(s, r));
    const Units u = s.units;
    Expected e;
    e.leftOn = formatSmallLength(j["deviation"]["max_left_on_mm"].get<double>(), u);
    e.overcut = formatSmallLength(j["deviation"]["max_overcut_mm"].get<double>(), u);
    e.rt = formatRoughness(j["roughness"]["rt_um"].get<double>(), u);
    e.ra = formatRoughness(j["roughness"]["ra_um"].get<double>(), u);
    for (const auto& f : j["features"])
        e.features.emplace_back(formatSmallLength(f["max_left_on_mm"].get<double>(), u),
                                formatSmallLength(f["max_overcut_mm"].get<double>(), u));
    return e;
}

bool contains(const std::string& text, const std::string& piece) {
    return text.find(piece) != std::string::npos;
}

} // namespace

TEST_CASE("the report and the window show result.json's figures, on every scene",
          "[viewer][figures]") {
    app::ensureDisplay();
    int checked = 0;
    for (const fs::path& file : sceneFiles()) {
        INFO(file.filename().string());
        Scene s = io::readScene(file.string());
        if (s.plan.passes.empty()) {
            // A scene for `swarf plan`: as planned (several end against a shoulder, whose
            // corner the figures leave out as the verdict does).
            const ConePlan plan = planCone(s);
            if (plan.planned)
                s = plan.scene;
        }
        const CutResult r = simulate(s);
        const Expected e = fromJson(s, r);

        const std::string html = io::reportHtml(s, r);
        CHECK(contains(html, "Most metal left on: " + e.leftOn));
        CHECK(contains(html, "most overcut: " + e.overcut));
        CHECK(contains(html, "Rt " + e.rt + ", Ra " + e.ra));
        for (const auto& [left, over] : e.features)
            CHECK(contains(html, "<td class=\"num\">" + left + "</td><td class=\"num\">" + over));

        if (s.plan.passes.empty())
            continue; // the window has no finished part to show
        viewer::ViewerOptions o;
        o.offScreen = true;
        o.widthPx = 320;
        o.heightPx = 240;
        viewer::ViewerSession view(s, r, o);
        view.pressKey("End");
        const std::string panel = view.panelText();
        INFO(panel);
        CHECK(contains(panel, "most left on " + e.leftOn + ", most overcut " + e.overcut));
        CHECK(contains(panel, "Rt " + e.rt + ", Ra " + e.ra));
        // The close-up's label gives the marks' height, outside and in a bore (where the marks
        // are measured but the close-up draws the exact bore without them).
        if (r.rtUm > 0) {
            view.pressKey("c");
            CHECK(contains(view.closeUpText(), e.rt + " high (Rt)"));
        }
        ++checked;
    }
    CHECK(checked >= 17);
}

TEST_CASE("the pictures carry the same figures", "[viewer][figures][snapshots]") {
    app::ensureDisplay();
    // The demo, a stepped pin (three features, a steep shoulder) and a bored socket.
    for (const char* name :
         {"fixture-arbor.toml", "finding-rubbing.toml", "bore-socket-no-offset.toml"}) {
        INFO(name);
        const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/" + name);
        const CutResult r = simulate(s);
        const Expected e = fromJson(s, r);
        const fs::path dir = fs::temp_directory_path() / "swarf-figures-pictures";
        fs::remove_all(dir);
        viewer::SnapshotOptions so;
        so.widthPx = 400;
        so.heightPx = 300;
        const viewer::SnapshotReport pics = viewer::renderSnapshots(s, r, dir.string(), so);
        CHECK(contains(pics.partLabel, "most left on " + e.leftOn + ", most overcut " + e.overcut));
        CHECK(contains(pics.partLabel, "Rt " + e.rt));
        CHECK(contains(pics.marksLabel, e.rt + " high (Rt)"));
        fs::remove_all(dir);
    }
}
