// The board canvas: view input (zoom, pan, fit), hover, the active tool, and every layer.
#pragma once

#include <imgui.h>

#include "editor/app/editor_app.hpp"

namespace stripsmith {

/// Draws the canvas into the current window region [pos, pos + size).
void drawCanvas(EditorApp& app, ImVec2 pos, ImVec2 size);

/// The transform the canvas uses for a screen rectangle (fitting first if a fit is pending).
BoardTransform canvasTransform(EditorApp& app, ImVec2 min, ImVec2 max);

/// Pans so that a board point sits in the middle of the canvas (used by the findings list).
void centreOn(EditorApp& app, ImVec2 boardPoint);

}  // namespace stripsmith
