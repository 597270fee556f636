// Edit menu and keyboard actions on the selection; each becomes one undoable command.
#pragma once

#include <memory>
#include <optional>
#include <string>

#include "editor/app/clipboard.hpp"
#include "editor/app/commands.hpp"
#include "editor/app/document.hpp"
#include "editor/app/selection.hpp"

namespace stripsmith {

/// What the Edit actions read and change: the board (read-only), the selection, the clipboard,
/// and the way to emit commands.
struct EditContext {
    const Document& doc;
    Selected& selection;
    ClipboardContent& clipboard;
    Commands commands;
};

void undo(const EditContext& c);
void redo(const EditContext& c);
void deleteSelection(const EditContext& c);
/// Turns selected parts 90° clockwise about their first pin (parts that would leave the board
/// stay).
void rotateSelection(const EditContext& c);
/// Moves the selection by whole holes, if what sits in holes stays on the board.
void nudgeSelection(const EditContext& c, int rows, int cols);
/// The command moving a selection by whole holes: on-board elements through their holes (see
/// moveElements), off-board parts by their place beside the board; nullptr when nothing moves.
std::unique_ptr<netcheck::edit::Command> moveCommand(const netcheck::Board& board,
                                                     const Selected& selection, int rows, int cols);
void copySelection(const EditContext& c);
/// Pastes the clipboard with its top-left at `at` (or one hole down-right of where it was copied),
/// parts renamed to free refs; the pasted elements become the selection.
void paste(const EditContext& c, std::optional<netcheck::Hole> at);
void duplicateSelection(const EditContext& c);
void selectAll(const EditContext& c);

/// Pastes `clip` onto a board: the command, or nullptr with a reason when it does not fit.
std::unique_ptr<netcheck::edit::Command> pasteCommand(const netcheck::Board& board,
                                                      const ClipboardContent& clip,
                                                      netcheck::Hole at, std::string* reason);

/// Clipboard content of the selected parts, links and cuts, relative to their top-left hole.
ClipboardContent copyOf(const netcheck::Board& board, const Selected& selection);

}  // namespace stripsmith
