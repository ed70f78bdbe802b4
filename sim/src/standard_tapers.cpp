// Standard tapers by name (references R3): Morse, metric 1:20, 7:24 steep taper, NPT, Jarno,
// Brown & Sharpe and the ISO 1119 series of rates.
#include "swarf/sim/cone.h"
#include "swarf/sim/units.h"

#include <cctype>
#include <charconv>
#include <cstdio>

namespace swarf {

namespace {

struct MorseRow {
    int size;
    double ratioK; // 1:k on diameter
    double gaugeDiameterIn;
};

// Source: references R3 (ratios: GOST 25307-82; gauge diameters: Machinery's Handbook).
constexpr MorseRow kMorse[] = {
    {0, 19.212, 0.3561}, {1, 20.047, 0.475}, {2, 20.020, 0.700}, {3, 19.922, 0.938},
    {4, 19.254, 1.231},  {5, 19.002, 1.748}, {6, 19.180, 2.494},
};

// Metric 1:20 sizes (ISO 296); the size is the gauge diameter in mm. Rate: references R3;
// the list of sizes is from memory of ISO 296.
constexpr int kMetricSizes[] = {4, 6, 80, 100, 120, 160, 200};

struct SteepRow {
    int size;
    double gaugeDiameterMm;
};
// 7:24 steep taper (ISO 297): gauge (large end) diameters from memory.
constexpr SteepRow kSteep[] = {{30, 31.75}, {40, 44.45}, {45, 57.15},
                               {50, 69.85}, {55, 88.9},  {60, 107.95}};

// Jarno sizes 2 to 20: large end No./8 in, small end No./10 in, length No./2 in, so the rate is
// 1:20 on diameter, 0.600 in/ft (references R3). The size range is from memory.
constexpr int kJarnoFirst = 2, kJarnoLast = 20;

// Brown & Sharpe sizes 1 to 18 (size range from memory); about 0.500 in/ft (references R3).
constexpr int kBsFirst = 1, kBsLast = 18;

// ISO 1119 series of rates 1:k (1:3, 1:10 and 1:50 are references R3; the rest of the list is
// from memory of ISO 1119).
constexpr int kIso1119K[] = {3, 4, 5, 6, 8, 10, 12, 15, 20, 30, 50, 100, 200, 500};

// Lower case, drop spaces and separators, "brownandsharpe"/"brown&sharpe" → "b&s", "no" and
// "#" size markers dropped.
std::string normalise(std::string_view in) {
    std::string s;
    char prev = ' ';
    for (char ch : in) {
        const auto c = static_cast<unsigned char>(ch);
        // A dash joining a word to a size ("Morse-3") is a separator; one after a space or at
        // the start ("Morse -1") is a minus sign and kept, so the size is rejected.
        const bool joiningDash = ch == '-' && !std::isspace(static_cast<unsigned char>(prev));
        prev = ch;
        if (std::isspace(c) || joiningDash || ch == '_' || ch == '.' || ch == '#' || ch == '/')
            continue;
        s.push_back(static_cast<char>(std::tolower(c)));
    }
    auto replace = [&s](std::string_view from, std::string_view to) {
        for (std::size_t p = s.find(from); p != std::string::npos; p = s.find(from, p + to.size()))
            s.replace(p, from.size(), to);
    };
    replace("brownandsharpe", "b&s");
    replace("brown&sharpe", "b&s");
    replace("bands", "b&s");
    return s;
}

// If s starts with one of the prefixes followed by an optional "no"/"size" and a whole number
// (and nothing else), returns that number.
std::optional<int> sizeAfter(const std::string& s,
                             std::initializer_list<std::string_view> prefixes) {
    for (std::string_view p : prefixes) {
        if (s.rfind(p, 0) != 0)
            continue;
        std::string_view rest = std::string_view(s).substr(p.size());
        for (std::string_view marker : {"size", "no"})
            if (rest.rfind(marker, 0) == 0)
                rest.remove_prefix(marker.size());
        if (rest.empty())
            continue;
        int n = 0;
        auto [end, ec] = std::from_chars(rest.data(), rest.data() + rest.size(), n);
        if (ec == std::errc() && end == rest.data() + rest.size())
            return n;
    }
    return std::nullopt;
}

std::string fmtNote(const char* f, double a) {
    char buf[256];
    std::snprintf(buf, sizeof buf, f, a);
    return buf;
}

std::optional<StandardTaper> morse(int size) {
    for (const auto& r : kMorse) {
        if (r.size != size)
            continue;
        return StandardTaper{
            "Morse " + std::to_string(size), 1.0 / r.ratioK, r.gaugeDiameterIn * kMmPerInch,
            "Morse: ratio 1:" + fmtNote("%.3f", r.ratioK) + " (GOST 25307-82), gauge diameter " +
                fmtNote("%.4g in", r.gaugeDiameterIn) + " (Machinery's Handbook)"};
    }
    return std::nullopt;
}

std::optional<StandardTaper> metric(int size) {
    for (int m : kMetricSizes)
        if (m == size)
            return StandardTaper{"Metric " + std::to_string(size), 1.0 / 20.0,
                                 static_cast<double>(size),
                                 "metric taper 1:20 (ISO 296), gauge diameter = size in mm"};
    return std::nullopt;
}

std::optional<StandardTaper> steep(std::optional<int> size) {
    const std::string note = "7:24 steep taper (ISO 297): rate 7/24 on diameter";
    if (!size)
        return StandardTaper{"7:24", 7.0 / 24.0, std::nullopt, note};
    for (const auto& r : kSteep)
        if (r.size == *size)
            return StandardTaper{
                "7:24 size " + std::to_string(r.size), 7.0 / 24.0, r.gaugeDiameterMm,
                note + ", gauge diameter " + fmtNote("%.2f mm", r.gaugeDiameterMm) +
                    " (from memory: check against the standard)"};
    return std::nullopt;
}

std::optional<StandardTaper> jarno(int size) {
    if (size < kJarnoFirst || size > kJarnoLast)
        return std::nullopt;
    return StandardTaper{"Jarno " + std::to_string(size), 0.600 / 12.0, size / 8.0 * kMmPerInch,
                         "Jarno: 0.600 in/ft, large end No./8 in, length No./2 in"};
}

std::optional<StandardTaper> brownSharpe(std::optional<int> size) {
    const std::string note =
        "Brown & Sharpe: about 0.500 in/ft (US Navy machinery repairman manual); per-size "
        "diameters are not built in: give the gauge diameter";
    if (!size)
        return StandardTaper{"B&S", 0.500 / 12.0, std::nullopt, note};
    if (*size < kBsFirst || *size > kBsLast)
        return std::nullopt;
    return StandardTaper{"B&S " + std::to_string(*size), 0.500 / 12.0, std::nullopt, note};
}

std::optional<StandardTaper> iso1119(int k) {
    for (int r : kIso1119K)
        if (r == k)
            return StandardTaper{"1:" + std::to_string(k), 1.0 / k, std::nullopt,
                                 "ISO 1119 series of conical tapers, rate 1:" + std::to_string(k)};
    return std::nullopt;
}

} // namespace

std::optional<StandardTaper> lookupStandardTaper(std::string_view name) {
    const std::string s = normalise(name);
    if (s.empty())
        return std::nullopt;

    if (auto n = sizeAfter(s, {"morsetaper", "morse", "mt", "mk"}))
        return morse(*n);
    if (auto n = sizeAfter(s, {"metrictaper", "metric", "me"}))
        return metric(*n);
    if (s == "7:24" || s == "steep" || s == "steeptaper" || s == "724")
        return steep(std::nullopt);
    if (auto n = sizeAfter(
            s, {"7:24steeptaper", "7:24size", "7:24", "steeptaper", "steep", "sk", "iso"}))
        return steep(*n);
    if (s == "npt") {
        return StandardTaper{"NPT", 1.0 / 16.0, std::nullopt,
                             "NPT pipe thread taper (ASME B1.20.1): 1:16 on diameter"};
    }
    if (auto n = sizeAfter(s, {"jarnotaper", "jarno"}))
        return jarno(*n);
    if (s == "b&s")
        return brownSharpe(std::nullopt);
    if (auto n = sizeAfter(s, {"b&staper", "b&s", "bs"}))
        return brownSharpe(*n);
    if (s.rfind("1:", 0) == 0) {
        int k = 0;
        const char* first = s.data() + 2;
        const char* last = s.data() + s.size();
        auto [end, ec] = std::from_chars(first, last, k);
        if (ec == std::errc() && end == last)
            return iso1119(k);
    }
    return std::nullopt;
}

std::vector<std::string> standardTaperNames() {
    std::vector<std::string> names;
    for (const auto& r : kMorse)
        names.push_back("Morse " + std::to_string(r.size));
    for (int m : kMetricSizes)
        names.push_back("Metric " + std::to_string(m));
    names.push_back("7:24");
    for (const auto& r : kSteep)
        names.push_back("7:24 size " + std::to_string(r.size));
    names.push_back("NPT");
    for (int n = kJarnoFirst; n <= kJarnoLast; ++n)
        names.push_back("Jarno " + std::to_string(n));
    names.push_back("B&S");
    for (int n = kBsFirst; n <= kBsLast; ++n)
        names.push_back("B&S " + std::to_string(n));
    for (int k : kIso1119K)
        names.push_back("1:" + std::to_string(k));
    return names;
}

} // namespace swarf
