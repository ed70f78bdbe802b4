#pragma once
// Internal to swarf_io: readers of the sections of a scene file, one per part of the Scene.
#include "toml_fields.h"

#include "swarf/sim/scene.h"

namespace swarf::io::detail {

/// [part] and its [[part.feature]] array.
Part readPart(const Fields& root, const Stock& stock);
/// [tool].
Tool readTool(const Fields& root);
/// [tool] kind: "turning" (default) or "boring_bar" with bar_diameter, overhang, min_bore (each
/// refused on the other kind); sets tool.kind and the bar's values. A boring bar's tip_height is
/// refused (it is axis_height, read with the tool).
void readToolKind(const Fields& f, Tool& tool);
/// [setup] with [setup.compound], [setup.cross], [setup.saddle].
Setup readSetup(const Fields& root);
/// [[plan.pass]] (the [plan] table may be absent: an empty plan). `boringBar`: the tool is a
/// boring bar, whose retract_to comes off the wall toward the centre (machine.h RetractLimit).
Plan readPlan(const Fields& root, bool boringBar);

/// [uncertainty] (every key optional: exact), with limits from the tool and the slides.
Uncertainty readUncertainty(const Fields& root, const Tool& tool, const Setup& setup);

/// Checks that a present number is > 0 (or ≥ 0 when zeroAllowed).
void requirePositive(const Fields& f, std::string_view key, double value, bool zeroAllowed = false);

} // namespace swarf::io::detail
