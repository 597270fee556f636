// Stacking parts in shared columns, as makers do: after the sweep (one part per column), each
// column folds into the one on its left when no strip holds something in both (a lead, a part's
// body, a link) and no strip carries two different nets there. Every strip keeps its nets in the
// same order with nothing between them, so the copper joins exactly what it joined before;
// leads keep their strips, so every lead rule still holds.
#pragma once

#include <vector>

#include "netcheck/layout/detail/strip_sweep.hpp"

namespace netcheck::layout_detail {

/// Folds columns of `copper` from column `first` on (columns left of it hold placed parts, which
/// never move). `groups`: the lead holes of each part (its pins' bounding box counts as taken) and
/// of each wire end. Returns, for each old column, its new column; links are moved already.
std::vector<int> mergeColumns(SweepResult& copper, const std::vector<std::vector<Hole>>& groups,
                              int first);

}  // namespace netcheck::layout_detail
