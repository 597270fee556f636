// Command: replace the board's intended circuit (load, capture, import, edit, remove).
#pragma once

#include <optional>
#include <string>

#include "netcheck/edit/command.hpp"

namespace netcheck::edit {

/// Replaces the optional circuit as a whole. Label: the one given, else "Set circuit" or
/// "Remove circuit".
class SetCircuit : public Command {
public:
    SetCircuit(const Board& board, std::optional<Circuit> circuit, std::string label = {});
    void apply(Board& board) override;
    void revert(Board& board) override;
    std::string label() const override;

private:
    std::optional<Circuit> before_;
    std::optional<Circuit> after_;
    std::string label_;
};

}  // namespace netcheck::edit
