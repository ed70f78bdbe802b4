// The raw bytes of a scene file (sim/io/src/scene_text.cpp, through readScene and
// readSceneText): a byte-order mark and CRLF line ends read the same as the plain file; bytes
// that are not UTF-8 are refused with their line and column; a file over 1 MB (a 10 MB one is
// made here at run time) is refused before TOML reads it.
#include "swarf/io/scene_reader.h"
#include "swarf/io/scene_writer.h"
#include "swarf/sim/error.h"

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;

namespace {

std::string slurp(const fs::path& p) {
    std::ifstream in(p, std::ios::binary);
    std::stringstream ss;
    ss << in.rdbuf();
    return ss.str();
}

std::string demo() {
    return slurp(fs::path(SWARF_SCENES_DIR) / "fixture-arbor.toml");
}

std::string withCrlf(const std::string& text) {
    std::string out;
    for (char c : text) {
        if (c == '\n')
            out += '\r';
        out += c;
    }
    return out;
}

const std::string kBom = "\xEF\xBB\xBF";

// The scene as the writer gives it back: equal texts mean equal scenes.
std::string asRead(const std::string& text) {
    return swarf::io::sceneToToml(swarf::io::readSceneText(text, "scene.toml"));
}

// The refusal of `text`: its message, or "" if it reads.
std::string refusal(const std::string& text) {
    try {
        (void)swarf::io::readSceneText(text, "scene.toml");
    } catch (const swarf::InputError& e) {
        CHECK(e.exitCode() == swarf::kExitBadInput);
        return e.what();
    }
    return "";
}

} // namespace

TEST_CASE("a byte-order mark and CRLF line ends read the same as the plain file", "[io][text]") {
    for (const auto& e : fs::directory_iterator(SWARF_SCENES_DIR)) {
        if (e.path().extension() != ".toml")
            continue;
        INFO(e.path().string());
        const std::string text = slurp(e.path());
        const std::string plain = asRead(text);
        CHECK(asRead(kBom + text) == plain);
        CHECK(asRead(withCrlf(text)) == plain);
        CHECK(asRead(kBom + withCrlf(text)) == plain);
    }
}

TEST_CASE("a byte that is not UTF-8 is refused at its line and column", "[io][text]") {
    struct Case {
        std::string text, at;
        std::string byte;
    };
    const std::vector<Case> cases = {
        {"name = \"a\xFF\"\n", "1:10", "0xFF"},
        // Columns count characters: "°" is one, two bytes.
        {"name = \"2°\xC3\"\n", "1:11", "0xC3"},
        {"# ok\nname = \"\xC0\xAF\"\n", "2:9", "0xC0"},         // an overlong '/'
        {"name = \"\xED\xA0\x80\"\n", "1:9", "0xED"},           // a UTF-16 surrogate
        {"name = \"\xF4\x90\x80\x80\"\n", "1:9", "0xF4"},       // past U+10FFFF
        {"name = \"x\"\r\n# \x80\r\n", "2:3", "0x80"},          // CRLF: the CR is no column
        {kBom + "name = \"\xFE\"\n", "1:9", "0xFE"},            // a BOM takes no column
        {"name = \"x\"\n# cut short \xE2\x82", "2:13", "0xE2"}, // ends inside a character
    };
    for (const Case& c : cases) {
        INFO(c.text);
        const std::string msg = refusal(c.text);
        CHECK(msg.rfind("scene.toml:" + c.at + ": ", 0) == 0);
        CHECK(msg.find("byte " + c.byte + " here is not UTF-8") != std::string::npos);
    }
    // Valid UTF-8 of every length reads on to the next problem (the missing [stock]).
    CHECK(refusal("name = \"é ′ 𝄞\"\n").find("stock: missing") != std::string::npos);
}

TEST_CASE("an empty file and a file of comments say what is missing first", "[io][text]") {
    CHECK(refusal("") == "scene.toml:1:1: stock: missing at the top level: expected a [stock] "
                         "table: the bar");
    CHECK(refusal("# nothing\n").rfind("scene.toml:1:1: stock: missing", 0) == 0);
}

