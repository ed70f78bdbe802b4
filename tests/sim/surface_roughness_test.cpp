// Tests for sim/include/swarf/sim/surface_roughness.h: Rt and Ra of the finishing pass, measured
// on the feed-mark surface, against values the test works out itself.
#include "swarf/sim/surface_roughness.h"

#include "kernel_scenes.h"
#include "swarf/sim/kernel.h"

#include <catch2/catch.hpp>
#include <cmath>
#include <functional>
#include <string>

using namespace swarf;
using namespace swarf::testing;

namespace {

// Ra of one period of a profile y(u), u in [0, f), by the midpoint rule on 200 000 points
// (derived; independent of the kernel).
double raOfPeriod(const std::function<double(double)>& y, double f) {
    const int n = 200000;
    std::vector<double> v(n);
    double mean = 0;
    for (int i = 0; i < n; ++i) {
        v[i] = y((i + 0.5) * f / n);
        mean += v[i];
    }
    mean /= n;
    double ra = 0;
    for (double x : v)
        ra += std::abs(x - mean);
    return ra / n;
}

// The arc profile of a nose of radius r repeated every f, one period, heights above the lowest
// point: y(u) = r − sqrt(r² − u²) on [−f/2, f/2] (references R2: the exact arc).
double arcHeight(double u, double f, double r) {
    const double w = u - f * std::round(u / f);
    return r - std::sqrt(r * r - w * w);
}

enum class Insert { D93, Round };

// A cone of half angle thetaDeg (0: a cylinder), 40 mm of path, one CNC move along it at feed
// f; the insert, its nose radius, the tip height and which way the cone widens as given.
Scene coneScene(Insert insert, double r, double f, double thetaDeg, double tip, bool widens) {
    const double th = degToRad(thetaDeg), c = std::cos(th), t = std::tan(th);
    const double len = 40 * c; // axial length of 40 mm of path
    Scene s = barScene(120, 120);
    if (insert == Insert::Round) {
        s.tool.shape = 'R';
        s.tool.includedAngleRad = kPi;
        s.tool.enteringAngleRad = degToRad(90);
        s.tool.edgeLengthMm = 2 * r;
    }
    s.tool.noseRadiusMm = r;
    s.tool.tipHeightMm = tip;
    s.sim.profileStepMm = 0.01;
    const double r0 = widens ? 12.0 : 12.0 + len * t; // drawn radius at z = 0
    if (thetaDeg == 0) {
        s.part.features.push_back(cylinderFeature(0, len, 2 * r0, 0.2));
    } else {
        Feature cone = coneFeature(0, len, 2 * r0, th, 0.2);
        cone.cone.widens = widens ? Widens::TowardChuck : Widens::TowardTailstock;
        s.part.features.push_back(cone);
    }
    // The imaginary tip on the drawn line, from 2 mm before the datum face to 2 mm past the
    // end (the offset of the nose does not matter here: only the marks' shape).
    const double slope = widens ? t : -t;
    s.plan.passes.push_back(pathPass({{-2, r0 - 2 * slope}, {len + 2, r0 + (len + 2) * slope}}, f));
    return s;
}

} // namespace

