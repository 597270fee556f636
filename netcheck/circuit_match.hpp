// Matching the board's parts to the intended circuit by reference designator: missing, extra and
// mismatched parts, the orientation of parts that may sit either way round, and reversed parts
// (private to the checker).
#pragma once

#include <span>
#include <string>
#include <string_view>
#include <vector>

#include "check_context.hpp"
#include "check_report.hpp"
#include "circuit.hpp"

namespace netcheck {

/// A pin of an intended net as placed on the board: the circuit's name for it, its node and its
/// island. The names point into the circuit and the board, which outlive the check.
struct NetPin {
    std::string_view ref;
    const std::string* pin = nullptr;
    int node = 0;
    int island = 0;

    PinRef pinRef() const { return PinRef{std::string(ref), *pin}; }
    std::string name() const { return std::string(ref) + "." + *pin; }
    /// The order of PinRef: by ref, then by pin name.
    bool operator<(const NetPin& other) const {
        return ref != other.ref ? ref < other.ref : *pin < *other.pin;
    }
};

/// An intended net with the pins the board actually has (pins of missing parts left out).
struct PlacedNet {
    std::string_view name;
    std::span<const NetPin> pins;  ///< into CircuitMatch::netPins
};

struct CircuitMatch {
    std::vector<Finding> errors;    ///< part findings, by ref
    std::vector<Finding> warnings;  ///< value-differs, pot-reversed
    std::vector<PlacedNet> nets;    ///< in circuit order (sorted by name)
    std::vector<NetPin> netPins;    ///< the pins of every net, net after net

    // The nets point into netPins: moving keeps them valid, a copy would not.
    CircuitMatch() = default;
    CircuitMatch(CircuitMatch&&) = default;
    CircuitMatch& operator=(CircuitMatch&&) = default;
    CircuitMatch(const CircuitMatch&) = delete;
    CircuitMatch& operator=(const CircuitMatch&) = delete;
};

/// Matches the board's parts and pins to `circuit`.
CircuitMatch matchCircuit(const CheckContext& context, const Circuit& circuit);

}  // namespace netcheck
