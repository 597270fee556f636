// What every step of one check shares: the board, its traced copper, the leads soldered into its
// holes, and how nodes and leads are named in messages. The repair code finds fixes on it too.
#pragma once

#include <span>
#include <string>
#include <utility>
#include <vector>

#include "netcheck/check/connectivity.hpp"
#include "netcheck/model/board.hpp"

namespace netcheck {

/// Something soldered into a hole: a part pin, one end of a link, or the board end of a wire.
struct Lead {
    enum class Kind { PartPin, LinkEnd, WireEnd };
    Kind kind = Kind::PartPin;
    int item = 0;    ///< index into board.parts, board.links or board.wires
    int sub = 0;     ///< pin index, or 0/1 for the from/to end
    int hole = 0;    ///< hole index row * cols + col
    int island = 0;  ///< island of the hole
};

/// The board with its copper traced and its leads collected. Node ids follow Connectivity:
/// holes, then off-board lugs. Leads outside the board are left out: they are in no hole.
class CheckedBoard {
public:
    explicit CheckedBoard(const Board& board);

    const Board& board() const { return *board_; }
    const Connectivity& copper() const { return copper_; }
    /// Every lead on the board, in hole order (in one hole: part pins, link ends, wire ends).
    const std::vector<Lead>& leads() const { return leads_; }
    /// The leads in one hole.
    std::span<const Lead> leadsAt(int hole) const {
        const auto at = static_cast<std::size_t>(hole);
        return {leads_.begin() + leadStart_[at], leads_.begin() + leadStart_[at + 1]};
    }
    /// "R1.2, link A1-C1": the leads in one hole, named.
    std::string leadNames(int hole) const;

    int leadsIn(int hole) const { return static_cast<int>(leadsAt(hole).size()); }
    bool holdsLead(int hole) const { return leadsIn(hole) > 0; }
    bool isHoleCut(int hole) const { return copper_.isHoleCut(holeAt(hole)); }
    /// Copper present and nothing soldered in it: a place for a new link or a hole cut.
    bool isFree(int hole) const { return !holdsLead(hole) && !isHoleCut(hole); }

    int holeIndex(Hole hole) const { return hole.row * board_->cols + hole.col; }
    Hole holeAt(int index) const { return Hole{index / board_->cols, index % board_->cols}; }
    bool isHoleNode(int node) const { return node >= 0 && node < board_->holeCount(); }

    /// "D7" for a hole node, "VR1.2" for a lug node.
    std::string nodeName(int node) const;
    /// "R1.2", "link A1-C1", "red wire to VR1.2" (for messages about a hole's leads).
    std::string leadName(const Lead& lead) const;

private:
    const Board* board_;
    Connectivity copper_;
    std::vector<Lead> leads_;
    std::vector<int> leadStart_;  // by hole, and one past the last: where its leads start
};

}  // namespace netcheck
