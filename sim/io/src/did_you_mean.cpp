// Edit-distance suggestions for misspelt keys and names.
#include "swarf/io/did_you_mean.h"

#include <algorithm>
#include <cctype>

namespace swarf::io {

namespace {
char lower(char c) {
    return static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
}

std::string lowerCopy(std::string_view s) {
    std::string out(s);
    for (char& c : out)
        c = lower(c);
    return out;
}
} // namespace

int editDistance(std::string_view a, std::string_view b) {
    // One row of the dynamic-programming table at a time.
    std::vector<int> prev(b.size() + 1), cur(b.size() + 1);
    for (std::size_t j = 0; j <= b.size(); ++j)
        prev[j] = static_cast<int>(j);
    for (std::size_t i = 1; i <= a.size(); ++i) {
        cur[0] = static_cast<int>(i);
        for (std::size_t j = 1; j <= b.size(); ++j) {
            const int subst = prev[j - 1] + (lower(a[i - 1]) == lower(b[j - 1]) ? 0 : 1);
            cur[j] = std::min({prev[j] + 1, cur[j - 1] + 1, subst});
        }
        std::swap(prev, cur);
    }
    return prev[b.size()];
}

std::string closestMatch(std::string_view word, const std::vector<std::string>& candidates) {
    // Nothing is close to a word far longer than every candidate; skip the quadratic work.
    constexpr std::size_t kLongestWord = 64;
    if (word.size() > kLongestWord)
        return {};
    const std::string w = lowerCopy(word);
    std::string best;
    int bestDistance = 1 << 30;
    for (const std::string& c : candidates) {
        const int d = editDistance(w, c);
        if (d < bestDistance) {
            bestDistance = d;
            best = c;
        }
    }
    if (best.empty())
        return {};
    const std::size_t longer = std::max(w.size(), best.size());
    const int allowed = std::max<int>(2, static_cast<int>(longer / 3));
    if (bestDistance <= allowed)
        return best;
    // "diam" for "diameter", "nose" for "nose_radius": a part of the word counts too.
    if (w.size() >= 3) {
        for (const std::string& c : candidates) {
            const std::string lc = lowerCopy(c);
            if (lc.find(w) != std::string::npos || w.find(lc) != std::string::npos)
                return c;
        }
    }
    return {};
}

std::string suggestion(std::string_view word, const std::vector<std::string>& candidates) {
    // Long lists (standard taper names) are cut short; the closest match is still offered.
    constexpr std::size_t kShown = 12;
    std::string list;
    for (std::size_t i = 0; i < candidates.size() && i < kShown; ++i) {
        if (i)
            list += ", ";
        list += candidates[i];
    }
    if (candidates.size() > kShown)
        list += ", ... (" + std::to_string(candidates.size()) + " in all)";
    const std::string best = closestMatch(word, candidates);
    if (best.empty())
        return "one of " + list;
    return "one of " + list + "; did you mean '" + best + "'?";
}

} // namespace swarf::io
