// The supply rails: a strip above the layout carrying the positive supply and one below carrying
// 0 V, each the board's whole length and joined to its net's copper by one link where a link
// fits (the shortest), else in a new column at the right.
#pragma once

#include <optional>
#include <vector>

#include "netcheck/layout/detail/strip_sweep.hpp"

namespace netcheck::layout_detail {

/// Adds the rails to `copper` (a net of -1, or one with no copper, gets none). `groups`: the lead
/// holes of each part (its pins' bounding box is taken as covered, body and all) and of each wire
/// end (a group of one). Returns the rows everything moved down by (1 with a top rail, else 0);
/// nullopt when a rail cannot be joined to its net.
std::optional<int> addSupplyRails(SweepResult& copper, const std::vector<std::vector<Hole>>& groups,
                                  int positive, int ground);

}  // namespace netcheck::layout_detail
