// Tracing the copper: which holes and pins are joined by strips, links and wires.
#pragma once

#include <functional>
#include <map>
#include <utility>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// A set of holes (and off-board lugs) joined by copper, links and wires.
struct Island {
    int id = 0;
    std::vector<Hole> holes;   ///< sorted
    std::vector<PinRef> pins;  ///< on-board pins and off-board lugs in this island, sorted
};

/// The copper of one board, traced. Nodes are the holes (row * cols + col), then the off-board
/// lugs in board order. Island ids are dense, 0..islandCount()-1, numbered in order of first node.
/// Keeps a pointer to the board, which must outlive it unchanged.
class Connectivity {
public:
    explicit Connectivity(const Board& board);

    int islandCount() const { return islandCount_; }
    int nodeCount() const { return static_cast<int>(islandOfNode_.size()); }
    /// Island of a node; -1 when out of range.
    int islandOfNode(int node) const;
    /// Island of a hole; -1 outside the board.
    int islandOfHole(Hole hole) const;
    /// Island of an on-board pin or off-board lug; -1 if the board has no such pin.
    int islandOfPin(const PinRef& pin) const;
    /// Node of an off-board lug; -1 if the board has no such lug.
    int lugNode(const PinRef& lug) const;
    /// Node of the hole or lug a wire ends on (a wire may also end on an on-board part's pin: its
    /// hole); -1 when it names nothing on the board.
    int endpointNode(const Endpoint& end) const;
    /// The two nodes each link and wire joins, links then wires, in board order (a wire end that
    /// names nothing on the board joins nothing).
    std::vector<std::pair<int, int>> jumpers() const;
    /// Holes and pins of island `id` (empty when out of range), gathered on demand: a viewer asks
    /// for the one island under the pointer, not for every island on each edit.
    Island island(int id) const;
    /// Every island, by id, with its holes and pins.
    std::vector<Island> islands() const;
    /// True when a hole cut removed this hole's copper.
    bool isHoleCut(Hole hole) const;
    /// True when copper joins `hole` with the next hole along its strip (column + 1).
    bool joinsNext(Hole hole) const;

private:
    int holeNode(Hole hole) const;  // -1 outside the board
    // Adds every hole, pin and lug to the island into(its island id) gives, if any.
    void gather(const std::function<Island*(int)>& into) const;

    const Board* board_;
    std::vector<int> islandOfNode_;
    std::vector<char> breakAfter_;  // by hole: no copper to the next hole along the strip
    std::vector<char> holeCut_;
    std::map<PinRef, int> lugNodes_;
    int islandCount_ = 0;
};

}  // namespace netcheck
