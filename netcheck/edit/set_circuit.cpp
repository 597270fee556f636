#include "netcheck/edit/set_circuit.hpp"

#include "netcheck/edit/out_of_step.hpp"

namespace netcheck::edit {

SetCircuit::SetCircuit(const Board& board, std::optional<Circuit> circuit, std::string label)
    : before_(board.circuit), after_(std::move(circuit)), label_(std::move(label)) {}

void SetCircuit::apply(Board& board) {
    requireInStep(board.circuit == before_, label(), "the circuit is not the one expected");
    board.circuit = after_;
}

void SetCircuit::revert(Board& board) {
    requireInStep(board.circuit == after_, label(), "the circuit is not the one expected");
    board.circuit = before_;
}

std::string SetCircuit::label() const {
    if (!label_.empty()) return label_;
    return after_ ? "Set circuit" : "Remove circuit";
}

}  // namespace netcheck::edit
