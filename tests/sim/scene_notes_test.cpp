// Tests of sceneNotes: the notes `swarf check` prints on a valid scene, on scenes built in code.
#include "swarf/sim/scene_notes.h"

#include "kernel_scenes.h"
#include "swarf/sim/findings.h"
#include "swarf/sim/tool_outline.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <string>

using namespace swarf;
using namespace swarf::testing;

namespace {

// A 28 mm cone (at its gauge plane) on a 30 mm bar, 1:10, ending 30 mm before the jaws, with the
// tolerance marked as given in the scene; one compound pass at the cone's angle, the compound
// winding toward the chuck and out, so the main edge cuts (no note on the compound's sense).
Scene coneScene(double toleranceMm) {
    Scene s = barScene(30.0, 80.0);
    s.stock.tailstockSupport = false;
    Feature f = coneFeature(0, 50, 25, std::atan(0.05), toleranceMm);
    f.cone.gaugeZMm = 30;
    f.cone.gaugeDiameterMm = 28;
    f.toleranceFromClass = false;
    s.part.features.push_back(f);
    s.setup.compoundReadingRad = std::atan(0.05);
    s.setup.compoundAdvanceToward = Widens::TowardChuck;
    s.setup.compoundAdvanceAcross = Across::Out;
    s.setup.zeroDiameterMm = 30;
    Pass p;
    p.kind = PassKind::Compound;
    p.fromMm = 0;
    p.toMm = 55;
    p.feedMmPerRev = 0.1;
    s.plan.passes.push_back(p);
    s.validate();
    return s;
}

bool hasNote(const std::vector<std::string>& notes, const std::string& text) {
    return std::any_of(notes.begin(), notes.end(),
                       [&](const std::string& n) { return n.find(text) != std::string::npos; });
}

} // namespace

TEST_CASE("a plain scene gets no notes", "[sim][notes]") {
    CHECK(sceneNotes(coneScene(0.02)).empty());
}

TEST_CASE("a tolerance over a tenth of the diameter gets a note on its key", "[sim][notes]") {
    // derived: the limit is a tenth of the 28 mm gauge diameter, 2.8 mm.
    CHECK(sceneNotes(coneScene(2.8)).empty());
    const auto notes = sceneNotes(coneScene(15));
    REQUIRE(notes.size() == 1);
    CHECK(notes[0].find("part.feature[1].tolerance ± 15.000 mm") != std::string::npos);
    CHECK(notes[0].find("more than a tenth of its 28.000 mm diameter") != std::string::npos);
    CHECK(notes[0].find("is the unit right?") != std::string::npos);
    CHECK(hasNote(sceneNotes(coneScene(2.81)), "a tenth"));

    // A tolerance from the ISO 2768 class is the program's own: no note.
    Scene s = coneScene(15);
    s.part.features[0].toleranceFromClass = true;
    CHECK(sceneNotes(s).empty());
}

TEST_CASE("a feed per revolution above 1 mm gets a note, once for the plan", "[sim][notes]") {
    Scene s = coneScene(0.02);
    s.plan.passes[0].feedMmPerRev = 1.0;
    CHECK(sceneNotes(s).empty());
    s.plan.passes[0].feedMmPerRev = 100;
    s.plan.passes.push_back(s.plan.passes[0]);
    s.plan.passes.back().feedMmPerRev = 120;
    s.plan.passes.push_back(s.plan.passes[0]);
    s.plan.passes.back().feedMmPerRev = 0.1;
    const auto notes = sceneNotes(s);
    REQUIRE(notes.size() == 1);
    CHECK(notes[0].find("plan.pass[2].feed = 120.000 mm a revolution (and 1 more passes over "
                        "1.00 mm) is more than 1.00 mm a revolution: is it a feed per minute") !=
          std::string::npos);

    s = coneScene(0.02);
    s.planning.roughFeedMmPerRev = 100;
    CHECK(hasNote(sceneNotes(s), "planning.rough_feed = 100.000 mm a revolution"));
    s.planning.finishFeedMmPerRev = 1.5;
    CHECK(hasNote(sceneNotes(s), "planning.finish_feed = 1.500 mm a revolution"));
    CHECK(sceneNotes(s).size() == 2);

    s = coneScene(0.02);
    s.units = Units::Inch;
    s.plan.passes[0].feedMmPerRev = 2.54; // 0.1 in a revolution
    CHECK(hasNote(sceneNotes(s), "plan.pass[1].feed = 0.1000 in a revolution"));
}

TEST_CASE("a stick-out that leaves the insert no room past the part gets a note", "[sim][notes]") {
    Scene s = coneScene(0.02);
    const ToolOutline outline(s.tool);
    // derived: the insert reaches uMax − tip z past its imaginary tip toward the chuck and
    // should stay kJawClearanceMm clear of the jaws.
    const double reach = std::max(0.0, outline.uMaxMm() - outline.imaginaryTip().x());
    const double needed = 50 + reach + kJawClearanceMm;
    s.stock.stickOutMm = needed + 0.01;
    CHECK(sceneNotes(s).empty());
    s.stock.stickOutMm = needed - 0.01;
    const auto notes = sceneNotes(s);
    REQUIRE(notes.size() == 1);
    CHECK(notes[0].find("between the part's end and the jaws") != std::string::npos);
    CHECK(notes[0].find("a stick-out of at least " + formatLength(needed, Units::Mm)) !=
          std::string::npos);

    // The face allowance adds to the stick-out needed.
    s.stock.faceAllowanceMm = 2;
    s.stock.stickOutMm = needed + 1;
    CHECK(hasNote(sceneNotes(s), "at least " + formatLength(needed + 2, Units::Mm)));
}

TEST_CASE("the stick-out and compound notes keep their wording", "[sim][notes]") {
    // Common practice: about three diameters or less in a chuck alone.
    Scene s = coneScene(0.02);
    s.stock.diameterMm = 26;
    s.part.features[0].cone.gaugeDiameterMm = 25.5;
    s.stock.stickOutMm = 80; // 3.08 diameters
    CHECK(hasNote(sceneNotes(s), "stick-out is 3.1 bar diameters with no tailstock support"));
    s.stock.tailstockSupport = true;
    CHECK(sceneNotes(s).empty());

    s = coneScene(0.02);
    s.setup.compoundReadingRad += degToRad(1.0); // the angle tolerance here is 0.5°
    CHECK(hasNote(sceneNotes(s), "the compound's true angle differs from the cone's half angle by "
                                 "1°00′00.0″"));
    s.setup.compound.travelMm = 40;
    CHECK(hasNote(sceneNotes(s), "the compound needs"));
}
