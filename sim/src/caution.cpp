// The safety cautions (see caution.h).
#include "swarf/sim/caution.h"

#include <cctype>
#include <sstream>

namespace swarf {

const std::vector<std::string>& safetyCautions() {
    static const std::vector<std::string> kCautions = {
        "Keep every guard in place and closed. Take the chuck key out of the chuck every time, "
        "before the spindle is started. Stop the spindle before you measure or reach in.",
        "No gloves, loose sleeves, ties, jewellery or long loose hair near rotating work. Wear eye "
        "protection. Clear swarf with a brush or hook, never by hand, and only with the spindle "
        "stopped.",
        "Before starting the spindle, turn the chuck by hand through a full turn with the tool at "
        "its nearest point: swarf checks the insert against the jaws, not the holder, the tool "
        "post or the swung compound.",
        "Keep the work's stick-out short (about three diameters or less in a chuck alone) or "
        "support it with the tailstock; check the work is held tight before starting.",
        "Take cutting speeds, feeds and depths of cut from the tooling supplier's data for this "
        "insert and material; the feeds here are the plan's inputs, not a recommendation.",
        "Defer to your shop's rules, local codes and licensed practice; swarf's figures do not "
        "replace training or supervision.",
        "The simulation behind these figures models the tool path and the insert's shape only. It "
        "does not model cutting forces, deflection of the work or the tool, chatter or tool wear. "
        "Check every reading on the machine and take a light trial cut before trusting any number "
        "here.",
    };
    return kCautions;
}

const std::vector<std::string>& boringCautions() {
    static const std::vector<std::string> kBoring = {
        "Boring: keep the bar's overhang as short as the bore allows (about four bar diameters "
        "for a steel bar) and check, before starting the spindle, that the bar and its holder "
        "clear the bore, the jaws and the chuck over the whole stroke.",
        "In a blind hole, swarf packs behind the bar and can break the insert or throw the "
        "bar: stop and clear it often, with the spindle stopped, using a hook or a brush.",
        "Never put fingers, a rag or a brush into the bore while the spindle turns; measure "
        "and clean the bore only with the spindle stopped.",
    };
    return kBoring;
}

std::optional<std::string> materialCaution(const std::string& material) {
    // Free-cutting leaded steels (11SMnPb30, 12L14), leaded brasses (CuZn39Pb3) and bronzes:
    // "Pb" in the designation, the word, or a common number for one (from memory: 1.0718 and
    // 1.0737 for 11SMnPb30/37, CW614N and CW603N the EN numbers of leaded brasses, C36000 and
    // CZ121 older ones). Common practice: lead on the hands and in the swarf.
    std::string lower;
    for (unsigned char c : material)
        lower += static_cast<char>(std::tolower(c));
    bool lead = material.find("Pb") != std::string::npos || lower.find("lead") != std::string::npos;
    for (const char* code : {"12l14", "1.0718", "1.0737", "cw614n", "cw603n", "c36000", "cz121"})
        lead = lead || lower.find(code) != std::string::npos;
    if (!lead)
        return std::nullopt;
    return "This material contains lead: do not eat, drink or smoke at the machine, wash your "
           "hands "
           "before you do, and keep its swarf apart for disposal as the shop's rules say.";
}

const std::string& safetyCautionShort() {
    static const std::string kShort =
        "CAUTION: a simulation of the tool path and the insert's shape only; it does not model "
        "cutting forces, deflection, chatter or tool wear. Check every reading on the machine and "
        "take a trial cut; keep guards closed, take the chuck key out, no gloves or loose clothing "
        "near rotating work, wear eye protection, stop the spindle before measuring, take speeds "
        "and feeds from the tooling "
        "supplier, and follow your shop's rules.";
    return kShort;
}

std::vector<std::string> wrapWords(const std::string& text, std::size_t width) {
    auto cols = [](const std::string& s) {
        std::size_t n = 0;
        for (unsigned char c : s)
            n += (c & 0xC0) != 0x80;
        return n;
    };
    std::vector<std::string> lines;
    std::istringstream words(text);
    std::string w, line;
    while (words >> w) {
        if (!line.empty() && cols(line) + 1 + cols(w) > width) {
            lines.push_back(line);
            line.clear();
        }
        line += (line.empty() ? "" : " ") + w;
    }
    if (!line.empty())
        lines.push_back(line);
    return lines;
}

} // namespace swarf
