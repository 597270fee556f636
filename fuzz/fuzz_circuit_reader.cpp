// Circuit files: any bytes read to a circuit or a located error; a circuit that reads writes
// back to text that reads to the same circuit.
#include <cstddef>
#include <cstdint>
#include <string_view>

#include "fuzz_check.hpp"
#include "netcheck/file/board_file.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    const auto first = netcheck::readCircuit(text, "fuzz.circuit.json");
    fuzz::require(first.ok() != first.error.has_value(), "exactly one of value and error");
    if (!first.ok()) return 0;
    const std::string written = netcheck::writeCircuit(*first.value);
    const auto second = netcheck::readCircuit(written, "written.circuit.json");
    fuzz::require(second.ok(), "a written circuit reads back");
    fuzz::require(*second.value == *first.value, "a written circuit reads back unchanged");
    return 0;
}
