#include "netcheck/layout/detail/supply_rails.hpp"

#include <algorithm>
#include <cstdlib>
#include <optional>

namespace netcheck::layout_detail {

namespace {

int owner(const SweepResult& copper, int row, int col) {
    return copper.owner[static_cast<std::size_t>(col)][static_cast<std::size_t>(row)];
}

bool hasCopper(const SweepResult& copper, int net) {
    for (const auto& column : copper.owner)
        if (std::find(column.begin(), column.end(), net) != column.end()) return true;
    return false;
}

// The shortest link from rail row `rail` to a hole of `net` with every hole on its way free:
// {column, row}, or column -1.
Hole bestLink(const SweepResult& copper, const Occupancy& used, int rail, int net) {
    Hole best{-1, -1};
    for (int col = 0; col < copper.cols; ++col) {
        for (int row = 0; row < copper.rows; ++row) {
            if (row == rail || owner(copper, row, col) != net) continue;
            bool clear = true;
            for (int r = std::min(row, rail); r <= std::max(row, rail) && clear; ++r)
                clear = used[static_cast<std::size_t>(col)][static_cast<std::size_t>(r)] == 0;
            if (clear && (best.col < 0 || std::abs(row - rail) < std::abs(best.row - rail)))
                best = {row, col};
        }
    }
    return best;
}

void addColumn(SweepResult& copper, Occupancy& used) {
    copper.owner.emplace_back(static_cast<std::size_t>(copper.rows), -1);
    used.emplace_back(static_cast<std::size_t>(copper.rows), 0);
    ++copper.cols;
}

// Joins rail row `rail` to its net: where a link fits, else in a new column at the right where
// the net's own strip is carried on to it. False when neither can be done.
bool joinRail(SweepResult& copper, Occupancy& used, int rail, int net) {
    Hole to = bestLink(copper, used, rail, net);
    if (to.col < 0) {
        int row = -1;  // a strip of the net that reaches the right-hand end, or a free one
        for (int r = 0; r < copper.rows && row < 0; ++r)
            if (r != rail && owner(copper, r, copper.cols - 1) == net) row = r;
        if (row < 0) return false;
        addColumn(copper, used);
        const int col = copper.cols - 1;
        copper.owner[static_cast<std::size_t>(col)][static_cast<std::size_t>(row)] = net;
        to = {row, col};
    }
    copper.links.push_back({{std::min(rail, to.row), to.col}, {std::max(rail, to.row), to.col}});
    for (int r = std::min(rail, to.row); r <= std::max(rail, to.row); ++r)
        used[static_cast<std::size_t>(to.col)][static_cast<std::size_t>(r)] = 1;
    return true;
}

}  // namespace

std::optional<int> addSupplyRails(SweepResult& copper, const std::vector<std::vector<Hole>>& groups,
                                  int positive, int ground) {
    const bool top = positive >= 0 && hasCopper(copper, positive);
    const bool bottom = ground >= 0 && hasCopper(copper, ground);
    Occupancy used = occupiedHoles(copper, groups);
    const int shift = top ? 1 : 0;
    if (top) {
        for (auto& column : copper.owner) column.insert(column.begin(), positive);
        for (auto& column : used) column.insert(column.begin(), 0);
        for (auto& link : copper.links) {
            ++link.from.row;
            ++link.to.row;
        }
        ++copper.rows;
    }
    if (bottom) {
        for (auto& column : copper.owner) column.push_back(ground);
        for (auto& column : used) column.push_back(0);
        ++copper.rows;
    }
    auto fillRails = [&] {  // the whole length, new columns too
        for (auto& column : copper.owner) {
            if (top) column.front() = positive;
            if (bottom) column.back() = ground;
        }
    };
    fillRails();
    if (top && !joinRail(copper, used, 0, positive)) return std::nullopt;
    fillRails();
    if (bottom && !joinRail(copper, used, copper.rows - 1, ground)) return std::nullopt;
    fillRails();
    return shift;
}

}  // namespace netcheck::layout_detail