TEST_CASE("a 10 MB scene file is refused before it is parsed; just under 1 MB reads",
          "[io][text][big]") {
    const std::string text = demo();
    // A valid scene behind 10 MB of comments, built here rather than kept in the repository.
    std::string padding;
    const std::string line = "# " + std::string(97, 'x') + "\n"; // 100 bytes
    while (padding.size() < 10u * 1024 * 1024)
        padding += line;
    CHECK(refusal(padding + text) ==
          "scene.toml:1:1: expected a scene file of at most 1 MB; this one is 10.0 MB: is it the "
          "right file?");
    // The same from a file on disk: read no further than the limit.
    const fs::path big = fs::temp_directory_path() / "swarf_scene_text_test_10mb.toml";
    {
        std::ofstream out(big, std::ios::binary);
        out << padding << text;
    }
    try {
        (void)swarf::io::readScene(big.string());
        FAIL("a 10 MB file was read");
    } catch (const swarf::InputError& e) {
        CHECK(std::string(e.what()).find("at most 1 MB; this one is larger") != std::string::npos);
        CHECK(e.where().line == 1);
    }
    fs::remove(big);
    // 10 MB of bytes that are not even text: the size is said first.
    CHECK(refusal(std::string(10u * 1024 * 1024, '\xFF')).find("at most 1 MB") !=
          std::string::npos);

    // Just under the limit, the padded scene reads the same as the plain one.
    const std::string under = padding.substr(0, 1024 * 1024 - text.size() - 100) + text;
    REQUIRE(under.size() < 1024 * 1024);
    CHECK(asRead(under) == asRead(text));
}

TEST_CASE("a folder or a file that cannot be opened is bad input", "[io][text]") {
    try {
        (void)swarf::io::readScene(SWARF_SCENES_DIR);
        FAIL("a folder was read as a scene");
    } catch (const swarf::InputError& e) {
        CHECK(std::string(e.what()).find("it is a folder") != std::string::npos);
        CHECK(e.exitCode() == swarf::kExitBadInput);
    }
}

TEST_CASE("\"cross-slide\", the screens' word, is read as the file keys' \"cross\" and "
          "\"cross_slide\"",
          "[io][text][words]") {
    auto replacedAll = [](std::string s, const std::string& from, const std::string& to) {
        for (std::size_t at = s.find(from); at != std::string::npos; at = s.find(from, at))
            s.replace(at, from.size(), to), at += to.size();
        return s;
    };
    SECTION("a pass's kind") {
        const std::string text =
            slurp(fs::path(SWARF_SCENES_DIR) / "finding-wind-back-shoulder.toml");
        REQUIRE(text.find("kind = \"cross\"") != std::string::npos);
        const swarf::Scene plain = swarf::io::readSceneText(text, "a.toml");
        const swarf::Scene alias = swarf::io::readSceneText(
            replacedAll(text, "kind = \"cross\"", "kind = \"cross-slide\""), "a.toml");
        REQUIRE(alias.plan.passes.size() == plain.plan.passes.size());
        int cross = 0;
        for (std::size_t k = 0; k < plain.plan.passes.size(); ++k) {
            CHECK(alias.plan.passes[k].kind == plain.plan.passes[k].kind);
            cross += plain.plan.passes[k].kind == swarf::PassKind::CrossSlide;
        }
        CHECK(cross > 0);
        // What swarf writes keeps the file key.
        CHECK(swarf::io::sceneToToml(alias).find("kind = \"cross\"") != std::string::npos);
    }
    SECTION("the compound's scale") {
        const std::string text = slurp(fs::path(SWARF_SCENES_DIR) / "taper-shank-morse.toml");
        REQUIRE(text.find("scale = \"cross_slide\"") != std::string::npos);
        const swarf::Scene alias = swarf::io::readSceneText(
            replacedAll(text, "scale = \"cross_slide\"", "scale = \"cross-slide\""), "a.toml");
        CHECK(alias.setup.compoundScale == swarf::CompoundScale::FromCrossSlide);
    }
    SECTION("other spellings are still refused with the choices") {
        const std::string text = slurp(fs::path(SWARF_SCENES_DIR) / "taper-shank-morse.toml");
        CHECK_THROWS_WITH(
            swarf::io::readSceneText(
                replacedAll(text, "scale = \"cross_slide\"", "scale = \"crossslide\""), "a.toml"),
            Catch::Contains("setup.compound.scale") && Catch::Contains("cross_slide"));
    }
}
