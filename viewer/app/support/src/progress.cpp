// The progress bar (see progress.h).
#include "swarf/app/progress.h"

#include <cstdio>
#include <string>
#include <unistd.h>

namespace swarf::app {

ProgressBar::ProgressBar(std::string label)
    : label_(std::move(label)), enabled_(isatty(fileno(stderr)) != 0),
      start_(std::chrono::steady_clock::now()) {}

ProgressBar::~ProgressBar() {
    finish();
}

void ProgressBar::update(double fraction) {
    if (!enabled_)
        return;
    const double secs =
        std::chrono::duration<double>(std::chrono::steady_clock::now() - start_).count();
    if (secs < 0.4)
        return;
    const int width = 30, filled = static_cast<int>(fraction * width + 0.5);
    const int pct = static_cast<int>(fraction * 100 + 0.5);
    if (pct == lastPct_)
        return;
    lastPct_ = pct;
    std::fprintf(stderr, "\r  %s [%s%s] %3d%%", label_.c_str(), std::string(filled, '#').c_str(),
                 std::string(width - filled, ' ').c_str(), pct);
    std::fflush(stderr);
    drawn_ = true;
}

void ProgressBar::finish() {
    if (drawn_)
        std::fprintf(stderr, "\r%60s\r", "");
    drawn_ = false;
}

} // namespace swarf::app
