// Command: replace the whole board at once (a generated layout accepted), as one undo step.
#pragma once

#include <string>

#include "netcheck/edit/command.hpp"

namespace netcheck::edit {

/// Swaps the board for another as a whole; undo gives back exactly the board it replaced.
class ReplaceBoard : public Command {
public:
    ReplaceBoard(const Board& before, Board after, std::string label);
    void apply(Board& board) override;
    void revert(Board& board) override;
    std::string label() const override { return label_; }

private:
    Board before_;
    Board after_;
    std::string label_;
};

}  // namespace netcheck::edit
