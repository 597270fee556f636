// New, open, save, save as, recent, quit: each asks about unsaved changes first where it must,
// and reports problems in a dialog without touching the open document. These work on the whole
// editor (a new document resets the selection, tool and view), so they sit beside the frame.
#pragma once

#include <string>

#include "editor/app/editor_app.hpp"

namespace stripsmith {

void actionNew(EditorApp& app);
void actionOpen(EditorApp& app);
void actionOpenPath(EditorApp& app, const std::string& path);
void actionSave(EditorApp& app);
void actionSaveAs(EditorApp& app);
/// Window close or File > Quit: asks about unsaved changes, then sets app.quitNow.
void actionQuit(EditorApp& app);

/// Reads a board file into the document. On failure the document is left as it was and an
/// error dialog names the file, line and problem. A file from a newer format version opens
/// read-only with a notice.
bool loadBoardFile(EditorApp& app, const std::string& path);
/// Writes the document atomically (keeping `<path>.bak`); false with an error dialog on failure.
/// Unless `overwrite`, a save over the open file when it changed on disk since it was read here
/// is not made: it asks (Save As, Overwrite, Reload) and returns false.
bool saveBoardFile(EditorApp& app, const std::string& path, bool overwrite = false);

/// Writes the printable build sheet (PDF or SVG by the name's ending) on A4 or US Letter; false
/// with an error dialog on failure.
bool exportSheetTo(EditorApp& app, const std::string& path, bool letter);

/// Draws the chooser, the unsaved-changes prompt, error and notice dialogs, and the recovery offer.
void drawFileDialogs(EditorApp& app);

/// Writes the recovery file every autosave interval while there are unsaved changes.
void tickAutosave(EditorApp& app, double seconds);

/// Called on a clean exit: the recovery file is no longer needed.
void endSession(EditorApp& app);

}  // namespace stripsmith
