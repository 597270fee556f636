// Board files: any bytes read to a board or a located error, never a crash, hang or leak; and a
// board that reads writes back to text that reads to the same board.
#include <cstddef>
#include <cstdint>
#include <string_view>

#include "fuzz_check.hpp"
#include "netcheck/file/board_file.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    const auto first = netcheck::readBoard(text, "fuzz.board.json");
    fuzz::require(first.ok() != first.error.has_value(), "exactly one of value and error");
    if (!first.ok()) {
        fuzz::require(!first.error->message.empty(), "an error says what is wrong");
        return 0;
    }
    const std::string written = netcheck::writeBoard(*first.value);
    const auto second = netcheck::readBoard(written, "written.board.json");
    fuzz::require(second.ok(), "a written board reads back");
    fuzz::require(*second.value == *first.value, "a written board reads back unchanged");
    fuzz::require(netcheck::writeBoard(*second.value) == written, "writing is stable");
    return 0;
}
