// The house rules, checked on the source tree: each room includes only from itself and the rooms
// below it, and only the room that owns a library includes it (DEVELOPERS.md, "Layers").
//   sim/        the kernel: C++ standard library and Eigen only
//   sim/io/     documents: the kernel, toml++, nlohmann-json, fmt
//   geometry/   solids: the kernel, documents (output files), OCCT
//   viewer/     pictures and the window: the kernel, documents, VTK
//   viewer/app/ the executable: everything
// Public headers of geometry/ and viewer/ name no OCCT or VTK type.
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <regex>
#include <string>
#include <vector>

namespace fs = std::filesystem;

namespace {

const fs::path kRoot = fs::path(SWARF_TEST_DATA_DIR).parent_path();

struct Include {
    std::string file, header;
    int line = 0;
};

// Every #include in the C++ files below `dir` (relative to the repository), except those under
// any of `skip`.
std::vector<Include> includesUnder(const std::string& dir,
                                   const std::vector<std::string>& skip = {}) {
    std::vector<Include> out;
    const std::regex inc(R"(^\s*#\s*include\s*[<"]([^>"]+)[>"])");
    for (const auto& e : fs::recursive_directory_iterator(kRoot / dir)) {
        const std::string ext = e.path().extension().string();
        if (!e.is_regular_file() || (ext != ".cpp" && ext != ".h"))
            continue;
        const std::string rel = fs::relative(e.path(), kRoot).string();
        bool skipped = false;
        for (const auto& s : skip)
            skipped = skipped || rel.rfind(s, 0) == 0;
        if (skipped)
            continue;
        std::ifstream in(e.path());
        std::string line;
        int n = 0;
        while (std::getline(in, line)) {
            ++n;
            std::smatch m;
            if (std::regex_search(line, m, inc))
                out.push_back({rel, m[1].str(), n});
        }
    }
    return out;
}

bool isVtk(const std::string& h) {
    return h.rfind("vtk", 0) == 0;
}
// OCCT's headers are named Package_Class.hxx (gp_Pnt.hxx, TopoDS_Shape.hxx, Standard.hxx).
bool isOcct(const std::string& h) {
    return h.size() > 4 && h.substr(h.size() - 4) == ".hxx";
}
bool isRoom(const std::string& h, const std::string& room) {
    return h.rfind("swarf/" + room + "/", 0) == 0;
}

// Lists the includes that break a rule, so a failure names them.
void requireNone(const std::vector<Include>& incs, bool (*bad)(const std::string&),
                 const std::string& rule) {
    int broken = 0;
    for (const Include& i : incs)
        if (bad(i.header)) {
            UNSCOPED_INFO(i.file << ":" << i.line << " includes " << i.header << " (" << rule
                                 << ")");
            ++broken;
        }
    CHECK(broken == 0);
}

} // namespace

TEST_CASE("the kernel includes the standard library, Eigen and itself only", "[app][layers]") {
    const auto incs = includesUnder("sim", {"sim/io"});
    REQUIRE(incs.size() > 100);
    requireNone(
        incs,
        [](const std::string& h) {
            const bool ours = h.rfind("swarf/", 0) == 0;
            if (ours)
                return !isRoom(h, "sim");
            if (h.find('/') != std::string::npos)
                return h.rfind("Eigen/", 0) != 0; // a library other than Eigen
            return h.find('.') != std::string::npos && h.substr(h.size() - 2) != ".h";
        },
        "sim/ is C++ and Eigen only");
}

TEST_CASE("documents include no solids, pictures or executable", "[app][layers]") {
    requireNone(
        includesUnder("sim/io"),
        [](const std::string& h) {
            return isVtk(h) || isOcct(h) || isRoom(h, "geometry") || isRoom(h, "viewer") ||
                   isRoom(h, "app") || h.rfind("CLI/", 0) == 0;
        },
        "sim/io/ depends on the kernel only");
}

TEST_CASE("solids include no VTK, pictures or executable", "[app][layers]") {
    requireNone(
        includesUnder("geometry"),
        [](const std::string& h) { return isVtk(h) || isRoom(h, "viewer") || isRoom(h, "app"); },
        "geometry/ is OCCT's room only");
}

TEST_CASE("pictures include no OCCT, solids or executable", "[app][layers]") {
    requireNone(
        includesUnder("viewer", {"viewer/app"}),
        [](const std::string& h) { return isOcct(h) || isRoom(h, "geometry") || isRoom(h, "app"); },
        "viewer/ is VTK's room only");
}

TEST_CASE("public headers of solids and pictures name no OCCT or VTK type", "[app][layers]") {
    auto incs = includesUnder("geometry/include");
    const auto more = includesUnder("viewer/include");
    incs.insert(incs.end(), more.begin(), more.end());
    REQUIRE(!incs.empty());
    requireNone(
        incs, [](const std::string& h) { return isVtk(h) || isOcct(h); },
        "OCCT and VTK stay private to their rooms");
}

TEST_CASE("the executable's support includes no pictures or solids", "[app][layers]") {
    requireNone(
        includesUnder("viewer/app/support"),
        [](const std::string& h) {
            return isVtk(h) || isOcct(h) || isRoom(h, "viewer") || isRoom(h, "geometry");
        },
        "process handling needs no pictures");
}
