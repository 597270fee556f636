// Command: grow or shrink the board at any edge, and trimming to the used area.
#pragma once

#include <cstddef>
#include <memory>
#include <optional>
#include <string>
#include <utility>
#include <vector>

#include "netcheck/edit/command.hpp"
#include "netcheck/edit/out_of_step.hpp"

namespace netcheck::edit {

/// Holes added (positive) or taken away (negative) at each edge: `top` rows above strip A,
/// `left` columns before hole 1, and so on.
struct EdgeChange {
    int top = 0;
    int bottom = 0;
    int left = 0;
    int right = 0;
    bool operator==(const EdgeChange&) const = default;
};

/// Resizes the board. Every hole reference moves with the copper (adding a row at the top makes
/// the old strip A strip B). Cuts, parts, links and wires that would lie outside the new board
/// (even with one lead) are removed, and remembered with their places in the lists, so undo
/// brings back exactly the board that was there. Off-board parts stay; a wire to one goes only if
/// its hole end falls off. A between cut at the new last hole of a strip goes too (it would cut
/// nothing). Label: "Resize board to 12 × 30" unless one is given.
class ResizeBoard : public Command {
public:
    /// Throws std::invalid_argument when the new board would have fewer than 1 row or column.
    ResizeBoard(const Board& board, EdgeChange change, std::string label = {});
    void apply(Board& board) override;
    void revert(Board& board) override;
    std::string label() const override;
    /// Holes of everything the resize removed, in the old board's numbering.
    std::vector<Hole> touched() const override;
    int newRows() const { return oldRows_ + change_.top + change_.bottom; }
    int newCols() const { return oldCols_ + change_.left + change_.right; }

private:
    template <class T>
    using Removed = std::vector<std::pair<std::size_t, T>>;  // index in the old list, element

    EdgeChange change_;
    int oldRows_;
    int oldCols_;
    std::string label_;
    Removed<Cut> cuts_;
    Removed<Part> parts_;
    Removed<Link> links_;
    Removed<Wire> wires_;
};

/// The smallest rectangle holding every hole in use (pins, link ends, wire ends, cuts with both
/// holes of a between cut).
struct HoleArea {
    Hole first;  ///< top-left
    Hole last;   ///< bottom-right
    bool operator==(const HoleArea&) const = default;
};

/// Nullopt when nothing is on the board.
std::optional<HoleArea> usedArea(const Board& board);

/// The resize that trims the board to its used area plus `margin` holes on every side (never
/// past the present edges). Nullptr when the board is empty or already that size.
/// Label: "Trim board to used area".
std::unique_ptr<Command> trimToUsedArea(const Board& board, int margin = 0);

}  // namespace netcheck::edit
