// Circuit text (the Circuit panel's Text tab): any bytes read to a circuit or to errors, each
// placed on a line and column of the input; a circuit that reads prints back to text that reads
// to the same circuit.
#include <algorithm>
#include <cstddef>
#include <cstdint>
#include <string_view>

#include "fuzz_check.hpp"
#include "netcheck/file/circuit_text.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    const netcheck::CircuitTextResult first = netcheck::parseCircuitText(text);
    fuzz::require(first.ok() == first.errors.empty(), "a circuit exactly when there is no error");
    const auto lines = static_cast<int>(std::count(text.begin(), text.end(), '\n')) + 1;
    for (const netcheck::CircuitTextError& error : first.errors) {
        fuzz::require(error.line >= 1 && error.line <= lines, "an error's line is in the text");
        fuzz::require(error.column >= 1, "an error's column is at least 1");
        fuzz::require(!error.message.empty(), "an error says what is wrong");
    }
    if (!first.ok()) return 0;
    const netcheck::CircuitTextResult second = netcheck::parseCircuitText(netcheck::circuitText(*first.circuit));
    fuzz::require(second.ok(), "printed circuit text reads back");
    fuzz::require(*second.circuit == *first.circuit, "printed circuit text reads back unchanged");
    return 0;
}
