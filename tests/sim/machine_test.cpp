// Tests for sim/include/swarf/sim/machine.h: dial readings to tool positions.
#include "swarf/sim/machine.h"

#include "kernel_scenes.h"
#include "swarf/sim/kernel.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;
using namespace swarf::testing;

namespace {
Scene compoundScene() {
    Scene s = barScene(30);
    s.setup.compoundReadingRad = degToRad(10);
    s.setup.compoundScale = CompoundScale::FromAxis;
    s.setup.compoundAdvanceToward = Widens::TowardTailstock;
    s.setup.crossDial = DialMode::Diameter;
    s.setup.zeroDiameterMm = 30;
    s.setup.zeroZMm = 0;
    Pass p;
    p.kind = PassKind::Compound;
    p.crossMm = 2.0;
    p.saddleMm = 40;
    p.fromMm = 0;
    p.toMm = 20;
    s.plan.passes.push_back(p);
    return s;
}
} // namespace

TEST_CASE("compound pass follows the machine model", "[machine]") {
    // Source: scenes/README.md [setup]: z = zero_z + s + p·a·cos α, x = D0/2 − c·k − p·sin α
    // (derived plane geometry).
    const Scene s = compoundScene();
    const auto m = planMoves(s);
    REQUIRE(m.size() == 1);
    const double a = degToRad(10);
    CHECK(m[0].tipFrom.x() == Approx(40.0));
    CHECK(m[0].tipFrom.y() == Approx(15.0 - 1.0));
    CHECK(m[0].tipTo.x() == Approx(40.0 - 20 * std::cos(a)));
    CHECK(m[0].tipTo.y() == Approx(14.0 - 20 * std::sin(a)));
    CHECK(m[0].compoundFrom == 0);
    CHECK(m[0].compoundTo == 20);
}

TEST_CASE("compound scale read from the cross-slide and its error", "[machine]") {
    Scene s = compoundScene();
    s.setup.compoundScale = CompoundScale::FromCrossSlide;
    s.setup.compoundReadingRad = degToRad(80); // references R5: set 90° − θ
    s.setup.compoundErrorRad = degToRad(0.1);
    const auto m = planMoves(s);
    const double a = degToRad(10.1);
    CHECK(m[0].tipTo.y() == Approx(14.0 - 20 * std::sin(a)));
}

TEST_CASE("a pass with a compound setting of its own", "[machine]") {
    // Source: scenes/README.md [[plan.pass]] compound_angle, compound_error: the pass runs at its
    // own true angle; the dials keep their zero (the machine model's formula, derived).
    Scene s = compoundScene();
    Pass second = s.plan.passes[0];
    second.crossMm = 2.5;
    second.compoundAngleRad = degToRad(12);
    second.compoundErrorRad = degToRad(-0.05);
    s.plan.passes.push_back(second);
    const auto m = planMoves(s);
    REQUIRE(m.size() == 2);
    const double a1 = degToRad(10), a2 = degToRad(11.95);
    CHECK(m[0].tipTo.y() == Approx(14.0 - 20 * std::sin(a1)));
    CHECK(m[1].tipFrom.y() == Approx(15.0 - 1.25));
    CHECK(m[1].tipTo.x() == Approx(40.0 - 20 * std::cos(a2)));
    CHECK(m[1].tipTo.y() == Approx(15.0 - 1.25 - 20 * std::sin(a2)));
    CHECK(setupForPass(s.setup, s.plan.passes[1]).compoundAxisAngleRad() == Approx(a2));
    CHECK(setupForPass(s.setup, s.plan.passes[0]).compoundAxisAngleRad() == Approx(a1));
}

TEST_CASE("radius dial moves the tool by the reading", "[machine]") {
    Scene s = compoundScene();
    s.setup.crossDial = DialMode::Radius;
    const auto m = planMoves(s);
    CHECK(m[0].tipFrom.y() == Approx(13.0));
}

TEST_CASE("backlash: a slide that reverses lags by its backlash", "[machine]") {
    // The gap model (derived): after a decreasing move the slide sits b behind the reading.
    CHECK(followWithBacklash(0.0, -1.0, 0.05) == Approx(-0.95));
    CHECK(followWithBacklash(-0.95, -0.5, 0.05) == Approx(-0.5));
    CHECK(followWithBacklash(0.0, 0.03, 0.05) == Approx(0.03));
    CHECK(followWithBacklash(0.0, -0.03, 0.05) == Approx(0.0)); // inside the gap: no motion

    Scene s = compoundScene();
    s.setup.cross.backlashMm = 0.05;
    s.setup.compound.backlashMm = 0.04;
    // The second pass's cross-slide reading is lower (1.0 after 2.0). Between the passes the
    // cross-slide is backed out one turn past the lower of the two (to -1.0) and fed in to 1.0:
    // it comes to 1.0 increasing and sits exactly there (scenes/README.md, between passes).
    Pass p2 = s.plan.passes[0];
    p2.crossMm = 1.0;
    s.plan.passes.push_back(p2);
    const auto m = planMoves(s);
    REQUIRE(m.size() == 2);
    // Cross travel 0.5 (diameter dial), exactly. The compound was wound back from 20 to 0 (in
    // order: dialled straight there): its slide lags 0.04, so the pass starts 0.04 along the
    // compound (the slack is taken up first, with the tool standing still).
    const double a = degToRad(10);
    CHECK(m[1].tipFrom.y() == Approx(15.0 - 0.5 - 0.04 * std::sin(a)).margin(1e-12));
    CHECK(m[1].tipFrom.x() == Approx(40.0 - 0.04 * std::cos(a)));
    CHECK(m[1].tipTo.x() == Approx(40.0 - 20 * std::cos(a)));
}

