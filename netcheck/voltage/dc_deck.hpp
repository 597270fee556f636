// The intended circuit as a DC operating-point deck for ngspice: one node per net, each part by
// its DC model (part_models.hpp), and the parameter values to vary for tolerances.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"
#include "netcheck/voltage/part_models.hpp"

namespace netcheck {

/// A net of the circuit and its deck node ("0" for ground).
struct DcNet {
    std::string name;
    std::string node;
    std::vector<PinRef> pins;
};

/// A part with its model and the node of each model pin.
struct DcPart {
    std::string ref;
    CircuitPart part;
    DcModel model;
    std::vector<int> netOfPin;  ///< per model pin: index into DcDeck::nets, -1 when unconnected
    std::vector<std::string> nodes;
};

/// Parameter values for every part, `values[i]` for parts[i] in model parameter order.
using DeckValues = std::vector<std::vector<double>>;

struct DcDeck {
    std::vector<DcNet> nets;
    int ground = -1;  ///< index into nets
    std::vector<DcPart> parts;

    /// The deck's lines, title first, ending with ".end". Every node has a 1 TOhm shunt to
    /// ground (ngspice's rshunt) so that nets joined only by capacitors do not make the matrix
    /// singular; such nets are then reported as having no DC path, not as 0 V.
    std::vector<std::string> lines(const DeckValues& values) const;
    DeckValues nominal() const;
    /// Deck node names of the nets, in net order.
    std::vector<std::string> nodes() const;
};

/// Builds the deck, or explains why it cannot: no supply with a known voltage, no ground.
/// Part values come from the circuit, or from the board's part of the same ref where the
/// circuit's is empty (an LED's colour is often written only on the board); "spice_model"
/// settings from either (the board's win).
struct DcDeckResult {
    std::optional<DcDeck> deck;
    std::string error;
};
DcDeckResult buildDcDeck(const Circuit& circuit, const Board* board,
                         const DcModelOptions& options);

/// The net taken as 0 V: one named GND, 0, 0V, GROUND, VSS or COM (in any case), else the
/// negative terminal of the first battery or DC jack. -1 when there is none.
int findGround(const std::vector<DcNet>& nets, const std::vector<DcPart>& parts);

}  // namespace netcheck
