// The set-up sheet: safety cautions, every pass's readings in the user's units as turns and
// divisions, the checks and roughness, and a self-contained HTML page.
#include "swarf/io/scene_reader.h"
#include "swarf/io/setup_sheet.h"
#include "swarf/sim/planner.h"

#include <catch2/catch.hpp>

#include <string>

using namespace swarf;

namespace {

ConePlan planOf(const std::string& name) {
    return planCone(io::readScene(std::string(SWARF_SCENES_DIR) + "/" + name));
}

bool has(const std::string& text, const std::string& part) {
    return text.find(part) != std::string::npos;
}

} // namespace

TEST_CASE("the sheet carries the safety cautions", "[io][sheet]") {
    const ConePlan plan = planOf("plan-lathe-centre.toml");
    REQUIRE(plan.planned);
    for (const std::string& text : {io::setupSheetText(plan), io::setupSheetHtml(plan)}) {
        CHECK(has(text, "chuck key"));
        CHECK(has(text, "gloves"));
        CHECK(has(text, "eye"));
        CHECK(has(text, "stick-out"));
        CHECK(has(text, "tooling supplier"));
        CHECK(has(text, "shop's rules"));
        CHECK(has(text, "forces"));
        CHECK(has(text, "deflection"));
        CHECK(has(text, "chatter"));
    }
}

TEST_CASE("each pass's readings appear as turns and divisions", "[io][sheet]") {
    const ConePlan plan = planOf("plan-lathe-centre.toml");
    REQUIRE(plan.planned);
    const std::string text = io::setupSheetText(plan);
    const Setup& su = plan.scene.setup;
    int compoundPasses = 0;
    for (const Pass& p : plan.scene.plan.passes) {
        if (p.kind != PassKind::Compound)
            continue;
        ++compoundPasses;
        // derived: 0.02 mm a division, 100 a turn; shown with no-break spaces inside [ ]
        const DialSetting d = dialSetting(su.cross, p.crossMm);
        char buf[64];
        std::snprintf(buf, sizeof buf, "%.3f\u00a0[%ld\u00a0t\u00a0+\u00a0", p.crossMm, d.turns);
        CHECK(has(text, buf));
    }
    CHECK(compoundPasses > 0);
    CHECK(has(text, "Rt"));
    CHECK(has(text, "rolls"));
    CHECK(has(text, "Sine bar"));
    CHECK(has(text, "increasing direction"));
    CHECK(io::dialReadingText(su.cross, -0.5, Units::Mm) == "-0.500 mm (-1 turns + 75 div)");
}

TEST_CASE("an inch scene's sheet is in inch", "[io][sheet][units]") {
    const ConePlan plan = planOf("plan-morse-3-inch.toml");
    REQUIRE(plan.planned);
    const std::string text = io::setupSheetText(plan);
    CHECK(has(text, "0.9380 in"));
    CHECK(has(text, "thou"));
    CHECK_FALSE(has(text, " mm"));
}

TEST_CASE("the HTML page is self-contained", "[io][sheet]") {
    const std::string html = io::setupSheetHtml(planOf("plan-7-24-taper.toml"));
    CHECK(html.rfind("<!DOCTYPE html>", 0) == 0);
    CHECK_FALSE(has(html, "http"));
    CHECK_FALSE(has(html, "<script"));
    CHECK_FALSE(has(html, "<link"));
    CHECK(has(html, "@media print"));
    CHECK(has(html, "</html>"));
}

TEST_CASE("a refused cone's sheet gives the reasons and the suggestions", "[io][sheet]") {
    const ConePlan plan = planOf("plan-valve-seat-rub.toml");
    REQUIRE_FALSE(plan.planned);
    const std::string text = io::setupSheetText(plan);
    CHECK(has(text, "cannot follow"));
    CHECK(has(text, "shape V"));
    CHECK(has(text, "chuck key"));
}
