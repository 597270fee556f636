// "Take the board's connectivity as the circuit": the board as it is, written as a netlist and as
// a circuit.
#pragma once

#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// The board's connectivity as a netlist: each group the pins joined by copper, links and wires,
/// sorted within and between groups. A pin alone is a group of one.
std::vector<std::vector<PinRef>> boardNets(const Board& board);

/// Every on-board and off-board part with its kind, value and pins, and one net per group of two
/// or more joined pins, named N1, N2 ... in the order boardNets() gives (a net keeps the name it
/// has in the board's present circuit when all of its pins agree on one).
Circuit captureCircuit(const Board& board);

}  // namespace netcheck
