// Commands on on-board parts: add, remove, replace (move, rotate, stretch, property edits).
#pragma once

#include <string>
#include <vector>

#include "netcheck/edit/element_commands.hpp"

namespace netcheck::edit {

/// The board's on-board parts, for the element commands. Labels: "Add R1", "Remove R1", and for a
/// change "Move R1", "Rotate R1", "Stretch R1", "Set pinout of Q1",
/// "Rename R1 to R2", "Set R1 to 4k7", "Edit R1".
struct PartList {
    using Element = Part;
    static std::vector<Part>& of(Board& board) { return board.parts; }
    static const std::vector<Part>& of(const Board& board) { return board.parts; }
    static std::string addLabel(const Part& part);
    static std::string removeLabel(const Part& part);
    static std::string changeLabel(const Part& before, const Part& after);
    static std::vector<Hole> holes(const Part& part);
};

/// Adds a part (at the end of the list unless an index is given).
using AddPart = AddElement<PartList>;
/// Removes the part at an index.
using RemovePart = RemoveElement<PartList>;
/// Replaces the part at an index; consecutive replaces of the same part merge (drags).
using ReplacePart = ReplaceElement<PartList>;

}  // namespace netcheck::edit
