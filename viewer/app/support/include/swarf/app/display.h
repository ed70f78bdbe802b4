#pragma once
// VTK on Linux draws through an X display, even when rendering off screen. Where none exists
// (a server, CI), the executable starts a virtual one (Xvfb) for itself before it draws. This is
// process handling (environment, a child process, its end), so it lives with the executable,
// not in the pictures library.
namespace swarf::app {

/// Makes sure an X display is available for rendering. If DISPLAY is set, does nothing.
/// Otherwise starts `Xvfb :N -screen 0 1600x1200x24 -nolisten tcp` on a free display number N,
/// waits until it accepts connections, sets DISPLAY=:N for this process and stops the server
/// when the process exits (the server also dies with the process however it ends). Safe to call
/// many times (the server is started once).
/// Throws swarf::RenderError if Xvfb is not installed or does not start.
void ensureDisplay();

/// True if ensureDisplay() started a virtual display in this process.
bool startedVirtualDisplay();

} // namespace swarf::app
