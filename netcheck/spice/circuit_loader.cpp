// The one place that decides how a circuit file is read.
#include "netcheck/spice/circuit_loader.hpp"

namespace netcheck {

ReadResult<Circuit> loadCircuitText(std::string_view text, std::string_view fileName,
                                    const ReadLimits& limits, const SpiceOptions& spice) {
    // SPICE decks: .cir, .sp, .spice, .net, .ckt, or text that is not JSON.
    if (looksLikeSpiceDeck(text, fileName)) {
        return importSpice(text, fileName, spice, limits);
    }
    return readCircuit(text, fileName, limits);
}

}  // namespace netcheck
