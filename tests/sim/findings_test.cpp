// Tests for sim/include/swarf/sim/findings.h. Each finding is also triggered by a scene made
// for it in scenes/finding-*.toml (checked by the scene corpus test in tests/io).
#include "swarf/sim/findings.h"

#include "kernel_scenes.h"
#include "swarf/sim/kernel.h"

#include <algorithm>
#include <catch2/catch.hpp>
#include <cmath>
#include <string>

using namespace swarf;
using namespace swarf::testing;

namespace {
bool has(const CutResult& r, FindingKind k) {
    return std::any_of(r.findings.begin(), r.findings.end(),
                       [&](const Finding& f) { return f.kind == k; });
}

// A good plan: a cylinder turned to size in two passes by a CNC path, well clear of the jaws.
Scene goodPlan() {
    Scene s = barScene(30);
    s.sim.angleSamples = 12;
    s.part.features.push_back(cylinderFeature(0, 40, 26, 0.05));
    s.plan.passes.push_back(pathPass({{-2, 14.0}, {42, 14.0}, {42, 16.0}}, 0.2));
    s.plan.passes.push_back(pathPass({{-2, 13.0}, {42, 13.0}, {42, 16.0}}, 0.1));
    return s;
}

// A ramp down toward the chuck at `deg`, then along.
Scene ramp(double deg) {
    Scene s = barScene(30);
    s.sim.angleSamples = 12;
    s.part.features.push_back(cylinderFeature(0, 40, 20, 0.05));
    const double t = std::tan(degToRad(deg));
    s.plan.passes.push_back(pathPass({{0, 14.0}, {5, 14.0}, {5 + 3 / t, 11.0}, {40, 11.0}}, 0.1));
    return s;
}
} // namespace

TEST_CASE("trailing edge limit of a 55 degree insert in a 93 degree holder", "[findings]") {
    // Source: references R8: 180° − κr − ε = 32° for 93° + D; minus 3° clearance
    // (references R8: 2–7°).
    const ToolOutline o(barScene(30).tool);
    CHECK(radToDeg(rampLimitRad(o)) == Approx(32.0 - 3.0));
}

TEST_CASE("a good plan raises no finding", "[findings]") {
    const CutResult r = simulate(goodPlan());
    for (const Finding& f : r.findings)
        INFO(findingKindName(f.kind) << ": " << f.message);
    CHECK(r.findings.empty());
    CHECK(r.withinTolerance);
}

TEST_CASE("rubbing only past the limit", "[findings]") {
    CHECK_FALSE(has(simulate(ramp(20)), FindingKind::Rubbing));
    CHECK(has(simulate(ramp(40)), FindingKind::Rubbing));
}

TEST_CASE("each finding from a plan made for it", "[findings]") {
    SECTION("air cut") {
        Scene s = goodPlan();
        s.plan.passes.insert(s.plan.passes.begin(), pathPass({{-2, 16.0}, {42, 16.0}}, 0.2));
        const CutResult r = simulate(s);
        REQUIRE(has(r, FindingKind::AirCut));
        CHECK(r.findings.front().pass == 0);
    }
    SECTION("left on and overcut") {
        Scene s = goodPlan();
        s.plan.passes.back().pathZX = {{-2, 13.1}, {42, 13.1}, {42, 16.0}};
        CHECK(has(simulate(s), FindingKind::LeftOn));
        s.plan.passes.back().pathZX = {{-2, 12.9}, {42, 12.9}, {42, 16.0}};
        const CutResult r = simulate(s);
        CHECK(has(r, FindingKind::Overcut));
        CHECK_FALSE(r.withinTolerance);
    }
    SECTION("jaw crash") {
        Scene s = goodPlan();
        s.plan.passes.back().pathZX = {{-2, 13.0}, {99.5, 13.0}};
        CHECK(has(simulate(s), FindingKind::JawCrash));
    }
    SECTION("past the centre") {
        Scene s = goodPlan();
        s.plan.passes.push_back(pathPass({{45, 16.0}, {45, -0.5}}, 0.05));
        CHECK(has(simulate(s), FindingKind::CrossesCentre));
    }
    SECTION("depth of cut") {
        Scene s = goodPlan();
        s.tool.edgeLengthMm = 0.9;
        CHECK(has(simulate(s), FindingKind::DepthOfCut));
    }
    SECTION("compound travel") {
        Scene s = goodPlan();
        Pass p;
        p.kind = PassKind::Compound;
        p.crossMm = -10; // far out: cuts nothing
        p.fromMm = 0;
        p.toMm = 120;
        s.setup.compound.travelMm = 100;
        s.plan.passes.push_back(p);
        CHECK(has(simulate(s), FindingKind::CompoundTravel));
    }
}

TEST_CASE("the nose leaves a fillet in a sharp inside corner", "[findings]") {
    // A 26 mm cylinder up to a 29 mm shoulder at z = 30: the path runs along the cylinder, then
    // straight up the shoulder's face. A nose of radius r in a square corner stands r(√2 − 1)
    // out of the drawn corner along the bisector (derived): 0.331 mm for r = 0.8 mm.
    Scene s = barScene(32);
    s.part.features.push_back(cylinderFeature(0, 30, 26, 0.05));
    s.part.features.push_back(cylinderFeature(30, 40, 29, 0.05));
    s.plan.passes.push_back(pathPass({{-2, 13.0}, {30, 13.0}, {30, 14.5}, {42, 14.5}}, 0.1));
    const CutResult r = simulate(s);
    const auto f = std::find_if(r.findings.begin(), r.findings.end(), [](const Finding& x) {
        return x.kind == FindingKind::CornerFillet;
    });
    REQUIRE(f != r.findings.end());
    CHECK(f->zMm == 30);
    CHECK(f->valueMm == Approx(0.8 * (std::sqrt(2.0) - 1)).epsilon(0.01));
    CHECK(f->pass == 0);
    // It says what the drawing would need.
    CHECK(f->message.find("relief groove") != std::string::npos);
    CHECK(f->message.find("smaller nose radius") != std::string::npos);
    // Away from the corner the cylinder is to size: the fillet is the only finding.
    CHECK(r.withinTolerance);
    CHECK(r.findings.size() == 1);
    // A corner with no taller neighbour (the cylinder ends at the bar's free end) has none.
    Scene plain = goodPlan();
    CHECK_FALSE(has(simulate(plain), FindingKind::CornerFillet));
}
