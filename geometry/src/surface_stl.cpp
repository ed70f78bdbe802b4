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

std::size_t writeSurfaceStl(const SurfaceGrid& s, const std::string& path) {
    static_assert(sizeof(float) == 4 && std::numeric_limits<float>::is_iec559);
    if (s.nz < 2 || s.nPhi < 3 ||
        s.radiusMm.size() != static_cast<std::size_t>(s.nz) * static_cast<std::size_t>(s.nPhi) ||
        s.phiRad.size() != static_cast<std::size_t>(s.nPhi))
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
    const std::size_t perRow = 2u * static_cast<std::size_t>(s.nPhi);
    const auto total =
        static_cast<std::uint32_t>((static_cast<std::size_t>(s.nz) - 1) * perRow + perRow);
    out.write(reinterpret_cast<const char*>(&total), 4); // little-endian hosts only (x86, arm)

    std::vector<float> cosPhi(s.nPhi), sinPhi(s.nPhi);
    for (int j = 0; j < s.nPhi; ++j) {
        cosPhi[j] = static_cast<float>(std::cos(s.phiRad[static_cast<std::size_t>(j)]));
        sinPhi[j] = static_cast<float>(std::sin(s.phiRad[static_cast<std::size_t>(j)]));
    }
    const auto vertex = [&](int i, int j) {
        const float r = s.at(i, j);
        return Vec{r * cosPhi[j], r * sinPhi[j], static_cast<float>(s.rowZ(i))};
    };
    StlSink sink(out);
    // Outward normals: counter-clockwise seen from outside.
    for (int i = 0; i + 1 < s.nz; ++i)
        for (int j = 0; j < s.nPhi; ++j) {
            const int k = (j + 1) % s.nPhi;
            const Vec a = vertex(i, j), b = vertex(i, k), c = vertex(i + 1, k),
                      d = vertex(i + 1, j);
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

std::size_t writeSurfaceStl(const FeedMarkSurface& surface, const std::string& path,
                            const SurfaceStlOptions& options) {
    if (surface.empty())
        throw OutputError("cannot write " + path + ": the surface has no grid to mesh");
    const int columns = std::max(3, surface.angleSamples());
    const std::size_t perRow = 2u * static_cast<std::size_t>(columns);
    const std::size_t maxRows = options.maxTriangles > 0
                                    ? std::max<std::size_t>(2, options.maxTriangles / perRow - 1)
                                    : std::numeric_limits<std::size_t>::max();
    const std::vector<double> rows = surface.markRows(surface.zFromMm(), surface.zToMm(), maxRows);
    return writeSurfaceStl(surface.grid(rows, evenColumns(columns)), path);
}

} // namespace swarf::geometry
