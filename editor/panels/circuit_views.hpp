// The parts of the Circuit panel, one file each; drawCircuitPanel (panel_circuit.cpp) puts them in
// tabs. Private to the panel.
#pragma once

#include <string>

#include "editor/panels/panels.hpp"
#include "netcheck/edit/circuit_edits.hpp"

namespace stripsmith {

/// Performs an edit as one SetCircuit command labelled `label`, or shows why it was refused.
void applyCircuitEdit(const CircuitPanelContext& c, const netcheck::CircuitEdit& edit,
                      const std::string& label);

/// Parts with kind, value and pins; add, edit, remove; a net name for every pin.
void drawCircuitParts(const CircuitPanelContext& c, const netcheck::Circuit& circuit);
/// Nets with their pins; rename and merge.
void drawCircuitNets(const CircuitPanelContext& c, const netcheck::Circuit& circuit);

/// The whole circuit as text: typed, read live with located errors, applied as one command.
void drawCircuitText(const CircuitPanelContext& c);

/// The board beside the circuit, net by net, as the check sees it.
void drawCircuitDifference(const netcheck::Board& board, CircuitPanelState& state);

/// Text box for a net name with a drop-down of matching existing names. True when the maker
/// confirmed a name (Enter, leaving the box after typing, or a pick from the list); then `text`
/// holds it.
bool netNameInput(const char* id, std::string& text, const netcheck::Circuit& circuit, float width);

}  // namespace stripsmith
