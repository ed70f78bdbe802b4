#pragma once
// VTK on Linux draws through an X display, even when rendering off screen. Where none exists
// (a server, CI), the viewer starts a virtual one (Xvfb) for itself.
namespace swarf::viewer {

/// Makes sure an X display is available for rendering. If DISPLAY is set, does nothing.
/// Otherwise starts `Xvfb :N -screen 0 1600x1200x24 -nolisten tcp` on a free display number N,
/// waits until it accepts connections, sets DISPLAY=:N for this process and stops the server
/// when the process exits. Safe to call many times (the server is started once).
/// Throws swarf::RenderError if Xvfb is not installed or does not start.
void ensureDisplay();

/// The X connection (an Xlib Display*, as void*) that every window of this process draws
/// through: opened once, after ensureDisplay(), retrying for a few seconds if the server is
/// slow to answer, and kept open until exit (one connection instead of one per picture).
/// Throws swarf::RenderError if the display cannot be opened.
void* sharedDisplayConnection();

/// True if ensureDisplay() started a virtual display in this process.
bool startedVirtualDisplay();

} // namespace swarf::viewer
