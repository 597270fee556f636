#include "netcheck/voltage/probe_point.hpp"

#include <algorithm>
#include <map>
#include <tuple>

#include "netcheck/model/part_kinds.hpp"

namespace netcheck {

ProbePoints::ProbePoints(const Board& board, const Connectivity& copper)
    : board_(board), copper_(copper) {
    for (const Part& part : board.parts) {
        for (const Pin& pin : part.pins) occupied_.insert(pin.hole);
    }
    for (const Link& link : board.links) {
        occupied_.insert(link.from);
        occupied_.insert(link.to);
    }
    for (const Wire& wire : board.wires) {
        if (wire.from.hole) occupied_.insert(*wire.from.hole);
        if (wire.to.hole) occupied_.insert(*wire.to.hole);
    }
}

std::vector<int> ProbePoints::islandsOf(const PinRef& pin) const {
    std::vector<int> islands{copper_.islandOfPin(pin)};
    // A non-polarised two-lead part may sit either way round (the check accepts it): its pin
    // may be on the island of its other lead.
    const Part* part = board_.findPart(pin.ref);
    const PartKind* kind = part != nullptr ? findPartKind(part->kind) : nullptr;
    if (part != nullptr && part->pins.size() == 2 && (kind == nullptr || !kind->polarised)) {
        const Pin& other = part->pins[0].name == pin.pin ? part->pins[1] : part->pins[0];
        islands.push_back(copper_.islandOfPin({pin.ref, other.name}));
    }
    return islands;
}

int ProbePoints::islandOf(const std::vector<PinRef>& pins) const {
    // Most pins decide, each voting for every island it may be on.
    std::map<int, int> votes;
    int best = -1;
    for (const PinRef& pin : pins) {
        for (const int island : islandsOf(pin)) {
            if (island < 0) continue;
            const int count = ++votes[island];
            if (best < 0 || count > votes[best]) best = island;
        }
    }
    return best;
}

std::string ProbePoints::find(const std::vector<PinRef>& pins, bool& split) const {
    const int chosen = islandOf(pins);
    split = false;
    for (const PinRef& pin : pins) {
        const std::vector<int> islands = islandsOf(pin);
        const bool onBoard = islands.front() >= 0;
        if (onBoard && std::find(islands.begin(), islands.end(), chosen) == islands.end()) {
            split = true;
        }
    }
    if (chosen < 0) return {};
    const Island island = copper_.island(chosen);
    // Rank: free before occupied, strip end before middle, near the left or right edge first.
    using Rank = std::tuple<int, int, int, int, int>;
    std::optional<std::pair<Rank, Hole>> best;
    for (const Hole& hole : island.holes) {
        if (copper_.isHoleCut(hole)) continue;
        const bool free = !occupied_.contains(hole);
        const bool end = hole.col == 0 || hole.col == board_.cols - 1 ||
                         !copper_.joinsNext(hole) || !copper_.joinsNext({hole.row, hole.col - 1});
        const int edge = std::min(hole.col, board_.cols - 1 - hole.col);
        const Rank rank{free ? 0 : 1, end ? 0 : 1, edge, hole.row, hole.col};
        if (!best || rank < best->first) best = std::pair{rank, hole};
    }
    if (best) return holeName(best->second);
    for (const PinRef& pin : island.pins) {
        if (board_.findOffboard(pin.ref) != nullptr) return pin.name();
    }
    return island.pins.empty() ? std::string() : island.pins.front().name();
}

}  // namespace netcheck
