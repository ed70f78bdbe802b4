// The bad-scene corpus: every file in tests/bad_scenes/ must be refused with the message its
// header names. Header lines: "# expect: <part of the message>", "# at: LINE:COLUMN" and
// (when the error is about a key) "# key: <dotted key>". A file may start with a byte-order mark
// and end its lines with CRLF (the header is read through both).
#include "swarf/io/scene_reader.h"
#include "swarf/sim/error.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;

namespace {

struct BadScene {
    fs::path path;
    std::string expect, at, key;
};

BadScene readHeader(const fs::path& p) {
    BadScene b{p, {}, {}, {}};
    std::ifstream in(p);
    std::string line;
    bool first = true;
    while (std::getline(in, line)) {
        if (first && line.rfind("\xEF\xBB\xBF", 0) == 0)
            line.erase(0, 3);
        first = false;
        if (!line.empty() && line.back() == '\r')
            line.pop_back();
        if (line.rfind("# ", 0) != 0)
            break;
        auto take = [&](const char* tag, std::string& into) {
            const std::string t = std::string("# ") + tag + ": ";
            if (line.rfind(t, 0) == 0)
                into = line.substr(t.size());
        };
        take("expect", b.expect);
        take("at", b.at);
        take("key", b.key);
    }
    return b;
}

std::vector<BadScene> corpus() {
    std::vector<BadScene> all;
    for (const auto& e : fs::directory_iterator(fs::path(SWARF_TEST_DATA_DIR) / "bad_scenes"))
        if (e.path().extension() == ".toml")
            all.push_back(readHeader(e.path()));
    std::sort(all.begin(), all.end(),
              [](const BadScene& a, const BadScene& b) { return a.path < b.path; });
    return all;
}

} // namespace

TEST_CASE("the bad-scene corpus has at least 100 scenes, each with its expected message",
          "[io][bad]") {
    const auto all = corpus();
    CHECK(all.size() >= 100);
    for (const BadScene& b : all) {
        INFO(b.path.string());
        CHECK_FALSE(b.expect.empty());
        CHECK_FALSE(b.at.empty());
    }
}

TEST_CASE("every bad scene is refused with file:line:column, key and the expected text",
          "[io][bad]") {
    for (const BadScene& b : corpus()) {
        const std::string file = b.path.string();
        INFO(file);
        bool threw = false;
        try {
            (void)swarf::io::readScene(file);
        } catch (const swarf::InputError& e) {
            threw = true;
            const std::string msg = e.what();
            INFO("message: " << msg);
            CHECK(msg.find(b.expect) != std::string::npos);
            CHECK(msg.rfind(file + ":" + b.at + ": ", 0) == 0);
            CHECK(e.where().file == file);
            if (!b.key.empty()) {
                CHECK(e.key() == b.key);
                CHECK(msg.find(b.key) != std::string::npos);
            }
            CHECK(e.exitCode() == swarf::kExitBadInput);
        }
        CHECK(threw);
    }
}
