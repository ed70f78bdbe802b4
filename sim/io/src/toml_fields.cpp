// Typed, located access to the tables of a scene file.
#include "toml_fields.h"

#include "swarf/io/did_you_mean.h"

#include <cctype>
#include <cmath>
#include <cstdio>

namespace swarf::io::detail {

SourceLoc locOf(const toml::source_region& region, const std::string& file) {
    return SourceLoc{file, static_cast<int>(region.begin.line),
                     static_cast<int>(region.begin.column)};
}

namespace {

// Long keys and strings are cut short in messages: the start, then how long they are.
constexpr std::size_t kShownChars = 60;

std::string shortened(const std::string& text) {
    if (text.size() <= kShownChars)
        return text;
    std::size_t cut = kShownChars;
    while (cut > 0 && (static_cast<unsigned char>(text[cut]) & 0xC0) == 0x80)
        --cut; // not inside a UTF-8 sequence
    return text.substr(0, cut) + "… (" + std::to_string(text.size()) + " bytes)";
}

} // namespace

std::string valueText(const toml::node& n) {
    if (auto s = n.as_string())
        return "\"" + shortened(s->get()) + "\"";
    if (auto i = n.as_integer())
        return std::to_string(i->get());
    if (auto f = n.as_floating_point()) {
        char buf[64];
        std::snprintf(buf, sizeof buf, "%.15g", f->get());
        std::string t = buf;
        if (t.find_first_of(".eEn") == std::string::npos)
            t += ".0";
        return t;
    }
    if (auto b = n.as_boolean())
        return b->get() ? "true" : "false";
    if (auto a = n.as_array()) {
        std::string t = "[";
        for (std::size_t i = 0; i < a->size(); ++i) {
            if (i)
                t += ", ";
            if (t.size() > kShownChars) {
                t += "… (" + std::to_string(a->size()) + " items)";
                break;
            }
            t += valueText(*a->get(i));
        }
        return t + "]";
    }
    if (n.is_table())
        return "(a table)";
    return "(a date or time)";
}

std::optional<double> parseDmsDegrees(std::string_view text) {
    // Numbers separated by unit marks or spaces: degrees, then minutes, then seconds.
    double parts[3] = {0, 0, 0};
    int count = 0;
    std::size_t i = 0;
    bool negative = false;
    while (i < text.size() && text[i] == ' ')
        ++i;
    if (i < text.size() && text[i] == '-') {
        negative = true;
        ++i;
    }
    while (i < text.size()) {
        const unsigned char c = static_cast<unsigned char>(text[i]);
        if (std::isdigit(c) || c == '.') {
            if (count == 3)
                return std::nullopt;
            std::size_t j = i;
            while (j < text.size() &&
                   (std::isdigit(static_cast<unsigned char>(text[j])) || text[j] == '.'))
                ++j;
            try {
                parts[count++] = std::stod(std::string(text.substr(i, j - i)));
            } catch (...) {
                return std::nullopt;
            }
            i = j;
        } else if (c == ' ' || c == 'd' || c == 'm' || c == 's' || c == '\'' || c == '"') {
            ++i;
        } else if (c >= 0x80) {
            // UTF-8 marks: ° (C2 B0), ′ (E2 80 B2), ″ (E2 80 B3).
            if (text.substr(i, 2) == "\xC2\xB0")
                i += 2;
            else if (text.substr(i, 3) == "\xE2\x80\xB2" || text.substr(i, 3) == "\xE2\x80\xB3")
                i += 3;
            else
                return std::nullopt;
        } else {
            return std::nullopt;
        }
    }
    if (count == 0 || parts[1] >= 60 || parts[2] >= 60)
        return std::nullopt;
    const double deg = parts[0] + parts[1] / 60.0 + parts[2] / 3600.0;
    return negative ? -deg : deg;
}

Fields::Fields(const toml::table& table, std::string path, const ReadContext& ctx,
               const std::vector<std::string_view>& allowed)
    : table_(table), path_(std::move(path)), ctx_(ctx) {
    std::vector<std::string> names(allowed.begin(), allowed.end());
    for (auto&& [k, v] : table_) {
        bool known = false;
        for (const auto& a : names)
            known = known || a == k.str();
        if (known)
            continue;
        const std::string here = path_.empty() ? "at the top level" : "in [" + path_ + "]";
        throw InputError(locOf(k.source(), ctx_.file), keyPath(shortened(std::string(k.str()))), "",
                         "unknown key " + here + ": expected " + suggestion(k.str(), names));
    }
}

std::string Fields::keyPath(std::string_view key) const {
    return path_.empty() ? std::string(key) : path_ + "." + std::string(key);
}

SourceLoc Fields::where() const {
    SourceLoc loc = locOf(table_.source(), ctx_.file);
    if (loc.line == 0)
        loc.line = loc.column = 1; // the root table and implicit tables
    return loc;
}

SourceLoc Fields::where(std::string_view key) const {
    if (const toml::node* n = table_.get(key)) {
        SourceLoc loc = locOf(n->source(), ctx_.file);
        if (loc.line > 0)
            return loc;
    }
    return where();
}

void Fields::fail(std::string_view key, const std::string& expected) const {
    const toml::node* n = table_.get(key);
    throw InputError(where(key), keyPath(key), n ? valueText(*n) : "", expected);
}

void Fields::missing(std::string_view key, const std::string& what) const {
    const std::string here = path_.empty() ? "at the top level" : "in [" + path_ + "]";
    throw InputError(where(), keyPath(key), "", "missing " + here + ": expected " + what);
}

std::optional<double> Fields::number(std::string_view key, const std::string& what) const {
    const toml::node* n = table_.get(key);
    if (!n)
        return std::nullopt;
    if (auto i = n->as_integer())
        return static_cast<double>(i->get());
    if (auto f = n->as_floating_point()) {
        require(std::isfinite(f->get()), key, "expected a finite number: " + what);
        return f->get();
    }
    fail(key, "expected a number: " + what);
}

double Fields::requiredNumber(std::string_view key, const std::string& what) const {
    if (auto v = number(key, what))
        return *v;
    missing(key, what);
}

std::optional<double> Fields::length(std::string_view key, const std::string& what) const {
    auto v = number(key, what + ", in " + unit());
    if (!v)
        return std::nullopt;
    const double mm = toMm(*v, ctx_.units);
    if (std::fabs(mm) > kMaxLengthMm) {
        char limit[64];
        std::snprintf(limit, sizeof limit, "%.6g %s", fromMm(kMaxLengthMm, ctx_.units),
                      unit().c_str());
        fail(key, "expected a length of at most " + std::string(limit) + " (10 m) either way (" +
                      what + "): is the unit right?");
    }
    return mm;
}

double Fields::requiredLength(std::string_view key, const std::string& what) const {
    if (auto v = length(key, what))
        return *v;
    missing(key, what + ", a length in " + unit());
}

std::optional<double> Fields::angle(std::string_view key, const std::string& what) const {
    const toml::node* n = table_.get(key);
    if (!n)
        return std::nullopt;
    if (auto s = n->as_string()) {
        if (auto deg = parseDmsDegrees(s->get()))
            return degToRad(*deg);
        fail(key, "expected an angle in degrees (a number, or \"2°51′51″\"): " + what);
    }
    if (auto v = number(key, what + ", in degrees"))
        return degToRad(*v);
    return std::nullopt;
}

double Fields::requiredAngle(std::string_view key, const std::string& what) const {
    if (auto v = angle(key, what))
        return *v;
    missing(key, what + ", in degrees");
}

std::optional<long long> Fields::integer(std::string_view key, const std::string& what) const {
    const toml::node* n = table_.get(key);
    if (!n)
        return std::nullopt;
    if (auto i = n->as_integer())
        return i->get();
    fail(key, "expected a whole number: " + what);
}

std::optional<bool> Fields::boolean(std::string_view key) const {
    const toml::node* n = table_.get(key);
    if (!n)
        return std::nullopt;
    if (auto b = n->as_boolean())
        return b->get();
    fail(key, "expected true or false");
}

std::optional<std::string> Fields::string(std::string_view key, const std::string& what) const {
    const toml::node* n = table_.get(key);
    if (!n)
        return std::nullopt;
    if (auto s = n->as_string())
        return s->get();
    fail(key, "expected a string in quotes: " + what);
}

std::optional<std::string> Fields::choice(std::string_view key,
                                          const std::vector<std::string>& words) const {
    std::string list;
    for (const auto& w : words)
        list += (list.empty() ? "\"" : ", \"") + w + "\"";
    auto s = string(key, "one of " + list);
    if (!s)
        return std::nullopt;
    for (const auto& w : words)
        if (*s == w)
            return s;
    fail(key, "expected " + suggestion(*s, words));
}

const toml::table* Fields::subtable(std::string_view key) const {
    const toml::node* n = table_.get(key);
    if (!n)
        return nullptr;
    if (auto t = n->as_table())
        return t;
    fail(key, "expected a table ([" + keyPath(key) + "])");
}

const toml::array* Fields::array(std::string_view key, const std::string& what) const {
    const toml::node* n = table_.get(key);
    if (!n)
        return nullptr;
    if (auto a = n->as_array())
        return a;
    fail(key, "expected an array: " + what);
}

} // namespace swarf::io::detail
