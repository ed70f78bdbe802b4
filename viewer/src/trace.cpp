// What the viewer draws along the cone (see trace.h).
#include "swarf/viewer/trace.h"

#include "swarf/sim/compare.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf::viewer {

namespace {

constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
// At most this many points along a meridian of the 3D surface before decimation.
constexpr std::size_t kMeridianRows = 400'000;

// Largest error, in units of its tolerance, of the chord from a to b over the samples between.
// Returns the sample where it is largest (or a if none is over 1).
std::size_t worstBetween(const Profile& p, const std::vector<double>* dev, std::size_t a,
                         std::size_t b, double tolR, double tolD, double& worst) {
    worst = 0;
    std::size_t at = a;
    const double ra = p.radiusMm[a], rb = p.radiusMm[b];
    const double da = dev ? (*dev)[a] : kNaN, db = dev ? (*dev)[b] : kNaN;
    const bool devChord = dev && !std::isnan(da) && !std::isnan(db);
    for (std::size_t i = a + 1; i < b; ++i) {
        const double t = static_cast<double>(i - a) / static_cast<double>(b - a);
        double e = std::fabs(p.radiusMm[i] - (ra + (rb - ra) * t)) / tolR;
        if (devChord && !std::isnan((*dev)[i]))
            e = std::max(e, std::fabs((*dev)[i] - (da + (db - da) * t)) / tolD);
        if (e > worst) {
            worst = e;
            at = i;
        }
    }
    return at;
}

} // namespace

std::vector<std::size_t> pickRows(std::size_t first, std::size_t last, std::size_t maxRows) {
    std::vector<std::size_t> rows;
    if (last < first)
        return rows;
    const std::size_t count = last - first + 1;
    const std::size_t cap = std::max<std::size_t>(maxRows, 2);
    const std::size_t stride = std::max<std::size_t>(1, (count - 1 + cap - 2) / (cap - 1));
    for (std::size_t i = first; i <= last; i += stride)
        rows.push_back(i);
    if (rows.back() != last)
        rows.push_back(last);
    return rows;
}

std::vector<std::size_t> profileRows(const Profile& profile, const std::vector<double>* deviationMm,
                                     std::size_t first, std::size_t last, std::size_t baseRows,
                                     double toleranceMm, double deviationToleranceMm,
                                     std::size_t maxRows) {
    const std::size_t n = profile.radiusMm.size();
    if (n == 0 || last < first)
        return {};
    last = std::min(last, n - 1);
    if (deviationMm && deviationMm->size() != n)
        deviationMm = nullptr;
    const double tolR = std::max(toleranceMm, 1e-12), tolD = std::max(deviationToleranceMm, 1e-12);
    std::vector<std::size_t> base = pickRows(first, last, baseRows);
    // Where the drawing starts or stops saying something (NaN deviation on one side only), both
    // samples are kept so that the colour changes at the right place.
    std::vector<char> keep(last - first + 1, 0);
    for (std::size_t i : base)
        keep[i - first] = 1;
    if (deviationMm)
        for (std::size_t i = first; i < last; ++i)
            if (std::isnan((*deviationMm)[i]) != std::isnan((*deviationMm)[i + 1]))
                keep[i - first] = keep[i + 1 - first] = 1;
    std::size_t count = 0;
    for (char k : keep)
        count += k != 0;
    // Refine each interval between kept rows until its chord fits (Douglas–Peucker within the
    // interval), while the row budget lasts.
    std::vector<std::pair<std::size_t, std::size_t>> todo;
    std::size_t prev = first;
    for (std::size_t i = first + 1; i <= last; ++i)
        if (keep[i - first]) {
            todo.emplace_back(prev, i);
            prev = i;
        }
    while (!todo.empty() && count < maxRows) {
        const auto [a, b] = todo.back();
        todo.pop_back();
        if (b <= a + 1)
            continue;
        double worst = 0;
        const std::size_t at = worstBetween(profile, deviationMm, a, b, tolR, tolD, worst);
        if (worst <= 1)
            continue;
        keep[at - first] = 1;
        ++count;
        todo.emplace_back(a, at);
        todo.emplace_back(at, b);
    }
    std::vector<std::size_t> rows;
    rows.reserve(count);
    for (std::size_t i = first; i <= last; ++i)
        if (keep[i - first])
            rows.push_back(i);
    return rows;
}

