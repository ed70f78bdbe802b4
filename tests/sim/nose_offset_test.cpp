// Tests for sim/include/swarf/sim/nose_offset.h.
#include "swarf/sim/nose_offset.h"
#include "swarf/sim/units.h"

#include <catch2/catch.hpp>
#include <cmath>

using namespace swarf;

TEST_CASE("R1 table", "[nose_offset]") {
    struct Row {
        double r, deg, dx, dxd, dz, normal;
    };
    // Source: references R1 (plane geometry; Smid, CNC Programming Handbook, from memory).
    const Row rows[] = {
        {0.8, 45, 0.46863, 0.93726, 0.46863, 0.33137},
        {0.8, 30, 0.33812, 0.67624, 0.58564, 0.29282},
        {0.8, 60, 0.58564, 1.17128, 0.33812, 0.29282},
    };
    for (const auto& row : rows) {
        INFO(row.deg << "°");
        const auto o = noseRadiusOffsets(row.r, degToRad(row.deg), Widens::TowardChuck);
        CHECK(o.leftOn);
        CHECK(o.dxRadiusMm == Approx(row.dx).margin(5e-6));
        // The table's diameter column is twice its rounded radius column: allow 1e-5.
        CHECK(o.dxDiameterMm == Approx(row.dxd).margin(1e-5));
        CHECK(o.dzMm == Approx(row.dz).margin(5e-6));
        CHECK(o.normalErrorMm == Approx(row.normal).margin(5e-6));
    }
    // Source: references R1: r = 1/32 in, 45° → ΔX 0.01831 in radius, 0.03661 in diameter,
    // ΔZ 0.01831 in.
    const auto o = noseRadiusOffsets(kMmPerInch / 32.0, degToRad(45), Widens::TowardChuck);
    CHECK(o.dxRadiusMm / kMmPerInch == Approx(0.01831).margin(5e-6));
    CHECK(o.dxDiameterMm / kMmPerInch == Approx(0.03661).margin(5e-6));
    CHECK(o.dzMm / kMmPerInch == Approx(0.01831).margin(5e-6));
    // Source: references R1, worked forum example: 60°, r = 0.015 in → ΔX = 0.011 in.
    const auto f = noseRadiusOffsets(0.015 * kMmPerInch, degToRad(60), Widens::TowardChuck);
    CHECK(f.dxRadiusMm / kMmPerInch == Approx(0.011).margin(5e-4));
}

TEST_CASE("R1: the right formula, not the ones that circulate", "[nose_offset]") {
    // Source: references R1: ΔX = r(1 − tan((90° − θ)/2)) = r(1 + tan θ − sec θ); ΔZ = r(1 −
    // tan(θ/2)). Wrong ones mentioned there: a form with sin(45° − θ/2), and the contact point R(1
    // − cos α).
    const double r = 0.8;
    for (double deg : {30.0, 60.0}) {
        const double t = degToRad(deg);
        const auto o = noseRadiusOffsets(r, t, Widens::TowardChuck);
        CHECK(o.dxRadiusMm == Approx(r * (1 + std::tan(t) - 1 / std::cos(t))));
        const double wrongSin = r * std::sin(degToRad(45) - t / 2);
        const double wrongSin2 = r * (1 - std::sqrt(2.0) * std::sin(degToRad(45) - t / 2));
        const double wrongContact = r * (1 - std::cos(t));
        for (double wrong : {wrongSin, wrongSin2, wrongContact}) {
            CHECK(std::fabs(o.dxRadiusMm - wrong) > 1e-3);
            CHECK(std::fabs(o.dzMm - wrong) > 1e-3);
        }
    }
}

namespace {
// derived: signed gap between the cone actually cut and the drawing's cone, measured along the
// outward normal (+ = metal left on), found from the nose circle alone. The drawing's line goes
// through the origin of (z, x); the imaginary tip sits at tipZ, tipX.
double cutGap(double r, double theta, Widens w, TipSide side, double tipZ, double tipX) {
    const double g = w == Widens::TowardChuck ? 1.0 : -1.0;
    // Outward (away from the material) unit normal of the line x = g·tan θ·z.
    const double nz = -g * std::sin(theta), nx = std::cos(theta);
    // The tip is the corner of the nose's lowest-x tangent and one z tangent.
    const double cz = tipZ + (side == TipSide::ChuckSide ? -r : r);
    const double cx = tipX + r;
    return (cz * nz + cx * nx) - r;
}
} // namespace

