// Edit menu and keyboard actions on the selection; each becomes one undoable command.
#pragma once

#include "editor/app/editor_app.hpp"

namespace stripsmith {

void undo(EditorApp& app);
void redo(EditorApp& app);
void deleteSelection(EditorApp& app);
/// Turns selected parts 90° clockwise about their first pin (parts that would leave the board stay).
void rotateSelection(EditorApp& app);
/// Moves the selection by whole holes, if what sits in holes stays on the board.
void nudgeSelection(EditorApp& app, int rows, int cols);
/// The command moving a selection by whole holes: on-board elements through their holes (see
/// moveElements), off-board parts by their place beside the board; nullptr when nothing moves.
std::unique_ptr<netcheck::edit::Command> moveCommand(const netcheck::Board& board, const Selected& selection,
                                                     int rows, int cols);
void copySelection(EditorApp& app);
/// Pastes the clipboard with its top-left at `at` (or one hole down-right of where it was copied),
/// parts renamed to free refs; the pasted elements become the selection.
void paste(EditorApp& app, std::optional<netcheck::Hole> at);
void duplicateSelection(EditorApp& app);
void selectAll(EditorApp& app);

/// Pastes `clip` onto a board: the command, or nullptr with a reason when it does not fit.
std::unique_ptr<netcheck::edit::Command> pasteCommand(const netcheck::Board& board, const ClipboardContent& clip,
                                                      netcheck::Hole at, std::string* reason);

/// Clipboard content of the selected parts, links and cuts, relative to their top-left hole.
ClipboardContent copyOf(const netcheck::Board& board, const Selected& selection);

}  // namespace stripsmith