TEST_CASE("Rt and Ra are the arc's within 1 % for every f/r, tip height and cone up to 60°",
          "[roughness][surface]") {
    // Expected values, worked out here (derived): the nose arc repeated every f along the move
    // leaves cusps r − sqrt(r² − f²/4) high normal to the move (references R2, exact arc), and
    // Ra is the arc profile's, integrated numerically above. With the tip h off centre a tool
    // point at x cuts R = sqrt(x² + h²): heights scale by dR/dx = x/R, and the surface's slope
    // becomes (x/R) tan θ, whose cosine takes the place of cos θ normal to the surface.
    // The grid keeps to tools whose nose arc forms the whole cusp (the D insert in a 93° holder
    // has 32° of arc behind its lowest point and 93° ahead; a round insert is all arc), so the
    // arc value is the true one; see the next test for a trailing edge that cuts it short.
    int cases = 0;
    for (const Insert insert : {Insert::D93, Insert::Round})
        for (const double thetaDeg : {0.0, 15.0, 30.0, 45.0, 60.0})
            for (const bool widens : {true, false}) {
                // The D insert cannot follow a steep cone that falls as it feeds (rubbing).
                if (thetaDeg > 0 && !widens && insert == Insert::D93)
                    continue;
                if (thetaDeg == 0 && !widens)
                    continue;
                for (const double tip : {0.0, 0.5, -0.8})
                    for (const double fr : {0.02, 0.05, 0.1, 0.125, 0.25, 0.4, 0.5, 0.75, 1.0}) {
                        const double r = insert == Insert::Round ? 2.0 : 0.8;
                        const double f = fr * r;
                        const Scene s = coneScene(insert, r, f, thetaDeg, tip, widens);
                        const CutResult res = simulate(s);
                        const double th = degToRad(thetaDeg);
                        // The drawn radius mid-cone stands for x there (the marks are microns on
                        // a radius of 12 mm or more: their own height does not change x/R).
                        const Feature& feat = s.part.features[0];
                        const double x = feat.radiusAt(0.5 * (feat.zStartMm + feat.zEndMm));
                        const double k = x / std::hypot(x, tip);
                        const double scale =
                            k * std::cos(std::atan(k * std::tan(th))) / std::cos(th);
                        const double rt = (r - std::sqrt(r * r - f * f / 4)) * scale;
                        const double ra =
                            raOfPeriod([&](double u) { return arcHeight(u, f, r); }, f) * scale;
                        INFO((insert == Insert::Round ? "round" : "D 93°")
                             << " r " << r << " f/r " << fr << " cone " << thetaDeg << "° "
                             << (widens ? "widening" : "narrowing") << " tip " << tip);
                        CHECK(res.rtUm == Approx(1000 * rt).epsilon(0.01));
                        CHECK(res.raUm == Approx(1000 * ra).epsilon(0.01));
                        ++cases;
                    }
            }
    CHECK(cases == (5 + 9) * 3 * 9); // D: 5 cones; round: 9; three tip heights, nine feeds
}

TEST_CASE("a trailing edge at 5° cuts the cusp short when f > 2r sin 5°", "[roughness][surface]") {
    // A C insert (80°) in a 95° holder leaves 5° of nose arc behind its lowest point, then the
    // straight trailing edge rising at 5° (references R8: C 80°, L 95°). From f = 2r sin 5° on,
    // that edge, not the arc, meets the next turn's arc: the marks are lower than the arc's
    // r − sqrt(r² − f²/4). The profile of one period, worked out here (derived): the arc of the
    // turn before, r − sqrt(r² − u²), meets the trailing flank of the turn after, at w = f − u
    // behind its lowest point: the arc up to r sin 5°, then the straight edge.
    const double r = 0.8, kappa2 = degToRad(5);
    Scene s = coneScene(Insert::D93, r, 0.2, 0, 0, true);
    s.tool.shape = 'C';
    s.tool.includedAngleRad = degToRad(80);
    s.tool.enteringAngleRad = degToRad(95);
    for (const double f : {0.1, 0.2, 0.4}) {
        s.plan.passes[0].feedMmPerRev = f;
        const CutResult res = simulate(s);
        auto trailing = [&](double w) {
            const double w0 = r * std::sin(kappa2);
            return w <= w0 ? r - std::sqrt(r * r - w * w)
                           : r * (1 - std::cos(kappa2)) + (w - w0) * std::tan(kappa2);
        };
        auto profile = [&](double u) {
            return std::min(r - std::sqrt(r * r - u * u), trailing(f - u));
        };
        // The crest: where the two meet (bisection on [0, f]).
        double lo = 0, hi = f;
        for (int it = 0; it < 100; ++it) {
            const double mid = 0.5 * (lo + hi);
            (r - std::sqrt(r * r - mid * mid) < trailing(f - mid) ? lo : hi) = mid;
        }
        const double rt = profile(lo);
        const double ra = raOfPeriod(profile, f);
        INFO("f " << f);
        CHECK(res.rtUm == Approx(1000 * rt).epsilon(0.01));
        CHECK(res.raUm == Approx(1000 * ra).epsilon(0.01));
        const double arc = r - std::sqrt(r * r - f * f / 4);
        if (f > 2 * r * std::sin(kappa2))
            CHECK(rt < 0.99 * arc); // lower than the arc value: the edge, not a fault
        else
            CHECK(rt == Approx(arc).epsilon(1e-9));
    }
}

TEST_CASE("measureRoughness needs a whole pitch", "[roughness][surface]") {
    const CutResult res = simulate(coneScene(Insert::D93, 0.8, 0.2, 0, 0, true));
    const Roughness none = measureRoughness(res.surface, 0, 5, 5.1);
    CHECK(none.rtUm == 0);
    CHECK(none.raUm == 0);
    CHECK(measureRoughness(res.surface, 0, 5, 5.3).rtUm > 0);
    CHECK(measureRoughness(FeedMarkSurface(), 0, 5, 15).rtUm == 0);
}
