// The one place that decides how a circuit file is read.
#include "circuit_loader.hpp"

#include "spice/spice_import.hpp"

namespace netcheck {

ReadResult<Circuit> loadCircuitText(std::string_view text, std::string_view fileName,
                                    const ReadLimits& limits) {
    // SPICE decks (.cir, .sp, .spice, .net, .ckt, or text that is not JSON) with default options.
    if (looksLikeSpiceDeck(text, fileName)) {
        return importSpice(text, fileName, SpiceOptions{}, limits);
    }
    return readCircuit(text, fileName, limits);
}

}  // namespace netcheck
