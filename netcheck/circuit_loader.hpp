// Loading an intended circuit from a file given beside the board (`--circuit FILE`).
#pragma once

#include <string_view>

#include "board_file.hpp"
#include "circuit.hpp"
#include "read_limits.hpp"

namespace netcheck {

/// Reads circuit file text, choosing the reader by file name. JSON circuit files (the shape of a
/// board file's `circuit` object) today; other formats add a branch here.
ReadResult<Circuit> loadCircuitText(std::string_view text, std::string_view fileName,
                                    const ReadLimits& limits = {});

}  // namespace netcheck
