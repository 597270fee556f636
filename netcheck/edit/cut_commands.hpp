// Commands on track cuts: add, remove, and the toggle the cut tool uses.
#pragma once

#include <memory>
#include <string>
#include <vector>

#include "netcheck/edit/element_commands.hpp"

namespace netcheck::edit {

/// The board's cuts, for the element commands. Labels: "Add cut C5", "Remove cut D7|D8".
struct CutList {
    using Element = Cut;
    static std::vector<Cut>& of(Board& board) { return board.cuts; }
    static const std::vector<Cut>& of(const Board& board) { return board.cuts; }
    static std::string addLabel(const Cut& cut) { return "Add cut " + cutName(cut); }
    static std::string removeLabel(const Cut& cut) { return "Remove cut " + cutName(cut); }
    static std::string changeLabel(const Cut& before, const Cut& after);
    /// A hole cut touches its hole; a between cut both holes beside it.
    static std::vector<Hole> holes(const Cut& cut);
};

/// Adds a cut (at the end of the list unless an index is given).
using AddCut = AddElement<CutList>;
/// Removes the cut at an index.
using RemoveCut = RemoveElement<CutList>;
/// Moves the cut at an index (dragging a cut); consecutive moves merge.
using ReplaceCut = ReplaceElement<CutList>;

/// What a click with the cut tool does: removes `cut` if the board has it, adds it otherwise.
std::unique_ptr<Command> toggleCut(const Board& board, const Cut& cut);

}  // namespace netcheck::edit
