// The error budget (sim/budget.h, sim/perturb.h): one source at a time against analytic
// propagation, within the Monte Carlo's own standard error at the sample count used; nothing
// uncertain gives no spread; the shares of linear sources add up; a seed gives the same numbers
// whatever the thread count.
#include "kernel_scenes.h"
#include "swarf/sim/budget.h"
#include "swarf/sim/kernel.h"
#include "swarf/sim/perturb.h"

#include <catch2/catch.hpp>

#include <cmath>

using namespace swarf;

namespace {

// A 1:10 arbor cut with the compound, as the demo scene (numbers made up for the test): bar 30,
// cone 0..50 with 29.000 at the gauge plane z = 40, the compound at the half angle winding
// toward the tailstock and in from the saddle at 52, diameter dial zeroed on the bar.
Scene arbor() {
    Scene s = testing::barScene(30.0, 85.0);
    const double th = std::atan(0.05);
    Feature c = testing::coneFeature(0, 50, 29.0 - 2 * 40 * 0.05, th, 0.02);
    c.cone.gaugeZMm = 40;
    c.cone.gaugeDiameterMm = 29.0;
    c.angleToleranceRad = degToRad(0.05);
    s.part.features.push_back(c);
    s.part.features.push_back(testing::cylinderFeature(50, 80, 30, 0.1));
    s.tool.noseRadiusMm = 0.4;
    s.setup.compoundReadingRad = th;
    s.setup.compoundAdvanceToward = Widens::TowardTailstock;
    s.setup.zeroDiameterMm = 30;
    s.setup.compound = {0.02, 100, 0.04, 90};
    s.setup.cross = {0.02, 100, 0.05, 150};
    s.setup.saddle = {0.1, 200, 0.1, 1e9};
    for (double c2 : {-3.36, -1.76, -0.36, -0.16}) {
        Pass p;
        p.kind = PassKind::Compound;
        p.crossMm = c2;
        p.saddleMm = 52;
        p.fromMm = 0;
        p.toMm = 55;
        p.feedMmPerRev = 0.1;
        s.plan.passes.push_back(p);
    }
    return s;
}

BudgetOptions opts(int samples, int threads = 2) {
    BudgetOptions o;
    o.samples = samples;
    o.seed = 7;
    o.threads = threads;
    return o;
}

// Standard error of a sample sd of n values from a distribution of excess kurtosis k
// (derived: Var(s²) ≈ σ⁴ (k + 2) / n, so se(s) ≈ σ √((k + 2) / (4n))).
double sdStandardError(double sigma, double excessKurtosis, int n) {
    return sigma * std::sqrt((excessKurtosis + 2.0) / (4.0 * n));
}

} // namespace

TEST_CASE("budget: nothing uncertain gives no spread and one verdict", "[budget]") {
    const Scene s = arbor();
    const Budget b = runBudget(s, opts(50));
    CHECK(b.sources.empty());
    CHECK(b.gaugeDiameterMm.sd == 0.0);
    CHECK(b.halfAngleRad.sd == 0.0);
    CHECK(b.gaugeDiameterMm.p2_5 == b.exact.gaugeDiameterMm);
    CHECK(b.gaugeDiameterMm.p97_5 == b.exact.gaugeDiameterMm);
    CHECK(b.pInTolerance == (b.exact.withinTolerance ? 1.0 : 0.0));
    for (double d : b.gaugeDiametersMm)
        CHECK(d == b.exact.gaugeDiameterMm);
}

TEST_CASE("budget: the exact part is the part swarf run cuts", "[budget]") {
    // The budget samples the profile every 0.01 mm over the cone alone; the run every 0.002 mm
    // over the bar. At the gauge plane both are exact samples of the same sweep.
    const Scene s = arbor();
    const CutResult r = simulate(s);
    const Budget b = runBudget(s, opts(2));
    CHECK(b.profileStepMm == Approx(0.01));
    CHECK(b.exact.gaugeDiameterMm == Approx(r.gaugeAsCutDiameterMm).margin(1e-9));
    CHECK(b.exact.halfAngleRad == Approx(r.features[0].asCutHalfAngleRad).margin(1e-6));
    CHECK(b.exact.withinTolerance == r.features[0].withinTolerance);
}

