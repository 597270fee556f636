#include "netcheck/edit/replace_board.hpp"

#include "netcheck/edit/out_of_step.hpp"

namespace netcheck::edit {

ReplaceBoard::ReplaceBoard(const Board& before, Board after, std::string label)
    : before_(before), after_(std::move(after)), label_(std::move(label)) {}

void ReplaceBoard::apply(Board& board) {
    requireInStep(board == before_, label_, "the board is not the one the layout replaces");
    board = after_;
}

void ReplaceBoard::revert(Board& board) {
    requireInStep(board == after_, label_, "the board is not the layout to take back");
    board = before_;
}

}  // namespace netcheck::edit