std::vector<std::size_t> minMaxSamples(const std::vector<double>& zMm,
                                       const std::vector<double>& values, std::size_t buckets) {
    const std::size_t n = std::min(zMm.size(), values.size());
    std::vector<std::size_t> out;
    if (n == 0)
        return out;
    if (buckets == 0 || n <= 2 * buckets + 2) {
        out.resize(n);
        for (std::size_t i = 0; i < n; ++i)
            out[i] = i;
        return out;
    }
    const double z0 = zMm.front(), span = std::max(zMm.back() - z0, 1e-12);
    auto bucketOf = [&](std::size_t i) {
        return std::min(buckets - 1, static_cast<std::size_t>((zMm[i] - z0) / span *
                                                              static_cast<double>(buckets)));
    };
    constexpr std::size_t kNone = static_cast<std::size_t>(-1);
    std::size_t lo = kNone, hi = kNone, bucket = kNone;
    auto emit = [&](std::size_t i) {
        if (out.empty() || out.back() < i)
            out.push_back(i);
    };
    auto flush = [&] {
        if (lo == kNone)
            return;
        emit(std::min(lo, hi));
        emit(std::max(lo, hi));
        lo = hi = kNone;
    };
    bool inRun = false;
    for (std::size_t i = 0; i < n; ++i) {
        const double v = values[i];
        if (std::isnan(v)) {
            if (inRun) {
                flush();
                emit(i - 1); // the run's last sample
            }
            if (inRun || out.empty())
                emit(i); // one NaN marks the break
            inRun = false;
            continue;
        }
        if (!inRun) {
            emit(i); // the run's first sample
            inRun = true;
            bucket = bucketOf(i);
        }
        const std::size_t b = bucketOf(i);
        if (b != bucket) {
            flush();
            bucket = b;
        }
        if (lo == kNone || v < values[lo])
            lo = i;
        if (hi == kNone || v > values[hi])
            hi = i;
    }
    if (inRun) {
        flush();
        emit(n - 1);
    }
    return out;
}

void mainConeExtent(const Scene& scene, const CutResult& result, double& zFromMm, double& zToMm) {
    const Profile& g = result.asCut.radiusMm.empty() ? result.stock : result.asCut;
    zFromMm = g.z0Mm;
    zToMm = g.radiusMm.empty() ? g.z0Mm : g.zAt(g.radiusMm.size() - 1);
    if (!scene.part.features.empty()) {
        zFromMm = scene.part.features.front().zStartMm;
        zToMm = scene.part.features.back().zEndMm;
    }
    if (const Feature* inner = scene.part.mainInsideCone(); inner && result.bored) {
        zFromMm = inner->zStartMm;
        zToMm = inner->zEndMm;
        return;
    }
    for (const Feature& f : scene.part.features)
        if (f.kind == FeatureKind::Cone) {
            zFromMm = f.zStartMm;
            zToMm = f.zEndMm;
            return;
        }
}