TEST_CASE("budget: a uniform diameter-dial reading error of ±e gives sd 2e/√12", "[budget]") {
    Scene s = arbor();
    const double e = 0.01; // mm of dial, on diameter
    s.uncertainty.crossReadingMm = e;
    const int n = 3000;
    const Budget b = runBudget(s, opts(n));
    // Source: references R11 (JCGM 100: a rectangular distribution of half-width a has
    // u = a/√3 = 2a/√12); the finishing pass's reading alone places the gauge diameter, one
    // division of a diameter dial being that much on diameter (derived).
    const double sigma = 2 * e / std::sqrt(12.0);
    // A uniform distribution has excess kurtosis −1.2 (derived).
    CHECK(std::abs(b.gaugeDiameterMm.sd - sigma) < 3 * sdStandardError(sigma, -1.2, n));
    CHECK(std::abs(b.gaugeDiameterMm.mean - b.exact.gaugeDiameterMm) < 3 * sigma / std::sqrt(n));
    // The readings do not tilt the cone (less than 0.2″; the run-out at the cone's end moves).
    CHECK(b.halfAngleRad.sd < 1e-6);
    REQUIRE(b.sources.size() == 1);
    CHECK(b.sources[0].source == BudgetSource::CrossReading);
    CHECK(b.sources[0].share == Approx(1.0));
}

TEST_CASE("budget: a compound-angle sd gives the lever-arm formula", "[budget]") {
    Scene s = arbor();
    const double sdRad = degToRad(2.0 / 60.0); // 2′
    s.uncertainty.compoundAngleSdRad = sdRad;
    const int n = 3000;
    const Budget b = runBudget(s, opts(n));
    // Source: references R10 and sim/sensitivity.h (derived): the cut's line pivots where the
    // finishing pass's compound reads 0, ΔD = 2 L δθ / cos²θ. The imaginary tip is there at
    // z = 52; the surface the nose leaves pivots about its contact point, the nose centre
    // (r back from the tip's leading tangent) plus r along the normal to the cone, at
    // z = 52 − r + r sin θ (derived), so L = 52 − r(1 − sin θ) − 40.
    const double th = std::atan(0.05), r = 0.4;
    const double lever = 52.0 - r * (1.0 - std::sin(th)) - 40.0;
    const double sigma = 2.0 * lever * sdRad / (std::cos(th) * std::cos(th));
    CHECK(std::abs(b.gaugeDiameterMm.sd - sigma) < 3 * sdStandardError(sigma, 0.0, n));
    // The fitted half angle follows the compound's true angle one for one.
    CHECK(std::abs(b.halfAngleRad.sd - sdRad) < 3 * sdStandardError(sdRad, 0.0, n));
}

TEST_CASE("budget: tip height follows the √(x² + h²) law", "[budget]") {
    Scene s = arbor();
    const double sdH = 0.5; // mm, large enough for the effect to show
    s.uncertainty.tipHeightSdMm = sdH;
    const int n = 3000;
    const Budget b = runBudget(s, opts(n));
    // Source: references R7 (a tip h off centre at distance x cuts radius √(x² + h²)); x is the
    // on-centre radius at the gauge plane. Mean and sd of D = 2√(x² + h²) for h ~ N(0, sdH) by
    // a numerical integral over the normal density (derived).
    const double x = 0.5 * b.exact.gaugeDiameterMm;
    double m1 = 0, m2 = 0, w = 0;
    for (int k = -4000; k <= 4000; ++k) {
        const double h = k * 8.0 * sdH / 4000.0;
        const double p = std::exp(-0.5 * (h / sdH) * (h / sdH));
        const double d = 2.0 * std::sqrt(x * x + h * h);
        m1 += p * d;
        m2 += p * d * d;
        w += p;
    }
    const double mean = m1 / w, sigma = std::sqrt(m2 / w - mean * mean);
    // About 2h²/D on diameter (references R7): 2·0.25/29 ≈ 17 µm of mean shift.
    CHECK(mean - 2 * x == Approx(sdH * sdH / x).epsilon(0.01));
    // h² is a scaled χ² with one degree of freedom: excess kurtosis 12 (derived).
    CHECK(std::abs(b.gaugeDiameterMm.sd - sigma) < 3 * sdStandardError(sigma, 12.0, n));
    CHECK(std::abs(b.gaugeDiameterMm.mean - mean) < 3 * sigma / std::sqrt(n));
    // A tip off centre only ever makes the diameter larger.
    CHECK(b.gaugeDiameterMm.p2_5 >= b.exact.gaugeDiameterMm - 1e-9);
}

