// Reference designators: the letter prefix for a kind and the next free number (R1, R2, ...).
#pragma once

#include <string>
#include <string_view>

#include "netcheck/model/board.hpp"

namespace stripsmith {

/// Common prefix for a kind: resistor "R", capacitor "C", bjt "Q", ic "U", pot "VR" ...;
/// "X" for unknown kinds.
std::string refPrefix(std::string_view kind);

/// The lowest-numbered free ref with that prefix among on-board and off-board parts
/// (and circuit parts, so a new part does not take the name of one not placed yet).
std::string nextFreeRef(const netcheck::Board& board, std::string_view prefix);

/// True when some on-board or off-board part other than `except` already uses `ref`.
bool refTaken(const netcheck::Board& board, std::string_view ref, std::string_view except = {});

/// The prefix of a ref: letters before the trailing digits ("R12" -> "R", "VR3" -> "VR").
std::string prefixOf(std::string_view ref);

}  // namespace stripsmith
