// The shared X connection (see x_connection.h).
#include "x_connection.h"

#include "swarf/sim/error.h"

#include <chrono>
#include <cstdlib>
#include <mutex>
#include <string>
#include <thread>

#include <dlfcn.h>

namespace swarf::viewer::detail {

void* sharedDisplayConnection() {
    static std::mutex mutex;
    std::lock_guard<std::mutex> lock(mutex);
    static void* connection = nullptr;
    if (connection)
        return connection;
    const char* display = std::getenv("DISPLAY");
    if (!display || !*display)
        throw RenderError("no X display to draw pictures on (DISPLAY is not set)");
    // Xlib is loaded at run time: VTK already has it in the process, and the viewer need not
    // link it itself.
    void* xlib = ::dlopen("libX11.so.6", RTLD_NOW | RTLD_GLOBAL);
    if (!xlib)
        throw RenderError("cannot load the X library (libX11.so.6) to draw pictures");
    using OpenFn = void* (*)(const char*);
    auto open = reinterpret_cast<OpenFn>(::dlsym(xlib, "XOpenDisplay"));
    if (!open)
        throw RenderError("the X library has no XOpenDisplay");
    for (int attempt = 0; attempt < 20 && !connection; ++attempt) {
        connection = open(nullptr);
        if (!connection)
            std::this_thread::sleep_for(std::chrono::milliseconds(250));
    }
    if (!connection)
        throw RenderError(std::string("cannot connect to the X display ") + display +
                          " to draw pictures");
    return connection;
}

} // namespace swarf::viewer::detail
