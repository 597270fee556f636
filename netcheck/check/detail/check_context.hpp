// What every part of one check run shares: the board, its traced copper, where the leads are, and
// how nodes are named (private to the checker).
#pragma once

#include <cstdint>
#include <span>
#include <string>
#include <utility>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/check/connectivity.hpp"
#include "netcheck/check/detail/hole_bits.hpp"
#include "netcheck/check/detail/packed_name.hpp"

namespace netcheck {

/// Something soldered into a hole: a part pin, one end of a link, or the board end of a wire.
struct Lead {
    enum class Kind : std::uint8_t { PartPin, LinkEnd, WireEnd };
    int item = 0;               ///< index into board.parts, board.links or board.wires
    int sub = 0;                ///< pin index, or 0/1 for the from/to end
    int hole = 0;               ///< hole index row * cols + col
    int island = 0;             ///< island of the hole
    std::uint32_t nameKey = 0;  ///< a part pin's name packed (PinKey)
    Kind kind = Kind::PartPin;
    bool onCut = false;   ///< the hole is hole-cut (the lead touches no copper)
    bool shared = false;  ///< another lead is in the same hole
};

/// One check run's shared facts. Node ids follow Connectivity: holes, then off-board lugs.
class CheckContext {
public:
    explicit CheckContext(const Board& board);
    /// The same for another board (or the same one edited), in this object's memory.
    void reset(const Board& board);

    const Board& board() const { return *board_; }
    const Connectivity& copper() const { return copper_; }
    /// Every lead on the board, part pins first, then link ends, then wire ends.
    const std::vector<Lead>& leads() const { return leads_; }
    /// The leads of board part `part`'s pins, in pin order; empty when a pin's hole is off the
    /// board. The leads lie in board order, so going through parts this way reads memory in
    /// order, where the parts' own pins lie scattered.
    std::span<const Lead> leadsOfPart(int part) const;
    /// Whether any lead shares its hole, or sits in a hole cut (most boards: none, and the
    /// passes that list them need not go through every lead).
    bool anyLeadShared() const { return anyShared_; }
    bool anyLeadOnCut() const { return anyOnCut_; }
    /// Pins of all on-board parts (the leads of those on the board, and any off it).
    std::size_t partPinCount() const { return partPins_; }
    /// The rows and columns holding leads: top..bottom, left..right (top > bottom: no leads).
    struct Area {
        int top = 0;
        int bottom = -1;
        int left = 0;
        int right = -1;
    };
    const Area& leadArea() const { return leadArea_; }
    /// Something is soldered in the hole.
    bool holdsLead(int hole) const { return hasLead_.test(hole); }
    /// Copper present and nothing soldered in it: a place for a new link or a hole cut.
    bool isFree(int hole) const;

    int holeIndex(Hole hole) const { return hole.row * board_->cols + hole.col; }
    Hole holeAt(int index) const { return Hole{index / board_->cols, index % board_->cols}; }
    bool isHoleNode(int node) const { return node < board_->holeCount(); }
    /// Node of lug `lug` of off-board part `part` (indices into board.offboard and its pins).
    int lugNode(int part, int lug) const { return lugBase_[static_cast<std::size_t>(part)] + lug; }
    /// "D7" for a hole node, "VR1.2" for a lug node.
    std::string nodeName(int node) const;
    /// "R1.2", "link A1-C1", "wire to VR1.2" (for messages about a hole's leads).
    std::string leadName(const Lead& lead) const;
    /// Node of a wire end; -1 when it names nothing on the board.
    int endpointNode(const Endpoint& end) const;
    /// Every link and wire as a pair of nodes (ends that name nothing are left out).
    std::vector<std::pair<int, int>> jumpers() const;

private:
    void collectLeads(const Board& board);

    const Board* board_;
    Connectivity copper_;
    std::vector<Lead> leads_;
    std::vector<int> firstLeadOfPart_;  // index of a part's first lead; -1 if a pin has none
    HoleBits hasLead_;
    HoleBits sharedHole_;  // two or more leads
    std::size_t partPins_ = 0;
    Area leadArea_;
    bool anyShared_ = false;
    bool anyOnCut_ = false;
    std::vector<int> lugBase_;
};

}  // namespace netcheck
