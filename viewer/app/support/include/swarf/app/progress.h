#pragma once
// A progress bar on stderr for long runs, drawn only when stderr is a terminal and the work has
// taken more than a moment; erased when done.
#include <chrono>
#include <string>

namespace swarf::app {

/// One bar. Not thread-safe: call update() from one thread.
class ProgressBar {
  public:
    /// `label` is printed before the bar ("simulating").
    explicit ProgressBar(std::string label = "simulating");
    ~ProgressBar();
    ProgressBar(const ProgressBar&) = delete;
    ProgressBar& operator=(const ProgressBar&) = delete;

    /// Shows `fraction` (0..1) done. Draws nothing in the first 0.4 s, nor when nothing changed.
    void update(double fraction);
    /// Erases the bar (also done by the destructor).
    void finish();

  private:
    std::string label_;
    bool enabled_;
    bool drawn_ = false;
    int lastPct_ = -1;
    std::chrono::steady_clock::time_point start_;
};

} // namespace swarf::app
