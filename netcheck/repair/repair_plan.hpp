// Repair plans: the fewest edits that bring a board back to its circuit, each verified by
// re-checking the edited board, with the findings each edit clears.
//
// The rule every offered edit obeys: applied after the plan's earlier steps, it leaves no error
// that was not there before it (so it never adds an error, a short, an open or a shared hole)
// and lays no bare link across a lead or another link. Per-finding suggestions obey it too: one
// that breaks it is withdrawn (attachPlan).
#pragma once

#include <cstddef>
#include <memory>
#include <string>
#include <vector>

#include "netcheck/check/check_report.hpp"
#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"
#include "netcheck/repair/repair_step.hpp"

namespace netcheck {

/// Bounds of the search. The search is breadth by breadth: every candidate edit of the plans
/// kept so far is tried (one check of the edited board each), the best `keep` plans go on to the
/// next depth. It stops at the first depth that reaches zero errors, at `maxSteps`, or when
/// `maxChecks` boards have been checked: the same input always gives the same plan.
struct RepairLimits {
    int maxSteps = 3;
    int keep = 6;
    int maxChecks = 4000;
    /// Boards larger than this are not searched (real boards have a few thousand holes; a search
    /// over thousands of checks of a million-hole board would take minutes).
    int maxHoles = 40000;
};

/// An error the plan leaves, and why.
struct RemainingError {
    std::string key;      ///< the error's identity across edits of the board
    std::string message;  ///< the error's message
    std::string reason;   ///< what would mend it, in a maker's words
    std::string text() const { return message + ": " + reason; }
};

struct RepairPlan {
    std::vector<RepairStep> steps;
    int errorsBefore = 0;
    int errorsAfter = 0;
    /// Errors no plan could clear, with what would mend each (fit the part, the right value ...).
    std::vector<RemainingError> remaining;
    int checks = 0;  ///< boards checked while searching
    std::string skipped;  ///< why no search was made (a board over the size limit); empty when searched
    bool clearsAll() const { return errorsAfter == 0 && errorsBefore > 0; }
};

/// Plans the repair of `board` against `circuit` (or the board's own circuit). An empty plan when
/// the board has no errors or nothing found makes it better.
RepairPlan planRepair(const Board& board, const Circuit* circuit = nullptr,
                      const RepairLimits& limits = {});

/// Gives each short and open of `report` (the check of `board`) its own fix (suggestFixes), marks
/// each error a step clears, withdraws the own fix of those knock-on errors, and withdraws every
/// other suggested fix that breaks the rule above.
void attachPlan(CheckReport& report, const RepairPlan& plan, const Board& board,
                const Circuit* circuit = nullptr);

/// Every step of the plan as one command on `board` (one undo step); null when a step no longer
/// fits the board.
std::unique_ptr<edit::Command> planCommand(const Board& board, const RepairPlan& plan);

/// The board with every step of the plan done.
Board repairedBoard(const Board& board, const RepairPlan& plan);

}  // namespace netcheck
