// The circuit as the layout engine sees it: nets numbered, each on-board part with the shapes it
// may stand in, each off-board part with its lugs.
#pragma once

#include <map>
#include <string>
#include <vector>

#include "netcheck/layout/detail/strip_sweep.hpp"
#include "netcheck/layout/lead_rules.hpp"
#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"

namespace netcheck::layout_detail {

/// An on-board part to place.
struct PartToPlace {
    std::string ref;
    LeadRule rule;
    std::vector<int> nets;      ///< per pin of rule.pins
    std::vector<Shape> shapes;  ///< preferred first
};

/// An off-board part: its lugs and their nets (-1 for a lug no net uses).
struct OffboardToWire {
    std::string ref;
    LeadRule rule;
    std::vector<int> nets;  ///< per lug of rule.pins
};

/// A part already on the board, kept where it is.
struct PlacedPart {
    const Part* part = nullptr;
    std::vector<int> nets;  ///< per pin of part->pins
    int dipColumn = -1;     ///< a DIP standing as the engine places them: its first pin column
};

struct LayoutCircuit {
    std::vector<std::string> netNames;  ///< by net number; pins on no net get a net of their own
    std::vector<PartToPlace> parts;
    std::vector<OffboardToWire> offboard;
    std::vector<PlacedPart> placed;
    std::vector<char> onBoard;          ///< per net: has a pin on the board (else lugs only)
    std::vector<int> uses;              ///< per net: leads on the board (pins and wire ends)
};

/// Numbers the nets and gives each part its shapes. Parts of `placed` (may be null) that the
/// circuit names stay; the rest of the circuit's parts are to place.
LayoutCircuit describeCircuit(const Circuit& circuit, const Board* placed);

}  // namespace netcheck::layout_detail
