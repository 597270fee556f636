// Locating an open: the pieces a net fell into and the links that would join them (private to
// the checker).
#pragma once

#include <vector>

#include "check_context.hpp"
#include "check_report.hpp"
#include "circuit_match.hpp"

namespace netcheck {

/// The open of `net`, whose pins lie in more than one island.
Finding locateOpen(const CheckContext& context, const PlacedNet& net);

}  // namespace netcheck
