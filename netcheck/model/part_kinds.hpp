// The part kinds Stripsmith knows: pin names, polarity, whether the value is a quantity, lead span.
#pragma once

#include <span>
#include <string_view>
#include <vector>

namespace netcheck {

/// One kind of part. To add a kind, add a row to the table in part_kinds.cpp.
struct PartKind {
    std::string_view name;               ///< file name of the kind, e.g. "electrolytic"
    std::string_view label;              ///< for menus, e.g. "Electrolytic capacitor"
    std::vector<std::string_view> pins;  ///< default pin names in order; empty = numbered 1..N
    bool polarised = false;              ///< pin names must match exactly (no end-for-end swap)
    bool quantity = false;               ///< value is a quantity (compared numerically)
    bool offboard = false;               ///< normally lives off the board
    int span = 0;  ///< default lead span in holes for two-lead parts lying flat
    std::string_view refPrefix;  ///< letters of a new part's reference, e.g. "R" for R1
};

std::span<const PartKind> partKinds();

/// Nullopt-like: nullptr for unknown kinds (they are generic parts with exact pin matching).
const PartKind* findPartKind(std::string_view name);

}  // namespace netcheck
