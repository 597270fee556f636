// Every panel of the editor, in one place. Each reads the document and its own state and emits
// commands; none changes the board directly, and none is handed the whole editor: each takes
// exactly the parts it uses.
#pragma once

#include <optional>
#include <string>

#include <imgui.h>

#include "editor/app/circuit_panel_state.hpp"
#include "editor/app/jfet_panel_state.hpp"
#include "editor/app/layout_dialog_state.hpp"
#include "editor/app/commands.hpp"
#include "editor/app/dialogs.hpp"
#include "editor/app/document.hpp"
#include "editor/app/hover.hpp"
#include "editor/app/test_log.hpp"
#include "editor/app/tool_state.hpp"
#include "editor/app/view_state.hpp"
#include "editor/files/file_chooser.hpp"
#include "netcheck/voltage/bench_voltages.hpp"
#include "editor/files/recent_files.hpp"
#include "editor/tools/edit_actions.hpp"
#include "editor/tools/tools.hpp"

namespace stripsmith {

/// Screen rectangles of the fixed panel layout for one frame.
struct PanelLayout {
    ImVec2 display;
    float menuHeight = 0;
    float statusHeight = 0;
    float leftWidth = 0;
    float rightWidth = 0;
    ImVec2 canvasPos;
    ImVec2 canvasSize;
};

PanelLayout computeLayout(ImVec2 display, float menuHeight, float uiScale);

/// A File menu item picked this frame. File actions work on the whole editor (they replace the
/// document and reset the view), so the frame carries them out.
struct FileRequest {
    enum class Kind { None, New, Open, OpenRecent, Save, SaveAs, Quit };
    Kind kind = Kind::None;
    std::string path;  ///< for OpenRecent
};

/// What the menus read and change.
struct MenuContext {
    const Document& doc;
    const RecentFiles& recent;
    FileChooser& chooser;
    ViewState& view;
    EditContext edit;
    std::optional<netcheck::Hole> pasteAt;  ///< the hole under the mouse
    TestLog& log;
    bool* showJfetBias = nullptr;  ///< View > JFET bias helper
    LayoutDialogState* layout = nullptr;  ///< Board > Lay out ... opens it
};

/// What the JFET bias panel reads and changes.
struct JfetPanelContext {
    const Document& doc;
    JfetPanelState& state;
    Commands commands;
    TestLog& log;
};

/// What the Circuit panel reads and changes.
struct CircuitPanelContext {
    const Document& doc;
    CircuitPanelState& state;
    bool& open;  ///< the panel's window is shown
    FileChooser& chooser;
    std::string& chosenFile;  ///< a circuit file picked in the chooser, taken once
    Dialogs& dialogs;
    Commands commands;
    TestLog& log;
};

/// File, Edit, View, Board and Help menus.
FileRequest drawMenuBar(const MenuContext& c);
/// "Parts": tools, the part palette, off-board parts, and placing options.
/// Returns where an off-board part it added is (board units), for the view to scroll to.
std::optional<ImVec2> drawPartsPanel(const ToolContext& tools, TestLog& log, ImVec2 pos, ImVec2 size);
/// "Board": size in holes and millimetres, resize by edge, trim, title.
void drawBoardPanel(const Document& doc, Commands commands, Selected& selection, ViewState& view,
                    TestLog& log, ImVec2 pos, ImVec2 size);
/// "Properties": the selected part, link, wire, cut or off-board part.
void drawPropertiesPanel(const EditContext& edit, TestLog& log, ImVec2 pos, ImVec2 size);
/// "Check": errors and warnings of the live check; click to show, apply suggested fixes.
void drawCheckPanel(const Document& doc, Commands commands, ViewState& view, TestLog& log,
                    ImVec2 pos, ImVec2 size);
/// "Circuit": the intended circuit; load one, capture the board's connectivity, remove.
void drawCircuitPanel(const CircuitPanelContext& c);
/// The JFET bias helper, when open.
void drawJfetBiasPanel(const JfetPanelContext& c);
/// The status line: hovered hole and its net (and its expected voltage when `voltages` is given),
/// board size, zoom, tool hint.
void drawStatusBar(const Document& doc, const HoverState& hover, const ToolState& tool,
                   const std::string& status, ImVec2 pos, ImVec2 size,
                   const netcheck::BenchVoltages* voltages, TestLog& log);
/// The keys reference.
void drawHelpWindow(bool& open, TestLog& log);

/// Fixed, undecorated panel window at a place in the layout.
bool beginPanel(const char* title, ImVec2 pos, ImVec2 size);

}  // namespace stripsmith
