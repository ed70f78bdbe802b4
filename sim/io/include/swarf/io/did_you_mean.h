#pragma once
// "Did you mean ...?" suggestions for misspelt keys and names in scene files.
#include <string>
#include <string_view>
#include <vector>

namespace swarf::io {

/// Levenshtein edit distance between a and b (insertions, deletions, substitutions each 1),
/// compared case-insensitively.
int editDistance(std::string_view a, std::string_view b);

/// The candidate closest to `word` by edit distance, if it is close enough to be a likely
/// misspelling (distance at most a third of the longer word's length, and at least 2 allowed;
/// a candidate that contains the word or is contained in it also counts). Empty string if none,
/// and for a word longer than 64 characters.
std::string closestMatch(std::string_view word, const std::vector<std::string>& candidates);

/// The text to put after "expected ": "one of a, b, c; did you mean 'b'?" or, when nothing is
/// close, "one of a, b, c". Lists longer than 12 are cut short.
std::string suggestion(std::string_view word, const std::vector<std::string>& candidates);

} // namespace swarf::io
