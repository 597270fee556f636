// Matching the board's parts to the intended circuit by reference designator: the check, the
// board-versus-circuit view (board_vs_circuit.hpp) and the repair code all read this one match.
#pragma once

#include <span>
#include <string>
#include <string_view>
#include <vector>

#include "netcheck/check/check_report.hpp"
#include "netcheck/check/checked_board.hpp"
#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// One pin of a board part as the circuit sees it.
struct MatchedPin {
    std::string_view name;   ///< the board's pin name
    std::string_view meant;  ///< the circuit's name for what sits here (differs when turned round)
    int node = -1;           ///< -1 for a pin outside the board: it joins nothing
    int island = -1;
    int net = -1;  ///< index into CircuitMatch::nets; -1 when the circuit does not care
};

/// A ref the circuit names, with the board part of that ref when there is one (the first of that
/// ref, on-board parts before off-board ones).
struct MatchedPart {
    std::string_view ref;
    const Part* part = nullptr;              ///< on the board
    const OffboardPart* offboard = nullptr;  ///< off the board
    const CircuitPart* declared = nullptr;   ///< null when the ref appears only in nets
    std::span<MatchedPin> pins;  ///< the board part's pins, in its order (in CircuitMatch)
    std::vector<std::string> unknownPins;  ///< pins the circuit uses that the part lacks, sorted

    bool found() const { return part != nullptr || offboard != nullptr; }
    const std::string& kind() const { return part ? part->kind : offboard->kind; }
    const std::string& value() const { return part ? part->value : offboard->value; }
    /// Index of the board pin of that name; -1 when the part has none.
    int findPin(std::string_view name) const;
    /// Where pin k is, for messages: "D7" on the board, "VR1.2" off it.
    std::string place(std::size_t k) const;
    /// What the circuit expects at two pins is swapped (the part taken as turned round).
    void swapPins(std::size_t a, std::size_t b);
    /// A finding about this part, with its placed pins' holes to highlight.
    Finding finding(FindingType type, std::string message) const;
};

/// A pin of an intended net as placed on the board, named as the circuit names it.
struct NetPin {
    std::string_view ref;
    std::string_view pin;
    int node = 0;
    int island = 0;

    PinRef pinRef() const { return PinRef{std::string(ref), std::string(pin)}; }
    std::string name() const { return pinRef().name(); }
    bool operator<(const NetPin& other) const {
        return ref != other.ref ? ref < other.ref : pin < other.pin;
    }
};

/// An intended net with the pins the board has (pins of missing parts, of parts whose pins do
/// not fit the circuit, and outside the board left out), in ref order.
struct Net {
    std::string_view name;
    std::span<const NetPin> pins;  ///< in CircuitMatch::netPins
};

/// The pins of all parts, and of all nets, each lie in one array (two allocations for a whole
/// board rather than one per part and per net: on the editor's board that halves the time of a
/// check); parts and nets hold their stretch of it. Moving a match keeps the stretches valid,
/// copying would not (so the move operations are declared: that leaves it without a copy). Names
/// point into the board and the circuit, which must outlive the match.
struct CircuitMatch {
    std::vector<MatchedPart> parts;  ///< every ref the circuit names, by ref
    std::vector<Net> nets;           ///< in the circuit's order (by name)
    std::vector<MatchedPin> pins;    ///< the parts' pins, part after part
    std::vector<NetPin> netPins;     ///< the nets' pins, net after net
    std::vector<Finding> errors;     ///< part findings: missing, extra, pins, values, reversed
    std::vector<Finding> warnings;   ///< value-differs, pot-reversed

    CircuitMatch() = default;
    CircuitMatch(CircuitMatch&&) = default;
    CircuitMatch& operator=(CircuitMatch&&) = default;
};

/// The pins of a net that lie in one island.
struct NetPiece {
    int island = 0;
    std::vector<const NetPin*> pins;  ///< sorted by pin name
};

/// The net's pins grouped by island, pieces in the order of their first pin.
std::vector<NetPiece> netPieces(const Net& net);

/// Matches the board's parts and pins to `circuit`, orients the parts that may sit either way
/// round, and reports what differs part by part.
CircuitMatch matchCircuit(const CheckedBoard& checked, const Circuit& circuit);

/// Settles which way round each part sits (see check.cpp) and reports reversed parts and pots.
void orientParts(const CheckedBoard& checked, CircuitMatch& match);

}  // namespace netcheck
