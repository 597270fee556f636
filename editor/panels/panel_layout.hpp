// The layout dialog: Board > "Lay out from the circuit" and "Place the remaining parts". Options,
// a run on the worker with a progress bar and Cancel, then up to three alternatives to preview and
// accept as one undo step.
#pragma once

#include "editor/app/commands.hpp"
#include "editor/app/document.hpp"
#include "editor/app/layout_dialog_state.hpp"
#include "editor/app/selection.hpp"
#include "editor/app/test_log.hpp"
#include "editor/app/view_state.hpp"

namespace stripsmith {

struct LayoutDialogContext {
    const Document& doc;
    LayoutDialogState& state;
    Commands commands;
    TestLog& log;
    ViewState& view;
    Selected& selection;  ///< cleared when a layout replaces the board
};

/// Opens the dialog for a fresh layout or for placing the parts not yet on the board.
void openLayoutDialog(LayoutDialogState& state, bool placeTheRest);
/// Draws the dialog when open; takes the worker's results as they arrive.
void drawLayoutDialog(const LayoutDialogContext& c);

}  // namespace stripsmith
