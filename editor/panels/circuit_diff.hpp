// The board beside its intended circuit: for each net, the pins the board joins against the pins
// the circuit names; parts on one side only; values and kinds that differ.
#pragma once

#include <string>
#include <vector>

#include "netcheck/model/board.hpp"

namespace stripsmith {

/// One net of the circuit against the copper.
struct NetDifference {
    std::string net;
    std::vector<netcheck::PinRef> inCircuit;  ///< the pins the circuit names
    std::vector<netcheck::PinRef> onBoard;    ///< every pin on the islands those pins are on
    std::vector<netcheck::PinRef>
        missingOnBoard;                          ///< named by the circuit, not joined on the board
    std::vector<netcheck::PinRef> extraOnBoard;  ///< joined on the board, not in this net
    bool same() const { return missingOnBoard.empty() && extraOnBoard.empty(); }
};

/// A part that is on both sides with a different value or kind.
struct PartDifference {
    std::string ref;
    std::string boardKind, circuitKind;
    std::string boardValue, circuitValue;
};

/// Board against circuit, in the circuit's net order. Empty when the board has no circuit.
struct CircuitDifference {
    std::vector<NetDifference> nets;
    std::vector<std::string> partsOnlyOnBoard;
    std::vector<std::string> partsOnlyInCircuit;
    std::vector<PartDifference> parts;
    bool same() const;
};

/// Compares the board's copper (on-board and off-board parts, links, wires) with its circuit.
/// Values compare as quantities where both read as one (4.7k equals 4k7), else as text.
CircuitDifference compareBoardWithCircuit(const netcheck::Board& board);

}  // namespace stripsmith
