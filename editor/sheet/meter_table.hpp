// "What the meter should read": the expected DC voltage of every net, where to probe it and its
// range, with the cautions, after the wiring list.
#pragma once

#include "netcheck/voltage/bench_voltages.hpp"
#include "page_flow.hpp"

namespace sheet {

/// Flows the table of the board's bench voltages (computed once per sheet: ngspice runs the
/// tolerance analysis) down the pages; a paragraph saying why when they could not be computed.
void drawMeterTable(PageFlow& flow, const netcheck::BenchVoltagesResult& result);

}  // namespace sheet
