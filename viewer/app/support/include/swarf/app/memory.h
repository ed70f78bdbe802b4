#pragma once
// How much memory this run may use: what the machine has free, read from the operating system.
// Process handling, so it lives with the executable (the kernel takes the figure as a value).
namespace swarf::app {

/// Bytes of memory this process may count on: MemAvailable of /proc/meminfo (memory free or
/// freeable without swapping), less a tenth for everything else. The environment variable
/// SWARF_MEMORY_MB, if set to a positive number, caps it (to try a scene as a smaller machine
/// would run it). Where neither is known, 4 GB.
double availableMemoryBytes();

} // namespace swarf::app
