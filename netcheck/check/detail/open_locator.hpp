// Locating an open: the pieces a net fell into and the links that would join them (private to
// the checker).
#pragma once

#include <vector>

#include "netcheck/check/detail/check_context.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/check/detail/circuit_match.hpp"

namespace netcheck {

/// The board as it would be with every short's suggested cut applied: opens are mended on it, so
/// a suggested link never joins a net to a short about to be cut away.
struct RepairedBoard {
    const Board* board = nullptr;
    const Connectivity* copper = nullptr;
    const std::vector<PlacedNet>* nets = nullptr;  ///< every intended net
};

/// The open of `net`, whose pins lie in more than one island. The fix is the removal of one
/// existing cut when that alone mends the net without shorting anything (a cut in the wrong
/// place), else links through the nearest free holes.
Finding locateOpen(const CheckContext& context, const PlacedNet& net,
                   const RepairedBoard& repaired);

}  // namespace netcheck
