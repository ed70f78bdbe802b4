// Tests for sim/include/swarf/sim/kernel.h: what simulate() makes of the finishing pass (its
// roughness, the crests of its marks in the verdict, a feed no nose can finish).
#include "swarf/sim/kernel.h"

#include "kernel_scenes.h"
#include "swarf/sim/compare.h"
#include "swarf/sim/error.h"
#include "swarf/sim/moment.h"

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

// A cylinder of 26 mm ±0.05 turned in two CNC passes, the finish with its tip on the drawn
// radius (13 mm) at feed f (nose radius 0.8 mm).
Scene cylinderPlan(double finishFeed) {
    Scene s = barScene(30);
    s.part.features.push_back(cylinderFeature(0, 40, 26, 0.05));
    s.plan.passes.push_back(pathPass({{-2, 14.0}, {42, 14.0}, {42, 16.0}}, 0.2));
    s.plan.passes.push_back(pathPass({{-2, 13.0}, {42, 13.0}, {42, 16.0}}, finishFeed));
    return s;
}

// The arc cusp r − sqrt(r² − f²/4) (references R2, exact arc).
double cusp(double f, double r) {
    return r - std::sqrt(r * r - f * f / 4);
}

} // namespace

TEST_CASE("the crests of the feed marks are metal left on, in the verdict and the colours",
          "[kernel][verdict]") {
    // Band ±0.05/2 = 0.025 mm on radius (derived: ±t on diameter). The valleys sit on the
    // drawing; the crests stand the arc cusp above them: 14.2 µm at 0.3 mm/rev, in; 58.4 µm at
    // 0.6 mm/rev, out.
    const CutResult in = simulate(cylinderPlan(0.3));
    CHECK(in.withinTolerance);
    CHECK(in.maxLeftOnMm == Approx(cusp(0.3, 0.8)).epsilon(1e-3));
    CHECK(in.maxOvercutMm < 1e-9);
    CHECK(in.features.at(0).maxLeftOnMm == Approx(cusp(0.3, 0.8)).epsilon(1e-3));

    const CutResult out = simulate(cylinderPlan(0.6));
    CHECK_FALSE(out.withinTolerance);
    CHECK(out.maxLeftOnMm == Approx(cusp(0.6, 0.8)).epsilon(1e-3));
    CHECK_FALSE(out.features.at(0).withinTolerance);
    REQUIRE(has(out, FindingKind::LeftOn));
    // The valleys' deviation alone would have passed: the swept envelope is on the drawing.
    const DeviationExtremes valleys = deviationExtremes(out.deviationMm);
    CHECK(valleys.leftOnMm < 1e-9);
    // The colours of the finished part: the crests, where they stand out.
    const MomentView end = describeMoment(cylinderPlan(0.6), out, 2);
    const std::size_t mid = end.deviationMm.size() / 3; // z about 13 mm, on the cylinder
    CHECK(end.deviationMm[mid] == Approx(cusp(0.6, 0.8)).epsilon(1e-3));
}

TEST_CASE("a finishing feed of twice the nose radius is refused", "[kernel][verdict]") {
    // common practice: at 2r or more a revolution the arcs no longer meet: a thread, not a
    // turned finish (a feed per minute typed as per revolution, say).
    Scene s = cylinderPlan(1.6);
    s.plan.passes[1].where = {"made-up.toml", 12, 1};
    try {
        simulate(s);
        FAIL("expected an InputError");
    } catch (const InputError& e) {
        CHECK(e.key() == "plan.pass[2].feed");
        CHECK(e.value() == "1.6");
        CHECK(e.where().line == 12);
        CHECK(std::string(e.what()).find("twice the nose radius") != std::string::npos);
        CHECK(e.exitCode() == kExitBadInput);
    }
    // A roughing pass may feed that coarsely: the finish takes its marks off.
    Scene rough = cylinderPlan(0.1);
    rough.plan.passes[0].feedMmPerRev = 2.0;
    CHECK_NOTHROW(simulate(rough));
}

TEST_CASE("a finishing feed above half the nose radius is noted", "[kernel][verdict]") {
    // common practice: f ≤ 0.5 r for a finish.
    CHECK_FALSE(has(simulate(cylinderPlan(0.4)), FindingKind::CoarseFinish));
    const CutResult r = simulate(cylinderPlan(0.5));
    REQUIRE(has(r, FindingKind::CoarseFinish));
    const auto f = std::find_if(r.findings.begin(), r.findings.end(), [](const Finding& x) {
        return x.kind == FindingKind::CoarseFinish;
    });
    CHECK(f->pass == 1);
    CHECK(f->valueMm == 0.5);
    CHECK(r.finishingPass == 1);
}

TEST_CASE("the finish's roughness with stock left on the face", "[kernel][verdict]") {
    // The finishing pass starts on the face allowance, before the drawing: its marks on the
    // cylinder are measured all the same (the arc cusp, references R2).
    Scene s = cylinderPlan(0.2);
    s.stock.faceAllowanceMm = 1;
    const CutResult r = simulate(s);
    CHECK(r.rtUm == Approx(1000 * cusp(0.2, 0.8)).epsilon(0.01));
    CHECK(r.raUm > 0);
}
