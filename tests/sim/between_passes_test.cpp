// Tests for the moves between passes (machine.h: betweenPassMoves) and their check
// (between_passes.h): the order of the moves, where they go, and the cuts they would make on
// purpose-made set-ups, worked by hand.
#include "swarf/sim/between_passes.h"

#include "kernel_scenes.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/machine.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;
using namespace swarf::testing;

namespace {

// Two compound passes on a Ø30 bar, compound at 10° toward the tailstock and in, take-up.
Scene twoPasses() {
    Scene s = barScene(30);
    s.part.features.push_back(coneFeature(0, 40, 24, degToRad(10), 0.1));
    s.setup.compoundReadingRad = degToRad(10);
    s.setup.compoundAdvanceToward = Widens::TowardTailstock;
    s.setup.zeroDiameterMm = 30;
    s.setup.approach = Approach::TakeUp;
    s.setup.compound = Slide{0.02, 100, 0.04, 100};
    s.setup.cross = Slide{0.02, 100, 0.05, 150};
    Pass p;
    p.kind = PassKind::Compound;
    p.crossMm = 1.0;
    p.saddleMm = 45;
    p.fromMm = 0;
    p.toMm = 30;
    p.feedMmPerRev = 0.1;
    s.plan.passes.push_back(p);
    p.crossMm = 2.0;
    s.plan.passes.push_back(p);
    return s;
}

} // namespace

TEST_CASE("between passes: back out, wind back past the start, bring up, feed in", "[between]") {
    // Source: scenes/README.md, "Between passes" (the order), and the machine model (derived).
    const Scene s = twoPasses();
    const auto b = betweenPassMoves(s);
    REQUIRE(b.size() == 6);
    // Before the first pass: fed in from outside the bar.
    CHECK(b[0].step == ReturnStep::FeedIn);
    CHECK(b[0].afterPass == -1);
    CHECK(b[0].move.tipFrom.y() > 15.0);
    CHECK(b[0].move.tipTo.y() == Approx(15 - 0.5));
    // After pass 1: the cross-slide one turn (2 mm on diameter) out from the smaller of 1.0
    // and 2.0, to -1.0; the slide reverses, so it moves 2 mm − backlash on diameter... in travel:
    // 1.0 mm − 0.05 mm.
    CHECK(b[1].step == ReturnStep::BackOut);
    CHECK(b[1].move.crossTo == Approx(-1.0));
    CHECK(b[1].move.tipTo.y() - b[1].move.tipFrom.y() == Approx(1.0 - 0.05));
    // The compound wound back a quarter turn (0.5 mm) past 0, then up to 0.
    CHECK(b[2].step == ReturnStep::WindBack);
    CHECK(b[2].slide == SlideName::Compound);
    CHECK(b[2].move.compoundTo == Approx(-0.5));
    CHECK(b[3].step == ReturnStep::BringUp);
    CHECK(b[3].move.compoundTo == Approx(0.0));
    // Back past the start, the slide lags its backlash: the tip is 0.5 − 0.04 mm of compound
    // travel beyond the start, toward the chuck and out.
    const double a = degToRad(10);
    CHECK(b[2].move.tipTo.x() == Approx(45 + (0.5 - 0.04) * std::cos(a)));
    CHECK(b[3].move.tipTo.x() == Approx(45.0));
    // Fed in to 2.0 from -1.0.
    CHECK(b[4].step == ReturnStep::FeedIn);
    CHECK(b[4].move.crossTo == Approx(2.0));
    CHECK(b[4].move.tipTo.y() == Approx(15 - 1.0));
    // After the last pass: backed out.
    CHECK(b[5].step == ReturnStep::BackOut);
    CHECK(b[5].beforePass == -1);
    CHECK(b[5].afterPass == 1);
    // retract_to moves the back-out.
    Scene r = s;
    r.plan.passes[0].retractToMm = -5.0;
    CHECK(betweenPassMoves(r)[1].move.crossTo == Approx(-5.0));
}

