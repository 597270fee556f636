// Where to put the meter's red lead for a net: a hole on the copper that is free and at an end of
// its strip, nearest a board edge (easy to reach, away from the leads), or an off-board lug.
#pragma once

#include <set>
#include <string>
#include <vector>

#include "netcheck/check/connectivity.hpp"
#include "netcheck/model/board.hpp"

namespace netcheck {

class ProbePoints {
public:
    /// Keeps references to `board` and `copper`, which must outlive it unchanged.
    ProbePoints(const Board& board, const Connectivity& copper);

    /// The probe point of the island holding most of `pins` (the circuit's pins of one net):
    /// "C1", or "BT1.+" when the net has no hole, or "" when none of its pins is on the board.
    /// `split` is set when the pins are on more than one island (an open on the board).
    std::string find(const std::vector<PinRef>& pins, bool& split) const;

    /// The island a probe point is on, -1 for none (the editor's overlay).
    int islandOf(const std::vector<PinRef>& pins) const;

private:
    /// Islands `pin` may be on: its own, and its partner's for a reversible two-lead part.
    std::vector<int> islandsOf(const PinRef& pin) const;

    const Board& board_;
    const Connectivity& copper_;
    std::set<Hole> occupied_;  ///< holes with a lead, a link end or a wire end
};

}  // namespace netcheck
