// Every planning scene in scenes/: its plan's readings fall on whole divisions of the dial, as
// the person reads them (stage A counting from the bar), and the plan still holds the drawing's
// tolerances with them (the exact profile swept and compared). Only a reading the plan marks
// as half a division may be one.
#include "swarf/io/scene_reader.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/planner.h"
#include "swarf/sim/sweep.h"
#include "swarf/sim/tool_outline.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cctype>
#include <cmath>
#include <filesystem>
#include <string>

namespace fs = std::filesystem;
using namespace swarf;

namespace {

// Whole (or, with `half`, half) divisions of `slide`.
bool onDivision(const Slide& slide, double readingMm, bool half = false) {
    const double steps = readingMm / slide.mmPerDivision * (half ? 2.0 : 1.0);
    return std::fabs(steps - std::round(steps)) < 1e-6;
}

} // namespace

TEST_CASE("every plan scene's readings are whole divisions and within tolerance",
          "[io][planner][divisions]") {
    int planned = 0;
    for (const auto& e : fs::directory_iterator(SWARF_SCENES_DIR)) {
        const std::string name = e.path().filename().string();
        if (name.rfind("plan-", 0) != 0 || e.path().extension() != ".toml")
            continue;
        INFO(name);
        const ConePlan plan = planCone(io::readScene(e.path().string()));
        if (!plan.planned)
            continue; // the refused scenes are checked in scene_writer_test.cpp
        ++planned;
        const Setup& su = plan.scene.setup;
        const auto& passes = plan.scene.plan.passes;
        for (std::size_t k = 0; k < passes.size(); ++k) {
            INFO("pass " << k + 1);
            const Pass& p = passes[k];
            const bool stageA = plan.display[k].stage == 0;
            const double cOff = stageA ? plan.stage0CrossOffsetMm : 0.0;
            const double sOff = stageA ? plan.stage0SaddleOffsetMm : 0.0;
            const bool half =
                std::find(plan.halfDivisionPasses.begin(), plan.halfDivisionPasses.end(),
                          static_cast<int>(k)) != plan.halfDivisionPasses.end();
            switch (p.kind) {
            case PassKind::Compound:
                CHECK(onDivision(su.cross, p.crossMm + cOff, half));
                CHECK(onDivision(su.saddle, p.saddleMm + sOff));
                CHECK(onDivision(su.compound, p.fromMm));
                CHECK(onDivision(su.compound, p.toMm));
                break;
            case PassKind::Saddle:
                CHECK(onDivision(su.cross, p.crossMm + cOff, half));
                CHECK(onDivision(su.compound, p.compoundMm));
                CHECK(onDivision(su.saddle, p.fromMm + sOff));
                CHECK(onDivision(su.saddle, p.toMm + sOff));
                break;
            case PassKind::CrossSlide:
                CHECK(onDivision(su.compound, p.compoundMm));
                CHECK(onDivision(su.saddle, p.saddleMm + sOff));
                CHECK(onDivision(su.cross, p.fromMm + cOff));
                CHECK(onDivision(su.cross, p.toMm + cOff));
                break;
            case PassKind::Path:
                break;
            }
            REQUIRE(p.retractToMm);
            CHECK(onDivision(su.cross, *p.retractToMm + cOff));
        }
        // The half divisions the plan admits to are said in its cautions.
        for (int k : plan.halfDivisionPasses) {
            bool said = false;
            for (const std::string& c : plan.cautions)
                said = said || c.find("pass " + std::to_string(k + 1) +
                                      "'s cross-slide reading "
                                      "is set on half a division") != std::string::npos;
            CHECK(said);
        }
        // With those readings, the whole kernel (crests of the feed marks and all) holds every
        // feature's tolerance.
        const CutResult cut = simulate(plan.scene);
        const auto& reports = cut.features;
        for (const FeatureReport& r : reports) {
            INFO("feature " << plan.scene.part.features[static_cast<std::size_t>(r.feature)].name);
            CHECK(r.withinTolerance);
        }
    }
    CHECK(planned >= 10);
}

TEST_CASE("every measuring step of every plan says the spindle is stopped",
          "[io][planner][caution]") {
    // Common practice: nothing is measured on a turning part. The sheet's Measure steps, and
    // every step that puts an instrument on the work, say so in the step itself.
    auto lower = [](std::string s) {
        std::transform(s.begin(), s.end(), s.begin(),
                       [](unsigned char ch) { return static_cast<char>(std::tolower(ch)); });
        return s;
    };
    int measuring = 0;
    for (const auto& e : fs::directory_iterator(SWARF_SCENES_DIR)) {
        const std::string name = e.path().filename().string();
        if (name.rfind("plan-", 0) != 0 || e.path().extension() != ".toml")
            continue;
        const ConePlan plan = planCone(io::readScene(e.path().string()));
        if (!plan.planned)
            continue;
        for (const PlanStep& step : plan.steps) {
            const std::string t = lower(step.text);
            const bool instrument =
                step.kind == PlanStep::Kind::Measure || t.find("micrometer") != std::string::npos ||
                t.find("indicator") != std::string::npos || t.find(" rolls") != std::string::npos ||
                t.find("plug gauge") != std::string::npos ||
                t.find("ring gauge") != std::string::npos;
            if (!instrument)
                continue;
            INFO(name << ": " << step.text);
            ++measuring;
            CHECK((t.find("spindle stopped") != std::string::npos ||
                   t.find("stop the spindle") != std::string::npos));
        }
    }
    CHECK(measuring >= 10);
}
