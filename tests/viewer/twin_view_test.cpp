// The twin in the window (key w): the ghost of the twin's as-cut part toggles, the panel shows
// the differences, and without a twin the panel says there is none.
#include "swarf/app/display.h"
#include "swarf/io/scene_reader.h"
#include "swarf/sim/causes.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/twin_difference.h"
#include "swarf/viewer/viewer.h"

#include "support/synthetic.h"

#include <catch2/catch.hpp>

#include <memory>
#include <string>

using namespace swarf;

namespace {

viewer::ViewerOptions smallWindow() {
    viewer::ViewerOptions o;
    o.offScreen = true;
    o.widthPx = 400;
    o.heightPx = 300;
    o.noTwinNote = "Give one with --twin FILE.";
    return o;
}

bool contains(const std::string& text, const std::string& piece) {
    return text.find(piece) != std::string::npos;
}

} // namespace

TEST_CASE("key w shows and hides the twin's ghost and the differences", "[viewer][twin]") {
    app::ensureDisplay();
    const Scene s = test::syntheticScene(3);
    CutResult r = test::syntheticResult(s, [](int k) { return 1.0 - 0.4 * k; });
    CutResult t = test::syntheticResult(s, [](int k) { return 1.0 - 0.45 * k; });
    // Gauge diameters 0.2 mm apart (derived: 0.1 mm less on radius, twice that on diameter).
    r.gaugeZMm = t.gaugeZMm = 20;
    r.gaugeAsCutDiameterMm = 2 * (10 + 0.05 * 20 + 0.2);
    t.gaugeAsCutDiameterMm = 2 * (10 + 0.05 * 20 + 0.1);
    viewer::ViewerSession view(s, r, smallWindow());
    viewer::TwinView twin{s, std::make_shared<const CutResult>(t), "synthetic-right.toml", false};
    view.setTwin(twin);
    CHECK_FALSE(view.twinShown());
    CHECK_FALSE(view.twinGhostDrawn());
    CHECK_FALSE(contains(view.panelText(), "synthetic-right.toml"));

    REQUIRE(view.pressKey("w"));
    view.render();
    CHECK(view.twinShown());
    CHECK(view.twinGhostDrawn());
    const std::string panel = view.panelText();
    INFO(panel);
    CHECK(contains(panel, "synthetic-right.toml"));
    const TwinDifference d = twinDifference(s, r, s, t);
    CHECK(d.gaugeDiameterChangeMm == Approx(0.2).margin(1e-12));
    CHECK(contains(panel, "difference " + formatDiameterChange(0.2, s.units)));

    // The close-up shows one stretch of this part: no ghost there; back to the whole part, back.
    REQUIRE(view.pressKey("c"));
    CHECK_FALSE(view.twinGhostDrawn());
    REQUIRE(view.pressKey("r"));
    CHECK(view.twinGhostDrawn());

    REQUIRE(view.pressKey("w"));
    view.render();
    CHECK_FALSE(view.twinShown());
    CHECK_FALSE(view.twinGhostDrawn());
    CHECK_FALSE(contains(view.panelText(), "synthetic-right.toml"));
}

TEST_CASE("a twin given to be shown at the start is on at once", "[viewer][twin]") {
    app::ensureDisplay();
    const Scene s = test::syntheticScene(2);
    const CutResult r = test::syntheticResult(s, [](int k) { return 0.5 - 0.5 * k; });
    viewer::ViewerSession view(s, r, smallWindow());
    view.setTwin({s, std::make_shared<const CutResult>(r), "same.toml", true});
    CHECK(view.twinShown());
    CHECK(view.twinGhostDrawn());
    CHECK(contains(view.panelText(), "difference " + formatDiameterChange(0.0, s.units)));
}

TEST_CASE("key w without a twin says so in the panel", "[viewer][twin]") {
    app::ensureDisplay();
    const Scene s = test::syntheticScene(2);
    const CutResult r = test::syntheticResult(s, [](int k) { return 0.5 - 0.5 * k; });
    viewer::ViewerSession view(s, r, smallWindow());
    CHECK_FALSE(contains(view.panelText(), "Twin: none"));
    REQUIRE(view.pressKey("w"));
    CHECK(view.twinShown());
    CHECK_FALSE(view.twinGhostDrawn());
    CHECK(contains(view.panelText(), "Twin: none. Give one with --twin FILE."));
    CHECK(view.twinShown());
    REQUIRE(view.pressKey("w"));
    CHECK_FALSE(contains(view.panelText(), "Twin: none"));
}

TEST_CASE("the panel names the cause at the pass that brought it in, in words",
          "[viewer][causes]") {
    // Lesson 1's mistake: the finishing pass (the last) set with the tip on the drawn line; the
    // cone comes out 2ΔX = 0.039 mm large (references R1, the nose-radius offset).
    app::ensureDisplay();
    const Scene s =
        io::readScene(std::string(SWARF_SCENES_DIR) + "/lessons/01-shallow-offset-mistake.toml");
    CutResult r = simulate(s);
    r.causes = findCauses(s, r);
    REQUIRE_FALSE(r.causes.empty());
    viewer::ViewerSession view(s, r, smallWindow());
    const int last = static_cast<int>(s.plan.passes.size());
    view.setPosition(last);
    CHECK(contains(view.panelText(), "Brings in the nose-radius offset: cone 0.0390 mm larger"));
    CHECK_FALSE(contains(view.panelText(), "nose_offset"));
    // A roughing pass brought nothing in.
    view.setPosition(1);
    CHECK_FALSE(contains(view.panelText(), "Brings in"));
}

TEST_CASE("the panel names a bored part's cause at its pass", "[viewer][causes][inside]") {
    // The collet seat bored without the inside offset: the bore comes out 2ΔX = 0.039 mm small
    // (references R1, mirrored inside).
    app::ensureDisplay();
    const Scene s = io::readScene(std::string(SWARF_SCENES_DIR) + "/bore-socket-no-offset.toml");
    CutResult r = simulate(s);
    r.causes = findCauses(s, r);
    REQUIRE_FALSE(r.causes.empty());
    CHECK(r.causes.front().source == "nose_offset");
    viewer::ViewerSession view(s, r, smallWindow());
    view.setPosition(static_cast<int>(s.plan.passes.size()));
    INFO(view.panelText());
    CHECK(contains(view.panelText(), "Brings in the nose-radius offset"));
    CHECK(contains(view.panelText(), "0.0390 mm"));
}