TEST_CASE("budget: the measurement the dials are zeroed on moves the diameter one for one",
          "[budget]") {
    Scene s = arbor();
    s.uncertainty.measuringSdMm = 0.002;
    const int n = 2000;
    const Budget b = runBudget(s, opts(n));
    // derived: the machine model's x = zero_diameter/2 − ..., so D moves with zero_diameter.
    CHECK(std::abs(b.gaugeDiameterMm.sd - 0.002) < 3 * sdStandardError(0.002, 0.0, n));
}

TEST_CASE("budget: the shares of linear sources add up to 1", "[budget]") {
    Scene s = arbor();
    s.uncertainty.crossReadingMm = 0.01;
    s.uncertainty.measuringSdMm = 0.003;
    s.uncertainty.saddleReadingMm = 0.05;
    // Without backlash: dialled in order, a saddle reading a little below the last one would
    // leave the slide where it was (the gap takes it up), and the saddle would act less.
    s.setup.saddle.backlashMm = 0;
    const Budget b = runBudget(s, opts(3000));
    REQUIRE(b.sources.size() == 3);
    double sum = 0;
    for (const SourceShare& x : b.sources) {
        CHECK(x.share > 0.05);
        sum += x.share;
    }
    // Source: references R11 (u_c² = Σ cᵢ² uᵢ² for independent inputs; the shares cᵢ²uᵢ²/u_c²
    // then add to 1). Sampling leaves a few per cent either way at 3000 parts.
    CHECK(sum == Approx(1.0).margin(0.06));
    // The saddle reading moves the cone along itself: ΔD = 2 δz tan θ (sim/sensitivity.h).
    const double saddleSigma = 2 * (0.05 / std::sqrt(3.0)) * 0.05;
    CHECK(b.sources[1].source == BudgetSource::SaddleReading);
    CHECK(std::abs(b.sources[1].sdMm - saddleSigma) < 3 * sdStandardError(saddleSigma, -1.2, 3000));
}

TEST_CASE("budget: the same seed gives the same numbers, whatever the thread count", "[budget]") {
    Scene s = arbor();
    s.uncertainty.crossReadingMm = 0.01;
    s.uncertainty.compoundAngleSdRad = degToRad(0.03);
    s.uncertainty.saddleBacklash = BacklashKnowledge::Unknown;
    s.uncertainty.noseRadiusToleranceMm = 0.013;
    const Budget a = runBudget(s, opts(120, 1));
    const Budget b = runBudget(s, opts(120, 3));
    const Budget c = runBudget(s, opts(120, 2));
    CHECK(a.gaugeDiametersMm == b.gaugeDiametersMm);
    CHECK(a.gaugeDiametersMm == c.gaugeDiametersMm);
    CHECK(a.gaugeDiameterMm.sd == b.gaugeDiameterMm.sd);
    CHECK(a.halfAngleRad.mean == b.halfAngleRad.mean);
    CHECK(a.pInTolerance == b.pInTolerance);
    REQUIRE(a.sources.size() == b.sources.size());
    for (std::size_t i = 0; i < a.sources.size(); ++i)
        CHECK(a.sources[i].share == b.sources[i].share);
    BudgetOptions other = opts(120, 2);
    other.seed = 8;
    CHECK(runBudget(s, other).gaugeDiametersMm != a.gaugeDiametersMm);
}

