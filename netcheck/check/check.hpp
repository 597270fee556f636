// Checking a board: trace the copper, compare with the intended circuit, locate every fault.
#pragma once

#include <optional>

#include "netcheck/check/check_report.hpp"
#include "netcheck/check/connectivity.hpp"
#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"

namespace netcheck {

struct CheckOptions {
    /// Shorts and opens with their path, pieces, message and suggested fix. Without, each is
    /// only named (its nets, its net): enough to count and compare faults, as a search that
    /// checks thousands of edited boards does, at a fraction of the cost.
    bool locateFaults = true;
};

/// Checks the board against `circuit` (or against board.circuit when null; with neither, only the
/// board's own faults are reported). Deterministic: the same board gives the same report.
CheckReport check(const Board& board, const Circuit* circuit = nullptr,
                  const CheckOptions& options = {});

/// The same check for a viewer that also shows the copper (the editor re-checks on every edit
/// and lights up the island under the pointer): it keeps the copper it traced, so each board is
/// traced once.
class Checker {
public:
    CheckReport check(const Board& board, const Circuit* circuit = nullptr,
                      const CheckOptions& options = {});
    /// The copper of the board last checked, valid while that board stays as it was. Call only
    /// after a check.
    const Connectivity& copper() const { return *copper_; }

private:
    std::optional<Connectivity> copper_;
};

}  // namespace netcheck
