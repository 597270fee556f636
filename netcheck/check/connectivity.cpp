// Tracing the copper. One pass along the strips numbers the segments (runs of holes that copper
// joins; each lug is a segment of its own), a union-find joins the segments that links and wires
// connect, and a last pass gives each node its island.
#include "netcheck/check/connectivity.hpp"

#include <algorithm>

#include "netcheck/check/detail/union_find.hpp"

namespace netcheck {

Connectivity::Connectivity(const Board& board) : board_(&board) {
    const auto holes = static_cast<std::size_t>(board.holeCount());
    auto at = [&](Hole hole) { return static_cast<std::size_t>(holeNode(hole)); };
    // Copper does not join a hole to the next along its strip across the board's edge, on pad
    // board, over a cut between them, and on either side of a hole cut (a hole without copper
    // joins neither neighbour).
    holeCut_.assign(holes, 0);
    breakAfter_.assign(holes, board.copper == CopperPattern::Pads ? 1 : 0);
    for (int row = 0; row < board.rows; ++row) breakAfter_[at({row, board.cols - 1})] = 1;
    for (const Cut& cut : board.cuts) {
        if (!board.contains(cut.hole)) continue;
        breakAfter_[at(cut.hole)] = 1;
        if (cut.kind != Cut::Kind::Hole) continue;
        holeCut_[at(cut.hole)] = 1;
        if (cut.hole.col > 0) breakAfter_[at({cut.hole.row, cut.hole.col - 1})] = 1;
    }
    std::vector<int> segmentOfNode(holes);
    int segments = 0;
    for (std::size_t hole = 0; hole < holes; ++hole) {
        segmentOfNode[hole] = segments;
        if (breakAfter_[hole]) ++segments;
    }
    for (const OffboardPart& part : board.offboard) {
        for (const std::string& lug : part.pins) {
            lugNodes_.emplace(PinRef{part.ref, lug}, static_cast<int>(segmentOfNode.size()));
            segmentOfNode.push_back(segments++);
        }
    }

    UnionFind sets(segments);
    for (const auto& [a, b] : jumpers()) {
        sets.unite(segmentOfNode[static_cast<std::size_t>(a)],
                   segmentOfNode[static_cast<std::size_t>(b)]);
    }

    // Islands are numbered in order of their first segment, so in order of their first node.
    std::vector<int> islandOfSegment(static_cast<std::size_t>(segments), -1);
    for (int s = 0; s < segments; ++s) {
        int& island = islandOfSegment[static_cast<std::size_t>(sets.find(s))];
        if (island < 0) island = islandCount_++;
        islandOfSegment[static_cast<std::size_t>(s)] = island;
    }
    islandOfNode_.resize(segmentOfNode.size());
    for (std::size_t node = 0; node < segmentOfNode.size(); ++node) {
        islandOfNode_[node] = islandOfSegment[static_cast<std::size_t>(segmentOfNode[node])];
    }
}

int Connectivity::islandOfNode(int node) const {
    if (node < 0 || node >= nodeCount()) return -1;
    return islandOfNode_[static_cast<std::size_t>(node)];
}

int Connectivity::holeNode(Hole hole) const {
    return board_->contains(hole) ? hole.row * board_->cols + hole.col : -1;
}

int Connectivity::islandOfHole(Hole hole) const {
    return islandOfNode(holeNode(hole));
}

int Connectivity::lugNode(const PinRef& lug) const {
    const auto it = lugNodes_.find(lug);
    return it == lugNodes_.end() ? -1 : it->second;
}

int Connectivity::endpointNode(const Endpoint& end) const {
    if (end.isHole()) return holeNode(*end.hole);
    if (const int lug = lugNode(end.lug); lug >= 0) return lug;
    const Part* part = board_->findPart(end.lug.ref);
    const Pin* pin = part ? part->findPin(end.lug.pin) : nullptr;
    return pin ? holeNode(pin->hole) : -1;
}

int Connectivity::islandOfPin(const PinRef& pin) const {
    return islandOfNode(endpointNode(Endpoint::atLug(pin)));
}

std::vector<std::pair<int, int>> Connectivity::jumpers() const {
    std::vector<std::pair<int, int>> joined;
    auto join = [&](const Endpoint& a, const Endpoint& b) {
        const int x = endpointNode(a);
        const int y = endpointNode(b);
        if (x >= 0 && y >= 0) joined.emplace_back(x, y);
    };
    for (const Link& link : board_->links)
        join(Endpoint::atHole(link.from), Endpoint::atHole(link.to));
    for (const Wire& wire : board_->wires) join(wire.from, wire.to);
    return joined;
}

bool Connectivity::isHoleCut(Hole hole) const {
    return board_->contains(hole) && holeCut_[static_cast<std::size_t>(holeNode(hole))];
}

bool Connectivity::joinsNext(Hole hole) const {
    return board_->contains(hole) && hole.col + 1 < board_->cols &&
           !breakAfter_[static_cast<std::size_t>(holeNode(hole))];
}

Island Connectivity::island(int id) const {
    Island result;
    result.id = id;
    gather([&](int of) { return of == id ? &result : nullptr; });
    std::sort(result.pins.begin(), result.pins.end());
    return result;
}

std::vector<Island> Connectivity::islands() const {
    std::vector<Island> all(static_cast<std::size_t>(islandCount_));
    for (int id = 0; id < islandCount_; ++id) all[static_cast<std::size_t>(id)].id = id;
    gather([&](int id) { return &all[static_cast<std::size_t>(id)]; });
    for (Island& island : all) std::sort(island.pins.begin(), island.pins.end());
    return all;
}

void Connectivity::gather(const std::function<Island*(int)>& into) const {
    auto at = [&](int node) {
        const int id = islandOfNode(node);
        return id < 0 ? nullptr : into(id);
    };
    for (int node = 0; node < board_->holeCount(); ++node) {
        if (Island* island = at(node))
            island->holes.push_back(Hole{node / board_->cols, node % board_->cols});
    }
    for (const Part& part : board_->parts) {
        for (const Pin& pin : part.pins) {
            if (Island* island = at(holeNode(pin.hole)))
                island->pins.push_back(PinRef{part.ref, pin.name});
        }
    }
    for (const auto& [lug, node] : lugNodes_) {
        if (Island* island = at(node)) island->pins.push_back(lug);
    }
}

}  // namespace netcheck
