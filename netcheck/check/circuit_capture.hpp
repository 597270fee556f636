// "Take the board's connectivity as the circuit": the board as it is, written as a circuit.
#pragma once

#include "netcheck/model/board.hpp"

namespace netcheck {

/// Every on-board and off-board part with its kind, value and pins, and one net per group of two
/// or more joined pins, named N1, N2 ... in the order boardNets() gives (a net keeps the name it
/// has in the board's present circuit when all of its pins agree on one).
Circuit captureCircuit(const Board& board);

}  // namespace netcheck
