// Reading the tool's kind: a turning holder, or a boring bar with its bar diameter, overhang,
// smallest bore and axis height.
#include "scene_sections.h"

#include <cstdio>

namespace swarf::io::detail {

namespace {

std::string fmtLen(double mm, Units u) {
    char buf[64];
    std::snprintf(buf, sizeof buf, "%.6g %s", fromMm(mm, u), unitName(u));
    return buf;
}

} // namespace

// kind = "turning" (the default) or "boring_bar", with the bar's own keys; each kind refuses
// the other's keys.
void readToolKind(const Fields& f, Tool& tool) {
    const auto kind = f.choice("kind", {"turning", "boring_bar"});
    tool.kind = kind && *kind == "boring_bar" ? ToolKind::BoringBar : ToolKind::Turning;
    if (tool.kind == ToolKind::Turning) {
        for (const char* key : {"bar_diameter", "overhang", "min_bore", "axis_height"})
            if (f.has(key))
                f.fail(key, "not a key of a turning tool: it belongs to kind = \"boring_bar\"");
        return;
    }
    if (f.has("tip_height"))
        f.fail("tip_height", "not a key of a boring bar: its tip is on the bar's axis; give "
                             "axis_height (the bar's axis above or below centre)");
    tool.barDiameterMm = f.requiredLength("bar_diameter", "the boring bar's diameter");
    requirePositive(f, "bar_diameter", tool.barDiameterMm);
    tool.overhangMm = f.requiredLength("overhang", "the bar's overhang from the tool post");
    requirePositive(f, "overhang", tool.overhangMm);
    tool.minBoreMm = f.requiredLength("min_bore", "the smallest bore the bar enters");
    requirePositive(f, "min_bore", tool.minBoreMm);
    f.require(tool.minBoreMm >= tool.barDiameterMm - 1e-9, "min_bore",
              "expected at least bar_diameter (" + fmtLen(tool.barDiameterMm, f.context().units) +
                  "): the bar itself goes into the hole");
}

} // namespace swarf::io::detail
