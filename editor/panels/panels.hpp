// Every panel of the editor, in one place. Each reads the editor state and emits commands; none
// changes the board directly.
#pragma once

#include <imgui.h>

#include "editor/app/editor_app.hpp"

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

/// File, Edit, View and Help menus.
void drawMenuBar(EditorApp& app);
/// "Parts": tools, the part palette, off-board parts, and placing options.
void drawPartsPanel(EditorApp& app, ImVec2 pos, ImVec2 size);
/// "Board": size in holes and millimetres, resize by edge, trim, title.
void drawBoardPanel(EditorApp& app, ImVec2 pos, ImVec2 size);
/// "Properties": the selected part, link, wire, cut or off-board part.
void drawPropertiesPanel(EditorApp& app, ImVec2 pos, ImVec2 size);
/// "Check": errors and warnings of the live check; click to show, apply suggested fixes.
void drawCheckPanel(EditorApp& app, ImVec2 pos, ImVec2 size);
/// "Circuit": the intended circuit; load one, capture the board's connectivity, remove.
void drawCircuitPanel(EditorApp& app);
/// The status line: hovered hole and its net, board size, zoom, tool hint.
void drawStatusBar(EditorApp& app, ImVec2 pos, ImVec2 size);
/// The keys reference.
void drawHelpWindow(EditorApp& app);

/// Fixed, undecorated panel window at a place in the layout.
bool beginPanel(const char* title, ImVec2 pos, ImVec2 size);

}  // namespace stripsmith