TEST_CASE("a feed-in to a start inside the bar is found, with its depth", "[between]") {
    // derived: a saddle pass that starts at z = 5, inside the Ø30 bar (its free end at z = 0),
    // with the tip at x = 14 (cross 2.0 on a diameter dial zeroed at Ø30): feeding in to it
    // drives the tip 15 − 14 = 1.0 mm into the bar, at the tip's own z.
    Scene s = barScene(30);
    s.part.features.push_back(cylinderFeature(0, 40, 28, 0.1));
    s.setup.zeroDiameterMm = 30;
    Pass p;
    p.kind = PassKind::Saddle;
    p.crossMm = 2.0;
    p.fromMm = 5;
    p.toMm = 40;
    p.feedMmPerRev = 0.1;
    s.plan.passes.push_back(p);
    const CutResult r = simulate(s);
    const Finding* f = nullptr;
    for (const Finding& x : r.findings)
        if (x.kind == FindingKind::CutBetweenPasses)
            f = &x;
    REQUIRE(f);
    CHECK(f->pass == 0);
    CHECK(f->valueMm == Approx(1.0).margin(1e-9));
    CHECK(f->message.find("feeding the cross-slide in") != std::string::npos);
    // Started in the air before the free end, it is clear.
    s.plan.passes[0].fromMm = -2;
    for (const Finding& x : simulate(s).findings)
        CHECK(x.kind != FindingKind::CutBetweenPasses);
}

TEST_CASE("winding back past the start into a shoulder is found", "[between]") {
    // derived: a saddle pass turns Ø26 up to a shoulder at z = 30 (the Ø30 bar beyond), the tip
    // stopping at z = 30. Then the compound, set parallel to the axis and advancing toward the
    // tailstock, runs passes from z = 30 back to the free end. Between two of them the
    // cross-slide is backed out one turn (x 13 → 14 on radius: clear of the Ø26, not of the
    // bar) and the compound is wound back a whole turn (2 mm) past its start: toward the chuck,
    // to z = 32. The nose (r 0.8) then has its lowest point at x = 14 at z = 31.2, inside the
    // bar beyond the shoulder: 15 − 14 = 1.0 mm deep.
    Scene s = barScene(30);
    s.part.features.push_back(cylinderFeature(0, 30, 26, 0.1));
    s.part.features.push_back(cylinderFeature(30, 60, 30, 0.1));
    s.setup.zeroDiameterMm = 30;
    s.setup.approach = Approach::TakeUp;
    s.setup.windBackTurns = 1;
    s.setup.compoundAdvanceToward = Widens::TowardTailstock;
    s.setup.compoundReadingRad = 0;
    Pass turn;
    turn.kind = PassKind::Saddle;
    turn.crossMm = 4.0; // x = 13
    turn.fromMm = -2;
    turn.toMm = 30;
    turn.feedMmPerRev = 0.1;
    Pass back;
    back.kind = PassKind::Compound;
    back.crossMm = 4.0;
    back.saddleMm = 30;
    back.fromMm = 0;
    back.toMm = 32;
    back.feedMmPerRev = 0.1;
    s.plan.passes = {turn, back, back}; // (the second a spring pass: it cuts only air)
    const CutResult r = simulate(s);
    const Finding* f = nullptr;
    for (const Finding& x : r.findings)
        if (x.kind == FindingKind::CutBetweenPasses)
            f = &x;
    REQUIRE(f);
    CHECK(f->pass == 2);
    CHECK(f->message.find("winding the compound back") != std::string::npos);
    CHECK(f->valueMm == Approx(1.0).margin(1e-9));
    CHECK(f->zMm >= 30.0 - 1e-9); // at the shoulder's face or beyond
    // Backed out past the bar (x = 15.5 and more), the way back is clear.
    s.plan.passes[1].retractToMm = -1.0;
    for (const Finding& x : simulate(s).findings) {
        INFO(x.message);
        CHECK(x.kind != FindingKind::CutBetweenPasses);
    }
}

TEST_CASE("a CNC path has no moves between of its own", "[between]") {
    Scene s = barScene(30);
    s.plan.passes.push_back(pathPass({{0, 14}, {10, 14}}, 0.1));
    s.plan.passes.push_back(pathPass({{0, 13}, {10, 13}}, 0.1));
    CHECK(betweenPassMoves(s).empty());
}
