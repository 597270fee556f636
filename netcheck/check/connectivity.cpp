// Tracing the copper. Strips fall into segments (runs of holes joined by copper) at breaks, kept
// as one bit per hole; a hole's segment is the number of breaks before it, counted from the bits.
// Only segments, off-board lugs, links and wires go through the union-find, so the tracer does no
// work per hole at all: its cost follows the cuts, links and wires, and a word of bits per 64
// holes.
#include "netcheck/check/connectivity.hpp"

#include <algorithm>

#include "netcheck/check/detail/union_find.hpp"

namespace netcheck {

namespace {

// Node id of each off-board lug, keyed by its pin reference (sorted).
void collectLugNodes(const Board& board, std::vector<std::pair<PinRef, int>>& lugs) {
    lugs.clear();
    int node = board.holeCount();
    for (const OffboardPart& part : board.offboard) {
        for (const std::string& pin : part.pins) lugs.push_back({PinRef{part.ref, pin}, node++});
    }
    std::stable_sort(lugs.begin(), lugs.end(),
                     [](const auto& a, const auto& b) { return a.first < b.first; });
}

int findLug(const std::vector<std::pair<PinRef, int>>& lugs, const PinRef& pin) {
    auto it = std::lower_bound(lugs.begin(), lugs.end(), pin,
                               [](const auto& entry, const PinRef& p) { return entry.first < p; });
    return it != lugs.end() && it->first == pin ? it->second : -1;
}

}  // namespace

Connectivity::Connectivity(const Board& board) {
    retrace(board);
}

void Connectivity::retrace(const Board& board) {
    board_ = &board;
    holeCount_ = board.holeCount();
    islandCount_ = 0;
    collectLugNodes(board, pinNodes_);
    markBreaks(board);
    segmentCount_ = breaks_.countAll();
    const int lugCount = static_cast<int>(pinNodes_.size());

    // Links and wires join segments and lugs.
    UnionFind& sets = sets_;
    sets.reset(segmentCount_ + lugCount);
    auto setOfHole = [&](Hole hole) -> int {
        return board.contains(hole) ? segmentOf(hole.row * board.cols + hole.col) : -1;
    };
    auto setOf = [&](const Endpoint& end) -> int {
        if (end.isHole()) return setOfHole(*end.hole);
        const int node = findLug(pinNodes_, end.lug);
        if (node >= 0) return segmentOf(node);
        // A wire may also end on the lead of an on-board part: it joins that lead's hole.
        const Part* part = board.findPart(end.lug.ref);
        const Pin* pin = part ? part->findPin(end.lug.pin) : nullptr;
        return pin ? setOfHole(pin->hole) : -1;
    };
    for (const Link& link : board.links) {
        const int a = setOfHole(link.from);
        const int b = setOfHole(link.to);
        if (a >= 0 && b >= 0) sets.unite(a, b);
    }
    for (const Wire& wire : board.wires) {
        const int a = setOf(wire.from);
        const int b = setOf(wire.to);
        if (a >= 0 && b >= 0) sets.unite(a, b);
    }

    // Dense island ids in order of first node. Segment and lug ids already rise in node order and
    // a set's root is its smallest member, so a set gets the next id at its root and every later
    // member takes its root's. A node's island is then its segment's: the table per segment is far
    // smaller than one per hole, and needs no pass over the holes.
    const int setCount = segmentCount_ + lugCount;
    islandOfSegment_.resize(static_cast<std::size_t>(setCount));
    for (int s = 0; s < setCount; ++s) {
        const int root = sets.find(s);
        islandOfSegment_[static_cast<std::size_t>(s)] =
            root == s ? islandCount_++ : islandOfSegment_[static_cast<std::size_t>(root)];
    }
}

// Breaks from the copper pattern and the cuts: the last hole of every strip, every hole of pad
// board, a cut between two holes, and both sides of a hole cut (a hole without copper joins
// neither neighbour).
void Connectivity::markBreaks(const Board& board) {
    const int cols = board.cols;
    if (board.copper == CopperPattern::Pads) {
        breaks_.resetAllSet(holeCount_);
    } else {
        breaks_.reset(holeCount_);
        for (int r = 0; r < board.rows; ++r) breaks_.set(r * cols + cols - 1);
    }
    holeCut_.reset(holeCount_);
    for (const Cut& cut : board.cuts) {
        if (!board.contains(cut.hole)) continue;
        const int i = cut.hole.row * cols + cut.hole.col;
        breaks_.set(i);
        if (cut.kind == Cut::Kind::Between) continue;
        holeCut_.set(i);
        if (cut.hole.col > 0) breaks_.set(i - 1);
    }
}

int Connectivity::islandOfHole(Hole hole) const {
    if (!board_->contains(hole)) return -1;
    return islandOfNode(hole.row * board_->cols + hole.col);
}

int Connectivity::islandOfPin(const PinRef& pin) const {
    const int lug = findLug(pinNodes_, pin);
    if (lug >= 0) return islandOfNode(lug);
    const Part* part = board_->findPart(pin.ref);
    const Pin* onBoard = part ? part->findPin(pin.pin) : nullptr;
    return onBoard ? islandOfHole(onBoard->hole) : -1;
}

bool Connectivity::isHoleCut(Hole hole) const {
    return board_->contains(hole) && holeCut_.test(hole.row * board_->cols + hole.col);
}

bool Connectivity::isHoleCutAt(int hole) const {
    return holeCut_.test(hole);
}

bool Connectivity::joinsNext(Hole hole) const {
    return board_->contains(hole) && !breaks_.test(hole.row * board_->cols + hole.col);
}

Island Connectivity::island(int id) const {
    Island result;
    result.id = id;
    if (id < 0 || id >= islandCount_) return result;
    const int cols = board_->cols;
    for (int i = 0; i < holeCount_; ++i) {
        if (islandOfNode(i) == id) result.holes.push_back(Hole{i / cols, i % cols});
    }
    for (const Part& part : board_->parts) {
        for (const Pin& pin : part.pins) {
            if (islandOfHole(pin.hole) == id) result.pins.push_back(PinRef{part.ref, pin.name});
        }
    }
    for (const auto& [lug, node] : pinNodes_) {
        if (islandOfNode(node) == id) result.pins.push_back(lug);
    }
    std::sort(result.pins.begin(), result.pins.end());
    return result;
}

std::vector<std::vector<PinRef>> boardNets(const Board& board) {
    const Connectivity connectivity(board);
    std::vector<std::vector<PinRef>> byIsland(static_cast<std::size_t>(connectivity.islandCount()));
    for (const Part& part : board.parts) {
        for (const Pin& pin : part.pins) {
            const int island = connectivity.islandOfHole(pin.hole);
            if (island >= 0)
                byIsland[static_cast<std::size_t>(island)].push_back({part.ref, pin.name});
        }
    }
    for (const OffboardPart& part : board.offboard) {
        for (const std::string& lug : part.pins) {
            const PinRef pin{part.ref, lug};
            const int island = connectivity.islandOfPin(pin);
            if (island >= 0) byIsland[static_cast<std::size_t>(island)].push_back(pin);
        }
    }
    std::vector<std::vector<PinRef>> groups;
    for (auto& pins : byIsland) {
        if (pins.empty()) continue;
        std::sort(pins.begin(), pins.end());
        groups.push_back(std::move(pins));
    }
    std::sort(groups.begin(), groups.end());
    return groups;
}

}  // namespace netcheck
