// Commands on off-board parts (pots, jacks, switches ...): add, remove, replace.
#pragma once

#include <string>
#include <vector>

#include "netcheck/edit/element_commands.hpp"

namespace netcheck::edit {

/// The board's off-board parts, for the element commands. Labels: "Add VR1", "Remove VR1",
/// "Rename VR1 to VR2", "Set VR1 to B100k", "Edit VR1". They sit in no hole: touched() is empty.
/// Removing one leaves its wires; deleteElements() (selection_commands.hpp) removes both.
struct OffboardList {
    using Element = OffboardPart;
    static std::vector<OffboardPart>& of(Board& board) { return board.offboard; }
    static const std::vector<OffboardPart>& of(const Board& board) { return board.offboard; }
    static std::string addLabel(const OffboardPart& part) { return "Add " + part.ref; }
    static std::string removeLabel(const OffboardPart& part) { return "Remove " + part.ref; }
    static std::string changeLabel(const OffboardPart& before, const OffboardPart& after);
    static std::vector<Hole> holes(const OffboardPart&) { return {}; }
};

/// Adds an off-board part (at the end of the list unless an index is given).
using AddOffboard = AddElement<OffboardList>;
/// Removes the off-board part at an index (its wires stay).
using RemoveOffboard = RemoveElement<OffboardList>;
/// Replaces the off-board part at an index; consecutive replaces merge.
using ReplaceOffboard = ReplaceElement<OffboardList>;

}  // namespace netcheck::edit
