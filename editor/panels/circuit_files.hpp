// Reading a circuit file for the Circuit panel (JSON circuit or SPICE deck, with the maker's SPICE
// options) and writing one (JSON or SPICE by the file name's ending). No window code.
#pragma once

#include <string>
#include <string_view>

#include "netcheck/file/board_file.hpp"
#include "netcheck/spice/spice_import.hpp"

namespace stripsmith {

/// A SPICE deck (by name or content, as looksLikeSpiceDeck decides) read with `options`, anything
/// else as a JSON circuit file. Notes (e.g. values SPICE reads differently) come back in `notes`.
netcheck::ReadResult<netcheck::Circuit> readCircuitForEditor(std::string_view text,
                                                             std::string_view fileName,
                                                             const netcheck::SpiceOptions& options);

/// True when `path` names a SPICE deck to write (.cir, .sp, .spice, .net, .ckt).
bool isSpiceFileName(std::string_view path);

/// The text of a circuit file for `path`: a SPICE deck titled `title` for SPICE names, else the
/// JSON circuit file.
std::string circuitFileText(const netcheck::Circuit& circuit, std::string_view path,
                            std::string_view title);

}  // namespace stripsmith
