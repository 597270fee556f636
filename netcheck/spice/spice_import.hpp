// The intended circuit from a SPICE deck (SPICE3/ngspice deck rules), with our own comment
// annotations for what SPICE cannot say (pots, electrolytics, board refs). See README.md here.
#pragma once

#include <string>
#include <string_view>

#include "netcheck/file/board_file.hpp"
#include "netcheck/model/circuit.hpp"
#include "netcheck/file/read_limits.hpp"

namespace netcheck {

/// How a deck becomes a circuit.
struct SpiceOptions {
    std::string groundName = "GND";  ///< the net name of node 0 (and its alias gnd)
    bool flatten = false;            ///< replace subcircuit calls by their elements (refs X1.R3)
    /// V and I elements: ignored, or V read as an off-board supply (kind "battery", pins +, -).
    enum class Sources { Ignore, Offboard } sources = Sources::Ignore;
};

/// Reads a deck. Every remark (ignored commands and sources, values such as 4K7 that SPICE reads
/// differently from the IEC code, unknown kinds) is in `notes` as "file:line: text". A malformed
/// deck gives an error naming file and line, and no circuit.
ReadResult<Circuit> importSpice(std::string_view text, std::string_view fileName,
                                const SpiceOptions& options, const ReadLimits& limits = {});

/// True when a file should be read as a SPICE deck: its extension is .cir, .sp, .spice, .net or
/// .ckt, or (any other name) its text does not start with '{'.
bool looksLikeSpiceDeck(std::string_view text, std::string_view fileName);

}  // namespace netcheck
