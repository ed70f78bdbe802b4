// The passes of one inside cone (planner_bore.h).
#include "planner_bore.h"

#include "swarf/sim/tool_outline.h"

#include <algorithm>
#include <cmath>

namespace swarf::detail {

BoreBuilder::BoreBuilder(const Scene& sc, ConePlan& out, const Feature& f)
    : sc_(sc), out_(out), f_(f) {
    const Cone& cone = f.cone;
    th_ = cone.halfAngleRad;
    g_ = cone.growthSign();
    a_ = sc.setup.compoundAdvanceToward == Widens::TowardChuck ? 1.0 : -1.0;
    k_ = sc.setup.crossDial == DialMode::Diameter ? 0.5 : 1.0;
    r_ = sc.tool.noseRadiusMm;
    // The twin's outline (a turning tool on the mirrored bar): the offset for its slope.
    Tool turning = sc.tool;
    turning.kind = ToolKind::Turning;
    const ToolOutline outline(turning);
    const double m = -g_ * std::tan(th_);
    const Eigen::Vector2d tip = outline.imaginaryTip();
    const Eigen::Vector2d sup = outline.support(m);
    noseOut_ = -((tip.y() - m * tip.x()) - (sup.y() - m * sup.x()));
}

double BoreBuilder::coneR(double z) const {
    return 0.5 * f_.cone.diameterAt(z);
}

// The tip's x that cuts radius R with the tip h off centre: √(R² − h²).
double BoreBuilder::tipXFor(double radiusMm) const {
    const double h = sc_.tool.tipHeightMm;
    return std::sqrt(std::max(0.0, radiusMm * radiusMm - h * h));
}

// Where the bore stands now at z (after the saddle passes), radius.
double BoreBuilder::currentR(double z) const {
    double r = 0.5 * sc_.stock.boreDiameterMm;
    for (const auto& [zEnd, radius] : opened_)
        if (z <= zEnd + 1e-9)
            r = std::max(r, radius);
    return r;
}

void BoreBuilder::boreCylinder(double radiusMm, double zEndMm, const std::string& what, int stage) {
    const Slide& cross = sc_.setup.cross;
    const Slide& saddle = sc_.setup.saddle;
    const double from = currentR(zEndMm);
    const double depth = std::max(0.0, radiusMm - from);
    const int n = std::max(1, static_cast<int>(std::ceil(depth / sc_.planning.maxDepthMm - 1e-9)));
    const double div = saddle.mmPerDivision;
    const double z0 = sc_.stock.freeEndZMm();
    const double sFrom = std::floor((z0 - r_ - 1.0 - saddle.backlashMm - zeroZ_) / div) * div;
    // To a shoulder or short of the hole's end: never past zEndMm.
    const double sTo = std::floor((zEndMm - zeroZ_) / div + 1e-9) * div;
    const double off = stage == 0 ? out_.stage0CrossOffsetMm : 0.0;
    for (int i = 1; i <= n; ++i) {
        const bool last = i == n;
        Pass p;
        p.kind = PassKind::Saddle;
        // Snapped to a nanometre: the stage's offset must not leave 1e-15 in the file.
        p.crossMm =
            std::round(
                (roundToDivision(cross, crossFor(tipXFor(from + depth * i / n)) + off) - off) *
                1e9) /
            1e9;
        p.compoundMm = 0;
        p.fromMm = sFrom;
        p.toMm = sTo;
        p.feedMmPerRev = last ? sc_.planning.finishFeedMmPerRev : sc_.planning.roughFeedMmPerRev;
        p.note = what + (n > 1 ? ", pass " + std::to_string(i) + " of " + std::to_string(n)
                               : std::string());
        PassDisplay d;
        d.stage = stage;
        add(p, d);
    }
    opened_.emplace_back(zEndMm, radiusMm);
}

bool BoreBuilder::planSetting(double zMouthMm, double zDeepMm) {
    const double cosT = std::cos(th_);
    const double div = sc_.setup.saddle.mmPerDivision;
    const double zStart = a_ > 0 ? zMouthMm : zDeepMm, zEnd = a_ > 0 ? zDeepMm : zMouthMm;
    const double raw = (zStart - zeroZ_) / div;
    saddleMm_ = (a_ > 0 ? std::floor(raw + 1e-9) : std::ceil(raw - 1e-9)) * div;
    const double base = zeroZ_ + saddleMm_;
    const Slide& comp = sc_.setup.compound;
    auto pAt = [&](double z) { return (z - base) / (a_ * cosT); };
    pFrom_ =
        std::max(0.0, std::floor(pAt(zStart) / comp.mmPerDivision + 1e-9) * comp.mmPerDivision);
    pTo_ = std::ceil(pAt(zEnd) / comp.mmPerDivision - 1e-9) * comp.mmPerDivision;
    out_.compoundRunMm = (zDeepMm - zMouthMm) / cosT;
    return pTo_ <= comp.travelMm + 1e-9;
}

double BoreBuilder::exactCross(double leftMm) const {
    const double base = zeroZ_ + saddleMm_;
    const double radius = coneR(base) + noseOut_ - leftMm / std::cos(th_);
    return crossFor(tipXFor(radius));
}

void BoreBuilder::conePass(bool finish, const std::string& what, double readingMm) {
    Pass p;
    p.kind = PassKind::Compound;
    p.saddleMm = saddleMm_;
    p.crossMm = readingMm;
    p.fromMm = pFrom_;
    p.toMm = pTo_;
    p.feedMmPerRev = finish ? sc_.planning.finishFeedMmPerRev : sc_.planning.roughFeedMmPerRev;
    p.note = what;
    PassDisplay d;
    d.stage = 1;
    d.coneFinish = finish;
    d.coneRough = !finish;
    add(p, d);
}

double BoreBuilder::thicknessMm() const {
    double t = 0;
    const int n = 400;
    for (int i = 0; i <= n; ++i) {
        const double z = f_.zStartMm + (f_.zEndMm - f_.zStartMm) * i / n;
        t = std::max(t, (coneR(z) - currentR(z)) * std::cos(th_));
    }
    return t;
}

void BoreBuilder::add(const Pass& p, const PassDisplay& d) {
    out_.scene.plan.passes.push_back(p);
    out_.display.push_back(d);
    PlanStep s;
    s.kind = PlanStep::Kind::Pass;
    s.pass = static_cast<int>(out_.scene.plan.passes.size()) - 1;
    s.text = p.note;
    out_.steps.push_back(s);
}

} // namespace swarf::detail
