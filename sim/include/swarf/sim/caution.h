#pragma once
// The safety cautions every output of swarf carries, written once: the console, the set-up
// sheets, the report, the planned scene's header and the window all take them from here.
#include <optional>
#include <string>
#include <vector>

namespace swarf {

/// The cautions in full, one per entry, for sheets, the report and the README: guards and the
/// chuck key, clothing and eyes, turning the chuck by hand before starting, stick-out and support,
/// speeds and feeds from the tooling supplier, the shop's rules, and what the simulation does not
/// model.
const std::vector<std::string>& safetyCautions();

/// The cautions boring adds, for a set-up with a boring bar: the bar's reach, swarf packing in a
/// blind hole, and no fingers (or rag, or brush) in the bore while the spindle turns.
const std::vector<std::string>& boringCautions();

/// A caution the bar's material calls for, if any: for a leaded steel, brass or bronze (Pb in
/// its designation, or "leaded"), washing hands and handling its swarf.
std::optional<std::string> materialCaution(const std::string& material);

/// The cautions in two sentences, for the console, the window's help and a page's footer.
const std::string& safetyCautionShort();

/// `text` broken into lines of at most `width` characters (counting UTF-8 code points) at
/// spaces, for the console and file headers. A word longer than `width` stands on its own line.
std::vector<std::string> wrapWords(const std::string& text, std::size_t width);

} // namespace swarf
