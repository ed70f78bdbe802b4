#pragma once
// Small pieces shared by swarf's HTML documents (the report and the set-up sheets).
#include <string>
#include <string_view>

namespace swarf::io {

/// `text` with the characters HTML gives a meaning to (& < > ") written as entities, so it shows
/// as written inside an element or a double-quoted attribute.
std::string escapeHtml(std::string_view text);

} // namespace swarf::io
