#pragma once
// Nose-radius offsets for an outside cone (references R1), and mirrored for an inside one. A tool
// is positioned by its imaginary tip: the corner where the tangents to the nose at its lowest x and
// at one of its z-extremes meet. Driving that corner along the drawing's cone line cuts a cone
// parallel to it but displaced: metal is left on when the tip's z-tangent is on the side the cone
// widens toward, and the cone is overcut when it is on the other side. Shifting the path by ONE of
// ΔX or ΔZ puts the cone where the drawing has it.
#include "swarf/sim/cone.h"

namespace swarf {

/// Which z-tangent of the nose the imaginary tip is built on.
enum class TipSide {
    ChuckSide,    ///< tangent at the nose's largest z (swarf's imaginary tip for a right-hand tool)
    TailstockSide ///< tangent at the nose's smallest z
};

/// The displacement of the cut cone and the path shifts that cancel it.
struct NoseOffsets {
    /// true: the cut cone lies outside the drawing's (metal left on); false: overcut.
    bool leftOn = true;
    /// Distance between the cut cone and the drawing's cone, normal to the surface, mm (≥ 0).
    /// Left on: r(sin θ + cos θ − 1). Overcut: r(1 + sin θ − cos θ).
    double normalErrorMm = 0;
    /// Radial path shift magnitude, mm (≥ 0). Left on: r(1 − tan((90° − θ)/2)) = r(1 + tan θ − sec
    /// θ). Overcut: r(sec θ + tan θ − 1).
    double dxRadiusMm = 0;
    /// The same on diameter, mm (2 · dxRadiusMm): what a diameter-reading cross-slide dial shows.
    double dxDiameterMm = 0;
    /// Axial path shift magnitude, mm (≥ 0). Left on: r(1 − tan(θ/2)). Overcut: r(1 + tan(θ/2)).
    double dzMm = 0;
    /// Sign of the radial shift to apply: −1 toward the axis, +1 away from it.
    int xShiftSign = -1;
    /// Sign of the axial shift to apply: +1 toward the chuck (+z), −1 toward the tailstock.
    int zShiftSign = +1;
};

/// Offsets for an outside cone of half angle θ (rad, 0 ≤ θ ≤ π/2; θ = π/2 only for the left-on
/// case) widening as given, cut with a nose of radius r (mm, ≥ 0) positioned by the imaginary
/// tip on `tip`'s side. All lengths mm.
NoseOffsets noseRadiusOffsets(double noseRadiusMm, double halfAngleRad, Widens widens,
                              TipSide tip = TipSide::ChuckSide);

/// Offsets for an inside cone (a bore) of half angle θ widening as given, cut with a boring
/// tool's nose of radius r positioned by its imaginary tip: the corner of the tangents at the
/// nose's largest x (the wall side) and at `tip`'s z. The outside case mirrored across the
/// surface (references R1, R12; derived): an inside cone widening one way is an outside one
/// widening the other, and the wall is away from the axis. So `leftOn` means metal left inside
/// the drawn bore (a plug gauge goes in short), the magnitudes are those of noseRadiusOffsets
/// for the mirrored cone, `xShiftSign` is +1 (away from the axis) to cut deeper and −1 to cut
/// less, and `zShiftSign` moves toward the bore's narrow end to cut deeper.
NoseOffsets insideNoseRadiusOffsets(double noseRadiusMm, double halfAngleRad, Widens widens,
                                    TipSide tip = TipSide::ChuckSide);

} // namespace swarf
