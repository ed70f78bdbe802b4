// Nose-radius offsets for an outside cone (references R1; the overcut case derived the same way).
#include "swarf/sim/nose_offset.h"

#include "swarf/sim/units.h"

#include <cassert>
#include <cmath>

namespace swarf {

NoseOffsets noseRadiusOffsets(double noseRadiusMm, double halfAngleRad, Widens widens,
                              TipSide tip) {
    assert(noseRadiusMm >= 0 && halfAngleRad >= 0 && halfAngleRad <= kPi / 2);
    const double r = noseRadiusMm;
    const double s = std::sin(halfAngleRad), c = std::cos(halfAngleRad);
    const double t2 = std::tan(halfAngleRad / 2.0);
    NoseOffsets o;
    // Left on when the tip's z-tangent faces the way the cone widens: the nose touches the cone
    // behind the tip and the tip's corner stands off the surface.
    o.leftOn = (widens == Widens::TowardChuck) == (tip == TipSide::ChuckSide);
    const double zTowardWide = widens == Widens::TowardChuck ? 1.0 : -1.0;
    if (o.leftOn) {
        o.normalErrorMm = r * (s + c - 1.0);
        // r(1 + tan θ − sec θ) written as r(1 − tan((90° − θ)/2)): finite at θ = 90°.
        o.dxRadiusMm = r * (1.0 - std::tan((kPi / 2 - halfAngleRad) / 2.0));
        o.dzMm = r * (1.0 - t2);
        // Move into the material: toward the axis, or along z toward the wide end.
        o.xShiftSign = -1;
        o.zShiftSign = static_cast<int>(zTowardWide);
    } else {
        o.normalErrorMm = r * (1.0 + s - c);
        o.dxRadiusMm = r * (1.0 / c + s / c - 1.0);
        o.dzMm = r * (1.0 + t2);
        // Move out of the material: away from the axis, or along z toward the narrow end.
        o.xShiftSign = +1;
        o.zShiftSign = static_cast<int>(-zTowardWide);
    }
    o.dxDiameterMm = 2.0 * o.dxRadiusMm;
    return o;
}

NoseOffsets insideNoseRadiusOffsets(double noseRadiusMm, double halfAngleRad, Widens widens,
                                    TipSide tip) {
    // Mirror x across the surface: the wall (the material) is then on the axis side, as outside,
    // and a bore widening toward one end is a shank widening toward the other. z is unchanged.
    const Widens mirrored =
        widens == Widens::TowardChuck ? Widens::TowardTailstock : Widens::TowardChuck;
    NoseOffsets o = noseRadiusOffsets(noseRadiusMm, halfAngleRad, mirrored, tip);
    o.xShiftSign = -o.xShiftSign;
    return o;
}

} // namespace swarf
