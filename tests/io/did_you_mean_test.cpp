// Tests of the did-you-mean suggestions.
#include "swarf/io/did_you_mean.h"

#include <catch2/catch.hpp>

using namespace swarf::io;

TEST_CASE("edit distance", "[io][did_you_mean]") {
    CHECK(editDistance("", "") == 0);
    CHECK(editDistance("abc", "") == 3);
    CHECK(editDistance("kitten", "sitting") == 3); // from memory: the textbook example
    CHECK(editDistance("diamter", "diameter") == 1);
    CHECK(editDistance("Stick_Out", "stick_out") == 0); // case-insensitive
}

TEST_CASE("closest match suggests likely misspellings only", "[io][did_you_mean]") {
    const std::vector<std::string> keys = {"diameter", "length", "stick_out", "face_allowance"};
    CHECK(closestMatch("diamter", keys) == "diameter");
    CHECK(closestMatch("stickout", keys) == "stick_out");
    CHECK(closestMatch("lenght", keys) == "length");
    CHECK(closestMatch("diam", keys) == "diameter"); // a part of the word
    CHECK(closestMatch("colour", keys).empty());
    CHECK(closestMatch("x", {}).empty());
}

TEST_CASE("suggestion text lists the choices", "[io][did_you_mean]") {
    const std::vector<std::string> words = {"axis", "cross_slide"};
    CHECK(suggestion("axial", words) == "one of axis, cross_slide; did you mean 'axis'?");
    CHECK(suggestion("zzzzzzz", words) == "one of axis, cross_slide");
    std::vector<std::string> many;
    for (int i = 0; i < 20; ++i)
        many.push_back("name" + std::to_string(i));
    const std::string s = suggestion("name19", many);
    CHECK(s.find("(20 in all)") != std::string::npos);
    CHECK(s.find("did you mean 'name19'") != std::string::npos);
}
