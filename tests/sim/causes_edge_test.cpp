// What an insert's trailing edge did to a steep cone (causes.h, trailing_edge): the run again
// with the insert reduced to its nose, against the edge's own line in closed form.
#include "kernel_scenes.h"

#include "swarf/sim/causes.h"
#include "swarf/sim/cut.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/nose_offset.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>

using namespace swarf;

namespace {

constexpr double kNoseMm = 0.4;

// A 45° seat (made up): Ø38 at z = 0 (its gauge plane), narrowing toward the chuck to Ø26 at
// z = 6, ±0.05; a D insert (55°) of r = 0.4 in a holder of entering angle κr, hand R, run by a
// CNC path of its imaginary tip down the drawn line shifted by the nose-radius offset of
// references R1 (so that the nose alone cuts the seat as drawn), from z = −1 to z = 6, then
// straight out.
Scene seat(double kappaDeg) {
    Scene s = testing::barScene(40.0, 50.0);
    const double theta = degToRad(45);
    Feature f = testing::coneFeature(0.0, 6.0, 38.0, theta, 0.05);
    f.cone.widens = Widens::TowardTailstock;
    f.angleToleranceRad = degToRad(0.1);
    s.part.features = {f};
    s.tool.noseRadiusMm = kNoseMm;
    s.tool.enteringAngleRad = degToRad(kappaDeg);
    s.sim.profileStepMm = 0.01;
    const NoseOffsets o =
        noseRadiusOffsets(kNoseMm, theta, Widens::TowardTailstock, TipSide::ChuckSide);
    auto line = [&](double z) { return 19.0 - z + o.xShiftSign * o.dxRadiusMm; };
    s.plan.passes = {testing::pathPass({{-1.0, line(-1.0)}, {6.0, line(6.0)}, {6.0, 21.0}}, 0.05)};
    s.validate();
    return s;
}

} // namespace

TEST_CASE("a trailing edge that cannot follow a steep cone is named with its own line",
          "[sim][causes]") {
    const Scene s = seat(93.0);
    const CutResult r = simulate(s);
    REQUIRE(std::any_of(r.findings.begin(), r.findings.end(),
                        [](const Finding& f) { return f.kind == FindingKind::Rubbing; }));
    const std::vector<Cause> cs = findCauses(s, r);
    REQUIRE_FALSE(cs.empty());
    CHECK(cs.front().source == "trailing_edge");
    CHECK(cs.front().pass == 0);

    // derived (tool_outline.h, references R8 for the angles): the trailing edge leaves the nose
    // at κr + ε = 148° from +z, tangent to it at C + r·(−sin 148°, cos 148°), C the nose centre,
    // the imaginary tip less (r, −r). At the end of the descent the tip is at z = 6 on the
    // offset line; the edge's line back from there is what the seat keeps: a cone of
    // 180° − 148° = 32° half angle, and at the gauge plane (z = 0) the radius of that line.
    const double trail = degToRad(148.0);
    const NoseOffsets o =
        noseRadiusOffsets(kNoseMm, degToRad(45), Widens::TowardTailstock, TipSide::ChuckSide);
    const double tipZ = 6.0, tipX = 13.0 + o.xShiftSign * o.dxRadiusMm;
    const double cz = tipZ - kNoseMm, cx = tipX + kNoseMm;
    const double tz = cz - kNoseMm * std::sin(trail), tx = cx + kNoseMm * std::cos(trail);
    const double edgeAtGauge = tx + (0.0 - tz) * std::tan(trail);
    // Without the edge the nose cuts the seat as drawn: Ø38 at the gauge plane (references R1).
    CHECK(cs.front().gaugeDiameterChangeMm == Approx(2 * edgeAtGauge - 38.0).epsilon(0.01));
    CHECK(cs.front().halfAngleChangeRad == Approx(degToRad(32.0 - 45.0)).epsilon(0.01));
    CHECK(cs.front().message.find("style") != std::string::npos); // a holder that follows
}

TEST_CASE("an edge that clears the slope is no cause", "[sim][causes]") {
    // A style N holder (63°): the trailing edge at 180° − 63° − 55° = 62° clears 45°
    // (references R8; derived). No rubbing, no cause.
    const Scene s = seat(63.0);
    const CutResult r = simulate(s);
    CHECK_FALSE(std::any_of(r.findings.begin(), r.findings.end(),
                            [](const Finding& f) { return f.kind == FindingKind::Rubbing; }));
    const std::vector<Cause> cs = findCauses(s, r);
    for (const Cause& c : cs)
        INFO(c.source << ": " << c.message);
    CHECK(cs.empty());
}
