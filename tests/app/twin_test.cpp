// Tests of swarf/app/twin.h: the rule that pairs a scene with its twin (the mistake and its
// correction) for `swarf view` (key w).
#include "swarf/app/twin.h"

#include <catch2/catch.hpp>

#include <filesystem>
#include <fstream>
#include <string>
#include <unistd.h>

using namespace swarf::app;
namespace fs = std::filesystem;

TEST_CASE("the twin's name swaps -mistake and -right in the same folder", "[app][twin]") {
    CHECK(twinNameByRule("lessons/nose-offset-mistake.toml") ==
          (fs::path("lessons") / "nose-offset-right.toml").string());
    CHECK(twinNameByRule("lessons/nose-offset-right.toml") ==
          (fs::path("lessons") / "nose-offset-mistake.toml").string());
    CHECK(twinNameByRule("steep-mistake.toml") == "steep-right.toml");
    // Only the end of the file name counts, not a folder's name or the middle of the name.
    CHECK(twinNameByRule("a-mistake.toml/b.toml") == "");
    CHECK(twinNameByRule("scenes/fixture-arbor.toml") == "");
    CHECK(twinNameByRule("scenes/right-mistake-of-mine.toml") == "");
    CHECK(twinNameByRule("scenes/x-mistake.toml.bak") == "");
    // A name that is all suffix has no stem to pair by.
    CHECK(twinNameByRule("scenes/-mistake.toml") == "");
    CHECK(twinNameByRule("-right.toml") == "");
}

TEST_CASE("findTwin: --twin wins, else the rule's file if it exists, else none", "[app][twin]") {
    const fs::path dir =
        fs::temp_directory_path() / ("swarf-twin-test-" + std::to_string(::getpid()));
    fs::remove_all(dir);
    fs::create_directories(dir);
    const std::string mistake = (dir / "backlash-mistake.toml").string();
    const std::string right = (dir / "backlash-right.toml").string();
    const std::string lonely = (dir / "lonely-mistake.toml").string();
    for (const std::string& f : {mistake, right, lonely})
        std::ofstream(f) << "# a scene\n";

    CHECK(findTwin(mistake) == right);
    CHECK(findTwin(right) == mistake);
    CHECK_FALSE(findTwin(lonely).has_value()); // lonely-right.toml does not exist
    CHECK_FALSE(findTwin((dir / "plain.toml").string()).has_value());
    // Given on the command line, taken as given (the scene reader says if it is missing).
    CHECK(findTwin(lonely, "elsewhere/other.toml") == "elsewhere/other.toml");
    CHECK(findTwin(mistake, lonely) == lonely);
    // A folder with the twin's name is not a twin.
    fs::create_directories(dir / "folder-right.toml");
    std::ofstream((dir / "folder-mistake.toml").string()) << "# a scene\n";
    CHECK_FALSE(findTwin((dir / "folder-mistake.toml").string()).has_value());
    fs::remove_all(dir);
}

TEST_CASE("the rule's text names both suffixes and the option", "[app][twin]") {
    const std::string t = twinRuleText();
    CHECK(t.find("--twin FILE") != std::string::npos);
    CHECK(t.find(kMistakeSuffix) != std::string::npos);
    CHECK(t.find(kRightSuffix) != std::string::npos);
}