TEST_CASE("budget: an unknown backlash places the slide within its gap", "[budget]") {
    Scene s = arbor();
    s.uncertainty.saddleBacklash = BacklashKnowledge::Unknown;
    // The saddle stands at 52 for every pass; not taken up it sits up to 0.1 mm further toward
    // the chuck, moving the cone (widening toward the chuck) along itself: D at the gauge plane
    // shrinks by at most 2 · 0.1 · tan θ (derived).
    const Budget b = runBudget(s, opts(400));
    const double most = 2 * 0.1 * 0.05;
    for (double d : b.gaugeDiametersMm) {
        CHECK(b.exact.gaugeDiameterMm - d >= -1e-9);
        CHECK(b.exact.gaugeDiameterMm - d <= most + 1e-9);
    }
    CHECK(b.gaugeDiameterMm.sd > 0);
    // The draw: about half the parts finished with the saddle taken up.
    int atExact = 0;
    for (double d : b.gaugeDiametersMm)
        atExact += std::abs(d - b.exact.gaugeDiameterMm) < 1e-9;
    CHECK(atExact > 150);
    CHECK(atExact < 250);
}

TEST_CASE("budget: counter-based draws are uniform and independent of the order asked",
          "[budget]") {
    double sum = 0, sumSq = 0;
    const int n = 20000;
    for (int i = 0; i < n; ++i) {
        const double u =
            budgetUniform(3, static_cast<std::uint64_t>(i), BudgetSource::TipHeight, 0);
        CHECK(u >= 0.0);
        CHECK(u < 1.0);
        sum += u;
        sumSq += u * u;
    }
    // Source: references R11 (a rectangular distribution on [0, 1): mean 1/2, u = 1/√12).
    CHECK(sum / n == Approx(0.5).margin(3 * std::sqrt(1.0 / 12.0 / n)));
    CHECK(sumSq / n - (sum / n) * (sum / n) == Approx(1.0 / 12.0).margin(0.003));
    CHECK(budgetUniform(3, 5, BudgetSource::TipHeight, 0) ==
          budgetUniform(3, 5, BudgetSource::TipHeight, 0));
    CHECK(budgetUniform(3, 5, BudgetSource::TipHeight, 0) !=
          budgetUniform(3, 5, BudgetSource::NoseRadius, 0));
}

TEST_CASE("budget: the sentence names the chance and the largest source", "[budget]") {
    CHECK(chanceInWords(0.9) == "9 in 10 parts");
    CHECK(chanceInWords(0.97) == "97 in 100 parts");
    CHECK(chanceInWords(0.999) == "more than 99 in 100 parts");
    CHECK(chanceInWords(1.0) == "every part drawn");
    CHECK(chanceInWords(0.0) == "no part drawn");
    Budget b;
    b.pInTolerance = 0.9;
    b.gaugeDiameterMm.sd = 0.01;
    b.sources = {{BudgetSource::CrossReading, 0.005, 0.25, 0},
                 {BudgetSource::CompoundAngle, 0.008, 0.7, 0}};
    CHECK(budgetSentence(b) ==
          "9 in 10 parts within tolerance; the compound setting is 70 % of the spread: set it "
          "with the sine bar");
    // Parts out with their gauge diameter within: the half angle's spread is named.
    b.pInTolerance = 0.3;
    b.pGaugeInTolerance = 1.0;
    b.halfAngleRad.sd = 0.0003;
    b.sources[0].halfAngleShare = 0.02;
    b.sources[1].halfAngleShare = 0.97;
    b.sources[0].share = 0.9;
    CHECK(budgetSentence(b) == "3 in 10 parts within tolerance; the compound setting is 97 % of "
                               "the half angle's spread: set it with the sine bar");
}
