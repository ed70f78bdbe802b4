// Weighted least squares for the cone as cut: two unknowns (D0 at the gauge plane, t = tan θ),
// Gauss–Newton on the readings' models (cone_fit.h).
#include "swarf/sim/cone_fit.h"

#include "swarf/sim/units.h"

#include <Eigen/Dense>
#include <cmath>
#include <set>

namespace swarf {

namespace {

// One scalar reading: value = model(D0, t); the model is linear in D0 with coefficient a, and
// its dependence on t is given by f and df.
struct Obs {
    std::string what;
    double zMm = 0;
    double value = 0, sigma = 0;
    enum class Kind { Diameter, Rolls, Indicator } kind = Kind::Diameter;
    double rollMm = 0;   // Rolls: d
    double travelMm = 0; // Indicator: L
    double lineRad = 0;  // Indicator: α
    SourceLoc where;
};

double model(const Obs& o, double d0, double t, double zg, double g) {
    switch (o.kind) {
    case Obs::Kind::Diameter:
        return d0 + 2.0 * g * t * (o.zMm - zg);
    case Obs::Kind::Rolls:
        return d0 + 2.0 * g * t * (o.zMm - zg) + o.rollMm * (1.0 + std::sqrt(1.0 + t * t));
    case Obs::Kind::Indicator:
        return o.travelMm * (std::cos(o.lineRad) * t - std::sin(o.lineRad));
    }
    return 0;
}

Eigen::Vector2d gradient(const Obs& o, double t, double zg, double g) {
    switch (o.kind) {
    case Obs::Kind::Diameter:
        return {1.0, 2.0 * g * (o.zMm - zg)};
    case Obs::Kind::Rolls:
        return {1.0, 2.0 * g * (o.zMm - zg) + o.rollMm * t / std::sqrt(1.0 + t * t)};
    case Obs::Kind::Indicator:
        return {0.0, o.travelMm * std::cos(o.lineRad)};
    }
    return {0, 0};
}

std::string indexed(const char* name, std::size_t i) {
    return std::string(name) + "[" + std::to_string(i + 1) + "]";
}

} // namespace

double ConeFit::diameterAt(double zMm, const Cone& drawing) const {
    return gaugeDiameterMm + 2.0 * drawing.growthSign() * std::tan(halfAngleRad) * (zMm - gaugeZMm);
}

ConeFit fitCone(const Cone& drawing, const Measurements& m) {
    ConeFit fit;
    fit.gaugeZMm = drawing.gaugeZMm;
    const double zg = drawing.gaugeZMm, g = drawing.growthSign();
    const double t0 = std::tan(drawing.halfAngleRad);

    std::vector<Obs> obs;
    std::set<long long> planes; // distinct planes (to 1 µm) that carry a size
    bool angleOnly = false, anyRolls = false;
    for (std::size_t i = 0; i < m.diameters.size(); ++i) {
        const auto& r = m.diameters[i];
        obs.push_back({indexed("diameter", i), r.zMm, r.valueMm, r.uncertaintyMm,
                       Obs::Kind::Diameter, 0, 0, 0, r.where});
        planes.insert(std::llround(r.zMm * 1000));
    }
    for (std::size_t i = 0; i < m.rolls.size(); ++i) {
        const auto& r = m.rolls[i];
        for (std::size_t j = 0; j < r.zMm.size(); ++j) {
            obs.push_back({indexed("over_rolls", i) + " plane " + std::to_string(j + 1), r.zMm[j],
                           r.readingMm[j], r.uncertaintyMm, Obs::Kind::Rolls, r.rollDiameterMm, 0,
                           0, r.where});
            planes.insert(std::llround(r.zMm[j] * 1000));
            anyRolls = true;
        }
    }
    for (std::size_t i = 0; i < m.gauges.size(); ++i) {
        const auto& r = m.gauges[i];
        // A stand-off uncertain by u moves the gauge's plane by u: 2 u tan θ on diameter.
        obs.push_back({indexed("gauge", i), r.zMm(), r.gaugeDiameterMm, 2.0 * t0 * r.uncertaintyMm,
                       Obs::Kind::Diameter, 0, 0, 0, r.where});
        planes.insert(std::llround(r.zMm() * 1000));
    }
    for (std::size_t i = 0; i < m.indicators.size(); ++i) {
        const auto& r = m.indicators[i];
        obs.push_back({indexed("indicator", i), 0.0, r.changeMm, r.uncertaintyMm,
                       Obs::Kind::Indicator, 0, r.travelMm, r.lineAngleRad, r.where});
        angleOnly = true;
    }
    (void)anyRolls;
    fit.readings = static_cast<int>(obs.size());
    if (planes.empty()) {
        fit.problem = "nothing gives a size: add a [[diameter]], [[over_rolls]] or [[gauge]] "
                      "(an indicator run gives the angle only)";
        return fit;
    }
    if (planes.size() < 2 && !angleOnly) {
        fit.problem = "everything was measured at one plane, which gives the size but not the "
                      "angle: add a second plane ([[diameter]] or [[over_rolls]] at another z) or "
                      "an [[indicator]] run";
        return fit;
    }

    double d0 = drawing.gaugeDiameterMm, t = t0;
    for (int it = 0; it < 30; ++it) {
        Eigen::Matrix2d n = Eigen::Matrix2d::Zero();
        Eigen::Vector2d b = Eigen::Vector2d::Zero();
        for (const Obs& o : obs) {
            const double w = 1.0 / (o.sigma * o.sigma);
            const Eigen::Vector2d j = gradient(o, t, zg, g);
            n += w * j * j.transpose();
            b += w * j * (o.value - model(o, d0, t, zg, g));
        }
        const Eigen::Vector2d step = n.ldlt().solve(b);
        d0 += step(0);
        t += step(1);
        if (!std::isfinite(d0) || !std::isfinite(t) || std::fabs(t) > 100) {
            fit.problem = "the readings give no cone (the fit does not settle)";
            return fit;
        }
        if (std::fabs(step(0)) < 1e-10 && std::fabs(step(1)) < 1e-13)
            break;
    }
    Eigen::Matrix2d n = Eigen::Matrix2d::Zero();
    for (const Obs& o : obs) {
        const Eigen::Vector2d j = gradient(o, t, zg, g);
        n += j * j.transpose() / (o.sigma * o.sigma);
        FitResidual r;
        r.what = o.what;
        r.zMm = o.zMm;
        r.residualMm = o.value - model(o, d0, t, zg, g);
        r.uncertaintyMm = o.sigma;
        r.where = o.where;
        fit.chiSquare += r.normalised() * r.normalised();
        fit.residuals.push_back(r);
    }
    const Eigen::Matrix2d cov = n.inverse();
    fit.gaugeDiameterMm = d0;
    fit.halfAngleRad = std::atan(t);
    fit.gaugeDiameterSdMm = std::sqrt(std::max(0.0, cov(0, 0)));
    // dθ/dt = cos²θ
    fit.halfAngleSdRad = std::sqrt(std::max(0.0, cov(1, 1))) / (1.0 + t * t);

    if (t <= 0) {
        fit.problem = std::string("the readings make the cone ") +
                      (t == 0 ? "a cylinder" : "narrow") + " toward the " +
                      (drawing.widens == Widens::TowardChuck ? "chuck" : "tailstock") +
                      ", where the drawing widens: a reading, its plane or its unit is wrong";
        return fit;
    }
    if (std::fabs(fit.halfAngleRad - drawing.halfAngleRad) > degToRad(5)) {
        fit.problem = "the readings make the half angle " + formatDms(fit.halfAngleRad, 0) +
                      ", more than 5° off the drawing's " + formatDms(drawing.halfAngleRad, 0) +
                      ": no compound is set that far off; a reading, its plane or its unit is "
                      "wrong";
        return fit;
    }
    const FitResidual* worst = nullptr; // the reading furthest off, in its uncertainties
    for (const FitResidual& r : fit.residuals)
        if (!worst || std::fabs(r.normalised()) > std::fabs(worst->normalised()))
            worst = &r;
    if (worst && std::fabs(worst->normalised()) > kMaxNormalisedResidual) {
        fit.problem = "the readings contradict each other: " + worst->what + " is " +
                      std::to_string(std::lround(std::fabs(worst->normalised()))) +
                      " times its uncertainty off the cone the readings give; measure again";
        return fit;
    }
    fit.ok = true;
    return fit;
}

} // namespace swarf
