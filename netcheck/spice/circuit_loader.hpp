// Loading an intended circuit from a file given beside the board (`--circuit FILE`).
#pragma once

#include <string_view>

#include "netcheck/file/board_file.hpp"
#include "netcheck/model/circuit.hpp"
#include "netcheck/file/read_limits.hpp"
#include "netcheck/spice/spice_import.hpp"

namespace netcheck {

/// Reads circuit file text, choosing the reader by file name and content: SPICE decks (read with
/// `spice`), otherwise JSON circuit files (the shape of a board file's `circuit` object).
ReadResult<Circuit> loadCircuitText(std::string_view text, std::string_view fileName,
                                    const ReadLimits& limits = {}, const SpiceOptions& spice = {});

}  // namespace netcheck
