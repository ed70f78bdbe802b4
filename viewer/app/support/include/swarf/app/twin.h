#pragma once
// A scene's twin: the same job done the other way (the mistake and its correction), shown beside
// it by `swarf view` (key w) and compared by `swarf run --compare`. The pairing rule is written
// once, here, and documented in scenes/README.md ("Twins").
#include <optional>
#include <string>

namespace swarf::app {

/// The suffixes of a pair's two file names: `<stem>-mistake.toml` and `<stem>-right.toml`.
inline constexpr const char* kMistakeSuffix = "-mistake.toml";
inline constexpr const char* kRightSuffix = "-right.toml";

/// The name the rule gives the twin of `scenePath`, whether or not that file exists: the same
/// folder, `-mistake.toml` swapped for `-right.toml` and the other way round. Empty when the
/// name follows neither pattern (or the stem before the suffix is empty).
std::string twinNameByRule(const std::string& scenePath);

/// The twin of `scenePath`: `explicitTwin` when it is not empty (the command line's --twin,
/// returned as given, even if it does not exist: the scene reader then says so); otherwise the
/// file twinNameByRule names, if it exists as a regular file; otherwise nothing.
std::optional<std::string> findTwin(const std::string& scenePath,
                                    const std::string& explicitTwin = "");

/// One line for a person on how a twin is found (the help texts and the window's panel).
std::string twinRuleText();

} // namespace swarf::app
