// Collecting the leads of a board and naming nodes for messages.
#include "netcheck/check/detail/check_context.hpp"

#include <algorithm>

namespace netcheck {

namespace {

// Asks for a part's pins ahead of use: they are a block of their own on the heap, often across
// two cache lines.
void prefetchPins(const Part& part) {
    if (part.pins.empty()) return;
    __builtin_prefetch(part.pins.data());
    __builtin_prefetch(reinterpret_cast<const char*>(part.pins.data() + part.pins.size()) - 1);
}

}  // namespace

CheckContext::CheckContext(const Board& board) : board_(&board), copper_(board) {
    collectLeads(board);
}

void CheckContext::reset(const Board& board) {
    board_ = &board;
    copper_.retrace(board);
    leads_.clear();
    firstLeadOfPart_.clear();
    lugBase_.clear();
    partPins_ = 0;
    anyShared_ = false;
    anyOnCut_ = false;
    collectLeads(board);
}

void CheckContext::collectLeads(const Board& board) {
    hasLead_.reset(board.holeCount());
    sharedHole_.reset(board.holeCount());
    leadArea_ = Area{board.rows, -1, board.cols, -1};
    auto add = [&](Lead::Kind kind, int item, int sub, Hole hole, std::uint32_t nameKey = 0) {
        if (!board.contains(hole)) return;
        leadArea_.top = std::min(leadArea_.top, hole.row);
        leadArea_.bottom = std::max(leadArea_.bottom, hole.row);
        leadArea_.left = std::min(leadArea_.left, hole.col);
        leadArea_.right = std::max(leadArea_.right, hole.col);
        const int index = holeIndex(hole);
        leads_.push_back(Lead{item, sub, index, 0, nameKey, kind});
        if (hasLead_.test(index)) {
            sharedHole_.set(index);
            anyShared_ = true;
        }
        hasLead_.set(index);
    };
    for (const Part& part : board.parts) partPins_ += part.pins.size();
    leads_.reserve(partPins_ + 2 * (board.links.size() + board.wires.size()));
    lugBase_.reserve(board.offboard.size());
    firstLeadOfPart_.reserve(board.parts.size());
    constexpr std::size_t kPartsAhead = 16;
    for (std::size_t p = 0; p < board.parts.size(); ++p) {
        if (p + kPartsAhead < board.parts.size()) prefetchPins(board.parts[p + kPartsAhead]);
        const auto& pins = board.parts[p].pins;
        const std::size_t first = leads_.size();
        for (std::size_t k = 0; k < pins.size(); ++k) {
            add(Lead::Kind::PartPin, static_cast<int>(p), static_cast<int>(k), pins[k].hole,
                PinKey::of(pins[k].name));
        }
        const bool everyPin = leads_.size() - first == pins.size();
        firstLeadOfPart_.push_back(everyPin ? static_cast<int>(first) : -1);
    }
    for (std::size_t l = 0; l < board.links.size(); ++l) {
        add(Lead::Kind::LinkEnd, static_cast<int>(l), 0, board.links[l].from);
        add(Lead::Kind::LinkEnd, static_cast<int>(l), 1, board.links[l].to);
    }
    for (std::size_t w = 0; w < board.wires.size(); ++w) {
        const Wire& wire = board.wires[w];
        if (wire.from.isHole()) add(Lead::Kind::WireEnd, static_cast<int>(w), 0, *wire.from.hole);
        if (wire.to.isHole()) add(Lead::Kind::WireEnd, static_cast<int>(w), 1, *wire.to.hole);
    }
    // Leads lie scattered over the board, so what is known of their holes is asked for a few
    // leads ahead.
    constexpr std::size_t kLookAhead = 16;
    for (std::size_t i = 0; i < leads_.size(); ++i) {
        if (i + kLookAhead < leads_.size()) {
            const int ahead = leads_[i + kLookAhead].hole;
            copper_.prefetchHole(ahead);
            sharedHole_.prefetch(ahead);
        }
        if (i + kLookAhead / 2 < leads_.size())
            copper_.prefetchIsland(leads_[i + kLookAhead / 2].hole);
        Lead& lead = leads_[i];
        lead.island = copper_.islandOfNode(lead.hole);
        lead.onCut = copper_.isHoleCutAt(lead.hole);
        lead.shared = anyShared_ && sharedHole_.test(lead.hole);
        anyOnCut_ = anyOnCut_ || lead.onCut;
    }
    int base = board.holeCount();
    for (const OffboardPart& part : board.offboard) {
        lugBase_.push_back(base);
        base += static_cast<int>(part.pins.size());
    }
}

std::span<const Lead> CheckContext::leadsOfPart(int part) const {
    const int first = firstLeadOfPart_[static_cast<std::size_t>(part)];
    if (first < 0) return {};
    const std::size_t pins = board_->parts[static_cast<std::size_t>(part)].pins.size();
    return std::span<const Lead>(leads_).subspan(static_cast<std::size_t>(first), pins);
}

bool CheckContext::isFree(int hole) const {
    return !holdsLead(hole) && !copper_.isHoleCutAt(hole);
}

std::string CheckContext::nodeName(int node) const {
    if (isHoleNode(node)) return holeName(holeAt(node));
    for (std::size_t p = 0; p < board_->offboard.size(); ++p) {
        const OffboardPart& part = board_->offboard[p];
        const int lug = node - lugBase_[p];
        if (lug >= 0 && lug < static_cast<int>(part.pins.size())) {
            return part.ref + "." + part.pins[static_cast<std::size_t>(lug)];
        }
    }
    return "?";
}

std::string CheckContext::leadName(const Lead& lead) const {
    const auto item = static_cast<std::size_t>(lead.item);
    switch (lead.kind) {
        case Lead::Kind::PartPin: {
            const Part& part = board_->parts[item];
            return part.ref + "." + part.pins[static_cast<std::size_t>(lead.sub)].name;
        }
        case Lead::Kind::LinkEnd: {
            const Link& link = board_->links[item];
            return "link " + linkName(link);
        }
        case Lead::Kind::WireEnd: {
            const Wire& wire = board_->wires[item];
            const Endpoint& other = lead.sub == 0 ? wire.to : wire.from;
            const std::string colour = wire.color.empty() ? "" : wire.color + " ";
            return colour + "wire to " + other.name();
        }
    }
    return "?";
}

int CheckContext::endpointNode(const Endpoint& end) const {
    if (end.isHole()) return board_->contains(*end.hole) ? holeIndex(*end.hole) : -1;
    for (std::size_t p = 0; p < board_->offboard.size(); ++p) {
        const OffboardPart& part = board_->offboard[p];
        if (part.ref != end.lug.ref) continue;
        for (std::size_t k = 0; k < part.pins.size(); ++k) {
            if (part.pins[k] == end.lug.pin)
                return lugNode(static_cast<int>(p), static_cast<int>(k));
        }
    }
    const Part* part = board_->findPart(end.lug.ref);
    const Pin* pin = part ? part->findPin(end.lug.pin) : nullptr;
    return pin && board_->contains(pin->hole) ? holeIndex(pin->hole) : -1;
}

std::vector<std::pair<int, int>> CheckContext::jumpers() const {
    std::vector<std::pair<int, int>> edges;
    auto add = [&](int a, int b) {
        if (a >= 0 && b >= 0) edges.emplace_back(a, b);
    };
    for (const Link& link : board_->links) {
        add(endpointNode(Endpoint::atHole(link.from)), endpointNode(Endpoint::atHole(link.to)));
    }
    for (const Wire& wire : board_->wires) add(endpointNode(wire.from), endpointNode(wire.to));
    return edges;
}

}  // namespace netcheck
