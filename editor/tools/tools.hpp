// The canvas tools. Each reads the mouse over the canvas, emits commands, and draws its preview.
#pragma once

#include <optional>
#include <string>

#include "editor/app/commands.hpp"
#include "editor/app/document.hpp"
#include "editor/app/selection.hpp"
#include "editor/app/tool_state.hpp"
#include "editor/canvas/canvas_frame.hpp"
#include "editor/canvas/canvas_input.hpp"

namespace stripsmith {

/// What the tools read and change: the board (read-only), the selection, the tool's own state,
/// and the way to emit commands.
struct ToolContext {
    const Document& doc;
    Selected& selection;
    ToolState& tool;
    Commands commands;
};

/// Runs the active tool on this frame's mouse input and draws its preview on the canvas.
void runActiveTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f);

void runSelectTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f);
void runPlaceTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f);
void runLinkTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f);
void runCutTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f);
void runWireTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f);

/// Switches tool, dropping any half-done gesture.
void selectTool(ToolState& state, Tool tool);
/// Picks a part kind to place (switches to the place tool).
void startPlacing(ToolState& state, const std::string& kind);

/// Adds an off-board part of a kind beside the board, in the first free slot of the column right of
/// it (ref numbered automatically), and selects it. Returns the middle of its body in board units
/// (for the view to scroll to), or nullopt when nothing was added.
std::optional<ImVec2> addOffboardPart(const ToolContext& c, const std::string& kind);

}  // namespace stripsmith
