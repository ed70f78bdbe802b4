// One part of an error budget: the scene as drawn from its uncertainty (see perturb.h).
#include "swarf/sim/perturb.h"

#include <algorithm>
#include <cmath>

namespace swarf {

namespace {

// The splitmix64 output function: a bijective mix of 64 bits.
std::uint64_t mix(std::uint64_t x) {
    x = (x ^ (x >> 30)) * 0xBF58476D1CE4E5B9ULL;
    x = (x ^ (x >> 27)) * 0x94D049BB133111EBULL;
    return x ^ (x >> 31);
}

constexpr std::uint64_t kGolden = 0x9E3779B97F4A7C15ULL;

// A number in [-1, 1).
double symmetric(std::uint64_t seed, std::uint64_t sample, BudgetSource src, std::uint64_t i) {
    return 2.0 * budgetUniform(seed, sample, src, i) - 1.0;
}

// Which slide a source's readings or backlash belong to.
enum class Which { Cross, Compound, Saddle };

// The slide that moves during a pass (Path passes have none).
Which movingSlide(const Pass& p) {
    return p.kind == PassKind::Compound ? Which::Compound
           : p.kind == PassKind::Saddle ? Which::Saddle
                                        : Which::Cross;
}

// The reading of slide `w` that stays put during pass p.
double& fixedReading(Pass& p, Which w) {
    return w == Which::Cross ? p.crossMm : w == Which::Compound ? p.compoundMm : p.saddleMm;
}

// Uniform reading errors of half-width e on every reading of slide w.
void jitterReadings(Scene& s, Which w, double e, std::uint64_t seed, std::uint64_t sample,
                    BudgetSource src) {
    for (std::size_t k = 0; k < s.plan.passes.size(); ++k) {
        Pass& p = s.plan.passes[k];
        if (p.kind == PassKind::Path)
            continue;
        if (movingSlide(p) == w) {
            p.fromMm += e * symmetric(seed, sample, src, 2 * k);
            p.toMm += e * symmetric(seed, sample, src, 2 * k + 1);
        } else {
            fixedReading(p, w) += e * symmetric(seed, sample, src, 2 * k);
        }
    }
}

// An unknown backlash on slide w: drawn once for the part, then taken up or not at each pass.
void drawBacklash(Scene& s, Which w, std::uint64_t seed, std::uint64_t sample, BudgetSource src) {
    Slide& slide = w == Which::Cross      ? s.setup.cross
                   : w == Which::Compound ? s.setup.compound
                                          : s.setup.saddle;
    // Readings per mm of slide travel: a diameter dial reads twice the cross-slide's travel.
    const double perTravel =
        w == Which::Cross && s.setup.crossDial == DialMode::Diameter ? 2.0 : 1.0;
    const double lag = slide.backlashMm * budgetUniform(seed, sample, src, 0) * perTravel;
    slide.backlashMm = 0; // the draw places the slide; the model must not lag it again
    for (std::size_t k = 0; k < s.plan.passes.size(); ++k) {
        Pass& p = s.plan.passes[k];
        if (p.kind == PassKind::Path)
            continue;
        const bool takenUp = budgetUniform(seed, sample, src, 1 + k) < 0.5;
        const double start = takenUp ? 0.0 : lag;
        if (movingSlide(p) == w) {
            const bool decreasing = p.toMm < p.fromMm;
            p.fromMm += start;
            if (decreasing)
                p.toMm += lag; // the handwheel drags the slide from the far side of its gap
        } else {
            fixedReading(p, w) += start;
        }
    }
}

} // namespace

double budgetUniform(std::uint64_t seed, std::uint64_t sample, BudgetSource source,
                     std::uint64_t index) {
    std::uint64_t x = mix(seed + kGolden);
    x = mix(x ^ (sample + 1) * kGolden);
    x = mix(x ^ (static_cast<std::uint64_t>(source) + 1) * 0xD1B54A32D192ED03ULL);
    x = mix(x ^ (index + 1) * 0xAEF17502108EF2D9ULL);
    return static_cast<double>(x >> 11) * 0x1.0p-53;
}

double budgetNormal(std::uint64_t seed, std::uint64_t sample, BudgetSource source,
                    std::uint64_t index) {
    // 1 − U lies in (0, 1], so the logarithm is finite.
    const double u1 = 1.0 - budgetUniform(seed, sample, source, 2 * index);
    const double u2 = budgetUniform(seed, sample, source, 2 * index + 1);
    return std::sqrt(-2.0 * std::log(u1)) * std::cos(2.0 * kPi * u2);
}

Scene perturbScene(const Scene& scene, std::uint64_t seed, std::uint64_t sample,
                   const std::vector<BudgetSource>& sources) {
    Scene s = scene;
    const Uncertainty& u = scene.uncertainty;
    for (BudgetSource src : sources) {
        switch (src) {
        case BudgetSource::CompoundAngle: {
            const double e = u.compoundAngleSdRad * budgetNormal(seed, sample, src, 0);
            s.setup.compoundErrorRad += e;
            for (Pass& p : s.plan.passes) // a pass with a compound setting of its own
                if (p.compoundErrorRad)
                    *p.compoundErrorRad += e;
            break;
        }
        case BudgetSource::CrossReading:
            jitterReadings(s, Which::Cross, u.crossReadingMm, seed, sample, src);
            break;
        case BudgetSource::CompoundReading:
            jitterReadings(s, Which::Compound, u.compoundReadingMm, seed, sample, src);
            break;
        case BudgetSource::SaddleReading:
            jitterReadings(s, Which::Saddle, u.saddleReadingMm, seed, sample, src);
            break;
        case BudgetSource::CrossBacklash:
            drawBacklash(s, Which::Cross, seed, sample, src);
            break;
        case BudgetSource::CompoundBacklash:
            drawBacklash(s, Which::Compound, seed, sample, src);
            break;
        case BudgetSource::SaddleBacklash:
            drawBacklash(s, Which::Saddle, seed, sample, src);
            break;
        case BudgetSource::TipHeight:
            s.tool.tipHeightMm += u.tipHeightSdMm * budgetNormal(seed, sample, src, 0);
            break;
        case BudgetSource::NoseRadius: {
            const double d = u.noseRadiusToleranceMm > 0
                                 ? u.noseRadiusToleranceMm * symmetric(seed, sample, src, 0)
                                 : u.noseRadiusSdMm * budgetNormal(seed, sample, src, 0);
            s.tool.noseRadiusMm = std::max(1e-3, s.tool.noseRadiusMm + d);
            break;
        }
        case BudgetSource::Measuring:
            s.setup.zeroDiameterMm += u.measuringSdMm * budgetNormal(seed, sample, src, 0);
            break;
        }
    }
    return s;
}

} // namespace swarf
