#include "netcheck/edit/compound_command.hpp"

namespace netcheck::edit {

CompoundCommand::CompoundCommand(std::string label, std::vector<std::unique_ptr<Command>> members)
    : label_(std::move(label)), members_(std::move(members)) {}

void CompoundCommand::apply(Board& board) {
    std::size_t done = 0;
    try {
        for (; done < members_.size(); ++done) members_[done]->apply(board);
    } catch (...) {
        while (done > 0) members_[--done]->revert(board);
        throw;
    }
}

void CompoundCommand::revert(Board& board) {
    std::size_t left = members_.size();
    try {
        for (; left > 0; --left) members_[left - 1]->revert(board);
    } catch (...) {
        for (; left < members_.size(); ++left) members_[left]->apply(board);
        throw;
    }
}

std::vector<Hole> CompoundCommand::touched() const {
    std::vector<Hole> holes;
    for (const auto& member : members_) {
        for (const Hole& h : member->touched()) holes.push_back(h);
    }
    return holes;
}

bool CompoundCommand::canMergeWith(const Command& next) const {
    const auto* other = dynamic_cast<const CompoundCommand*>(&next);
    if (other == nullptr || other->members_.size() != members_.size()) return false;
    for (std::size_t i = 0; i < members_.size(); ++i) {
        const auto* member = dynamic_cast<const MergeableCommand*>(members_[i].get());
        if (member == nullptr || !member->canMergeWith(*other->members_[i])) return false;
    }
    return true;
}

void CompoundCommand::takeNewState(const Command& next) {
    const auto& other = static_cast<const CompoundCommand&>(next);
    for (std::size_t i = 0; i < members_.size(); ++i) members_[i]->mergeWith(*other.members_[i]);
}

}  // namespace netcheck::edit
