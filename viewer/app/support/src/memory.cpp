// How much memory this run may use (see memory.h).
#include "swarf/app/memory.h"

#include <algorithm>
#include <cstdlib>
#include <fstream>
#include <sstream>
#include <string>

namespace swarf::app {

double availableMemoryBytes() {
    double bytes = 0;
    std::ifstream in("/proc/meminfo");
    std::string line;
    while (std::getline(in, line)) {
        std::istringstream ls(line);
        std::string key;
        double kb = 0;
        if (ls >> key >> kb && key == "MemAvailable:") {
            bytes = 0.9 * kb * 1024.0;
            break;
        }
    }
    if (!(bytes > 0))
        bytes = 4e9;
    if (const char* cap = std::getenv("SWARF_MEMORY_MB")) {
        const double mb = std::atof(cap);
        if (mb > 0)
            bytes = std::min(bytes, mb * 1e6);
    }
    return bytes;
}

} // namespace swarf::app
