// Tests of swarf/sim/moment.h: the cut at a slider position.
#include "swarf/sim/moment.h"

#include "support/synthetic.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace swarf;

namespace {

// After pass k the synthetic cone is 1.0, 0.6, 0.2, ... mm (radially) above the drawing.
double leftOn(int k) {
    return 1.0 - 0.4 * k;
}

// Largest absolute difference between two profiles on the same grid.
double maxDiff(const Profile& a, const Profile& b) {
    REQUIRE(a.radiusMm.size() == b.radiusMm.size());
    double worst = 0;
    for (std::size_t i = 0; i < a.radiusMm.size(); ++i)
        worst = std::max(worst, std::fabs(a.radiusMm[i] - b.radiusMm[i]));
    return worst;
}

} // namespace

TEST_CASE("whole slider positions show the profile after that pass", "[sim][moment]") {
    const Scene s = test::syntheticScene(3);
    const CutResult r = test::syntheticResult(s, leftOn);
    for (int k = 0; k < 3; ++k) {
        const auto m = describeMoment(s, r, k + 1.0);
        CHECK(m.pass == k);
        CHECK(m.passFraction == 1.0);
        CHECK(maxDiff(m.profile, r.afterPass[static_cast<std::size_t>(k)]) == 0.0);
        // and not the neighbouring passes' profiles
        if (k > 0)
            CHECK(maxDiff(m.profile, r.afterPass[static_cast<std::size_t>(k - 1)]) > 0.3);
        CHECK(m.passNote == s.plan.passes[static_cast<std::size_t>(k)].note);
        CHECK(m.passKind == "compound");
        // The dials read the end of the pass's move.
        CHECK(m.crossMm == Approx(2.0 * k));
        CHECK(m.compoundMm == Approx(40));
    }
    const auto before = describeMoment(s, r, 0);
    CHECK(before.pass == -1);
    CHECK(maxDiff(before.profile, r.stock) == 0.0);
    CHECK(before.compoundMm == Approx(0));
    const auto end = describeMoment(s, r, 99); // clamped
    CHECK(end.finished);
    CHECK(end.position == 3);
    CHECK(maxDiff(end.profile, r.asCut) == 0.0);
}

TEST_CASE("deviation at a moment is normal to the drawing, + left on", "[sim][moment]") {
    const Scene s = test::syntheticScene(3);
    const CutResult r = test::syntheticResult(s, leftOn);
    const auto m = describeMoment(s, r, 1.0);           // 1.0 mm left on radially
    const double cosA = 1 / std::sqrt(1 + 0.05 * 0.05); // derived: normal of a 1:10 cone
    const std::size_t mid = 2100;                       // z = 20
    CHECK(m.deviationMm[mid] == Approx(1.0 * cosA).epsilon(1e-9));
    CHECK(std::isnan(m.deviationMm[50])); // z = −0.5: off the drawing
    CHECK(std::isnan(m.deviationMm[5000]));
    // The finished part uses the kernel's own deviation.
    const auto end = describeMoment(s, r, 3.0);
    CHECK(end.deviationMm[mid] == r.deviationMm[mid]);
}

TEST_CASE("readings and tip are interpolated along the move within a pass", "[sim][moment]") {
    const Scene s = test::syntheticScene(3);
    const CutResult r = test::syntheticResult(s, leftOn);
    const auto idx = movesOfPass(r, 1);
    REQUIRE(idx.size() == 1);
    CHECK(idx[0] == 1);
    // Position 1.25: a quarter of the way through pass 2 (its move runs (0, 10.6) → (40, 12.6)).
    const auto m = describeMoment(s, r, 1.25);
    CHECK(m.pass == 1);
    CHECK(m.passFraction == Approx(0.25));
    CHECK(m.compoundMm == Approx(10));
    CHECK(m.crossMm == Approx(2));
    CHECK(m.tipZX.x() == Approx(10));
    CHECK(m.tipZX.y() == Approx(11.1));
    CHECK_FALSE(m.finished);
    CHECK(std::string(passKindName(PassKind::Saddle)) == "saddle");
}
