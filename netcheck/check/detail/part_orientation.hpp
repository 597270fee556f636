// Which way round the parts sit: end-for-end parts and pots get the orientation that agrees best
// with the copper; polarised parts whose other orientation would agree clearly better are reported
// as reversed (private to the checker).
#pragma once

#include <span>
#include <string>
#include <string_view>
#include <vector>

#include "netcheck/check/detail/check_context.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/check/detail/part_use.hpp"

namespace netcheck {

/// Orients `uses` in place and appends reversed-part errors and pot-reversed warnings.
void orientParts(const CheckContext& context, std::span<PartUse> uses,
                 const std::vector<std::string_view>& netNames, std::vector<Finding>& errors,
                 std::vector<Finding>& warnings);

}  // namespace netcheck
