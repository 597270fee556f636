// The edits a repair may try, found from the check's errors and the board near them (private to
// the repair planner).
#pragma once

#include <vector>

#include "netcheck/check/check_report.hpp"
#include "netcheck/model/board.hpp"
#include "netcheck/repair/repair_step.hpp"

namespace netcheck {

/// Edits worth trying on `board`, whose check gave `report`, each once, in a fixed order:
/// - a short: remove a link or wire that joins its island; cut the track in a gap between two
///   leads along its path; move a nearby cut of its strips into such a gap; the parts at the
///   path's two ends (below);
/// - an open: remove or move (one or two holes) a cut next to one of its pieces; the links the
///   check suggests; the parts of its smallest piece;
/// - a reversed part: turn it or reorder its leads;
/// - a shared hole: move each lead in it to a free neighbouring hole, remove a link ending there;
/// - a lead on a cut: remove or move the cut, move the lead;
/// - a part: turn it round (polarised two-lead parts), put its leads in another order among its
///   holes or its holes turned by a quarter, half or three quarters about one lead (parts of three
///   or four leads), move one lead to a free neighbouring hole.
std::vector<RepairStep> candidateSteps(const Board& board, const CheckReport& report);

}  // namespace netcheck
