// The board canvas: view input (zoom, pan, fit), hover, and every layer. The active tool runs on
// what drawCanvas returns (see editor/frame.cpp), so the canvas knows nothing of the tools.
#pragma once

#include <imgui.h>

#include "editor/app/bench_voltages_worker.hpp"
#include "editor/app/document.hpp"
#include "editor/app/hover.hpp"
#include "editor/app/selection.hpp"
#include "editor/app/test_log.hpp"
#include "editor/app/view_state.hpp"
#include "editor/canvas/canvas_frame.hpp"
#include "editor/canvas/canvas_input.hpp"

namespace stripsmith {

/// What the canvas reads and the view state it changes (zoom, pan, hover).
struct CanvasContext {
    const Document& doc;
    const Selected& selection;
    ViewState& view;
    HoverState& hover;
    TestLog& log;
    /// The latest bench voltages, drawn when View > Bench voltages is on.
    std::shared_ptr<const BenchVoltagesWorker::Result> voltages = nullptr;
};

/// The canvas as drawn this frame: its geometry and the mouse over it.
struct CanvasView {
    CanvasFrame frame;
    CanvasInput input;
};

/// Draws the canvas into the current window region [pos, pos + size).
CanvasView drawCanvas(const CanvasContext& c, ImVec2 pos, ImVec2 size);

/// The transform the canvas uses for a screen rectangle (fitting first if a fit is pending).
BoardTransform canvasTransform(ViewState& view, const netcheck::Board& board, ImVec2 min,
                               ImVec2 max);

/// Pans so that a board point sits in the middle of the canvas (used by the findings list).
void centreOn(ViewState& view, const netcheck::Board& board, ImVec2 boardPoint);

}  // namespace stripsmith