TEST_CASE("approach: readings taken up from below sit exactly; in order they lag", "[machine]") {
    // The gap model (derived): the same three passes with and without backlash. The second pass
    // sets the cross-slide lower (2.0 → 1.0 on diameter) and the saddle lower (40 → 39.5);
    // the third winds the compound from 20 back down to 5 while it cuts.
    Scene s = compoundScene();
    Pass p2 = s.plan.passes[0];
    p2.crossMm = 1.0;
    p2.saddleMm = 39.5;
    Pass p3 = s.plan.passes[0];
    p3.fromMm = 20;
    p3.toMm = 5;
    s.plan.passes.push_back(p2);
    s.plan.passes.push_back(p3);
    const auto exact = planMoves(s);
    REQUIRE(exact.size() == 3);

    Scene b = s;
    b.setup.cross.backlashMm = 0.05;
    b.setup.compound.backlashMm = 0.04;
    b.setup.saddle.backlashMm = 0.1;
    const double a = degToRad(10);

    SECTION("take_up: every reading set before a pass is where the zero-backlash plan is") {
        b.setup.approach = Approach::TakeUp;
        const auto m = planMoves(b);
        REQUIRE(m.size() == 3);
        for (int k = 0; k < 2; ++k) {
            CHECK((m[k].tipFrom - exact[k].tipFrom).norm() < 1e-12);
            CHECK((m[k].tipTo - exact[k].tipTo).norm() < 1e-12);
        }
        CHECK((m[2].tipFrom - exact[2].tipFrom).norm() < 1e-12);
        // The compound then runs down from its start: the slide stays 0.04 along its travel
        // (advancing toward the tailstock and in toward the axis) behind its handwheel.
        CHECK(m[2].tipTo.x() == Approx(exact[2].tipTo.x() - 0.04 * std::cos(a)));
        CHECK(m[2].tipTo.y() == Approx(exact[2].tipTo.y() - 0.04 * std::sin(a)));
    }
    SECTION("in_order: the reversed saddle and compound lag by their backlash") {
        b.setup.approach = Approach::InOrder;
        const auto m = planMoves(b);
        REQUIRE(m.size() == 3);
        CHECK((m[0].tipFrom - exact[0].tipFrom).norm() < 1e-12); // all increasing from zero
        // Pass 2: saddle 0.1 further toward the chuck, compound 0.04 along its travel after
        // winding back from 20 to 0 (derived); the cross-slide, backed out and fed in again,
        // sits at its reading.
        CHECK(m[1].tipFrom.y() == Approx(exact[1].tipFrom.y() - 0.04 * std::sin(a)).margin(1e-12));
        CHECK(m[1].tipFrom.x() == Approx(exact[1].tipFrom.x() + 0.1 - 0.04 * std::cos(a)));
        CHECK(m[1].tipTo.y() == Approx(exact[1].tipTo.y()).margin(1e-12));
        CHECK(m[1].tipTo.x() == Approx(exact[1].tipTo.x() + 0.1));
    }
}

TEST_CASE("a CNC path is taken as given", "[machine]") {
    Scene s = barScene(30);
    s.plan.passes.push_back(pathPass({{0, 14}, {10, 14}, {20, 12}}, 0.1));
    const auto m = planMoves(s);
    REQUIRE(m.size() == 2);
    CHECK(m[1].tipFrom == Eigen::Vector2d(10, 14));
    CHECK(m[1].tipTo == Eigen::Vector2d(20, 12));
    CHECK(m[1].pass == 0);
}

TEST_CASE("profileUpTo steps through a move", "[machine][kernel]") {
    Scene s = barScene(30);
    s.part.features.push_back(cylinderFeature(0, 30, 28, 0.1));
    s.plan.passes.push_back(pathPass({{-2, 14}, {30, 14}}, 0.1));
    const auto m = planMoves(s);
    const Profile half = profileUpTo(s, m, 1, 0.5);
    const Profile none = profileUpTo(s, m, 0);
    CHECK(half.radiusAt(5) == Approx(14.0));
    CHECK(half.radiusAt(25) == Approx(15.0));
    CHECK(none.radiusAt(5) == Approx(15.0));
}
