// Planning a cone: references, straight-turning passes, cone roughing and finishing passes.
//
// Geometry (derived from the machine model in scenes/README.md): with the compound at the cone's
// half angle θ and its sense (as the scene gives it) matching the way the cone widens
// (compound_sense.h), winding the compound moves the imaginary tip parallel to the cone line. With
// the saddle locked at s and the cross-slide at c, the tip line passes through the point
// (zeroZ + s, zeroD/2 − k c), so c = (zeroD/2 − X(zeroZ + s)) / k, where X(z) is the wanted tip
// line: the cone radius, plus the nose-radius offset (references R1, taken from the insert
// outline), plus the metal left for later passes divided by cos θ.
#include "swarf/sim/planner.h"
#include "planner_build.h"

#include "swarf/sim/tool_outline.h"

#include <algorithm>
#include <cmath>

namespace swarf {
namespace detail {

PlanBuilder::PlanBuilder(const Scene& scene, ConePlan& out, const Feature& feature)
    : sc_(scene), out_(out), f_(feature), cone_(feature.cone) {
    th_ = cone_.halfAngleRad;
    g_ = cone_.growthSign();
    lead_ = scene.tool.hand == Hand::L ? -1.0 : 1.0;
    a_ = scene.setup.compoundAdvanceToward == Widens::TowardChuck ? 1.0 : -1.0;
    k_ = scene.setup.crossDial == DialMode::Diameter ? 0.5 : 1.0;
    rs_ = scene.stock.diameterMm / 2.0;
    z0_ = scene.stock.freeEndZMm();
    zLo_ = f_.zStartMm;
    zHi_ = f_.zEndMm;
    r_ = scene.tool.noseRadiusMm;

    // Nose-radius offset from the insert outline: the tip line that puts the swept nose on the
    // cone line (references R1 for the closed forms; the outline gives the same for an arc).
    const ToolOutline outline(scene.tool);
    const double m = g_ * std::tan(th_);
    const Eigen::Vector2d tip = outline.imaginaryTip();
    const Eigen::Vector2d sup = outline.support(m);
    noseRadial_ = (tip.y() - m * tip.x()) - (sup.y() - m * sup.x());
    tipAheadZ_ = tip.x() - sup.x();
    // A tool above or below centre cuts radius sqrt(x² + h²) (references R7): aim at the
    // gauge plane's radius.
    const double h = scene.tool.tipHeightMm;
    const double rg = cone_.gaugeDiameterMm / 2.0;
    heightCorr_ = h != 0 && rg > std::fabs(h) ? std::sqrt(rg * rg - h * h) - rg : 0.0;
}

double PlanBuilder::coneR(double z) const {
    return cone_.diameterAt(z) / 2.0;
}

double PlanBuilder::tipLine(double z, double normalLeftMm) const {
    return coneR(z) + noseRadial_ + normalLeftMm / std::cos(th_) + heightCorr_;
}

double PlanBuilder::currentR(double z) const {
    double r = rs_;
    for (const Turned& t : turned_)
        if (z <= t.zEndMm + 1e-9)
            r = std::min(r, t.radiusMm);
    return r;
}

bool PlanBuilder::endIsFree(bool highEnd) const {
    const double z = highEnd ? zHi_ + 0.01 : zLo_ - 0.01;
    if (!highEnd && z < z0_)
        return true; // beyond the bar's free end: air
    const auto nb = sc_.part.nominalRadiusAt(z);
    if (!nb)
        return true; // the drawing says nothing there
    const bool largeEnd = (g_ > 0) == highEnd;
    const double rEnd = coneR(highEnd ? zHi_ : zLo_);
    // A convex corner (the neighbour no larger than the cone's large end) lets the tool run on.
    if (largeEnd)
        return *nb <= rEnd + 1e-3;
    // Past the small end the cone line runs on downward: free if it stays clear of the
    // neighbour over the whole run-out (nose, margin and a millimetre).
    const double runMm = 2.0 * r_ + r_ + 0.5 + sc_.setup.compound.backlashMm + 1.0;
    const auto nbFar = sc_.part.nominalRadiusAt(highEnd ? zHi_ + runMm : zLo_ - runMm);
    const double lowest = rEnd - std::tan(th_) * runMm - r_;
    return *nb <= lowest && (!nbFar || *nbFar <= lowest);
}

std::optional<std::pair<double, double>> PlanBuilder::tipRange(double normalLeftMm) const {
    const int n = 400;
    const double dz = (zHi_ - zLo_) / n;
    double za = 1e18, zb = -1e18;
    for (int i = 0; i <= n; ++i) {
        const double z = zLo_ + i * dz;
        if (currentR(z) > coneR(z) + normalLeftMm / std::cos(th_) + 1e-6) {
            za = std::min(za, z - dz);
            zb = std::max(zb, z + dz);
        }
    }
    if (za > zb)
        return std::nullopt;
    za = std::max(za, zLo_);
    zb = std::min(zb, zHi_);
    const double margin = r_ + 0.5 + sc_.setup.compound.backlashMm;
    double ta = za + tipAheadZ_, tb = zb + tipAheadZ_;
    // Low end: run on into air, or stop short of a concave corner.
    if (za > zLo_ + 1e-9 || endIsFree(false))
        ta -= margin;
    else
        ta = std::max(ta, zLo_ + lead_ * r_ + r_);
    if (zb < zHi_ - 1e-9 || endIsFree(true))
        tb += margin;
    else
        tb = std::min(tb, zHi_ + lead_ * r_ - r_);
    // Keep clear of the chuck jaws.
    tb = std::min(tb, sc_.stock.jawZMm() - 2.0 * r_ - 1.0);
    if (tb <= ta)
        return std::nullopt;
    return std::make_pair(ta, tb);
}

double PlanBuilder::crossFor(double tipX) const {
    return (zeroD_ / 2.0 - tipX) / k_;
}

void PlanBuilder::addPass(Pass pass, PassDisplay display) {
    out_.scene.plan.passes.push_back(std::move(pass));
    out_.display.push_back(display);
    PlanStep step;
    step.kind = PlanStep::Kind::Pass;
    step.pass = static_cast<int>(out_.scene.plan.passes.size()) - 1;
    step.text = out_.scene.plan.passes.back().note;
    out_.steps.push_back(step);
}

void PlanBuilder::turnCylinder(double radiusMm, double zEndMm, bool endAtShoulder,
                               const std::string& what, int stage, int featureIndex) {
    const Slide& cross = sc_.setup.cross;
    const Slide& saddle = sc_.setup.saddle;
    const double top = std::min(rs_, currentR(zEndMm));
    const double allowance = sc_.planning.finishAllowanceMm;
    const double roughDepth = std::max(0.0, top - radiusMm - allowance);
    const int n = roughDepth > 1e-9
                      ? static_cast<int>(std::ceil(roughDepth / sc_.planning.maxDepthMm - 1e-9))
                      : 0;
    const double sFrom =
        std::floor((z0_ - r_ - 1.0 - saddle.backlashMm - zeroZ_) / saddle.mmPerDivision) *
        saddle.mmPerDivision;
    // Stop at a shoulder without passing it; run on past a free end until the nose is clear,
    // short of the jaws.
    double sTo = endAtShoulder
                     ? std::floor((zEndMm - zeroZ_) / saddle.mmPerDivision + 1e-9)
                     : std::ceil((zEndMm + r_ + 0.5 - zeroZ_) / saddle.mmPerDivision - 1e-9);
    sTo *= saddle.mmPerDivision;
    const double jawLimit = std::floor((sc_.stock.jawZMm() - 1.5 - zeroZ_) / saddle.mmPerDivision) *
                            saddle.mmPerDivision;
    sTo = std::min(sTo, jawLimit);
    for (int i = 0; i <= n; ++i) {
        const bool finish = i == n;
        const double x = finish ? radiusMm + heightCorrAt(radiusMm)
                                : radiusMm + allowance + roughDepth * (n - 1 - i) / n;
        Pass p;
        p.kind = PassKind::Saddle;
        // Whole divisions as the person reads the dial in this stage (stage A counts from the
        // bar, the scene from the references: they differ by the stage's offset).
        const double off = stage == 0 ? out_.stage0CrossOffsetMm : 0.0;
        p.crossMm = roundToDivision(cross, crossFor(x) + off) - off;
        p.compoundMm = 0;
        p.fromMm = sFrom;
        p.toMm = sTo;
        p.feedMmPerRev = finish ? sc_.planning.finishFeedMmPerRev : sc_.planning.roughFeedMmPerRev;
        p.note = what +
                 (finish ? ": finishing pass"
                         : ": roughing pass " + std::to_string(i + 1) + " of " + std::to_string(n));
        PassDisplay d;
        d.stage = stage;
        addPass(p, d);
        if (finish && featureIndex >= 0)
            finishes_.push_back({static_cast<int>(out_.scene.plan.passes.size()) - 1, crossFor(x),
                                 featureIndex, off});
    }
    turned_.push_back({zEndMm, radiusMm});
}

double PlanBuilder::heightCorrAt(double radiusMm) const {
    const double h = sc_.tool.tipHeightMm;
    return h != 0 && radiusMm > std::fabs(h) ? std::sqrt(radiusMm * radiusMm - h * h) - radiusMm
                                             : 0;
}

double PlanBuilder::maxNormalThickness() const {
    double t = 0;
    const int n = 400;
    for (int i = 0; i <= n; ++i) {
        const double z = zLo_ + (zHi_ - zLo_) * i / n;
        t = std::max(t, (currentR(z) - coneR(z)) * std::cos(th_));
    }
    return t;
}

void PlanBuilder::planSettings() {
    const auto range = tipRange(0.0);
    if (!range)
        return;
    const double cosT = std::cos(th_);
    const double begin = a_ > 0 ? range->first : range->second;
    const double lengthAlong = (range->second - range->first) / cosT;
    const Slide& comp = sc_.setup.compound;
    const double usable = comp.travelMm - 2.0 * comp.mmPerDivision;
    const int n = std::max(1, static_cast<int>(std::ceil(lengthAlong / usable - 1e-9)));
    out_.compoundSettings = n;
    out_.compoundRunMm = lengthAlong;
    const double overlap = n > 1 ? std::min(0.5, usable * 0.05) : 0.0;
    settings_.clear();
    for (int i = 0; i < n; ++i) {
        Setting s;
        const double t0 = std::max(0.0, lengthAlong * i / n - overlap);
        const double t1 = lengthAlong * (i + 1) / n;
        const double zA = begin + a_ * t0 * cosT, zB = begin + a_ * t1 * cosT;
        s.zMinMm = std::min(zA, zB);
        s.zMaxMm = std::max(zA, zB);
        // Compound at 0 where the setting begins: round the saddle so the readings stay ≥ 0.
        const double raw = (zA - zeroZ_) / sc_.setup.saddle.mmPerDivision;
        s.saddleMm = (a_ > 0 ? std::floor(raw + 1e-9) : std::ceil(raw - 1e-9)) *
                     sc_.setup.saddle.mmPerDivision;
        settings_.push_back(s);
    }
}

bool PlanBuilder::compoundPass(double normalLeftMm, bool finish, const std::string& what,
                               int passNo, int passCount) {
    const auto range = tipRange(normalLeftMm);
    if (!range)
        return false;
    const double cosT = std::cos(th_);
    const Slide& comp = sc_.setup.compound;
    bool any = false;
    for (std::size_t k = 0; k < settings_.size(); ++k) {
        const Setting& st = settings_[k];
        const double lo = std::max(range->first, st.zMinMm),
                     hi = std::min(range->second, st.zMaxMm);
        if (hi <= lo + 1e-6)
            continue;
        const double base = zeroZ_ + st.saddleMm;
        auto pAt = [&](double z) { return (z - base) / (a_ * cosT); };
        const double zStart = a_ > 0 ? lo : hi, zEnd = a_ > 0 ? hi : lo;
        double pFrom = std::floor(pAt(zStart) / comp.mmPerDivision + 1e-9) * comp.mmPerDivision;
        double pTo = std::ceil(pAt(zEnd) / comp.mmPerDivision - 1e-9) * comp.mmPerDivision;
        pFrom = std::max(0.0, pFrom);
        pTo = std::min(pTo, comp.travelMm);
        Pass p;
        p.kind = PassKind::Compound;
        p.saddleMm = st.saddleMm;
        const double exact = crossFor(tipLine(base, normalLeftMm));
        p.crossMm = roundToDivision(sc_.setup.cross, exact);
        p.fromMm = pFrom;
        p.toMm = pTo;
        p.feedMmPerRev = finish ? sc_.planning.finishFeedMmPerRev : sc_.planning.roughFeedMmPerRev;
        std::string n = what;
        if (!finish)
            n += " " + std::to_string(passNo) + " of " + std::to_string(passCount);
        if (settings_.size() > 1)
            n += ", saddle setting " + std::to_string(k + 1) + " of " +
                 std::to_string(settings_.size());
        p.note = n;
        PassDisplay d;
        d.stage = 1;
        d.coneFinish = finish;
        d.coneRough = !finish;
        d.setting = static_cast<int>(k);
        addPass(p, d);
        if (finish)
            finishes_.push_back(
                {static_cast<int>(out_.scene.plan.passes.size()) - 1, exact, featureIndex_});
        any = true;
    }
    return any;
}

void PlanBuilder::saddleSteps() {
    // Stepped straight passes whose inner corners lie on the cone offset by the finishing
    // allowance (plus the nose offset); what is left between the steps is at most one step deep.
    const double allowance = sc_.planning.finishAllowanceMm;
    const double tanT = std::tan(th_);
    const double top = std::min(rs_, currentR(zHi_));
    const double bottom = tipLine(zLo_, allowance);
    if (top <= bottom)
        return;
    const int n = static_cast<int>(std::ceil((top - bottom) / sc_.planning.maxDepthMm - 1e-9));
    const Slide& saddle = sc_.setup.saddle;
    const double sFrom =
        std::floor((z0_ - r_ - 1.0 - saddle.backlashMm - zeroZ_) / saddle.mmPerDivision) *
        saddle.mmPerDivision;
    int made = 0;
    for (int j = 1; j < n; ++j) {
        const double x = top - (top - bottom) * j / n;
        const double xSet = roundToDivision(sc_.setup.cross, crossFor(x));
        const double xTip = zeroD_ / 2.0 - k_ * xSet;
        // Where the tip line for the allowance reaches this radius.
        const double zCorner = cone_.gaugeZMm + (xTip - (cone_.gaugeDiameterMm / 2.0 + noseRadial_ +
                                                         heightCorr_ + allowance / std::cos(th_))) /
                                                    tanT;
        const double zStop = std::min(zCorner, zHi_);
        if (zStop <= zLo_)
            continue;
        Pass p;
        p.kind = PassKind::Saddle;
        p.crossMm = xSet;
        p.compoundMm = 0;
        p.fromMm = sFrom;
        p.toMm = std::floor((zStop - zeroZ_) / saddle.mmPerDivision + 1e-9) * saddle.mmPerDivision;
        if (p.toMm <= p.fromMm)
            continue;
        p.feedMmPerRev = sc_.planning.roughFeedMmPerRev;
        p.note = "cone, stepped saddle pass " + std::to_string(++made);
        PassDisplay d;
        d.stage = 1;
        d.coneRough = true;
        addPass(p, d);
        // What the steps leave behind is bounded by the step's corner radius.
        turned_.push_back({zStop, xTip});
    }
    out_.saddleStepPasses = made;
}

} // namespace detail
} // namespace swarf
