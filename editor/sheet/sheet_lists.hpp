// The list pages: check result and findings, board size, assembly order, bill of materials,
// cuts in both sides' coordinates, links and off-board wiring.
#pragma once

#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/check/check_report.hpp"
#include "page_flow.hpp"

namespace sheet {

/// Flows every list down the pages of `flow`.
void drawLists(PageFlow& flow, const netcheck::Board& board, const netcheck::CheckReport& report,
               const std::vector<netcheck::Cut>& cuts);

}  // namespace sheet
