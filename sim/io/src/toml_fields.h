#pragma once
// Internal to swarf_io: typed, located access to one TOML table of a scene, with unknown-key
// checks and unit conversion. Every failure throws InputError naming file:line:column, the
// dotted key path, the value as written and what was expected.
#include "swarf/sim/error.h"
#include "swarf/sim/units.h"

#include <toml++/toml.h>

#include <initializer_list>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace swarf::io::detail {

/// What every table of one file shares: the file name (for messages) and the length unit.
struct ReadContext {
    std::string file;
    Units units = Units::Mm;
};

/// The largest length a scene may give, either way (10 m): more is a wrong unit or a slip, and
/// keeps every later product of lengths finite.
inline constexpr double kMaxLengthMm = 10000.0;

/// Location of a node (its first character), in `file`.
SourceLoc locOf(const toml::source_region& region, const std::string& file);
/// The value of a node as a person would write it: 2.5, "cone", [1, 2], a table. Long strings
/// and arrays are cut short ("…") with their size.
std::string valueText(const toml::node& n);
/// Parses an angle written as degrees, minutes, seconds ("2°51′51″", "2d51m51s", "2 51 51.1")
/// into degrees. Empty if the text is not such an angle.
std::optional<double> parseDmsDegrees(std::string_view text);

/// One TOML table of the scene, with its dotted path ("part.feature[2]").
class Fields {
  public:
    /// Checks at once that every key of `table` is in `allowed` (else InputError with a
    /// did-you-mean among `allowed`).
    Fields(const toml::table& table, std::string path, const ReadContext& ctx,
           const std::vector<std::string_view>& allowed);

    const toml::table& table() const { return table_; }
    const ReadContext& context() const { return ctx_; }
    /// "stock.diameter" for key "diameter" in table "stock".
    std::string keyPath(std::string_view key) const;
    /// Where the table starts.
    SourceLoc where() const;
    /// Where the key's value is; the table's start if the key is absent.
    SourceLoc where(std::string_view key) const;
    bool has(std::string_view key) const { return table_.get(key) != nullptr; }
    const toml::node* node(std::string_view key) const { return table_.get(key); }

    /// Throws InputError for the key's value: "expected" + what.
    [[noreturn]] void fail(std::string_view key, const std::string& expected) const;
    /// Throws InputError for a missing key.
    [[noreturn]] void missing(std::string_view key, const std::string& what) const;
    /// Throws if ok is false.
    void require(bool ok, std::string_view key, const std::string& expected) const {
        if (!ok)
            fail(key, expected);
    }

    /// A number (integer or float); wrong type throws. `what` describes it for messages.
    std::optional<double> number(std::string_view key, const std::string& what) const;
    double requiredNumber(std::string_view key, const std::string& what) const;
    /// A length in the scene's units, returned in mm; more than kMaxLengthMm either way throws.
    std::optional<double> length(std::string_view key, const std::string& what) const;
    double requiredLength(std::string_view key, const std::string& what) const;
    /// An angle in degrees (number, or a "d°m′s″" string), returned in radians.
    std::optional<double> angle(std::string_view key, const std::string& what) const;
    double requiredAngle(std::string_view key, const std::string& what) const;
    std::optional<long long> integer(std::string_view key, const std::string& what) const;
    std::optional<bool> boolean(std::string_view key) const;
    std::optional<std::string> string(std::string_view key, const std::string& what) const;
    /// One of the given words (case-sensitive); otherwise a did-you-mean.
    std::optional<std::string> choice(std::string_view key,
                                      const std::vector<std::string>& words) const;
    /// A sub-table; wrong type throws.
    const toml::table* subtable(std::string_view key) const;
    /// An array; wrong type throws.
    const toml::array* array(std::string_view key, const std::string& what) const;

    /// The unit word for messages: "mm" or "in".
    std::string unit() const { return unitName(ctx_.units); }

  private:
    const toml::table& table_;
    std::string path_;
    const ReadContext& ctx_;
};

} // namespace swarf::io::detail
