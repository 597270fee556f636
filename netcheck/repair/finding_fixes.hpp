// The fix of each short and open on its own: one cut for a short, one misplaced cut to remove or
// links for an open. The repair plan (repair_plan.hpp) then verifies them against the whole board.
#pragma once

#include "netcheck/check/check_report.hpp"
#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// Fills `suggestedCut`, `cutToRemove`, `suggestedLinks` and `fix` of the shorts and opens of
/// `report`, the check of `board` against `circuit` (or the board's own circuit):
/// - a short: the first cut along its path (hole cuts in free holes first, then cuts between
///   holes; in line with an existing cut first, then nearest the middle) after which its two ends
///   fall apart and no net of its island is split; else "no single cut separates them";
/// - an open: an existing cut whose removal alone mends the net and shorts nothing (a cut made in
///   the wrong hole); else links through the nearest free holes joining the pieces Prim-style,
///   found on the board with the shorts' cuts made, so a link never joins a short about to be cut.
void suggestFixes(CheckReport& report, const Board& board, const Circuit* circuit = nullptr);

}  // namespace netcheck
