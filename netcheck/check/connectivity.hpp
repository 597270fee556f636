// Tracing the copper: which holes and pins are joined by strips, links and wires.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"
#include "netcheck/check/detail/hole_bits.hpp"
#include "netcheck/check/detail/union_find.hpp"

namespace netcheck {

/// A set of holes (and off-board lugs) joined by copper, links and wires.
struct Island {
    int id = 0;
    std::vector<Hole> holes;   ///< sorted
    std::vector<PinRef> pins;  ///< on-board pins and off-board lugs in this island, sorted
};

/// Result of tracing one board. Node ids: holes first (row * cols + col), then off-board lugs in
/// board order. Island ids are dense, 0..islandCount()-1, numbered in order of first node.
class Connectivity {
public:
    explicit Connectivity(const Board& board);
    /// Traces `board` afresh in this object's memory (for checks repeated on every edit).
    void retrace(const Board& board);

    int islandCount() const { return islandCount_; }
    /// Island of a hole; -1 outside the board.
    int islandOfHole(Hole hole) const;
    /// Island of an on-board pin or off-board lug; -1 if the board has no such pin.
    int islandOfPin(const PinRef& pin) const;
    /// Holes and pins of island `id` (empty when out of range). Built on demand, in O(holes):
    /// a viewer asks for the one island under the pointer, not for every island on each edit.
    Island island(int id) const;
    /// True when a hole cut removed this hole's copper.
    bool isHoleCut(Hole hole) const;
    /// The same for a hole index (row * cols + col) known to be on the board.
    bool isHoleCutAt(int hole) const;
    /// True when copper joins `hole` with the next hole along its strip (column + 1).
    bool joinsNext(Hole hole) const;
    /// Number of nodes: holes, then off-board lugs.
    int nodeCount() const { return holeCount_ + static_cast<int>(pinNodes_.size()); }
    /// Island of a node id (see the class comment); -1 when out of range.
    int islandOfNode(int node) const {
        if (node < 0 || node >= nodeCount()) return -1;
        return islandOfSegment_[static_cast<std::size_t>(segmentOf(node))];
    }
    /// Asks for what islandOfNode() and isHoleCutAt() read of a hole to be brought into cache
    /// ahead of them, for passes that look up many holes scattered over a large board.
    void prefetchHole(int hole) const {
        breaks_.prefetchCount(hole);
        holeCut_.prefetch(hole);
    }
    /// The second stage, a few lookups after prefetchHole(hole): asks for the hole's island,
    /// which can only be found once the hole's bits have arrived.
    void prefetchIsland(int hole) const {
        __builtin_prefetch(&islandOfSegment_[static_cast<std::size_t>(segmentOf(hole))]);
    }

private:
    void markBreaks(const Board& board);
    // A hole's strip segment is the number of breaks along the strips before it (a break: no
    // copper to the next hole); lugs follow the holes' segments, one each.
    int segmentOf(int node) const {
        return node < holeCount_ ? breaks_.countBefore(node) : segmentCount_ + node - holeCount_;
    }

    const Board* board_ = nullptr;
    int holeCount_ = 0;
    int segmentCount_ = 0;  // strip segments, lugs not counted
    HoleBits breaks_;
    HoleBits holeCut_;
    std::vector<int> islandOfSegment_;
    std::vector<std::pair<PinRef, int>> pinNodes_;  // sorted by PinRef, for islandOfPin
    UnionFind sets_;                                // kept only for its memory
    int islandCount_ = 0;
};

/// The board's connectivity as a netlist: each group the pins joined by copper, links and wires,
/// sorted within and between groups. A pin alone is a group of one.
std::vector<std::vector<PinRef>> boardNets(const Board& board);

}  // namespace netcheck
