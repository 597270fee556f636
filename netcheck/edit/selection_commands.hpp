// Commands on a selection of several elements: delete and move, as one undo step each.
#pragma once

#include <compare>
#include <cstddef>
#include <memory>
#include <string>
#include <vector>

#include "netcheck/edit/command.hpp"

namespace netcheck::edit {

/// One selected element: which list it is in and its index there.
struct ElementRef {
    enum class Kind { Part, Link, Cut, Offboard, Wire };
    Kind kind = Kind::Part;
    std::size_t index = 0;
    auto operator<=>(const ElementRef&) const = default;
};

/// Removes every referenced element (duplicates ignored) as one step. Removing an off-board part
/// also removes the wires to its lugs, which would otherwise dangle. Removals run from the end of
/// each list, so the indices stay valid while they run. Label: `label`, else the single member's
/// label ("Remove R1") or "Delete 3 items". Nullptr for an empty selection; OutOfStepError for an
/// index past the end of its list.
std::unique_ptr<Command> deleteElements(const Board& board, std::vector<ElementRef> selection,
                                        std::string label = {});

/// Moves every referenced element by `rows`, `cols` holes, as one step (off-board parts do not
/// sit in holes and are left as they are). Consecutive moves of the same selection merge, so a
/// drag sent as many small moves with one merge key is one undo step. Holes are not checked
/// against the board's edges: the caller keeps the selection on the board. Label: `label`, else
/// the single member's label ("Move R1") or "Move 3 items". Nullptr when nothing would move.
std::unique_ptr<Command> moveElements(const Board& board, std::vector<ElementRef> selection,
                                      int rows, int cols, std::string label = {});

}  // namespace netcheck::edit
