// Binary STL: an 80-byte header, a little-endian uint32 triangle count, then per triangle a
// normal and three vertices (12 float32) and a uint16 attribute word, 50 bytes in all.
#include "swarf/geometry/surface_stl.h"

#include "swarf/io/output_file.h"

#include <array>
#include <cmath>
#include <cstdint>
#include <cstring>
#include <fstream>
#include <limits>
#include <numbers>
#include <vector>

namespace swarf::geometry {
namespace {

using Vec = std::array<float, 3>;

class StlSink {
  public:
    explicit StlSink(std::ofstream& out) : out_(out) { buffer_.reserve(kFlushBytes + 64); }

    void triangle(const Vec& a, const Vec& b, const Vec& c) {
        const double ux = b[0] - a[0], uy = b[1] - a[1], uz = b[2] - a[2];
        const double vx = c[0] - a[0], vy = c[1] - a[1], vz = c[2] - a[2];
        double nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
        const double len = std::sqrt(nx * nx + ny * ny + nz * nz);
        if (len > 0)
            nx /= len, ny /= len, nz /= len;
        put(Vec{static_cast<float>(nx), static_cast<float>(ny), static_cast<float>(nz)});
        put(a);
        put(b);
        put(c);
        const std::uint16_t attribute = 0;
        append(&attribute, 2);
        ++count_;
        if (buffer_.size() >= kFlushBytes)
            flush();
    }

    void flush() {
        out_.write(buffer_.data(), static_cast<std::streamsize>(buffer_.size()));
        buffer_.clear();
    }
    std::size_t count() const { return count_; }

  private:
    static constexpr std::size_t kFlushBytes = 1 << 20;
    void put(const Vec& v) { append(v.data(), 12); }
    void append(const void* p, std::size_t n) {
        const char* c = static_cast<const char*>(p);
        buffer_.insert(buffer_.end(), c, c + n);
    }
    std::ofstream& out_;
    std::vector<char> buffer_;
    std::size_t count_ = 0;
};

} // namespace

std::size_t writeSurfaceStl(const HeightMap& s, const std::string& path,
                            const SurfaceStlOptions& options) {
    static_assert(sizeof(float) == 4 && std::numeric_limits<float>::is_iec559);
    if (s.nz < 2 || s.nPhi < 3 ||
        s.radiusMm.size() != static_cast<std::size_t>(s.nz) * static_cast<std::size_t>(s.nPhi))
        throw OutputError("cannot write " + path + ": the surface has no grid to mesh");
    io::PendingFile file(path);
    const std::string& tmp = file.tmpPath();
    std::ofstream out(tmp, std::ios::binary | std::ios::trunc);
    if (!out)
        throw OutputError("cannot write " + path + ": cannot create " + tmp);

    std::array<char, 80> header{};
    const char title[] = "swarf as-cut surface, mm, Z = spindle axis";
    std::memcpy(header.data(), title, sizeof title - 1);
    out.write(header.data(), header.size());
    // Rows kept: greedily, each at least `spacing` after the last kept one, and always the
    // last row; the spacing is the smallest that meets the triangle limit. Where the kernel
    // made rows dense (the finished surface) they are thinned first; sparse rows stay.
    const std::size_t perRow = 2u * static_cast<std::size_t>(s.nPhi);
    const auto keptRows = [&](double spacing) {
        std::vector<int> rows{0};
        for (int i = 1; i < s.nz - 1; ++i)
            if (s.rowZ(i) - s.rowZ(rows.back()) >= spacing)
                rows.push_back(i);
        rows.push_back(s.nz - 1);
        return rows;
    };
    const auto trianglesOf = [&](const std::vector<int>& rows) { return rows.size() * perRow; };
    std::vector<int> rows = keptRows(0.0);
    if (options.maxTriangles > 0 && trianglesOf(rows) > options.maxTriangles) {
        double lo = 0.0, hi = s.rowZ(s.nz - 1) - s.rowZ(0);
        for (int it = 0; it < 60; ++it) {
            const double mid = 0.5 * (lo + hi);
            (trianglesOf(keptRows(mid)) > options.maxTriangles ? lo : hi) = mid;
        }
        rows = keptRows(hi);
    }
    const auto total = static_cast<std::uint32_t>((rows.size() - 1) * perRow + perRow);
    out.write(reinterpret_cast<const char*>(&total), 4); // little-endian hosts only (x86, arm)

    std::vector<float> cosPhi(s.nPhi), sinPhi(s.nPhi);
    for (int j = 0; j < s.nPhi; ++j) {
        const double phi = 2 * std::numbers::pi * j / s.nPhi;
        cosPhi[j] = static_cast<float>(std::cos(phi));
        sinPhi[j] = static_cast<float>(std::sin(phi));
    }
    const auto vertex = [&](int i, int j) {
        const float r = s.at(i, j);
        return Vec{r * cosPhi[j], r * sinPhi[j], static_cast<float>(s.rowZ(i))};
    };
    StlSink sink(out);
    // Outward normals: counter-clockwise seen from outside.
    for (std::size_t r = 0; r + 1 < rows.size(); ++r)
        for (int j = 0; j < s.nPhi; ++j) {
            const int i = rows[r], i1 = rows[r + 1];
            const int k = (j + 1) % s.nPhi;
            const Vec a = vertex(i, j), b = vertex(i, k), c = vertex(i1, k), d = vertex(i1, j);
            sink.triangle(a, b, c);
            sink.triangle(a, c, d);
        }
    const Vec startCentre{0, 0, static_cast<float>(s.rowZ(0))};
    const Vec endCentre{0, 0, static_cast<float>(s.rowZ(s.nz - 1))};
    for (int j = 0; j < s.nPhi; ++j) {
        const int k = (j + 1) % s.nPhi;
        sink.triangle(startCentre, vertex(0, k), vertex(0, j));             // faces −Z
        sink.triangle(endCentre, vertex(s.nz - 1, j), vertex(s.nz - 1, k)); // faces +Z
    }
    sink.flush();
    out.close();
    if (!out || sink.count() != total)
        throw OutputError("cannot write " + path + ": writing " + tmp + " failed");
    file.commit();
    return sink.count();
}

} // namespace swarf::geometry
