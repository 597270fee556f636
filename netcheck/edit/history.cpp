#include "netcheck/edit/history.hpp"

namespace netcheck::edit {

void History::perform(std::unique_ptr<Command> command, Board& board, int mergeKey) {
    if (!command) return;
    // Apply first: a command that throws leaves the board and the history as they were.
    command->apply(board);
    done_.resize(cursor_);
    if (savedCursor_ > static_cast<std::ptrdiff_t>(cursor_)) savedCursor_ = -1;
    // Never merge into the saved state's last command: the depth would stay the same while the
    // board changed, and isModified() would miss it.
    const bool mayMerge = mergeKey != 0 && mergeKey == lastMergeKey_ && cursor_ > 0 &&
                          savedCursor_ != static_cast<std::ptrdiff_t>(cursor_);
    lastMergeKey_ = mergeKey;
    if (mayMerge && done_[cursor_ - 1]->mergeWith(*command)) return;
    done_.push_back(std::move(command));
    cursor_ = done_.size();
}

bool History::undo(Board& board) {
    if (!canUndo()) return false;
    Command& command = *done_[cursor_ - 1];
    command.revert(board);
    --cursor_;
    lastMergeKey_ = 0;
    lastTouched_ = command.touched();
    return true;
}

bool History::redo(Board& board) {
    if (!canRedo()) return false;
    Command& command = *done_[cursor_];
    command.apply(board);
    ++cursor_;
    lastMergeKey_ = 0;
    lastTouched_ = command.touched();
    return true;
}

std::string History::undoLabel() const { return canUndo() ? done_[cursor_ - 1]->label() : ""; }

std::string History::redoLabel() const { return canRedo() ? done_[cursor_]->label() : ""; }

void History::markSaved() {
    savedCursor_ = static_cast<std::ptrdiff_t>(cursor_);
    lastMergeKey_ = 0;
}

bool History::isModified() const { return savedCursor_ != static_cast<std::ptrdiff_t>(cursor_); }

void History::clear() {
    done_.clear();
    cursor_ = 0;
    savedCursor_ = 0;
    lastMergeKey_ = 0;
    lastTouched_.clear();
}

}  // namespace netcheck::edit
