// Printing a check report and a board's netlist, as text and as JSON (the CLI contract).
#pragma once

#include <string>

#include <nlohmann/json.hpp>

#include "netcheck/model/board.hpp"
#include "netcheck/check/check_report.hpp"

namespace netcheck {

/// One line per finding with hole coordinates, then a summary line.
std::string formatReportText(const CheckReport& report, const Board& board);
/// {"ok": bool, "errors": [...], "warnings": [...], ...}; see README "The report".
nlohmann::ordered_json reportJson(const CheckReport& report);
/// {"nets": [["C1.1","R1.2"], ...]}
nlohmann::ordered_json netsJson(const Board& board);
std::string formatNetsText(const Board& board);

}  // namespace netcheck
