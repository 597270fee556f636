// Everything the editor holds between frames: the document, how it is viewed, the selection, the
// active tool, open dialogs. One instance, owned by main (or a test or benchmark). Panels, tools
// and the canvas are handed only the parts they use (see editor/frame.cpp).
#pragma once

#include <optional>
#include <string>

#include "editor/app/bench_voltages_worker.hpp"
#include "editor/app/circuit_panel_state.hpp"
#include "editor/app/clipboard.hpp"
#include "editor/app/commands.hpp"
#include "editor/app/dialogs.hpp"
#include "editor/app/document.hpp"
#include "editor/app/jfet_panel_state.hpp"
#include "editor/app/layout_dialog_state.hpp"
#include "editor/app/hover.hpp"
#include "editor/app/selection.hpp"
#include "editor/app/test_log.hpp"
#include "editor/app/tool_state.hpp"
#include "editor/app/view_state.hpp"
#include "editor/files/file_chooser.hpp"
#include "editor/files/disk_stamp.hpp"
#include "editor/files/recent_files.hpp"
#include "editor/files/recovery.hpp"

namespace stripsmith {

struct EditorApp {
    Document doc;
    ViewState view;
    Selected selection;
    ToolState tool;
    FileChooser chooser;
    Dialogs dialogs;
    RecentFiles recent;
    ClipboardContent clipboard;
    HoverState hover;
    /// The open file as last read or written, to notice a save made meanwhile by someone else.
    std::optional<DiskStamp> diskStamp;

    std::string status;  ///< last action's message, shown in the status bar
    TestLog log;         ///< lines for the end-to-end tests (off by default)

    std::string recoveryDir;   ///< empty: autosave off
    RecoverySlot recovery;     ///< this editor's own recovery copy, locked for its whole life
    std::string recoveryError; ///< why there is no slot, said once
    double autosaveSeconds = 60.0;
    double sinceAutosave = 0.0;
    unsigned autosavedRevision = 0;

    bool quitRequested = false;      ///< window close asked (checked for unsaved changes)
    bool quitNow = false;            ///< main loop should end
    std::string chosenForPanel;      ///< a circuit or sheet path picked in the chooser
    CircuitPanelState circuitPanel;  ///< the Circuit panel's typed text and choices
    BenchVoltagesWorker benchVoltages;       ///< computes off the frame (View > Bench voltages)
    std::optional<unsigned> benchRequested;  ///< the revision last asked for
    JfetPanelState jfetPanel;                ///< the JFET bias panel's figures
    LayoutDialogState layoutDialog;          ///< Board > Lay out ...: options, run, results

    /// The way to change the document: commands, reported in the status line.
    Commands commands() { return Commands(doc, status, log); }
    /// Performs a command (see Commands::perform).
    bool perform(std::unique_ptr<netcheck::edit::Command> command, int mergeKey = 0) {
        return commands().perform(std::move(command), mergeKey);
    }
    /// Message for the status bar.
    void say(std::string message) { commands().say(std::move(message)); }
};

}  // namespace stripsmith
