// The board beside its intended circuit, net by net, as the editor's Circuit panel shows it. Built
// from the check's own matching, so it never disagrees with the check's findings.
#pragma once

#include <string>
#include <vector>

#include "netcheck/model/board.hpp"

namespace netcheck {

/// One net of the circuit against the copper. Pins are named as the circuit names them: a part
/// the check takes as turned end for end shows its pins by their circuit names.
struct NetDifference {
    std::string net;
    std::vector<PinRef> inCircuit;       ///< the pins the circuit names
    std::vector<PinRef> onBoard;         ///< every pin on the islands those pins are on
    std::vector<PinRef> missingOnBoard;  ///< named by the circuit, not joined on the board
    std::vector<PinRef> extraOnBoard;    ///< joined on the board, not in this net
    bool same() const { return missingOnBoard.empty() && extraOnBoard.empty(); }
};

/// A part on both sides whose value the check finds different (value-mismatch or value-differs).
struct PartDifference {
    std::string ref;
    std::string boardKind, circuitKind;
    std::string boardValue, circuitValue;
};

/// Board against circuit, in the circuit's net order. Empty when the board has no circuit.
struct CircuitDifference {
    std::vector<NetDifference> nets;
    std::vector<std::string> partsOnlyOnBoard;    ///< the check's extra-part refs
    std::vector<std::string> partsOnlyInCircuit;  ///< the check's missing-part refs
    std::vector<PartDifference> parts;
    bool same() const;
};

/// Compares the board's copper (on-board and off-board parts, links, wires) with its circuit.
CircuitDifference compareBoardWithCircuit(const Board& board);

}  // namespace netcheck
