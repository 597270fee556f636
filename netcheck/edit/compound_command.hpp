// A labelled group of commands done and undone as one step.
#pragma once

#include <memory>
#include <string>
#include <vector>

#include "netcheck/edit/mergeable.hpp"

namespace netcheck::edit {

/// Applies its members in order and reverts them in reverse order: a multi-selection move, a
/// paste, deleting a selection, applying a suggested fix. Members see the board as the members
/// before them left it. If a member fails (OutOfStepError), the members already done are undone
/// before the error goes on, so the board is never left half-changed.
/// Merges with a following group of the same shape when every member merges with its
/// counterpart (dragging a multi-selection).
class CompoundCommand : public MergeableCommand {
public:
    CompoundCommand(std::string label, std::vector<std::unique_ptr<Command>> members);
    void apply(Board& board) override;
    void revert(Board& board) override;
    std::string label() const override { return label_; }
    std::vector<Hole> touched() const override;
    bool canMergeWith(const Command& next) const override;
    bool empty() const { return members_.empty(); }
    std::size_t size() const { return members_.size(); }

protected:
    void takeNewState(const Command& next) override;

private:
    std::string label_;
    std::vector<std::unique_ptr<Command>> members_;
};

}  // namespace netcheck::edit