TEST_CASE("offsets cancel the gap for cones widening either way", "[nose_offset]") {
    const double r = 1.2;
    for (double deg : {1.0, 5.0, 14.04, 30.0, 45.0, 60.0, 80.0}) {
        const double t = degToRad(deg);
        for (Widens w : {Widens::TowardChuck, Widens::TowardTailstock}) {
            for (TipSide side : {TipSide::ChuckSide, TipSide::TailstockSide}) {
                INFO(deg << "° widens " << (w == Widens::TowardChuck ? "chuck" : "tailstock")
                         << " tip " << (side == TipSide::ChuckSide ? "chuck" : "tailstock"));
                const auto o = noseRadiusOffsets(r, t, w, side);
                const double gap = cutGap(r, t, w, side, 0, 0);
                CHECK(o.leftOn == (gap > 0));
                CHECK(std::fabs(gap) == Approx(o.normalErrorMm));
                CHECK(o.dxDiameterMm == Approx(2 * o.dxRadiusMm));
                // Shift the tip by ΔX alone, then by ΔZ alone: either puts the cut on the line.
                CHECK(cutGap(r, t, w, side, 0, o.xShiftSign * o.dxRadiusMm) ==
                      Approx(0).margin(1e-12));
                CHECK(cutGap(r, t, w, side, o.zShiftSign * o.dzMm, 0) == Approx(0).margin(1e-12));
            }
        }
        // derived: mirrored cones with mirrored tips need the same magnitudes, z mirrored.
        const auto a = noseRadiusOffsets(r, t, Widens::TowardChuck, TipSide::ChuckSide);
        const auto b = noseRadiusOffsets(r, t, Widens::TowardTailstock, TipSide::TailstockSide);
        CHECK(a.dxRadiusMm == Approx(b.dxRadiusMm));
        CHECK(a.dzMm == Approx(b.dzMm));
        CHECK(a.zShiftSign == -b.zShiftSign);
    }
}

TEST_CASE("limits: cylinder and face need no offset", "[nose_offset]") {
    // derived: the imaginary tip is exact on a cylinder (θ = 0) and on a face (θ = 90°).
    const auto cyl = noseRadiusOffsets(0.8, 0.0, Widens::TowardChuck);
    CHECK(cyl.dxRadiusMm == Approx(0).margin(1e-15));
    CHECK(cyl.normalErrorMm == Approx(0).margin(1e-15));
    const auto face = noseRadiusOffsets(0.8, kPi / 2, Widens::TowardChuck);
    CHECK(face.dzMm == Approx(0).margin(1e-15));
    CHECK(face.normalErrorMm == Approx(0).margin(1e-15));
    CHECK(noseRadiusOffsets(0.0, 0.5, Widens::TowardChuck).normalErrorMm == 0);
}

namespace {
// derived: signed gap between the bore actually cut and the drawing's bore, along the normal
// into the wall (+ = metal left inside the drawn bore), from the nose circle alone. The drawn
// bore's line goes through the origin of (z, x), its radius growing toward `w`; a boring tool's
// imaginary tip is the corner of the nose's largest-x tangent (the wall side) and one z tangent.
double boreGap(double r, double theta, Widens w, TipSide side, double tipZ, double tipX) {
    const double g = w == Widens::TowardChuck ? 1.0 : -1.0;
    // Unit normal of the line x = g·tan θ·z pointing into the wall (x increasing).
    const double nz = -g * std::sin(theta), nx = std::cos(theta);
    const double cz = tipZ + (side == TipSide::ChuckSide ? -r : r);
    const double cx = tipX - r;
    // How far the nose's deepest point falls short of the line.
    return -((cz * nz + cx * nx) + r);
}
} // namespace

TEST_CASE("inside: R1 mirrored, checked against the nose circle", "[nose_offset][inside]") {
    const double r = 0.8;
    for (double deg : {1.4321, 2.8624, 30.0, 45.0, 60.0}) {
        const double t = degToRad(deg);
        for (Widens w : {Widens::TowardChuck, Widens::TowardTailstock}) {
            for (TipSide side : {TipSide::ChuckSide, TipSide::TailstockSide}) {
                INFO(deg << "° widens " << (w == Widens::TowardChuck ? "chuck" : "tailstock")
                         << " tip " << (side == TipSide::ChuckSide ? "chuck" : "tailstock"));
                const auto o = insideNoseRadiusOffsets(r, t, w, side);
                const double gap = boreGap(r, t, w, side, 0, 0);
                CHECK(o.leftOn == (gap > 0));
                CHECK(std::fabs(gap) == Approx(o.normalErrorMm));
                CHECK(boreGap(r, t, w, side, 0, o.xShiftSign * o.dxRadiusMm) ==
                      Approx(0).margin(1e-12));
                CHECK(boreGap(r, t, w, side, o.zShiftSign * o.dzMm, 0) == Approx(0).margin(1e-12));
            }
        }
    }
    // Source: references R1 (the closed forms), R12 (the sign turned inside; derived): a socket
    // widening toward its mouth (the tailstock), bored with the tip on the chuck side, is left
    // on by r(sin θ + cos θ − 1) and wants the tip moved r(1 − tan((90° − θ)/2)) away from the
    // axis; at 45°, r = 0.8: the R1 table's 0.46863 and 0.33137.
    const auto socket =
        insideNoseRadiusOffsets(0.8, degToRad(45), Widens::TowardTailstock, TipSide::ChuckSide);
    CHECK(socket.leftOn);
    CHECK(socket.dxRadiusMm == Approx(0.46863).margin(5e-6));
    CHECK(socket.normalErrorMm == Approx(0.33137).margin(5e-6));
    CHECK(socket.xShiftSign == +1);
    CHECK(socket.zShiftSign == +1); // toward the socket's narrow end, the chuck
}
