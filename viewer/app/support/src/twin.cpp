// A scene's twin (see twin.h).
#include "swarf/app/twin.h"

#include <filesystem>
#include <string_view>

namespace swarf::app {

namespace {

bool endsWith(std::string_view s, std::string_view tail) {
    return s.size() >= tail.size() && s.substr(s.size() - tail.size()) == tail;
}

} // namespace

std::string twinNameByRule(const std::string& scenePath) {
    namespace fs = std::filesystem;
    const fs::path p(scenePath);
    const std::string name = p.filename().string();
    std::string twin;
    for (const auto& [from, to] :
         {std::pair{kMistakeSuffix, kRightSuffix}, std::pair{kRightSuffix, kMistakeSuffix}}) {
        const std::string_view f(from);
        if (name.size() > f.size() && endsWith(name, f)) {
            twin = name.substr(0, name.size() - f.size()) + to;
            break;
        }
    }
    if (twin.empty())
        return "";
    return (p.parent_path() / twin).string();
}

std::optional<std::string> findTwin(const std::string& scenePath, const std::string& explicitTwin) {
    if (!explicitTwin.empty())
        return explicitTwin;
    const std::string byRule = twinNameByRule(scenePath);
    std::error_code ec;
    if (byRule.empty() || !std::filesystem::is_regular_file(byRule, ec))
        return std::nullopt;
    return byRule;
}

std::string twinRuleText() {
    return std::string("a scene's twin is given with --twin FILE, or found beside it by name: "
                       "<stem>") +
           kMistakeSuffix + " and <stem>" + kRightSuffix + " are each other's twins";
}

} // namespace swarf::app
