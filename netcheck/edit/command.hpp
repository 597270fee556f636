// Reversible changes to a board. The editor changes the document only through these, so undo and
// redo are exact and testable without a window.
#pragma once

#include <string>
#include <vector>

#include "netcheck/model/board.hpp"

namespace netcheck::edit {

/// One reversible change. apply() then revert() must leave the board exactly as before.
class Command {
public:
    virtual ~Command() = default;
    virtual void apply(Board& board) = 0;
    virtual void revert(Board& board) = 0;
    /// For the Edit menu: "Move R1", "Add cut C5".
    virtual std::string label() const = 0;
    /// Holes the change touched, so the view can show where an undo happened.
    virtual std::vector<Hole> touched() const { return {}; }
    /// Folds a following command of the same gesture (a drag) into this one; true when merged.
    /// Called only with commands that have already been applied.
    virtual bool mergeWith(const Command& next) { (void)next; return false; }
};

}  // namespace netcheck::edit
