// "What the meter should read": the expected DC voltage of every net, where to probe it and its
// range, with the cautions, after the wiring list.
#pragma once

#include "netcheck/model/board.hpp"
#include "page_flow.hpp"

namespace sheet {

/// Computes the bench voltages of the board's circuit (ngspice) and flows the table down the
/// pages; a paragraph saying why when they cannot be computed.
void drawMeterTable(PageFlow& flow, const netcheck::Board& board);

}  // namespace sheet
