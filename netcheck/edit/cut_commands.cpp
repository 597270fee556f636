#include "netcheck/edit/cut_commands.hpp"

#include <algorithm>

namespace netcheck::edit {

std::string CutList::changeLabel(const Cut& before, const Cut& /*after*/) {
    return "Move cut " + cutName(before);
}

std::vector<Hole> CutList::holes(const Cut& cut) {
    if (cut.kind == Cut::Kind::Between) return {cut.hole, Hole{cut.hole.row, cut.hole.col + 1}};
    return {cut.hole};
}

std::unique_ptr<Command> toggleCut(const Board& board, const Cut& cut) {
    const auto found = std::find(board.cuts.begin(), board.cuts.end(), cut);
    if (found == board.cuts.end()) return std::make_unique<AddCut>(cut);
    return std::make_unique<RemoveCut>(board,
                                       static_cast<std::size_t>(found - board.cuts.begin()));
}

}  // namespace netcheck::edit
