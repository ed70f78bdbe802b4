// Tests for `swarf taper` (viewer/app/cmd_taper.cpp): runs the built binary.
#include <catch2/catch.hpp>

#include <cstdio>
#include <string>
#include <sys/wait.h>

namespace {

struct Run {
    int exitCode = -1;
    std::string out; // stdout and stderr together
};

Run runSwarf(const std::string& args) {
    const std::string cmd = std::string("'") + SWARF_BINARY + "' " + args + " 2>&1";
    Run r;
    FILE* p = popen(cmd.c_str(), "r");
    REQUIRE(p != nullptr);
    char buf[4096];
    while (std::fgets(buf, sizeof buf, p))
        r.out += buf;
    const int status = pclose(p);
    r.exitCode = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
    return r;
}

bool has(const std::string& text, const std::string& part) {
    return text.find(part) != std::string::npos;
}

} // namespace

TEST_CASE("swarf taper: Morse 3 in inch", "[cli][taper]") {
    const auto r =
        runSwarf("taper --standard 'Morse 3' --units inch --length 3.25 --nose-radius 0.03125 "
                 "--rolls 0.25 --tip-height 0.01 --feed 0.004 --work-length 8");
    INFO(r.out);
    CHECK(r.exitCode == 0);
    // Source: references R3: Morse 3 ratio 1:19.922, 0.60235 in/ft, gauge 0.938 in,
    // included 2°52′31.5″ (the table rounds from the exact ratio: we print 31.45″).
    CHECK(has(r.out, "1:19.9220"));
    CHECK(has(r.out, "0.60235 in/ft"));
    CHECK(has(r.out, "0.9380 in"));
    CHECK(has(r.out, "2°52′31.45″"));
    // Every section is there, with units.
    for (const char* s : {"Compound slide", "Sine bar", "5 in bar", "200 mm bar", "Nose radius",
                          "ΔX", "ΔZ", "tailstock set-over", "taper attachment", "Over two rolls",
                          "hyperboloid", "Ra", "µin", "CAUTION", "chuck key"})
        CHECK(has(r.out, s));
}

TEST_CASE("swarf taper: R1 offsets and R5 compound in mm", "[cli][taper]") {
    // Source: references R5: 60/20/80 mm → compound 14°2′ (14°02′10.5″ to 0.1″, derived).
    auto r = runSwarf("taper --dia 60 --dia2 20 --length 80");
    INFO(r.out);
    CHECK(r.exitCode == 0);
    CHECK(has(r.out, "set 14°02′10.5″"));
    CHECK(has(r.out, "set 75°57′49.5″"));
    // Source: references R1: r 0.8 mm, θ 30° → ΔX 0.33812 radius, ΔZ 0.58564 (to 4 places).
    r = runSwarf("taper --dia 40 --half-angle 30 --nose-radius 0.8");
    INFO(r.out);
    CHECK(r.exitCode == 0);
    CHECK(has(r.out, "ΔX 0.3381 mm on radius = 0.6762 mm on diameter"));
    CHECK(has(r.out, "ΔZ 0.5856 mm"));
}

TEST_CASE("swarf taper: bad values exit 2 with the option, the value and what was expected",
          "[cli][taper]") {
    struct Bad {
        const char* args;
        const char* mustSay;
    };
    const Bad cases[] = {
        {"taper --dia 25 --ratio abc", "--ratio = abc: a ratio on diameter"},
        {"taper --dia -3 --ratio 1:20", "--dia = -3: a length in mm greater than 0"},
        {"taper --standard 'Morse 9'", "--standard = Morse 9: a standard taper"},
        {"taper --dia 25 --half-angle 95", "--half-angle = 95: an angle over 0° and under 90°"},
        {"taper --dia 25 --ratio 20 --included 3", "only one taper form"},
        {"taper --dia 25 --ratio 20 --units furlong", "--units = furlong: mm or inch"},
        {"taper --standard NPT",
         "--dia = (none given): the gauge diameter, which NPT does not fix"},
        {"taper --dia 25", "taper = (none given): one of --standard, --half-angle"},
        {"taper --dia 25 --ratio 20 --blocks 1,x", "--blocks = 1,x: block sizes in mm > 0"},
        {"taper --dia 25 --half-angle 8°60′", "--half-angle = 8°60′: an angle"},
        {"taper --dia 10 --ratio 1:2 --length 30", "--length = 30: a length shorter than"},
        {"taper --dia 25 --ratio 20 --nose-radius 0.4 --feed 1", "--feed = 1: a feed below twice"},
    };
    for (const auto& c : cases) {
        const auto r = runSwarf(c.args);
        INFO(c.args << "\n" << r.out);
        CHECK(r.exitCode == 2);
        CHECK(has(r.out, c.mustSay));
        CHECK_FALSE(has(r.out, "Cone:")); // nothing half-printed
    }
}

TEST_CASE("swarf taper --at with a negative distance says it the other way, no double negative",
          "[cli][taper]") {
    // A 1:20 cone gauged at its large end (Ø30): 35 mm toward the large end, beyond the gauge
    // plane, is Ø30 + 35/20 = Ø31.750 (derived).
    const Run r = runSwarf("taper --ratio 1:20 --dia 30 --length 50 --at -35");
    INFO(r.out);
    CHECK(r.exitCode == 0);
    CHECK(has(r.out, "35.000 mm from the gauge plane toward the large end: diameter 31.750 mm"));
    CHECK_FALSE(has(r.out, "-35.000 mm"));
    const Run s = runSwarf("taper --ratio 1:20 --dia 30 --length 50 --at 35");
    CHECK(has(s.out, "35.000 mm from the gauge plane toward the small end: diameter 28.250 mm"));
}
