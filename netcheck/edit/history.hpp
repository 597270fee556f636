// Undo/redo stack of commands, and the "unsaved changes" state derived from it.
#pragma once

#include <cstddef>
#include <memory>
#include <string>
#include <vector>

#include "netcheck/edit/command.hpp"

namespace netcheck::edit {

class History {
public:
    /// Applies `command` to `board` and records it. With `mergeKey` != 0, a command performed
    /// right after another with the same key is offered to the previous one's mergeWith (so a
    /// drag is one undo step). Clears the redo list.
    void perform(std::unique_ptr<Command> command, Board& board, int mergeKey = 0);
    /// Ends the current merge run (call on mouse release).
    void endMerge() { lastMergeKey_ = 0; }
    bool undo(Board& board);
    bool redo(Board& board);
    bool canUndo() const { return cursor_ > 0; }
    bool canRedo() const { return cursor_ < done_.size(); }
    /// Number of steps undo can take back (a merged drag counts once).
    std::size_t depth() const { return cursor_; }
    std::string undoLabel() const;
    std::string redoLabel() const;
    /// Holes touched by the command last undone or redone.
    const std::vector<Hole>& lastTouched() const { return lastTouched_; }

    /// Remember the present state as the saved one.
    void markSaved();
    /// True when the board differs from the saved state (undo depth differs from the saved depth).
    bool isModified() const;
    void clear();

private:
    std::vector<std::unique_ptr<Command>> done_;
    std::size_t cursor_ = 0;             // commands [0, cursor_) are applied
    std::ptrdiff_t savedCursor_ = 0;     // -1 when the saved state fell off the redo list
    int lastMergeKey_ = 0;
    std::vector<Hole> lastTouched_;
};

}  // namespace netcheck::edit
