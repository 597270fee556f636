// Matching the board's parts to the intended circuit by reference designator: missing, extra and
// mismatched parts, the orientation of parts that may sit either way round, and reversed parts
// (private to the checker).
#pragma once

#include <string>
#include <vector>

#include "check_context.hpp"
#include "check_report.hpp"
#include "circuit.hpp"

namespace netcheck {

/// A pin of an intended net as placed on the board: the circuit's name for it and its node.
struct NetPin {
    PinRef pin;
    int node = 0;
};

/// An intended net with the pins the board actually has (pins of missing parts left out).
struct PlacedNet {
    std::string name;
    std::vector<NetPin> pins;
};

struct CircuitMatch {
    std::vector<Finding> errors;    ///< part findings, by ref
    std::vector<Finding> warnings;  ///< value-differs, pot-reversed
    std::vector<PlacedNet> nets;    ///< in circuit order (sorted by name)
};

/// Matches the board's parts and pins to `circuit`.
CircuitMatch matchCircuit(const CheckContext& context, const Circuit& circuit);

}  // namespace netcheck
