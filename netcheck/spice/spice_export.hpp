// Writing a circuit as a SPICE deck that ngspice parses and importSpice reads back unchanged.
#pragma once

#include <string>
#include <string_view>

#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// A deck with one element per part: R, C, L, D, Q, J, M where the kind has one (with a `.model`
/// line per model name), two resistors and a `*@pot` line for a pot, and a call of an empty
/// `.subckt` for anything else (jacks, ICs, switches). `*@` annotation lines restore what SPICE
/// cannot carry (kinds, board refs, value text, pin and net names), so importSpice with default
/// options gives the same circuit (part and circuit `extra` keys are not carried).
std::string exportSpice(const Circuit& circuit, std::string_view title);

}  // namespace netcheck
