// Tests for sim/include/swarf/sim/cone.h.
#include "swarf/sim/cone.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

TEST_CASE("metric 1:20 half angle", "[cone]") {
    // Source: references R3, ISO 296 metric taper 1:20: half angle 1.43210°.
    CHECK(radToDeg(halfAngleFromRatio(20.0)) == Approx(1.43210).margin(5e-6));
}

TEST_CASE("diameter and plane round trip", "[cone]") {
    Cone c{10.0, 20.0, degToRad(5.0), Widens::TowardChuck};
    CHECK(c.diameterAt(c.zAtDiameter(23.0)) == Approx(23.0));
    CHECK(c.diameterAt(20.0) > 20.0);
    c.widens = Widens::TowardTailstock;
    CHECK(c.diameterAt(20.0) < 20.0);
}

TEST_CASE("round trips between every cone form", "[cone]") {
    // derived: each form converts to the half angle and back.
    for (double deg :
         {0.2, 1.43210, 1.7899, 2.8624, 5.0, 8.29714, 14.036, 30.0, 45.0, 60.0, 80.0}) {
        INFO(deg << "°");
        const double t = degToRad(deg);
        const Cone c{0.0, 25.0, t, Widens::TowardChuck};
        CHECK(halfAngleFromIncluded(c.includedAngleRad()) == Approx(t).epsilon(1e-13));
        CHECK(halfAngleFromRatio(c.ratioK()) == Approx(t).epsilon(1e-13));
        CHECK(halfAngleFromTaperPerFoot(c.taperPerFootIn()) == Approx(t).epsilon(1e-13));
        CHECK(halfAngleFromTaperRate(c.taperRate()) == Approx(t).epsilon(1e-13));
        // two diameters at two planes, in either order, and on a cone widening either way
        const double d2 = c.diameterAt(12.0);
        CHECK(halfAngleFromTwoDiameters(0.0, 25.0, 12.0, d2) == Approx(t).epsilon(1e-12));
        CHECK(halfAngleFromTwoDiameters(12.0, d2, 0.0, 25.0) == Approx(t).epsilon(1e-12));
        const Cone back{0.0, 25.0, t, Widens::TowardTailstock};
        CHECK(halfAngleFromTwoDiameters(0.0, 25.0, -12.0, back.diameterAt(-12.0)) ==
              Approx(t).epsilon(1e-12));
        CHECK(lengthBetweenDiameters(c, 25.0, d2) == Approx(12.0).epsilon(1e-12));
        CHECK(lengthBetweenDiameters(c, d2, 25.0) == Approx(12.0).epsilon(1e-12));
        CHECK(c.zAtDiameter(d2) == Approx(12.0).epsilon(1e-12));
        CHECK(back.zAtDiameter(back.diameterAt(-7.0)) == Approx(-7.0).epsilon(1e-12));
        // Source: references R9 (ISO 3040): C = 2 tan(α/2), α the included angle.
        CHECK(c.taperRate() == Approx(2 * std::tan(c.includedAngleRad() / 2)));
        CHECK(c.taperPerFootIn() == Approx(12 * c.taperRate()));
        CHECK(c.ratioK() * c.taperRate() == Approx(1.0));
    }
}

TEST_CASE("inch and mm give the same cone", "[cone]") {
    // derived: a cone written in inch (gauge diameter in inch, taper per foot) and the same cone
    // written in mm (gauge diameter in mm, ratio; two diameters in mm) are one cone.
    for (double tpf : {0.5, 0.6, 0.62460, 0.75, 3.5}) {
        INFO(tpf << " in/ft");
        const double gaugeIn = 0.938, lengthIn = 3.25;
        const Cone inch{toMm(1.0, Units::Inch), toMm(gaugeIn, Units::Inch),
                        halfAngleFromTaperPerFoot(tpf), Widens::TowardChuck};
        const double k = 12.0 / tpf; // the same taper as a ratio 1:k
        const Cone mm{25.4, gaugeIn * 25.4, halfAngleFromRatio(k), Widens::TowardChuck};
        CHECK(inch.halfAngleRad == Approx(mm.halfAngleRad).epsilon(1e-14));
        CHECK(inch.gaugeDiameterMm == Approx(mm.gaugeDiameterMm).epsilon(1e-14));
        const double zEnd = toMm(1.0 + lengthIn, Units::Inch);
        CHECK(inch.diameterAt(zEnd) == Approx(mm.diameterAt(zEnd)).epsilon(1e-13));
        // the large end in inch: gauge + TPF·length/12
        CHECK(fromMm(inch.diameterAt(zEnd), Units::Inch) ==
              Approx(gaugeIn + tpf * lengthIn / 12.0).epsilon(1e-13));
        // two diameters in inch and in mm give the same half angle
        const double dEndIn = gaugeIn + tpf * lengthIn / 12.0;
        CHECK(halfAngleFromTwoDiameters(toMm(0, Units::Inch), toMm(gaugeIn, Units::Inch),
                                        toMm(lengthIn, Units::Inch), toMm(dEndIn, Units::Inch)) ==
              Approx(inch.halfAngleRad).epsilon(1e-12));
        // taper per foot is a rate: the same number per 12 mm as per 12 in
        CHECK(inch.taperPerFootIn() == Approx(tpf).epsilon(1e-13));
    }
}
