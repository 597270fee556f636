// Making parts for the place tools: pin layout by kind, rotation, stretching and pinout changes.
// Pure functions of the board model, so they are tested without a window.
#pragma once

#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "netcheck/model/board.hpp"

namespace stripsmith {

/// Kinds placed by their two ends (click-click or drag); the rest place as a unit.
bool isTwoLead(std::string_view kind);

/// Default pin count of a multi-pin kind (ic 8, header 4, three-lead parts 3).
int defaultPinCount(std::string_view kind);

/// Pin names for a kind with `count` pins: the kind's table names, else "1".."N".
std::vector<std::string> pinNamesFor(std::string_view kind, int count);

/// A two-lead part from its first to its second hole, pins named by the kind.
netcheck::Part makeTwoLeadPart(std::string_view kind, std::string ref, std::string value,
                               netcheck::Hole first, netcheck::Hole second);

/// A multi-pin part with pin 1 at `anchor`, turned `quarterTurns` x 90° clockwise. Three-lead
/// parts and headers stand in one column (each lead on its own strip); a DIP has pins 1..N/2 down
/// one column and the rest up the column three holes to the right (0.3 in across the strips).
netcheck::Part makeMultiPinPart(std::string_view kind, std::string ref, std::string value,
                                netcheck::Hole anchor, int quarterTurns, int pinCount);

/// Second hole of a two-lead part of this kind placed with one click (default span, lying flat
/// along the strip, or standing when `standing`).
netcheck::Hole defaultSecondHole(std::string_view kind, netcheck::Hole first, bool standing);

/// The part turned 90° clockwise about its first pin.
netcheck::Part rotatePart(const netcheck::Part& part);

/// The part moved by whole holes.
netcheck::Part movePart(const netcheck::Part& part, int rows, int cols);

/// True when every pin lies on the board.
bool fitsOnBoard(const netcheck::Part& part, const netcheck::Board& board);

/// Pin orders a maker can pick for a three-lead kind (bjt: E-B-C, C-B-E, B-C-E ...); empty for
/// other kinds.
std::vector<std::string> pinoutChoices(std::string_view kind);

/// Renames the pins in hole order to the names in `pinout` ("E-B-C"): the first hole becomes E,
/// and so on; records extra["pinout"]. Nullopt when the names do not match the pin count.
std::optional<netcheck::Part> applyPinout(const netcheck::Part& part, std::string_view pinout);

}  // namespace stripsmith
