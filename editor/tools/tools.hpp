// The canvas tools. Each reads the mouse over the canvas, emits commands, and draws its preview.
#pragma once

#include <optional>

#include <imgui.h>

#include "editor/app/editor_app.hpp"
#include "editor/canvas/canvas_frame.hpp"

namespace stripsmith {

/// The mouse over the canvas this frame, in board terms.
struct CanvasInput {
    ImVec2 board{0, 0};                        ///< board units under the mouse
    bool hovered = false;                      ///< mouse over the canvas (and no popup above it)
    std::optional<netcheck::Hole> hole;        ///< hole under the mouse (nearest cell)
    std::optional<netcheck::PinRef> lug;       ///< off-board lug under the mouse
    bool pressed = false;                      ///< left button went down this frame
    bool released = false;                     ///< left button went up this frame
    bool down = false;                         ///< left button held
    bool shift = false;
};

void runSelectTool(EditorApp& app, const CanvasInput& in, const CanvasFrame& f);
void runPlaceTool(EditorApp& app, const CanvasInput& in, const CanvasFrame& f);
void runLinkTool(EditorApp& app, const CanvasInput& in, const CanvasFrame& f);
void runCutTool(EditorApp& app, const CanvasInput& in, const CanvasFrame& f);
void runWireTool(EditorApp& app, const CanvasInput& in, const CanvasFrame& f);

/// Switches tool, dropping any half-done gesture.
void selectTool(EditorApp& app, Tool tool);
/// Picks a part kind to place (switches to the place tool).
void startPlacing(EditorApp& app, const std::string& kind);

/// Adds an off-board part of a kind beside the board (ref numbered automatically).
void addOffboardPart(EditorApp& app, const std::string& kind);

}  // namespace stripsmith
