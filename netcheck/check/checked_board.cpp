#include "netcheck/check/checked_board.hpp"

#include <numeric>

namespace netcheck {

CheckedBoard::CheckedBoard(const Board& board)
    : board_(&board),
      copper_(board),
      leadStart_(static_cast<std::size_t>(board.holeCount()) + 1, 0) {
    std::vector<Lead> found;
    auto add = [&](Lead::Kind kind, std::size_t item, int sub, Hole hole) {
        if (!board.contains(hole)) return;
        const int index = holeIndex(hole);
        found.push_back(
            Lead{kind, static_cast<int>(item), sub, index, copper_.islandOfNode(index)});
        ++leadStart_[static_cast<std::size_t>(index)];
    };
    for (std::size_t p = 0; p < board.parts.size(); ++p) {
        const std::vector<Pin>& pins = board.parts[p].pins;
        for (std::size_t k = 0; k < pins.size(); ++k) {
            add(Lead::Kind::PartPin, p, static_cast<int>(k), pins[k].hole);
        }
    }
    for (std::size_t l = 0; l < board.links.size(); ++l) {
        add(Lead::Kind::LinkEnd, l, 0, board.links[l].from);
        add(Lead::Kind::LinkEnd, l, 1, board.links[l].to);
    }
    for (std::size_t w = 0; w < board.wires.size(); ++w) {
        const Wire& wire = board.wires[w];
        if (wire.from.isHole()) add(Lead::Kind::WireEnd, w, 0, *wire.from.hole);
        if (wire.to.isHole()) add(Lead::Kind::WireEnd, w, 1, *wire.to.hole);
    }
    // Sorted by hole, by counting: each hole's count becomes the end of its stretch, and placing
    // the leads from the last back moves each end to the start, keeping the order found.
    std::partial_sum(leadStart_.begin(), leadStart_.end(), leadStart_.begin());
    leads_.resize(found.size());
    for (auto lead = found.rbegin(); lead != found.rend(); ++lead) {
        leads_[static_cast<std::size_t>(--leadStart_[static_cast<std::size_t>(lead->hole)])] =
            *lead;
    }
}

std::string CheckedBoard::leadNames(int hole) const {
    std::string names;
    for (const Lead& lead : leadsAt(hole)) names += (names.empty() ? "" : ", ") + leadName(lead);
    return names;
}

std::string CheckedBoard::nodeName(int node) const {
    if (isHoleNode(node)) return holeName(holeAt(node));
    int lug = board_->holeCount();
    for (const OffboardPart& part : board_->offboard) {
        for (const std::string& pin : part.pins) {
            if (lug++ == node) return part.ref + "." + pin;
        }
    }
    return "?";
}

std::string CheckedBoard::leadName(const Lead& lead) const {
    const auto item = static_cast<std::size_t>(lead.item);
    switch (lead.kind) {
        case Lead::Kind::PartPin: {
            const Part& part = board_->parts[item];
            return part.ref + "." + part.pins[static_cast<std::size_t>(lead.sub)].name;
        }
        case Lead::Kind::LinkEnd:
            return "link " + linkName(board_->links[item]);
        case Lead::Kind::WireEnd: {
            const Wire& wire = board_->wires[item];
            const Endpoint& other = lead.sub == 0 ? wire.to : wire.from;
            const std::string colour = wire.color.empty() ? "" : wire.color + " ";
            return colour + "wire to " + other.name();
        }
    }
    return "?";
}

}  // namespace netcheck
