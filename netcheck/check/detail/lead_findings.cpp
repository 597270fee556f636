// Findings about where leads sit, with or without a circuit: two leads in one hole, a lead in a
// hole-cut hole, a lead alone on its copper, and board edges nothing uses.
#include <algorithm>

#include "netcheck/check/detail/finders.hpp"
#include "netcheck/model/board_size.hpp"
#include "netcheck/model/wording.hpp"

namespace netcheck {

namespace {

Finding holeFinding(FindingType type, Hole hole, std::string message) {
    Finding finding = Finding::of(type, std::move(message), {hole});
    finding.hole = hole;
    return finding;
}

}  // namespace

void findSharedHoles(const CheckedBoard& checked, std::vector<Finding>& errors) {
    for (const Lead& lead : checked.leads()) {
        const std::span<const Lead> here = checked.leadsAt(lead.hole);
        if (here.size() < 2 || &here.front() != &lead) continue;
        const Hole hole = checked.holeAt(lead.hole);
        errors.push_back(holeFinding(FindingType::SharedHole, hole,
                                     holeName(hole) + " holds " + plural(here.size(), "lead") +
                                         ": " + checked.leadNames(lead.hole)));
    }
}

void findLeadsOnCuts(const CheckedBoard& checked, std::vector<Finding>& errors) {
    for (const Lead& lead : checked.leads()) {
        if (!checked.isHoleCut(lead.hole)) continue;
        const Hole hole = checked.holeAt(lead.hole);
        errors.push_back(holeFinding(FindingType::PinOnCut, hole,
                                     checked.leadName(lead) + " is in " + holeName(hole) +
                                         ", where a hole cut removed the copper"));
    }
}

void findDanglingLeads(const CheckedBoard& checked, const std::vector<char>* onlyIslands,
                       std::vector<Finding>& warnings) {
    const Board& board = checked.board();
    const Connectivity& copper = checked.copper();
    // What each island holds: a pin or lug counts one, a link or wire end two (it joins
    // something, so the island is more than a lone lead).
    std::vector<int> held(static_cast<std::size_t>(copper.islandCount()), 0);
    auto add = [&](int node, int count) {
        if (node >= 0) held[static_cast<std::size_t>(copper.islandOfNode(node))] += count;
    };
    for (const Lead& lead : checked.leads())
        add(lead.hole, lead.kind == Lead::Kind::PartPin ? 1 : 2);
    for (int node = board.holeCount(); node < copper.nodeCount(); ++node) add(node, 1);
    for (const Wire& wire : board.wires) {
        for (const Endpoint* end : {&wire.from, &wire.to}) {
            if (!end->isHole()) add(checked.copper().endpointNode(*end), 2);
        }
    }
    for (const Lead& lead : checked.leads()) {
        const auto island = static_cast<std::size_t>(lead.island);
        if (held[island] != 1 || (onlyIslands != nullptr && !(*onlyIslands)[island])) continue;
        const Hole hole = checked.holeAt(lead.hole);
        warnings.push_back(holeFinding(
            FindingType::DanglingLead, hole,
            checked.leadName(lead) + " in " + holeName(hole) + " touches nothing else"));
    }
}

void findTrim(const CheckedBoard& checked, std::vector<Finding>& warnings) {
    const Board& board = checked.board();
    if (checked.leads().empty()) return;
    Hole first{board.rows, board.cols};
    Hole last{-1, -1};
    for (const Lead& lead : checked.leads()) {
        const Hole hole = checked.holeAt(lead.hole);
        first = {std::min(first.row, hole.row), std::min(first.col, hole.col)};
        last = {std::max(last.row, hole.row), std::max(last.col, hole.col)};
    }
    const int spare[4] = {first.row, board.rows - 1 - last.row, first.col,
                          board.cols - 1 - last.col};
    const char* const what[4] = {"row", "row", "column", "column"};
    const char* const where[4] = {" at the top", " at the bottom", " at the left", " at the right"};
    std::vector<std::string> sides;
    for (int i = 0; i < 4; ++i) {
        if (spare[i] > 0)
            sides.push_back(plural(static_cast<std::size_t>(spare[i]), what[i]) + where[i]);
    }
    if (sides.empty()) return;
    const int rows = last.row - first.row + 1;
    const int cols = last.col - first.col + 1;
    warnings.push_back(Finding::of(FindingType::Trim,
                                   "the board could lose " + listed(sides) + ": " +
                                       sizeInHoles(cols, rows) + " (" + holeName(first) + " to " +
                                       holeName(last) + "), " +
                                       sizeInMm(cols * board.pitchMm, rows * board.pitchMm),
                                   {first, last}));
}

}  // namespace netcheck
