// SPICE decks: any bytes import to a circuit or an error naming a line, never a crash, hang or
// leak. The first byte picks the options (flatten subcircuits, sources off-board).
#include <cstddef>
#include <cstdint>
#include <string_view>

#include "fuzz_check.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/spice/spice_import.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    netcheck::SpiceOptions options;
    if (size > 0) {
        options.flatten = (data[0] & 1) != 0;
        options.sources = (data[0] & 2) != 0 ? netcheck::SpiceOptions::Sources::Offboard
                                             : netcheck::SpiceOptions::Sources::Ignore;
    }
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    const auto result = netcheck::importSpice(text, "fuzz.cir", options);
    fuzz::require(result.ok() != result.error.has_value(), "exactly one of value and error");
    if (result.ok()) {
        // An imported circuit is one the circuit file format can hold.
        const auto back = netcheck::readCircuit(netcheck::writeCircuit(*result.value), "x.json");
        fuzz::require(back.ok(), "an imported circuit can be saved and read back");
    }
    (void)netcheck::looksLikeSpiceDeck(text, "fuzz.cir");
    return 0;
}
