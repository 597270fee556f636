// One editor frame: menus, panels, canvas and dialogs, built into ImGui draw lists. No GL here,
// so tests and the frame benchmark call it with a bare ImGui context. The one place that holds the
// whole editor and hands each panel, tool and the canvas only the parts it uses.
#pragma once

#include "editor/app/editor_app.hpp"

namespace stripsmith {

/// Call between ImGui::NewFrame() and ImGui::Render().
void buildFrame(EditorApp& app);

/// Keyboard shortcuts (skipped while a text field has the keyboard or a dialog is open).
void handleShortcuts(EditorApp& app);

}  // namespace stripsmith
