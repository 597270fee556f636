// Modal dialogs waiting to be shown: errors, notices, "save changes?", the crash recovery offer.
#pragma once

#include <optional>
#include <string>

#include "editor/files/recovery.hpp"

namespace stripsmith {

/// The build sheet export after its file was chosen: first the paper, then where it went.
struct SheetExport {
    enum class Stage { Closed, ChoosePaper, Written };
    Stage stage = Stage::Closed;
    std::string path;     ///< the file chosen, then written
    bool letter = false;  ///< US Letter rather than A4; kept for the next export
};

/// What to do once the maker has answered "save changes?".
enum class PendingAction { None, New, Open, OpenPath, Quit };

struct Dialogs {
    std::string errorTitle;  ///< non-empty: show an error message
    std::string errorText;
    PendingAction pending = PendingAction::None;  ///< non-None: ask about unsaved changes
    std::string pendingPath;
    bool askUnsaved = false;
    std::optional<LeftCopy> recovery;  ///< offer to restore after a crash
    bool diskChanged = false;          ///< ask before saving over a file changed on disk
    std::string notice;                    ///< informational message (read-only file ...)
    SheetExport sheet;                     ///< the build sheet's paper choice and result
};

}  // namespace stripsmith
