// The root error type's messages.
#include "swarf/sim/error.h"

namespace swarf {

std::string SourceLoc::str() const {
    std::string s = file.empty() ? std::string("<input>") : file;
    if (line > 0) {
        s += ":" + std::to_string(line);
        if (column > 0)
            s += ":" + std::to_string(column);
    }
    return s;
}

namespace {
std::string composeInputMessage(const SourceLoc& where, const std::string& key,
                                const std::string& value, const std::string& expected) {
    std::string msg = where.str() + ": ";
    if (!key.empty())
        msg += key;
    if (!value.empty())
        msg += (key.empty() ? "" : " = ") + value;
    if (!key.empty() || !value.empty())
        msg += ": ";
    msg += expected;
    return msg;
}
} // namespace

InputError::InputError(SourceLoc where, std::string key, std::string value, std::string expected)
    : Error(composeInputMessage(where, key, value, expected), kExitBadInput),
      where_(std::move(where)), key_(std::move(key)), value_(std::move(value)),
      expected_(std::move(expected)) {}

} // namespace swarf
