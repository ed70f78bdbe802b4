// Grids of the feed-mark surface, filled on demand (see feed_marks.h).
#include "feed_marks_data.h"

#include <algorithm>
#include <cmath>
#include <limits>

namespace swarf {

std::vector<double> evenColumns(int n, double phi0Rad) {
    std::vector<double> phi(static_cast<std::size_t>(std::max(n, 0)));
    for (int j = 0; j < n; ++j)
        phi[static_cast<std::size_t>(j)] = phi0Rad + 2 * kPi * j / n;
    return phi;
}

void FeedMarkSurface::fillRow(double zMm, const double* phase, int n, float* out) const {
    if (!d_) {
        std::fill(out, out + n, std::numeric_limits<float>::quiet_NaN());
        return;
    }
    const Data& d = *d_;
    if (zMm < d.freeEndZMm) {
        std::fill(out, out + n, 0.0f);
        return;
    }
    const auto stock = static_cast<float>(d.stockRadiusMm);
    std::fill(out, out + n, stock);
    if (zMm > zToMm())
        return;
    thread_local std::vector<int> set;
    d.movesNear(zMm, set);
    const double h = d.tipHeightMm, h2 = h * h;
    for (int k : set) {
        const detail::MarkedMove& m = d.moves[static_cast<std::size_t>(k)];
        const bool table = m.kind == detail::MarkedMove::Kind::Marked && !m.table.empty();
        const double sStar = table ? detail::sStarAt(m, zMm) : 0.0;
        if (table && m.periodic(sStar)) {
            // The screw lookup: x = envelope + G(frac(s*/f − φ/2π)), linear between samples.
            const double line = detail::envelopeX(d.outline, m, zMm);
            const double p = sStar / m.feedMm;
            const double frac0 = p - std::floor(p);
            const float* g = m.table.data();
            constexpr int kN = detail::kMarkTableSamples;
            for (int j = 0; j < n; ++j) {
                double psi = frac0 - phase[j];
                psi += psi < 0 ? 1.0 : 0.0;
                const double u = psi * kN;
                int i0 = static_cast<int>(u);
                double fr = u - i0;
                if (i0 >= kN)
                    i0 = kN - 1, fr = 1.0;
                const double x = line + g[i0] + fr * (g[i0 + 1] - g[i0]);
                const double xp = x > 0 ? x : 0.0;
                const double r = h == 0 ? xp : std::sqrt(xp * xp + h2);
                out[j] = std::min(out[j], static_cast<float>(r));
            }
            continue;
        }
        for (int j = 0; j < n; ++j) {
            const double x = detail::markedX(d.outline, m, zMm, m.feedMm * phase[j]);
            out[j] = std::min(out[j], static_cast<float>(d.radiusOf(x)));
        }
    }
}

SurfaceGrid FeedMarkSurface::grid(const std::vector<double>& rowsZMm,
                                  const std::vector<double>& phiRad) const {
    SurfaceGrid g;
    g.nz = static_cast<int>(rowsZMm.size());
    g.nPhi = static_cast<int>(phiRad.size());
    g.zMm = rowsZMm;
    g.phiRad = phiRad;
    g.radiusMm.resize(rowsZMm.size() * phiRad.size());
    bool even = g.nPhi >= 3;
    for (int j = 0; even && j < g.nPhi; ++j)
        even = std::abs(phiRad[static_cast<std::size_t>(j)] - phiRad[0] - 2 * kPi * j / g.nPhi) <
               1e-12;
    if (even) {
        fillGrid(rowsZMm, g.nPhi, phiRad[0], g.radiusMm.data());
        return g;
    }
    std::vector<double> phase(phiRad.size());
    for (std::size_t j = 0; j < phiRad.size(); ++j) {
        const double p = phiRad[j] / (2 * kPi);
        phase[j] = p - std::floor(p);
    }
    for (std::size_t i = 0; i < rowsZMm.size(); ++i)
        fillRow(rowsZMm[i], phase.data(), g.nPhi, g.radiusMm.data() + i * phiRad.size());
    return g;
}

namespace {

// A marked move's profile resampled for n evenly spaced columns: H(ψ) = G exactly at ψ = i/M,
// M = n·L, stored so that every row reads two of its L resamplings forward and contiguously
// (see fillGrid): rows[r] holds H at r + m·L for m = 0, −1, −2, ... (mod n), slope[r] the step
// to resampling r + 1.
struct EvenProfile {
    int n = 0, L = 0;
    std::vector<float> value, slope; // L rows of n
};

EvenProfile resample(const ToolOutline& o, const detail::MarkedMove& m, int n) {
    EvenProfile e;
    e.n = n;
    e.L = std::max(1, (2 * detail::kMarkTableSamples + n - 1) / n);
    const int M = n * e.L;
    // H exactly, at a plane where s* is mid-move (G does not depend on the plane).
    const double sStar = 0.5 * m.lenMm;
    const double z = m.c0.x() + m.supportZMm + sStar * m.dir.x();
    const double line = detail::xAtPath(o, m, z, sStar);
    std::vector<double> h(static_cast<std::size_t>(M) + 1);
    for (int i = 0; i < M; ++i) {
        const double sa = sStar - static_cast<double>(i) / M * m.feedMm;
        h[static_cast<std::size_t>(i)] =
            std::min(detail::xAtPath(o, m, z, sa), detail::xAtPath(o, m, z, sa + m.feedMm)) - line;
    }
    h[static_cast<std::size_t>(M)] = h[0];
    e.value.resize(static_cast<std::size_t>(e.L) * n);
    e.slope.resize(e.value.size());
    for (int r = 0; r < e.L; ++r)
        for (int k = 0; k < n; ++k) {
            const int mm = (n - k) % n; // reversed, so that rows read forward
            const auto i = static_cast<std::size_t>(r + mm * e.L);
            e.value[static_cast<std::size_t>(r * n + k)] = static_cast<float>(h[i]);
            e.slope[static_cast<std::size_t>(r * n + k)] = static_cast<float>(h[i + 1] - h[i]);
        }
    return e;
}

// out[k] = min(out[k], radius of line + v[k] + fr·d[k]) for k < count: contiguous, so the
// compiler can use vector instructions.
void lerpMin(const float* v, const float* d, float fr, float line, float h2, float* out,
             int count) {
    if (h2 == 0) {
        for (int k = 0; k < count; ++k) {
            float x = line + (v[k] + fr * d[k]);
            x = x > 0 ? x : 0.0f;
            out[k] = x < out[k] ? x : out[k];
        }
        return;
    }
    for (int k = 0; k < count; ++k) {
        float x = line + (v[k] + fr * d[k]);
        x = x > 0 ? x : 0.0f;
        const float r = std::sqrt(x * x + h2);
        out[k] = r < out[k] ? r : out[k];
    }
}

} // namespace

void FeedMarkSurface::fillGrid(const std::vector<double>& rowsZMm, int columns, double phi0Rad,
                               float* out) const {
    const int n = columns;
    if (!d_ || n < 1) {
        std::fill(out, out + rowsZMm.size() * static_cast<std::size_t>(std::max(n, 0)),
                  std::numeric_limits<float>::quiet_NaN());
        return;
    }
    const Data& d = *d_;
    std::vector<double> phase(static_cast<std::size_t>(n));
    double p0 = phi0Rad / (2 * kPi);
    p0 -= std::floor(p0);
    for (int j = 0; j < n; ++j) {
        const double p = p0 + static_cast<double>(j) / n;
        phase[static_cast<std::size_t>(j)] = p - std::floor(p);
    }
    std::vector<EvenProfile> profiles(d.moves.size());
    std::vector<int> set;
    const auto h2 = static_cast<float>(d.tipHeightMm * d.tipHeightMm);
    for (std::size_t i = 0; i < rowsZMm.size(); ++i) {
        const double z = rowsZMm[i];
        float* row = out + i * static_cast<std::size_t>(n);
        if (z < d.freeEndZMm || z > zToMm()) {
            fillRow(z, phase.data(), n, row);
            continue;
        }
        std::fill(row, row + n, static_cast<float>(d.stockRadiusMm));
        d.movesNear(z, set);
        for (int k : set) {
            const detail::MarkedMove& m = d.moves[static_cast<std::size_t>(k)];
            const bool table = m.kind == detail::MarkedMove::Kind::Marked && !m.table.empty();
            const double sStar = table ? detail::sStarAt(m, z) : 0.0;
            if (!table || !m.periodic(sStar)) {
                for (int j = 0; j < n; ++j) {
                    const double x = detail::markedX(d.outline, m, z,
                                                     m.feedMm * phase[static_cast<std::size_t>(j)]);
                    row[j] = std::min(row[j], static_cast<float>(d.radiusOf(x)));
                }
                continue;
            }
            EvenProfile& e = profiles[static_cast<std::size_t>(k)];
            if (e.n == 0)
                e = resample(d.outline, m, n);
            // Column j at phase ψ_j = frac(F − p0 − j/n), F = frac(s*/f): in resampled steps
            // U0 − j·L (mod M), U0 = frac(F − p0)·M = r + q·L + fr.
            const double F = sStar / m.feedMm;
            double u0 = F - p0;
            u0 -= std::floor(u0);
            u0 *= static_cast<double>(n) * e.L;
            auto base = static_cast<long long>(u0);
            const auto fr = static_cast<float>(u0 - static_cast<double>(base));
            base %= static_cast<long long>(n) * e.L;
            const int r = static_cast<int>(base % e.L), q = static_cast<int>(base / e.L);
            const float* v = e.value.data() + static_cast<std::size_t>(r) * n;
            const float* sl = e.slope.data() + static_cast<std::size_t>(r) * n;
            const auto line = static_cast<float>(detail::envelopeX(d.outline, m, z));
            // Columns j < q read entries n − q + j, columns j ≥ q entries j − q.
            lerpMin(v + (n - q), sl + (n - q), fr, line, h2, row, q);
            lerpMin(v, sl, fr, line, h2, row + q, n - q);
        }
    }
}

std::vector<double> FeedMarkSurface::markRows(double zFromMm, double zToMm,
                                              std::size_t maxRows) const {
    std::vector<double> rows;
    if (!d_ || !(zToMm >= zFromMm))
        return rows;
    const Data& d = *d_;
    maxRows = std::max<std::size_t>(maxRows, 2);
    // Sub-rows of each sample interval: many where one marked move leaves both of its ends.
    auto subRows = [&](std::size_t i) {
        const int m0 = d.runFinal[d.runOf(i)];
        const int m1 = i + 1 < d.samples ? d.runFinal[d.runOf(i + 1)] : -1;
        if (m0 < 0 || m0 != m1)
            return std::size_t{1};
        const double pitch = markPitchZMm(m0);
        if (!(pitch > 0))
            return std::size_t{1};
        const auto& m = d.moves[static_cast<std::size_t>(m0)];
        const double spacing = 0.004 * std::max(pitch, 0.05 * m.feedMm);
        return static_cast<std::size_t>(std::max(1.0, std::ceil(d.dzMm / spacing - 1e-9)));
    };
    const std::size_t first = d.sampleAt(zFromMm);
    std::size_t count = 2;
    for (std::size_t i = first; i < d.samples && d.zAt(i) < zToMm && count <= maxRows; ++i)
        count += subRows(i);
    if (count > maxRows) {
        rows.resize(maxRows);
        for (std::size_t k = 0; k < maxRows; ++k)
            rows[k] = zFromMm +
                      (zToMm - zFromMm) * static_cast<double>(k) / static_cast<double>(maxRows - 1);
        return rows;
    }
    rows.push_back(zFromMm);
    for (std::size_t i = first; i < d.samples; ++i) {
        const double z = d.zAt(i);
        if (z >= zToMm)
            break;
        const std::size_t sub = subRows(i);
        for (std::size_t j = 0; j < sub; ++j) {
            const double zr = z + d.dzMm * static_cast<double>(j) / static_cast<double>(sub);
            if (zr > rows.back() && zr < zToMm)
                rows.push_back(zr);
        }
    }
    if (zToMm > rows.back())
        rows.push_back(zToMm);
    return rows;
}

} // namespace swarf
