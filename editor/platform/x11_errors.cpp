#include "editor/platform/x11_errors.hpp"

#include <X11/Xlib.h>

#include <cstdio>

namespace stripsmith::platform {
namespace {

XErrorHandler previousHandler = nullptr;
bool reported = false;

int onXError(Display* display, XErrorEvent* event) {
    if (event->error_code == BadCursor) {
        if (!reported) std::fprintf(stderr, "stripsmith: this X server refused a mouse cursor shape; keeping the default cursor\n");
        reported = true;
        return 0;
    }
    return previousHandler ? previousHandler(display, event) : 0;
}

}  // namespace

void tolerateCursorErrors() {
    XErrorHandler old = XSetErrorHandler(onXError);
    if (old != onXError) previousHandler = old;
}

}  // namespace stripsmith::platform
