#pragma once
// Internal to the viewer: the one X connection every window of this process draws through.

namespace swarf::viewer::detail {

/// The X connection (an Xlib Display*, as void*) that every window of this process draws
/// through: opened once, retrying for a few seconds if the server is slow to answer, and kept
/// open until exit (one connection instead of one per picture). Precondition: DISPLAY names a
/// display (the executable makes one, see swarf/app/display.h). Throws swarf::RenderError if
/// DISPLAY is not set or the display cannot be opened.
void* sharedDisplayConnection();

} // namespace swarf::viewer::detail
