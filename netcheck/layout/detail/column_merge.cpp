#include "netcheck/layout/detail/column_merge.hpp"

#include <algorithm>

namespace netcheck::layout_detail {

namespace {

bool fits(const std::vector<int>& ownerA, const std::vector<char>& takenA,
          const std::vector<int>& ownerB, const std::vector<char>& takenB) {
    for (std::size_t row = 0; row < ownerA.size(); ++row) {
        if (takenA[row] && takenB[row]) return false;
        if (ownerA[row] != ownerB[row] && ownerA[row] != -1 && ownerB[row] != -1) return false;
    }
    return true;
}

}  // namespace

std::vector<int> mergeColumns(SweepResult& copper, const std::vector<std::vector<Hole>>& groups,
                              int first) {
    const Occupancy taken = occupiedHoles(copper, groups);
    std::vector<int> newColumn(static_cast<std::size_t>(copper.cols), 0);
    std::vector<std::vector<int>> owner;
    Occupancy merged;
    for (int col = 0; col < copper.cols; ++col) {
        const auto c = static_cast<std::size_t>(col);
        if (col >= first && !owner.empty() && fits(owner.back(), merged.back(), copper.owner[c], taken[c])) {
            for (std::size_t row = 0; row < owner.back().size(); ++row) {
                if (owner.back()[row] == -1) owner.back()[row] = copper.owner[c][row];
                merged.back()[row] = static_cast<char>(merged.back()[row] | taken[c][row]);
            }
        } else {
            owner.push_back(copper.owner[c]);
            merged.push_back(taken[c]);
        }
        newColumn[c] = static_cast<int>(owner.size()) - 1;
    }
    copper.owner = std::move(owner);
    copper.cols = static_cast<int>(copper.owner.size());
    for (auto& link : copper.links) {
        link.from.col = newColumn[static_cast<std::size_t>(link.from.col)];
        link.to.col = newColumn[static_cast<std::size_t>(link.to.col)];
    }
    return newColumn;
}

}  // namespace netcheck::layout_detail
