// Edits of an intended circuit as plain functions: each takes the circuit as it is and gives the
// changed copy, or a message saying why the change cannot be made. The Circuit panel wraps the
// result in one SetCircuit command, so every edit is one exact undo step.
#pragma once

#include <string>
#include <variant>
#include <vector>

#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// The changed circuit, or why it could not be changed (shown to the maker as it is).
using CircuitEdit = std::variant<Circuit, std::string>;

/// Adds part `ref` (kind, value, pin names). Refused when the ref is empty, has a '.' or is taken.
CircuitEdit addCircuitPart(const Circuit& circuit, const std::string& ref,
                           const CircuitPart& part);
/// Removes a part and its pins from every net; nets left with no pin go too.
CircuitEdit removeCircuitPart(const Circuit& circuit, const std::string& ref);
/// Replaces a part's kind, value and pin list (and its ref, moving its pins in the nets). Pins
/// no longer in the list leave their nets.
CircuitEdit editCircuitPart(const Circuit& circuit, const std::string& ref,
                            const std::string& newRef, const CircuitPart& part);
/// Puts `pin` into net `net` (made when new), taking it out of any other net first. An empty
/// `net` only takes it out. Nets left with no pin go.
CircuitEdit assignPinToNet(const Circuit& circuit, const PinRef& pin,
                           const std::string& net);
/// Adds net `name` holding `pins`, each taken out of any net it was in. Refused when the name is
/// empty or taken, or when no pin is given (a net of no pin joins nothing).
CircuitEdit addNet(const Circuit& circuit, const std::string& name,
                   const std::vector<PinRef>& pins);
/// Renames a net. Refused when the new name is empty or already names another net.
CircuitEdit renameNet(const Circuit& circuit, const std::string& from,
                      const std::string& to);
/// Moves every pin of net `from` into net `into`, and removes `from`.
CircuitEdit mergeNets(const Circuit& circuit, const std::string& from,
                      const std::string& into);

/// Existing net names containing `typed` (any case), the ones starting with it first; all names
/// when `typed` is empty. At most `limit`.
std::vector<std::string> netNameSuggestions(const Circuit& circuit,
                                            const std::string& typed, std::size_t limit = 12);

/// Pins of a part as the panel lists them: its declared pins, else those named in the nets.
std::vector<std::string> pinsOfPart(const Circuit& circuit, const std::string& ref);

}  // namespace netcheck
