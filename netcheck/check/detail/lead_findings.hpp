// Findings about where leads sit, with or without a circuit: two leads in one hole, a lead in a
// hole-cut hole, a lead alone on its copper, and board edges nothing uses (private to the checker).
#pragma once

#include <vector>

#include "netcheck/check/detail/check_context.hpp"
#include "netcheck/check/check_report.hpp"

namespace netcheck {

/// shared-hole errors, by hole.
void findSharedHoles(const CheckContext& context, std::vector<Finding>& errors);
/// pin-on-cut errors, by hole.
void findLeadsOnCuts(const CheckContext& context, std::vector<Finding>& errors);
/// dangling-lead warnings: an island with one pin and no link or wire end. When `onlyIslands` is
/// given, only islands flagged there are reported (with a circuit: islands holding a pin of an
/// intended net; pins the circuit leaves unconnected are don't-care).
void findDanglingLeads(const CheckContext& context, const std::vector<char>* onlyIslands,
                       std::vector<Finding>& warnings);
/// trim warning: rows and columns at the edges with no pin, link end or wire end.
void findTrim(const CheckContext& context, std::vector<Finding>& warnings);

}  // namespace netcheck
