// Reading angles and ratios as people write them.
#include "swarf/sim/angle_text.h"

#include "swarf/sim/units.h"

#include <cctype>
#include <cmath>
#include <cstdlib>
#include <string>
#include <vector>

namespace swarf {

namespace {

std::string_view trim(std::string_view s) {
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.front())))
        s.remove_prefix(1);
    while (!s.empty() && std::isspace(static_cast<unsigned char>(s.back())))
        s.remove_suffix(1);
    return s;
}

// Replaces each occurrence of `from` by a single `to` character.
void replaceAll(std::string& s, std::string_view from, char to) {
    for (std::size_t p = s.find(from); p != std::string::npos; p = s.find(from, p + 1))
        s.replace(p, from.size(), 1, to);
}

} // namespace

std::optional<double> parseNumberText(std::string_view text) {
    const std::string s(trim(text));
    if (s.empty())
        return std::nullopt;
    // Only digits, one point, an exponent and signs: strtod alone would also take "inf", "0x1p3".
    for (char c : s)
        if (!(std::isdigit(static_cast<unsigned char>(c)) || c == '.' || c == '-' || c == '+' ||
              c == 'e' || c == 'E'))
            return std::nullopt;
    char* end = nullptr;
    const double v = std::strtod(s.c_str(), &end);
    if (end != s.c_str() + s.size() || !std::isfinite(v))
        return std::nullopt;
    return v;
}

std::optional<double> parseAngleText(std::string_view text) {
    std::string s(trim(text));
    if (s.empty())
        return std::nullopt;
    bool negative = false;
    if (s.front() == '-') {
        negative = true;
        s.erase(0, 1);
    }
    // Unit marks become separators: D (degrees), M (minutes), S (seconds), or a blank.
    for (std::string_view deg : {"°", "º", "deg"})
        replaceAll(s, deg, 'D');
    // Seconds first: "''" is a seconds mark, "'" alone a minutes mark.
    for (std::string_view sec : {"″", "”", "\"", "''"})
        replaceAll(s, sec, 'S');
    for (std::string_view min : {"′", "’", "'"})
        replaceAll(s, min, 'M');
    // The ASCII forms after the marks above: "8d17m49s".
    for (char& c : s) {
        if (c == 'd')
            c = 'D';
        else if (c == 'm')
            c = 'M';
        else if (c == 's')
            c = 'S';
        else if (c == ':')
            c = ' ';
    }
    // Split into numbers, each with the mark that follows it (or none).
    struct Part {
        double value;
        char mark;
        bool hasPoint;
    };
    std::vector<Part> parts;
    std::size_t i = 0;
    while (i < s.size()) {
        if (std::isspace(static_cast<unsigned char>(s[i]))) {
            ++i;
            continue;
        }
        std::size_t j = i;
        while (j < s.size() && (std::isdigit(static_cast<unsigned char>(s[j])) || s[j] == '.'))
            ++j;
        if (j == i)
            return std::nullopt; // a mark with no number, or a stray character
        const std::string num = s.substr(i, j - i);
        auto v = parseNumberText(num);
        if (!v)
            return std::nullopt;
        char mark = 0;
        std::size_t k = j;
        while (k < s.size() && std::isspace(static_cast<unsigned char>(s[k])))
            ++k;
        if (k < s.size() && (s[k] == 'D' || s[k] == 'M' || s[k] == 'S')) {
            mark = s[k];
            j = k + 1;
        }
        parts.push_back({*v, mark, num.find('.') != std::string::npos});
        i = j;
    }
    if (parts.empty() || parts.size() > 3)
        return std::nullopt;
    // Assign degrees, minutes, seconds: by their marks, or by position when unmarked.
    double dms[3] = {0, 0, 0};
    bool seen[3] = {false, false, false};
    int next = 0;
    for (std::size_t p = 0; p < parts.size(); ++p) {
        int slot = parts[p].mark == 'D'   ? 0
                   : parts[p].mark == 'M' ? 1
                   : parts[p].mark == 'S' ? 2
                                          : next;
        if (slot < next || slot > 2 || seen[slot])
            return std::nullopt;
        if (parts[p].hasPoint && p + 1 != parts.size())
            return std::nullopt;
        dms[slot] = parts[p].value;
        seen[slot] = true;
        next = slot + 1;
    }
    if ((seen[1] && dms[1] >= 60) || (seen[2] && dms[2] >= 60))
        return std::nullopt;
    const double deg = dms[0] + dms[1] / 60.0 + dms[2] / 3600.0;
    return degToRad(negative ? -deg : deg);
}

std::optional<double> parseRatioText(std::string_view text) {
    std::string_view s = trim(text);
    for (std::string_view lead : {"1:", "1/"}) {
        if (s.substr(0, lead.size()) == lead) {
            s.remove_prefix(lead.size());
            break;
        }
    }
    auto k = parseNumberText(s);
    if (!k || !(*k > 0))
        return std::nullopt;
    return k;
}

} // namespace swarf
