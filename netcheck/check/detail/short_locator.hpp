// Locating a short: the shortest copper path between pins of two nets in one island, and a single
// cut that would separate them without opening anything else (private to the checker).
#pragma once

#include <vector>

#include "netcheck/check/detail/check_context.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/check/detail/circuit_match.hpp"

namespace netcheck {

/// The short in `island`, which holds pins of `nets` (two or more, sorted by name). Only the pins
/// of those nets that lie in the island are looked at.
Finding locateShort(const CheckContext& context, int island,
                    const std::vector<const PlacedNet*>& nets);

}  // namespace netcheck
