// Tests for sim/include/swarf/sim/caution.h: the cautions every output carries.
#include "swarf/sim/caution.h"

#include <catch2/catch.hpp>

#include <string>

using namespace swarf;

namespace {
bool anyHas(const std::vector<std::string>& lines, const std::string& part) {
    for (const std::string& l : lines)
        if (l.find(part) != std::string::npos)
            return true;
    return false;
}
} // namespace

TEST_CASE("the cautions name turning the chuck by hand before starting", "[sim][caution]") {
    // common practice: the jaw check covers the insert, not the holder or the swung compound.
    CHECK(anyHas(safetyCautions(), "turn the chuck by hand through a full turn"));
    CHECK(anyHas(safetyCautions(), "Stop the spindle before you measure"));
    CHECK(safetyCautionShort().find("stop the spindle before measuring") != std::string::npos);
}

TEST_CASE("a leaded material gets the lead caution, others none", "[sim][caution]") {
    // common practice: leaded free-cutting steels and brasses.
    for (const char* m : {"free-cutting steel 11SMnPb30, bright drawn", "12L14 steel",
                          "brass CW614N", "leaded bronze", "CuZn39Pb3", "steel 1.0718"}) {
        INFO(m);
        const auto c = materialCaution(m);
        REQUIRE(c.has_value());
        CHECK(c->find("wash your hands") != std::string::npos);
    }
    for (const char* m : {"alloy steel 42CrMo4, annealed", "mild steel", "1018 steel, cold drawn",
                          "stainless steel 1.4305", "aluminium 6082-T6", ""}) {
        INFO(m);
        CHECK_FALSE(materialCaution(m).has_value());
    }
}
