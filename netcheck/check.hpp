// Checking a board: trace the copper, compare with the intended circuit, locate every fault.
#pragma once

#include "board.hpp"
#include "check_report.hpp"
#include "circuit.hpp"

namespace netcheck {

/// Checks the board against `circuit` (or against board.circuit when null; with neither, only the
/// board's own faults are reported). Deterministic: the same board gives the same report.
CheckReport check(const Board& board, const Circuit* circuit = nullptr);

}  // namespace netcheck
