// Commands on flying leads (wires): add, remove, replace (move an end, recolour).
#pragma once

#include <string>
#include <vector>

#include "netcheck/edit/element_commands.hpp"

namespace netcheck::edit {

/// The board's wires, for the element commands. Labels: "Add wire VR1.2–B3",
/// "Remove wire VR1.2–B3", "Move wire VR1.2–B3", "Colour wire VR1.2–B3 red", "Edit wire ...".
struct WireList {
    using Element = Wire;
    static std::vector<Wire>& of(Board& board) { return board.wires; }
    static const std::vector<Wire>& of(const Board& board) { return board.wires; }
    static std::string addLabel(const Wire& wire);
    static std::string removeLabel(const Wire& wire);
    static std::string changeLabel(const Wire& before, const Wire& after);
    /// The ends that are holes.
    static std::vector<Hole> holes(const Wire& wire);
};

/// Adds a wire (at the end of the list unless an index is given).
using AddWire = AddElement<WireList>;
/// Removes the wire at an index.
using RemoveWire = RemoveElement<WireList>;
/// Replaces the wire at an index; consecutive replaces merge.
using ReplaceWire = ReplaceElement<WireList>;

}  // namespace netcheck::edit
