// Printing a check report and a board's netlist, as text and as JSON (the CLI contract).
#pragma once

#include <string>

#include <nlohmann/json.hpp>

#include "netcheck/model/board.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/repair/repair_plan.hpp"

namespace netcheck {

/// One line per finding with hole coordinates, then a summary line. With a repair plan (attached
/// to the report, see attachPlan), the plan comes first: each step with the errors it clears
/// indented under it.
std::string formatReportText(const CheckReport& report, const Board& board,
                             const RepairPlan* plan = nullptr);
/// {"ok": bool, "errors": [...], "warnings": [...], "repair": {...}}; see README "The report".
nlohmann::ordered_json reportJson(const CheckReport& report, const RepairPlan* plan = nullptr);
/// {"nets": [["C1.1","R1.2"], ...]}
nlohmann::ordered_json netsJson(const Board& board);
std::string formatNetsText(const Board& board);

}  // namespace netcheck
