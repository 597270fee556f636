// X11 errors that must not end the session.
#pragma once

namespace stripsmith::platform {

/// Installs an X error handler that reports a failed cursor change (some X servers, e.g. Xvfb
/// without cursor fonts, refuse SFML's system cursors) once on stderr instead of exiting, and
/// passes every other error to Xlib's default handler.
void tolerateCursorErrors();

}  // namespace stripsmith::platform