DeviationTrace deviationTrace(const Scene& scene, const CutResult& result, const MomentView& moment,
                              double zFromMm, double zToMm, std::size_t maxPoints) {
    DeviationTrace all;
    const FeedMarkSurface& surface = result.surface;
    if (moment.finished && !surface.empty()) {
        // Along the operator's meridian (φ = 0), at the rows that resolve the marks, at most
        // kMeridianRows of them (evenly spaced then).
        all.feedMarks = true;
        const double z0 = std::max(zFromMm, surface.zFromMm());
        const double z1 = std::min(zToMm, surface.zToMm());
        for (double z : surface.markRows(z0, z1, kMeridianRows)) {
            const double r = surface.radiusAt(z, 0.0);
            all.zMm.push_back(z);
            all.nominalMm.push_back(scene.part.nominalRadiusAt(z).value_or(kNaN));
            all.deviationMm.push_back(normalDeviationAt(scene.part, z, r));
        }
    } else {
        // A bored part: the bore against the drawn bore.
        all.inside = result.bored;
        const Profile& p = all.inside ? moment.bore : moment.profile;
        const Profile& drawn = all.inside ? result.boreNominal : result.nominal;
        const std::vector<double>& dev = all.inside ? moment.boreDeviationMm : moment.deviationMm;
        for (std::size_t i = 0; i < p.radiusMm.size(); ++i) {
            const double z = p.zAt(i);
            if (z < zFromMm || z > zToMm)
                continue;
            all.zMm.push_back(z);
            all.nominalMm.push_back(drawn.radiusAt(z));
            all.deviationMm.push_back(i < dev.size() ? dev[i] : kNaN);
        }
    }
    // A NaN nominal is a break too.
    for (std::size_t i = 0; i < all.zMm.size(); ++i)
        if (std::isnan(all.nominalMm[i]))
            all.deviationMm[i] = kNaN;
    return decimateTrace(all, maxPoints);
}

DeviationTrace decimateTrace(const DeviationTrace& all, std::size_t maxPoints) {
    if (maxPoints == 0 || all.zMm.size() <= maxPoints)
        return all;
    DeviationTrace out;
    out.feedMarks = all.feedMarks;
    out.inside = all.inside;
    for (std::size_t i :
         minMaxSamples(all.zMm, all.deviationMm, std::max<std::size_t>(1, maxPoints / 2))) {
        out.zMm.push_back(all.zMm[i]);
        out.nominalMm.push_back(all.nominalMm[i]);
        out.deviationMm.push_back(all.deviationMm[i]);
    }
    return out;
}

CloseUp closeUpOf(const Scene& scene, const CutResult& result) {
    CloseUp c;
    double z0 = 0, z1 = 0;
    mainConeExtent(scene, result, z0, z1);
    double centre = 0.5 * (z0 + z1);
    for (const Feature& f : scene.part.features)
        if (f.kind == FeatureKind::Cone && f.zStartMm == z0 && f.zEndMm == z1) {
            centre = f.cone.gaugeZMm;
            break;
        }
    c.feedMmPerRev = scene.plan.passes.empty() ? 0.0 : scene.plan.passes.back().feedMmPerRev;
    const double span = z1 - z0;
    // Forty feed marks, but never less than half a millimetre nor more than the cone.
    double length = c.feedMmPerRev > 0 ? 40 * c.feedMmPerRev : 2.0;
    length = std::min(std::max(length, 0.5), std::max(span, 0.0));
    centre = std::clamp(centre, z0 + 0.5 * length, z1 - 0.5 * length);
    c.zFromMm = centre - 0.5 * length;
    c.zToMm = centre + 0.5 * length;
    // Relief: marks Rt high at pitch f are raised to stand about a quarter of the pitch high, to
    // the nearest of 1, 2, 5, 10, 20, ... (at most 1000).
    const double rtMm = result.rtUm / 1000.0;
    if (rtMm > 0 && c.feedMmPerRev > 0) {
        const double want = 0.25 * c.feedMmPerRev / rtMm;
        double best = 1;
        for (double decade = 1; decade <= 1000; decade *= 10)
            for (double m : {1.0, 2.0, 5.0}) {
                const double v = m * decade;
                if (v <= 1000 && std::fabs(std::log(v / want)) < std::fabs(std::log(best / want)))
                    best = v;
            }
        c.reliefFactor = best;
    }
    return c;
}

} // namespace swarf::viewer
