// Which nets the operating point really settles. A net is known when a path of parts carrying
// current (or resistors, which hold a net even without current) joins it to ground without
// passing a net on a pin of a part left out of the deck (an IC): the voltage of anything else
// would be a guess.
#pragma once

#include <string>
#include <vector>

#include "netcheck/voltage/dc_deck.hpp"

namespace netcheck {

enum class NetState {
    Known,     ///< set by the simulated parts
    Unknown,   ///< depends on a part with no model
    NoDcPath,  ///< joined to nothing that sets a DC voltage (only capacitors, a switched-off part)
};

struct NetSettlement {
    NetState state = NetState::Known;
    std::string why;  ///< for Unknown and NoDcPath
};

/// One settlement per net of `deck`, judged at the operating point `volts` (per net).
std::vector<NetSettlement> settleNets(const DcDeck& deck, const std::vector<double>& volts);

}  // namespace netcheck
