// Everything the editor holds between frames: the document, how it is viewed, the selection, the
// active tool, open dialogs. One instance, owned by main (or a test or benchmark).
#pragma once

#include <map>
#include <optional>
#include <string>
#include <vector>

#include "editor/app/document.hpp"
#include "editor/app/view_state.hpp"
#include "editor/canvas/layers.hpp"
#include "editor/files/file_chooser.hpp"
#include "editor/files/recent_files.hpp"
#include "editor/files/recovery.hpp"
#include "editor/panels/circuit_panel_state.hpp"
#include "editor/tools/tool_state.hpp"

namespace stripsmith {

/// What to do once the maker has answered "save changes?".
enum class PendingAction { None, New, Open, OpenPath, Quit };

/// Modal dialogs waiting to be shown.
struct Dialogs {
    std::string errorTitle;             ///< non-empty: show an error message
    std::string errorText;
    PendingAction pending = PendingAction::None;  ///< non-None: ask about unsaved changes
    std::string pendingPath;
    bool askUnsaved = false;
    std::optional<RecoveryFile> recovery;         ///< offer to restore after a crash
    std::string notice;                           ///< informational message (read-only file ...)
};

/// Elements copied with Ctrl+C, positions relative to their top-left hole.
struct ClipboardContent {
    std::vector<netcheck::Part> parts;
    std::vector<netcheck::Link> links;
    std::vector<netcheck::Cut> cuts;
    bool empty() const { return parts.empty() && links.empty() && cuts.empty(); }
};

struct EditorApp {
    Document doc;
    ViewState view;
    Selected selection;
    ToolState tool;
    FileChooser chooser;
    Dialogs dialogs;
    RecentFiles recent;
    ClipboardContent clipboard;

    std::string status;                   ///< last action's message, shown in the status bar
    std::optional<netcheck::Hole> hoverHole;
    int hoverIsland = -1;
    std::optional<std::size_t> hoverPart;
    std::optional<netcheck::PinRef> hoverLug;
    bool spaceHeld = false;

    std::string recoveryDir;              ///< empty: autosave off
    double autosaveSeconds = 60.0;
    double sinceAutosave = 0.0;
    unsigned autosavedRevision = 0;

    bool quitRequested = false;           ///< window close asked (checked for unsaved changes)
    bool quitNow = false;                 ///< main loop should end
    bool logHoles = false;                ///< STRIPSMITH_E2E_LOG: print hole screen positions
    std::string lastLoggedView;
    std::map<std::string, std::string> loggedItems;
    unsigned long loggedFrames = 0;
    std::string chosenForPanel;           ///< a circuit or sheet path picked in the chooser
    CircuitPanelState circuitPanel;       ///< the Circuit panel's typed text and choices

    /// Performs a command, clears the selection if asked, and reports errors in the status line.
    bool perform(std::unique_ptr<netcheck::edit::Command> command, int mergeKey = 0);
    /// With STRIPSMITH_E2E_LOG set: prints the last ImGui item's centre as "STRIPSMITH_E2E item
    /// NAME X Y" when it moves, so scripted tests know where to click (they still click).
    void logItem(const std::string& name);
    /// With STRIPSMITH_E2E_LOG set: prints "STRIPSMITH_E2E frame N revision R keys K buttons B
    /// mouse X Y" at the end of every frame: frames done, the document's revision, how many key
    /// presses (modifiers aside) and mouse-button presses and releases the editor has taken in so
    /// far, and where it last saw the mouse ("- -": outside the window). Scripted tests wait for
    /// what they sent to be taken before they look for its effect (or send it again).
    void logFrame(unsigned long keysTaken, unsigned long buttonsTaken);
    /// Message for the status bar.
    void say(std::string message);
};

/// Merge keys: commands of one gesture share a key so the gesture is one undo step.
inline constexpr int kMergeMove = 1;
inline constexpr int kMergeStretch = 2;
inline constexpr int kMergeArrowMove = 3;

}  // namespace stripsmith
