#include "netcheck/edit/set_title.hpp"

#include "netcheck/edit/out_of_step.hpp"

namespace netcheck::edit {

SetTitle::SetTitle(const Board& board, std::string title)
    : before_(board.title), after_(std::move(title)) {}

void SetTitle::apply(Board& board) {
    requireInStep(board.title == before_, label(), "the title is not the one expected");
    board.title = after_;
}

void SetTitle::revert(Board& board) {
    requireInStep(board.title == after_, label(), "the title is not the one expected");
    board.title = before_;
}

bool SetTitle::canMergeWith(const Command& next) const {
    const auto* other = dynamic_cast<const SetTitle*>(&next);
    return other != nullptr && other->before_ == after_;
}

void SetTitle::takeNewState(const Command& next) {
    after_ = static_cast<const SetTitle&>(next).after_;
}

}  // namespace netcheck::edit
