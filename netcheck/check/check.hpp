// Checking a board: trace the copper, compare with the intended circuit, locate every fault.
#pragma once

#include <memory>

#include "netcheck/model/board.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/model/circuit.hpp"

namespace netcheck {

class Connectivity;

/// Checks the board against `circuit` (or against board.circuit when null; with neither, only the
/// board's own faults are reported). Deterministic: the same board gives the same report.
CheckReport check(const Board& board, const Circuit* circuit = nullptr);

/// The same check, for a caller that checks again and again (the editor, on every edit): the
/// checker keeps its working memory between checks, so once it has seen a board of a size, a
/// re-check allocates little beyond its report. Reports are exactly those of check().
class Checker {
public:
    Checker();
    ~Checker();
    Checker(Checker&&) noexcept;
    Checker& operator=(Checker&&) noexcept;

    CheckReport check(const Board& board, const Circuit* circuit = nullptr);
    /// The copper of the board the last check traced, valid while that board stays as it was
    /// and until the next check (a viewer checking on every edit then traces each board once).
    /// Call only after a check.
    const Connectivity& copper() const;

private:
    struct Workspace;
    std::unique_ptr<Workspace> workspace_;
};

}  // namespace netcheck
