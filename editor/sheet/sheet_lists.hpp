// The list pages: check result and findings, board size, assembly order, bill of materials,
// cuts in both sides' coordinates, links, off-board wiring and what the meter should read.
#pragma once

#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/voltage/bench_voltages.hpp"
#include "page_flow.hpp"

namespace sheet {

/// Flows every list down the pages of `flow`.
void drawLists(PageFlow& flow, const netcheck::Board& board, const netcheck::CheckReport& report,
               const std::vector<netcheck::Cut>& cuts,
               const netcheck::BenchVoltagesResult& voltages);

}  // namespace sheet
