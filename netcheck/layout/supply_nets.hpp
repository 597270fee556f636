// Which nets of a circuit are its supply: the positive one and 0 V, for the layout engine's
// "supply rails" option (the top strip carries the positive supply and the bottom strip 0 V, as
// makers lay out stripboards so the power strips are easy to find; common practice).
#pragma once

#include <optional>
#include <string>

#include "netcheck/model/circuit.hpp"

namespace netcheck {

struct SupplyNets {
    std::optional<std::string> positive;
    std::optional<std::string> ground;
};

/// By the parts first: the "+" and "-" of a battery or DC jack (a regulator's GND is 0 V); then
/// by name: VCC, VDD, V+, VIN or a name starting with "+" is positive; GND, 0, 0V, VSS, V- is
/// 0 V. A net is never both.
SupplyNets findSupplyNets(const Circuit& circuit);

}  // namespace netcheck
