// Sine bar stacks and gauge block combinations (references R4; block sets common practice).
#include "swarf/sim/sine_bar.h"

#include <algorithm>
#include <cassert>
#include <cmath>
#include <cstdint>
#include <numeric>

namespace swarf {

std::vector<SineBar> commonSineBars() {
    return {
        {"5 in", 5 * kMmPerInch}, {"10 in", 10 * kMmPerInch}, {"100 mm", 100.0}, {"200 mm", 200.0}};
}

double sineBarStackMm(double barLengthMm, double angleRad) {
    assert(angleRad >= 0 && angleRad < kPi / 2);
    return barLengthMm * std::sin(angleRad);
}

double sineBarAngleRad(double barLengthMm, double stackMm) {
    assert(barLengthMm > 0 && stackMm >= 0 && stackMm <= barLengthMm);
    return std::asin(stackMm / barLengthMm);
}

GaugeBlockSet commonInchBlockSet() {
    GaugeBlockSet s{"common 81-piece inch set", Units::Inch, {}};
    for (int i = 1; i <= 9; ++i)
        s.sizes.push_back(0.1000 + i * 0.0001);
    for (int i = 1; i <= 49; ++i)
        s.sizes.push_back(0.100 + i * 0.001);
    for (int i = 1; i <= 19; ++i)
        s.sizes.push_back(i * 0.050);
    for (int i = 1; i <= 4; ++i)
        s.sizes.push_back(i * 1.0);
    return s;
}

GaugeBlockSet commonMetricBlockSet() {
    GaugeBlockSet s{"common 87-piece metric set", Units::Mm, {}};
    for (int i = 1; i <= 9; ++i)
        s.sizes.push_back(1.000 + i * 0.001);
    for (int i = 1; i <= 49; ++i)
        s.sizes.push_back(1.00 + i * 0.01);
    for (int i = 1; i <= 19; ++i)
        s.sizes.push_back(i * 0.5);
    for (int i = 1; i <= 10; ++i)
        s.sizes.push_back(i * 10.0);
    return s;
}

GaugeStack combineGaugeBlocks(double heightMm, const GaugeBlockSet& set) {
    GaugeStack out;
    out.wantedMm = heightMm;
    if (set.sizes.empty()) {
        out.reason = "the gauge block set is empty";
        return out;
    }
    // Work in whole micro-units of the set's unit, then in multiples of the sizes' common step.
    constexpr double kMicro = 1e6;
    std::vector<std::int64_t> units;
    std::int64_t step = 0;
    for (double s : set.sizes) {
        if (!(s > 0)) {
            out.reason = "the gauge block set has a size that is not > 0";
            return out;
        }
        units.push_back(std::llround(s * kMicro));
        step = std::gcd(step, units.back());
    }
    if (step == 0)
        step = 1;
    out.resolutionMm = toMm(static_cast<double>(step) / kMicro, set.units);
    const double wanted = fromMm(heightMm, set.units) * kMicro / static_cast<double>(step);
    const std::int64_t target = std::llround(wanted);
    if (target <= 0) {
        out.reason = "the stack height is zero or less: no blocks needed";
        return out;
    }
    const std::int64_t total = std::accumulate(units.begin(), units.end(), std::int64_t{0}) / step;
    if (target > total) {
        out.reason = "the stack is taller than all the blocks of the set together";
        return out;
    }
    // The search keeps one bit per block and height step: cap it near 25 MB.
    constexpr std::int64_t kMaxBits = 200'000'000;
    if (target > kMaxBits / static_cast<std::int64_t>(units.size())) {
        out.reason = "the set's step is too fine for this height to search";
        return out;
    }
    // 0/1 knapsack, fewest blocks: best[t] = fewest blocks adding to t; took[i] marks where
    // block i improved best[t], which lets the combination be read back from the last block.
    const std::size_t n = units.size();
    const auto T = static_cast<std::size_t>(target);
    constexpr std::uint16_t kNone = 0xFFFF;
    std::vector<std::uint16_t> best(T + 1, kNone);
    best[0] = 0;
    std::vector<std::vector<bool>> took(n, std::vector<bool>(T + 1, false));
    for (std::size_t i = 0; i < n; ++i) {
        const auto w = static_cast<std::size_t>(units[i] / step);
        if (w > T)
            continue;
        for (std::size_t t = T; t >= w; --t) {
            if (best[t - w] != kNone && best[t - w] + 1 < best[t]) {
                best[t] = static_cast<std::uint16_t>(best[t - w] + 1);
                took[i][t] = true;
            }
            if (t == w)
                break;
        }
    }
    if (best[T] == kNone) {
        out.reason = "no combination of the set's blocks adds up to this height";
        return out;
    }
    std::size_t t = T;
    for (std::size_t i = n; i-- > 0 && t > 0;) {
        if (took[i][t]) {
            out.blocks.push_back(set.sizes[i]);
            t -= static_cast<std::size_t>(units[i] / step);
        }
    }
    assert(t == 0);
    std::sort(out.blocks.rbegin(), out.blocks.rend());
    double sum = 0;
    for (double b : out.blocks)
        sum += b;
    out.builtMm = toMm(sum, set.units);
    out.found = true;
    return out;
}

} // namespace swarf
