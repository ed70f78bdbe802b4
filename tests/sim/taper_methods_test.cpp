// Tests for sim/include/swarf/sim/taper_methods.h.
#include "swarf/sim/cone.h"
#include "swarf/sim/taper_methods.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

TEST_CASE("R5 tailstock set-over", "[taper_methods]") {
    // Source: references R5 (F. D. Jones, Turning and Boring): 2½ → 2 in over 6 in, 9 in work
    // → 3/8 in.
    CHECK(tailstockSetOverFromDiametersMm(2.5, 2.0, 6.0, 9.0) == Approx(0.375));
    const double theta =
        halfAngleFromTwoDiameters(0, 2.0 * kMmPerInch, 6 * kMmPerInch, 2.5 * kMmPerInch);
    CHECK(tailstockSetOverMm(theta, 9 * kMmPerInch) / kMmPerInch == Approx(0.375));
}

TEST_CASE("R5 taper attachment", "[taper_methods]") {
    // Source: references R5: tan θ = TPF / 24.
    for (double tpf : {0.5, 0.6, 0.62460, 3.5}) {
        const double t = taperAttachmentAngleFromTaperPerFootRad(tpf);
        CHECK(std::tan(t) == Approx(tpf / 24.0));
        CHECK(t == Approx(halfAngleFromTaperPerFoot(tpf)));
    }
    // derived: offset over a 300 mm bar for 1:20 is 300 · 0.025 = 7.5 mm.
    CHECK(taperAttachmentOffsetMm(halfAngleFromRatio(20), 300.0) == Approx(7.5));
}

TEST_CASE("judging the methods", "[taper_methods]") {
    // A Morse-like shallow cone, 100 mm long, on 250 mm work between centres.
    TaperJob shallow{halfAngleFromRatio(20.0), 100.0, 250.0, true};
    auto v = judgeTaperMethods(shallow);
    REQUIRE(v.size() == 3);
    CHECK(v[0].kind == TaperMethodKind::TailstockSetOver);
    CHECK(v[0].practical);
    CHECK(*v[0].settingMm == Approx(6.25)); // derived: 250 · 0.025
    CHECK(v[1].kind == TaperMethodKind::TaperAttachment);
    CHECK(v[1].practical);
    CHECK(v[2].kind == TaperMethodKind::Compound);
    CHECK_FALSE(v[2].practical); // stroke 100.03 mm > 100 mm travel (common practice default)
    CHECK(*v[2].settingMm == Approx(100.0 / std::cos(shallow.halfAngleRad)));

    // A 30° centre point, 15 mm long: compound only.
    TaperJob steep{degToRad(30), 15.0, 200.0, true};
    v = judgeTaperMethods(steep);
    CHECK_FALSE(v[0].practical); // 115 mm set-over
    CHECK_FALSE(v[1].practical); // beyond about 10°
    CHECK(v[2].practical);
    for (const auto& m : v)
        CHECK_FALSE(m.why.empty());

    // No work length: set-over cannot be judged; a bore: no set-over at all.
    TaperJob noLen{degToRad(2), 50.0, std::nullopt, true};
    CHECK_FALSE(judgeTaperMethods(noLen)[0].practical);
    CHECK_FALSE(judgeTaperMethods(noLen)[0].settingMm);
    TaperJob bore{degToRad(2), 50.0, 300.0, false};
    CHECK_FALSE(judgeTaperMethods(bore)[0].practical);

    // Limits can be changed.
    TaperMethodLimits big;
    big.compoundTravelMm = 150;
    CHECK(judgeTaperMethods(shallow, big)[2].practical);
}
