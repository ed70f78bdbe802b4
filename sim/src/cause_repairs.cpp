// The repairs of findCauses and the cone they are measured on (cause_repairs.h).
#include "cause_repairs.h"

#include "swarf/sim/causes.h"
#include "swarf/sim/machine.h"
#include "swarf/sim/nose_offset.h"

#include <algorithm>
#include <cmath>

namespace swarf::detail {

namespace {

// Moves pass k's cut by dxMm in radius (+: away from the axis), as a person does by setting the
// cross-slide reading (or, on a CNC path, the points). The same inside: a reading that grows
// moves the tool toward the axis on either side of the wall.
void shiftPass(Scene& s, int k, double dxMm) {
    Pass& p = s.plan.passes.at(static_cast<std::size_t>(k));
    const double reading = s.setup.crossDial == DialMode::Diameter ? 2 * dxMm : dxMm;
    switch (p.kind) {
    case PassKind::Compound:
    case PassKind::Saddle:
        p.crossMm -= reading; // increasing readings move in
        break;
    case PassKind::CrossSlide:
        p.fromMm -= reading;
        p.toMm -= reading;
        break;
    case PassKind::Path:
        for (auto& pt : p.pathZX)
            pt.second += dxMm;
        return;
    }
    if (p.retractToMm)
        *p.retractToMm -= reading;
}

// The reading on the scene's own scale that sets the compound to half angle θ.
double readingFor(const Setup& su, double thetaRad) {
    return su.compoundScale == CompoundScale::FromAxis ? thetaRad : kPi / 2 - thetaRad;
}

// The compound set to the reading the drawn half angle has on the other scale.
CauseRepair compoundScaleRepair(const Feature& f) {
    const double theta = f.cone.halfAngleRad;
    return {
        "compound_scale",
        [&f, theta](const Scene& s, std::string& msg) {
            std::optional<Scene> none;
            const double tol = f.angleToleranceRad;
            Scene r = s;
            bool any = false;
            auto mend = [&](double& reading) {
                const double own =
                    s.setup.compoundScale == CompoundScale::FromAxis ? reading : kPi / 2 - reading;
                const double other =
                    s.setup.compoundScale == CompoundScale::FromAxis ? kPi / 2 - reading : reading;
                if (std::fabs(own - theta) > tol && std::fabs(other - theta) <= tol) {
                    reading = readingFor(s.setup, theta);
                    any = true;
                }
            };
            mend(r.setup.compoundReadingRad);
            for (Pass& p : r.plan.passes)
                if (p.compoundAngleRad)
                    mend(*p.compoundAngleRad);
            if (!any)
                return none;
            const bool fromAxis = s.setup.compoundScale == CompoundScale::FromAxis;
            msg = std::string("the compound was set to ") +
                  formatDms(s.setup.compoundReadingRad, 0) + ", the half angle as a scale read " +
                  (fromAxis ? "from the cross-slide" : "from the axis") +
                  " shows it, on a scale read " +
                  (fromAxis ? "from the axis" : "from the cross-slide") + "|set " +
                  formatDms(readingFor(s.setup, theta), 0) + " on this scale";
            return std::optional<Scene>(r);
        },
        true};
}

// The cross-slide readings worked out for the other dial mode.
CauseRepair dialModeRepair() {
    return {"dial_mode",
            [](const Scene& s, std::string& msg) {
                std::optional<Scene> none;
                const bool manual =
                    std::any_of(s.plan.passes.begin(), s.plan.passes.end(),
                                [](const Pass& p) { return p.kind != PassKind::Path; });
                if (!manual)
                    return none;
                Scene r = s;
                const bool dia = s.setup.crossDial == DialMode::Diameter;
                r.setup.crossDial = dia ? DialMode::Radius : DialMode::Diameter;
                msg = std::string("the cross-slide readings were worked out for a ") +
                      (dia ? "radius" : "diameter") + " dial, and the dial reads " +
                      (dia ? "diameter" : "radius") + "|work them out on " +
                      (dia ? "diameter" : "radius") + ", as the dial reads";
                return std::optional<Scene>(r);
            },
            true};
}

// The nose-radius offset: the finishing pass shifted to where the closed form puts the
// imaginary tip (references R1; inside, mirrored: nose_offset.h), less what its readings
// already applied. A candidate when the miss exceeds half a cross-slide division (finer than a
// person can set) and is no more than 2.5 offsets (missing, doubled, or on the wrong side; a
// larger miss is not the offset's).
CauseRepair noseOffsetRepair(const Feature& f, bool inside) {
    const double theta = f.cone.halfAngleRad;
    return {"nose_offset", [&f, theta, inside](const Scene& s, std::string& msg) {
                std::optional<Scene> none;
                const auto fin = finishingAt(planMoves(s), f.cone.gaugeZMm, inside);
                if (!fin)
                    return none;
                const TipSide side =
                    s.tool.hand == Hand::L ? TipSide::TailstockSide : TipSide::ChuckSide;
                const double r = s.tool.noseRadiusMm;
                const NoseOffsets no = inside
                                           ? insideNoseRadiusOffsets(r, theta, f.cone.widens, side)
                                           : noseRadiusOffsets(r, theta, f.cone.widens, side);
                const double target = 0.5 * f.cone.gaugeDiameterMm + no.xShiftSign * no.dxRadiusMm;
                const double miss = target - fin->tipXMm;
                const double halfDivision =
                    0.5 * crossTravelFromReading(s.setup, s.setup.cross.mmPerDivision);
                if (std::fabs(miss) <= halfDivision || std::fabs(miss) > 2.5 * no.dxRadiusMm)
                    return none;
                Scene out = s;
                shiftPass(out, fin->pass, miss);
                const double reading =
                    s.setup.crossDial == DialMode::Diameter ? 2 * std::fabs(miss) : std::fabs(miss);
                msg = "the finishing pass " +
                      std::string(std::fabs(miss) > 1.5 * no.dxRadiusMm
                                      ? "had the nose-radius offset the wrong way"
                                  : std::fabs(miss) > 0.5 * no.dxRadiusMm
                                      ? "was set without the nose-radius offset"
                                      : "had only part of the nose-radius offset") +
                      " (" + formatLength(no.dxRadiusMm, s.units, Precision::Fine) +
                      " on radius for this nose and angle" + (inside ? ", inside" : "") +
                      ", references R1)";
                msg += "|set the finishing reading " +
                       formatLength(reading, s.units, Precision::Fine) +
                       (miss < 0 ? " further in" : " further out") +
                       (inside ? (miss < 0 ? ", toward the axis," : ", toward the wall,") : "") +
                       " on the dial";
                return std::optional<Scene>(out);
            }};
}

} // namespace

CauseTarget causeTarget(const Scene& scene) {
    CauseTarget t;
    t.inside = scene.tool.kind == ToolKind::BoringBar;
    t.cone = scene.workedCone();
    if (!t.cone)
        return t;
    t.feature = static_cast<int>(t.cone - scene.part.features.data());
    t.lengthMm = t.cone->zEndMm - t.cone->zStartMm;
    return t;
}

std::optional<FinishingTip> finishingAt(const std::vector<ToolMove>& moves, double zMm,
                                        bool inside) {
    std::optional<FinishingTip> best;
    for (const ToolMove& m : moves) {
        const double z0 = m.tipFrom.x(), z1 = m.tipTo.x();
        if (std::fabs(z1 - z0) < 1e-9 || zMm < std::min(z0, z1) || zMm > std::max(z0, z1))
            continue;
        const double x = m.tipFrom.y() + (zMm - z0) / (z1 - z0) * (m.tipTo.y() - m.tipFrom.y());
        if (!best || (inside ? x > best->tipXMm : x < best->tipXMm))
            best = FinishingTip{m.pass, x};
    }
    return best;
}

std::string coneChangeWords(double dMm, double dRad, Units u, bool inside) {
    std::string s = std::string(inside ? "the bore is " : "the cone is ") +
                    formatLength(std::fabs(dMm), u, Precision::Fine) +
                    (dMm >= 0 ? " large" : " small") + " on diameter at the gauge plane";
    if (std::fabs(dRad) >= degToRad(1.0 / 3600.0))
        s += ", its half angle " + formatDms(std::fabs(dRad), 0) +
             (dRad >= 0 ? " steeper" : " shallower");
    return s;
}

std::vector<CauseRepair> causeRepairs(const CauseTarget& target) {
    return {compoundScaleRepair(*target.cone), dialModeRepair(),
            noseOffsetRepair(*target.cone, target.inside)};
}

} // namespace swarf::detail
