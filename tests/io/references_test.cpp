// Every reference id a test cites has its entry in tests/REFERENCES.md. Tests cite a published
// source by the id of the project's reference list ("// Source: references R3 ..."); the file
// gives each id's titles, authors and standards, so a reader can look the source up.
#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <map>
#include <regex>
#include <set>
#include <sstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;

namespace {

// Where an id is cited: "file:line".
using Citations = std::multimap<int, std::string>;

// The ids cited in one source text: each "references R<n>", and each "R<n>" in a `Source:`
// comment (from "Source:" to the end of its line and on the comment lines that follow it).
Citations citedIds(const std::string& text, const std::string& name) {
    static const std::regex cite("references R([0-9]+)\\b");
    static const std::regex bare("\\bR([0-9]+)\\b");
    Citations out;
    std::istringstream in(text);
    std::string line;
    bool inSource = false;
    for (int n = 1; std::getline(in, line); ++n) {
        std::set<int> ids;
        for (std::sregex_iterator m(line.begin(), line.end(), cite), e; m != e; ++m)
            ids.insert(std::stoi((*m)[1]));
        const auto comment = line.find("//");
        const auto source = line.find("Source:");
        const bool startsSource =
            comment != std::string::npos && source != std::string::npos && comment < source;
        const bool commentOnly = line.find_first_not_of(" \t") == comment;
        inSource = startsSource || (inSource && comment != std::string::npos && commentOnly);
        if (inSource) {
            const std::string rest = line.substr(startsSource ? source : comment);
            for (std::sregex_iterator m(rest.begin(), rest.end(), bare), e; m != e; ++m)
                ids.insert(std::stoi((*m)[1]));
        }
        for (int id : ids)
            out.emplace(id, name + ":" + std::to_string(n));
    }
    return out;
}

// The ids with a "## R<n>" heading in a Markdown text.
std::set<int> listedIds(const std::string& markdown) {
    static const std::regex heading("^##[ \\t]+R([0-9]+)\\b");
    std::set<int> out;
    std::istringstream in(markdown);
    std::string line;
    while (std::getline(in, line)) {
        std::smatch m;
        if (std::regex_search(line, m, heading))
            out.insert(std::stoi(m[1]));
    }
    return out;
}

std::string readText(const fs::path& p) {
    std::ifstream in(p, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

} // namespace

TEST_CASE("the citation scanner finds both forms", "[references]") {
    const std::string text = "x = 1; // Source: references R3 (Morse)\n"
                             "// Source: references R3 and R9 (ISO 3040), and R12\n"
                             "//   continued: R10\n"
                             "y = 2; // R11 outside a source comment\n"
                             "// R4, and no source comment above\n"
                             "z = 3; // (references R5)\n"
                             "Rt = Ra; R2D2 = 0;\n";
    const Citations c = citedIds(text, "t.cpp");
    std::set<int> ids;
    for (const auto& [id, where] : c)
        ids.insert(id);
    CHECK(ids == std::set<int>{3, 5, 9, 10, 12});
    CHECK(c.find(5)->second == "t.cpp:6");
    CHECK(c.count(3) == 2);

    CHECK(listedIds("# Title\n## R1 Offsets\ntext R7\n### R2 not a section\n##R4 no space\n"
                    "## R12 Inside cones\n") == std::set<int>{1, 12});
}

TEST_CASE("every reference id a test cites is listed in tests/REFERENCES.md", "[references]") {
    const fs::path root = SWARF_TEST_DATA_DIR;
    const fs::path list = root / "REFERENCES.md";
    REQUIRE(fs::exists(list));
    const std::set<int> listed = listedIds(readText(list));
    REQUIRE_FALSE(listed.empty());

    Citations cited;
    int files = 0;
    for (const auto& e : fs::recursive_directory_iterator(root)) {
        const std::string ext = e.path().extension().string();
        if (!e.is_regular_file() || (ext != ".cpp" && ext != ".h"))
            continue;
        ++files;
        cited.merge(citedIds(readText(e.path()), fs::relative(e.path(), root).string()));
    }
    // The scan saw the tests and their citations (else it checked nothing).
    CHECK(files >= 30);
    std::set<int> ids;
    for (const auto& [id, where] : cited)
        ids.insert(id);
    CHECK(ids.size() >= 9);

    for (const auto& [id, where] : cited) {
        INFO(where << " cites references R" << id);
        CHECK(listed.count(id) == 1);
    }
}
