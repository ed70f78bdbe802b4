// Tests for sim/include/swarf/sim/tool_outline.h.
#include "swarf/sim/tool_outline.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

namespace {
Tool makeTool(char shape, double eDeg, double kDeg, double r, Hand hand = Hand::R) {
    Tool t;
    t.shape = shape;
    t.includedAngleRad = degToRad(eDeg);
    t.enteringAngleRad = degToRad(kDeg);
    t.noseRadiusMm = r;
    t.hand = hand;
    t.edgeLengthMm = 11;
    return t;
}
} // namespace

TEST_CASE("outline of a 93 degree D insert", "[tool_outline]") {
    // ISO 1832 D = 55°, ISO 5608 J = 93°: Source: references R8.
    ToolOutline o(makeTool('D', 55, 93, 0.8));
    CHECK(o.noseRadiusMm() == 0.8);
    CHECK(o.imaginaryTip().x() == Approx(0.8));
    CHECK(o.imaginaryTip().y() == Approx(-0.8));
    // The lowest point of the nose is straight below the centre (derived).
    CHECK(o.lowerEnvelope(0.0) == Approx(-0.8));
    CHECK(o.lowerEnvelope(0.3) == Approx(-std::sqrt(0.64 - 0.09)));
    // The leading z extreme is the nose point at angle 0: the 93° edge leans back (derived).
    CHECK(o.uMaxMm() == Approx(0.8));
    // Behind the nose, the trailing edge rises at 180° − 93° − 55° = 32° (references R8).
    const double u1 = -2.0, u2 = -3.0;
    const double slope = (o.lowerEnvelope(u2) - o.lowerEnvelope(u1)) / (u2 - u1);
    CHECK(std::atan(-slope) == Approx(degToRad(32)).margin(1e-12));
    CHECK(o.leadingEdgeAngleRad() == Approx(degToRad(93)));
    CHECK(o.trailingEdgeAngleRad() == Approx(degToRad(148)));
}

TEST_CASE("support point follows the move slope", "[tool_outline]") {
    ToolOutline o(makeTool('D', 55, 93, 0.4));
    // Horizontal move: the lowest point of the nose (derived).
    Eigen::Vector2d q = o.support(0.0);
    CHECK(q.x() == Approx(0.0).margin(1e-12));
    CHECK(q.y() == Approx(-0.4));
    // A move rising at θ touches the nose where its normal is (sinθ, −cosθ) (derived).
    const double th = degToRad(20);
    q = o.support(std::tan(th));
    CHECK(q.x() == Approx(0.4 * std::sin(th)));
    CHECK(q.y() == Approx(-0.4 * std::cos(th)));
}

TEST_CASE("left hand mirrors right hand", "[tool_outline]") {
    ToolOutline r(makeTool('C', 80, 95, 0.8, Hand::R));
    ToolOutline l(makeTool('C', 80, 95, 0.8, Hand::L));
    CHECK(l.imaginaryTip().x() == Approx(-0.8));
    CHECK(l.uMinMm() == Approx(-r.uMaxMm()));
    CHECK(l.uMaxMm() == Approx(-r.uMinMm()));
    for (double u : {-5.0, -1.0, -0.3, 0.0, 0.2, 0.7}) {
        CHECK(l.lowerEnvelope(-u) == Approx(r.lowerEnvelope(u)));
    }
}

TEST_CASE("polygon stays within the chord error", "[tool_outline]") {
    ToolOutline o(makeTool('T', 60, 90, 0.8));
    const double err = 1e-4;
    auto poly = o.polygon(err);
    REQUIRE(poly.size() > 10);
    // Every vertex on the outline; the mid-chord sag on the arc no more than err (derived).
    double maxSag = 0;
    for (std::size_t i = 0; i < poly.size(); ++i) {
        const Eigen::Vector2d a = poly[i], b = poly[(i + 1) % poly.size()];
        if (std::abs(a.norm() - 0.8) < 1e-9 && std::abs(b.norm() - 0.8) < 1e-9) {
            maxSag = std::max(maxSag, 0.8 - (0.5 * (a + b)).norm());
        }
    }
    CHECK(maxSag <= err);
    CHECK(maxSag > 0);
    // Counter-clockwise: positive signed area.
    double area = 0;
    for (std::size_t i = 0; i < poly.size(); ++i) {
        const auto& a = poly[i];
        const auto& b = poly[(i + 1) % poly.size()];
        area += a.x() * b.y() - b.x() * a.y();
    }
    CHECK(area > 0);
}

TEST_CASE("round insert is a circle", "[tool_outline]") {
    ToolOutline o(makeTool('R', 0, 90, 3.0));
    CHECK(o.uMinMm() == Approx(-3));
    CHECK(o.uMaxMm() == Approx(3));
    CHECK(o.lowerEnvelope(1.5) == Approx(-std::sqrt(9 - 2.25)));
}
