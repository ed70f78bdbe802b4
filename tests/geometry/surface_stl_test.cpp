#include "swarf/geometry/surface_stl.h"
#include "swarf/sim/kernel.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <array>
#include <cmath>
#include <cstdint>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <map>
#include <vector>

using namespace swarf;
using namespace swarf::geometry;
namespace fs = std::filesystem;

namespace {
struct Tri {
    std::array<float, 3> n, v[3];
};

std::vector<Tri> readStl(const std::string& path, std::uint32_t& declared) {
    std::ifstream in(path, std::ios::binary);
    char header[80];
    in.read(header, 80);
    in.read(reinterpret_cast<char*>(&declared), 4);
    std::vector<Tri> tris;
    char rec[50];
    while (in.read(rec, 50)) {
        Tri t;
        std::memcpy(t.n.data(), rec, 12);
        for (int k = 0; k < 3; ++k)
            std::memcpy(t.v[k].data(), rec + 12 + 12 * k, 12);
        tris.push_back(t);
    }
    return tris;
}
} // namespace

TEST_CASE("surface STL is a closed mesh of the grid", "[geometry][stl]") {
    SurfaceGrid s;
    s.nz = 5;
    s.zMm = {-1.0, -0.5, 0.0, 0.25, 1.0}; // rows need not be evenly spaced
    s.nPhi = 12;
    s.phiRad = evenColumns(12);
    for (int i = 0; i < s.nz; ++i)
        for (int j = 0; j < s.nPhi; ++j)
            s.radiusMm.push_back(10.0f + 0.01f * static_cast<float>(j % 2));
    const fs::path dir = fs::temp_directory_path() / "swarf-geometry-test-stl";
    fs::remove_all(dir);
    fs::create_directories(dir);
    const std::string path = (dir / "surface.stl").string();
    const std::size_t n = writeSurfaceStl(s, path);
    // derived: two triangles per grid cell around, and a fan of nPhi triangles per end.
    CHECK(n == 2u * 4u * 12u + 2u * 12u);
    CHECK(fs::file_size(path) == 84 + 50 * n);
    CHECK_FALSE(fs::exists(path + ".tmp"));
    std::uint32_t declared = 0;
    const auto tris = readStl(path, declared);
    REQUIRE(tris.size() == n);
    CHECK(declared == n);
    // Closed and consistently oriented: every directed edge appears once, and its reverse once.
    std::map<std::array<float, 6>, int> edges;
    for (const Tri& t : tris)
        for (int k = 0; k < 3; ++k) {
            const auto& a = t.v[k];
            const auto& b = t.v[(k + 1) % 3];
            ++edges[{a[0], a[1], a[2], b[0], b[1], b[2]}];
        }
    bool closed = true;
    for (const auto& [e, count] : edges) {
        const std::array<float, 6> rev{e[3], e[4], e[5], e[0], e[1], e[2]};
        const auto it = edges.find(rev);
        closed = closed && count == 1 && it != edges.end() && it->second == 1;
    }
    CHECK(closed);
    // Outward normals: on the side wall they point away from the axis.
    const Tri& side = tris.front();
    const float cx = (side.v[0][0] + side.v[1][0] + side.v[2][0]) / 3;
    const float cy = (side.v[0][1] + side.v[1][1] + side.v[2][1]) / 3;
    CHECK(side.n[0] * cx + side.n[1] * cy > 0);
    // The point (i, j) sits at radius R(i, j), angle 2πj/nPhi, z0 + i·dz.
    CHECK(std::abs(side.v[0][2] - (-1.0f)) < 1e-6f);
    float zMax = -10;
    for (const Tri& t : tris)
        for (const auto& v : t.v)
            zMax = std::max(zMax, v[2]);
    CHECK(zMax == 1.0f);
    CHECK(std::abs(std::hypot(side.v[0][0], side.v[0][1]) - 10.0f) < 1e-5f);
}

TEST_CASE("surface STL keeps under its triangle limit", "[geometry][stl]") {
    // A 30 mm bar turned to 20 mm over 10 mm at 0.1 mm/rev (made up for the test).
    Scene sc;
    sc.name = "stl";
    sc.stock.diameterMm = 30;
    sc.stock.lengthMm = 100;
    sc.stock.stickOutMm = 40;
    Feature cyl;
    cyl.kind = FeatureKind::Cylinder;
    cyl.zStartMm = 0;
    cyl.zEndMm = 10;
    cyl.diameterMm = 20;
    cyl.toleranceMm = 0.1;
    sc.part.features.push_back(cyl);
    sc.tool.includedAngleRad = degToRad(55);
    sc.tool.enteringAngleRad = degToRad(93);
    sc.tool.noseRadiusMm = 0.4;
    sc.tool.edgeLengthMm = 11.6;
    sc.sim.angleSamples = 36;
    Pass p;
    p.kind = PassKind::Path;
    p.pathZX = {{-1, 10}, {11, 10}};
    p.feedMmPerRev = 0.1;
    sc.plan.passes.push_back(p);
    const CutResult r = simulate(sc);
    const std::string path = (fs::temp_directory_path() / "swarf-limited-surface.stl").string();
    SurfaceStlOptions o;
    o.maxTriangles = 3000;
    const std::size_t n = writeSurfaceStl(r.surface, path, o);
    CHECK(n <= 3000);
    CHECK(n >= 2000); // as many rows as fit, not much fewer
    std::uint32_t declared = 0;
    const auto tris = readStl(path, declared);
    CHECK(tris.size() == n);
    // The mesh runs over the whole surface: to its last z.
    float zMax = -1;
    for (const Tri& t : tris)
        for (const auto& v : t.v)
            zMax = std::max(zMax, v[2]);
    CHECK(std::abs(zMax - static_cast<float>(r.surface.zToMm())) < 1e-5f);
    fs::remove(path);
}

TEST_CASE("surface STL refuses a grid it cannot mesh", "[geometry][stl]") {
    SurfaceGrid s;
    s.nz = 1;
    s.nPhi = 12;
    s.zMm = {0.0};
    s.phiRad = evenColumns(12);
    s.radiusMm.assign(12, 1.0f);
    const std::string path = (fs::temp_directory_path() / "swarf-bad-surface.stl").string();
    CHECK_THROWS_AS(writeSurfaceStl(s, path), OutputError);
    CHECK_FALSE(fs::exists(path));
}
