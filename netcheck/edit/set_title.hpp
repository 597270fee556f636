// Command: change the board's title.
#pragma once

#include <string>

#include "netcheck/edit/mergeable.hpp"

namespace netcheck::edit {

/// Sets the title. Consecutive title edits merge, so typing a title is one undo step.
/// Label: "Set title".
class SetTitle : public MergeableCommand {
public:
    SetTitle(const Board& board, std::string title);
    void apply(Board& board) override;
    void revert(Board& board) override;
    std::string label() const override { return "Set title"; }
    bool canMergeWith(const Command& next) const override;

protected:
    void takeNewState(const Command& next) override;

private:
    std::string before_;
    std::string after_;
};

}  // namespace netcheck::edit
