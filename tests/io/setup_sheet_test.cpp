// The set-up sheet: safety cautions, every pass's readings in the user's units as turns and
// divisions, the checks and roughness, and a self-contained HTML page.
#include "swarf/io/scene_reader.h"
#include "swarf/io/setup_sheet.h"
#include "swarf/sim/planner.h"
#include "swarf/sim/sensitivity.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <string>

using namespace swarf;

namespace {

ConePlan planOf(const std::string& name) {
    return planCone(io::readScene(std::string(SWARF_SCENES_DIR) + "/" + name));
}

bool has(const std::string& text, const std::string& part) {
    return text.find(part) != std::string::npos;
}

// The text with its line breaks and indents (the plain-text sheet wraps at 98 columns) taken
// back to single spaces.
std::string flat(const std::string& text) {
    std::string out;
    bool space = false;
    for (char c : text) {
        if (c == ' ' || c == '\n') {
            space = true;
            continue;
        }
        if (space && !out.empty())
            out += ' ';
        space = false;
        out += c;
    }
    return out;
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
        CHECK(has(text, "turn the chuck by hand"));
        // tool steel: no lead caution
        CHECK_FALSE(has(text, "contains lead"));
    }
    // A leaded free-cutting steel (11SMnPb30) gets the lead caution (common practice).
    const ConePlan leaded = planOf("plan-1-20-chuck-out.toml");
    REQUIRE(leaded.planned);
    CHECK(has(io::setupSheetText(leaded), "This material contains lead"));
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

TEST_CASE("the sheet follows the order of the shop", "[io][sheet]") {
    // common practice: the datum face first, the tool on centre height, the bar measured and
    // touched off, the compound set, the passes, then the checks with the spindle stopped.
    for (const char* name : {"plan-7-24-taper.toml", "plan-1-20-chuck-out.toml"}) {
        INFO(name);
        const ConePlan plan = planOf(name);
        REQUIRE(plan.planned);
        for (const std::string& text :
             {flat(io::setupSheetText(plan)), flat(io::setupSheetHtml(plan))}) {
            const auto face = text.find("Face the end to length first");
            const auto height = text.find("centre height");
            const auto bar = text.find("measure the bar with a micrometer");
            const auto compound = text.find("Swing the compound");
            const auto cone = text.find("cone roughing pass 1");
            const auto check = text.find("Stop the spindle. Before finishing");
            REQUIRE(face != std::string::npos);
            REQUIRE(height != std::string::npos);
            REQUIRE(bar != std::string::npos);
            REQUIRE(compound != std::string::npos);
            REQUIRE(cone != std::string::npos);
            REQUIRE(check != std::string::npos);
            CHECK(face < height);
            CHECK(height < bar);
            CHECK(bar < compound);
            CHECK(compound < cone);
            CHECK(cone < check);
            // Measured under or over size: the dial is set from the measured diameter.
            CHECK(has(text, "if it measured Ø d instead, set the dial to read ("));
            // The compound by sine bar, or by an indicator on a test bar: L·sin θ.
            CHECK(has(text, "L·sin θ = "));
            CHECK(has(text, "Sine bar"));
        }
    }
}

TEST_CASE("each pass says which way it feeds, which edge cuts, and the way there and back",
          "[io][sheet]") {
    const ConePlan out = planOf("plan-1-20-chuck-out.toml");
    const ConePlan in = planOf("plan-1-20-tailstock-in.toml");
    REQUIRE(out.planned);
    REQUIRE(in.planned);
    const std::string a = flat(io::setupSheetText(out)), b = flat(io::setupSheetText(in));
    CHECK(has(a, "It feeds toward the chuck and out, main edge cutting."));
    CHECK_FALSE(has(a, "trailing edge cutting"));
    CHECK(has(b, "It feeds toward the tailstock and in, trailing edge cutting."));
    CHECK(has(b, "relief at the start of the cone passes"));
    CHECK(has(b, "nose and trailing edge cutting (plunging)"));
    for (const std::string& t : {a, b}) {
        CHECK(has(t, "Then back the cross-slide out to "));
        CHECK(has(t, "wind the compound back to "));
        CHECK(has(t, "feed the cross-slide in to "));
        CHECK(has(t, "back out to"));
    }
    // The handwheel pace of a hand-fed compound pass (derived): 0.06 mm/rev at 700 rev/min is
    // 42 mm a minute; one turn of the compound's dial is 100 × 0.02 = 2 mm: 21 turns a minute.
    CHECK(handwheelTurnsPerMinute(out.scene.setup, out.scene.plan.passes.back()) ==
          Approx(0.06 * 700 / 2.0));
    CHECK(has(a, "about 21 turns a minute at 700 rev/min"));
}

TEST_CASE("the sheet's sensitivities match the closed forms", "[io][sheet]") {
    for (const char* name : {"plan-7-24-taper.toml", "plan-morse-2-inch.toml"}) {
        INFO(name);
        const ConePlan plan = planOf(name);
        REQUIRE(plan.planned);
        const Units u = plan.scene.units;
        const double th = plan.halfAngleRad;
        const double step = u == Units::Inch ? 0.005 * kMmPerInch : 0.1;
        const double minute = kPi / 180.0 / 60.0;
        const ConeSensitivity s = coneSensitivity(plan);
        // Source: references R10 (two diameters on one cone: tan θ = (D2 − D1) / (2 (z2 − z1)),
        // so measuring δz off along the axis moves the diameter by 2 δz tan θ), derived.
        CHECK(s.perAxialStepMm == Approx(2 * step * std::tan(th)));
        // derived from the machine model (scenes/README.md): a diameter dial's division is
        // that much on diameter, a radius dial's twice it.
        const Setup& su = plan.scene.setup;
        CHECK(s.perCrossDivisionMm == Approx(su.crossDial == DialMode::Diameter
                                                 ? su.cross.mmPerDivision
                                                 : 2 * su.cross.mmPerDivision));
        // derived: the finishing line pivots where its compound reads 0, z0 = zero_z + saddle;
        // turning it by δθ moves the radius at z by (z − z0) δθ / cos²θ.
        const Pass& fin = plan.scene.plan.passes[static_cast<std::size_t>(plan.finishPass)];
        const double z0 = su.zeroZMm + fin.saddleMm;
        CHECK(s.pivotZMm == Approx(z0));
        CHECK(s.perCompoundMinuteMm ==
              Approx(2 * std::fabs(plan.checkZMm - z0) * minute / std::pow(std::cos(th), 2)));
        // Source: references R7 (a tip h off centre cuts radius √(x² + h²); diameter error
        // ≈ 2h²/D): on centre, the step off centre.
        const double D = plan.checkDiameterFinishedMm;
        CHECK(s.perToolHeightStepMm == Approx(2 * (std::sqrt(D * D / 4 + step * step) - D / 2)));
        CHECK(s.perToolHeightStepMm == Approx(2 * step * step / D).epsilon(0.001));
        // Source: references R6 (rolls: M2 − M1 = 2 (h2 − h1) tan θ), derived: d(M2 − M1)/dθ =
        // 2 (h2 − h1) / cos²θ, so (Δ′ − Δ) calls for turning the compound by
        // (Δ′ − Δ) cos²θ / (2 (h2 − h1)).
        const double span = std::fabs(plan.rolls.z2Mm - plan.rolls.z1Mm);
        CHECK(s.compoundPerRollMmRad == Approx(std::pow(std::cos(th), 2) / (2 * span)));
        // Source: references R10 (an indicator over compound travel L changes by L Δθ cos θ).
        CHECK(s.indicatorPerMinuteMm == Approx(plan.indicatorTravelMm * minute * std::cos(th)));
        CHECK(plan.indicatorMoveMm == Approx(plan.indicatorTravelMm * std::sin(th)));
        // The sheet shows the same numbers, in the scene's units.
        for (const std::string& text :
             {flat(io::setupSheetText(plan)), flat(io::setupSheetHtml(plan))}) {
            CHECK(has(text, formatLength(s.perAxialStepMm, u, Precision::Fine)));
            CHECK(has(text, formatLength(s.perCrossDivisionMm, u, Precision::Fine)));
            CHECK(has(text, formatLength(s.perCompoundMinuteMm, u, Precision::Fine)));
            CHECK(has(text, formatLength(s.perToolHeightStepMm, u, Precision::Fine)));
            // The trial-cut rule names the finishing reading and the diameter before finishing.
            CHECK(has(text, "finish at cross-slide reading " +
                                formatLengthNumber(plan.finishCrossMm, u) + " + (D′ − " +
                                formatLengthNumber(plan.checkDiameterRoughMm, u) + ")"));
            CHECK(has(text, "If the roll readings differ by Δ′ instead of"));
        }
    }
}
