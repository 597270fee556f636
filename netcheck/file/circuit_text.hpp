// The intended circuit as short lines of text, typed as fast as a schematic is read: one line per
// part ("R1 resistor 1k : VCC LED_A", its nets in the kind's pin order) or one line per net
// ("VCC: R1.1 D1.A"), mixed freely. docs/editor.md describes the syntax for makers.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// One problem in circuit text. `line` and `column` are 1-based; the column counts characters.
struct CircuitTextError {
    int line = 0;
    int column = 0;
    std::string message;
    /// "line 3, column 12: unknown kind "resister" ..."
    std::string describe() const;
    bool operator==(const CircuitTextError&) const = default;
};

/// What a text says: the circuit when it has no error, else its errors in text order.
struct CircuitTextResult {
    std::optional<Circuit> circuit;
    std::vector<CircuitTextError> errors;
    bool ok() const { return circuit.has_value(); }
};

/// Errors listed at most; past them the maker fixes the first ones first.
inline constexpr std::size_t kMaxCircuitTextErrors = 50;

/// Reads circuit text. Part lines declare no pin list (a part's pins are the ones in its nets, as
/// in circuits read from SPICE decks); the pins of every net come out sorted.
CircuitTextResult parseCircuitText(std::string_view text);

/// The circuit as text parseCircuitText reads back to the same parts and nets: one line per
/// part (nets in pin order, or PIN=NET where the pins do not follow the kind's order), then net
/// lines for pins no part line can hold (undeclared parts, pins the kind does not have) and for
/// nets without pins. Ends with a line break.
std::string circuitText(const Circuit& circuit);

/// `typed` with what text cannot say taken from `before`: unknown keys kept for round trips, the
/// declared pin list of a part that keeps its kind and uses only those pins, and the order of pins
/// in a net whose pins did not change. Applying text that says what `before` says gives `before`.
Circuit keepWhatTextCannotSay(Circuit typed, const Circuit& before);

}  // namespace netcheck
