#include "netcheck/edit/resize_board.hpp"

#include <algorithm>
#include <stdexcept>

#include "netcheck/edit/out_of_step.hpp"

namespace netcheck::edit {

namespace {

struct Offset {
    int rows = 0;
    int cols = 0;
};

void shift(Hole& hole, Offset by) {
    hole.row += by.rows;
    hole.col += by.cols;
}

void shift(Cut& cut, Offset by) { shift(cut.hole, by); }

void shift(Part& part, Offset by) {
    for (Pin& pin : part.pins) shift(pin.hole, by);
}

void shift(Link& link, Offset by) {
    shift(link.from, by);
    shift(link.to, by);
}

void shift(Wire& wire, Offset by) {
    if (wire.from.hole) shift(*wire.from.hole, by);
    if (wire.to.hole) shift(*wire.to.hole, by);
}

struct Bounds {
    int rows;
    int cols;
    bool has(Hole h) const { return h.row >= 0 && h.row < rows && h.col >= 0 && h.col < cols; }
};

bool fits(const Cut& cut, Bounds b) {
    if (cut.kind == Cut::Kind::Between) return b.has(cut.hole) && cut.hole.col + 1 < b.cols;
    return b.has(cut.hole);
}

bool fits(const Part& part, Bounds b) {
    return std::all_of(part.pins.begin(), part.pins.end(),
                       [b](const Pin& pin) { return b.has(pin.hole); });
}

bool fits(const Link& link, Bounds b) { return b.has(link.from) && b.has(link.to); }

bool fits(const Wire& wire, Bounds b) {
    return (!wire.from.hole || b.has(*wire.from.hole)) && (!wire.to.hole || b.has(*wire.to.hole));
}

// Moves every element by `by`; those that no longer fit leave the list and are kept, unmoved,
// with their old index.
template <class T>
void shiftAndDrop(std::vector<T>& list, Offset by, Bounds bounds,
                  std::vector<std::pair<std::size_t, T>>& removed) {
    removed.clear();
    std::vector<T> kept;
    kept.reserve(list.size());
    for (std::size_t i = 0; i < list.size(); ++i) {
        T moved = list[i];
        shift(moved, by);
        if (fits(moved, bounds)) {
            kept.push_back(std::move(moved));
        } else {
            removed.emplace_back(i, std::move(list[i]));
        }
    }
    list = std::move(kept);
}

// The inverse of shiftAndDrop: moves back, then reinserts in ascending index order, which puts
// each removed element at its old index.
template <class T>
void unshiftAndRestore(std::vector<T>& list, Offset by,
                       const std::vector<std::pair<std::size_t, T>>& removed) {
    for (T& element : list) shift(element, Offset{-by.rows, -by.cols});
    for (const auto& [index, element] : removed) {
        requireInStep(index <= list.size(), "Resize board", "cannot put a removed element back");
        list.insert(list.begin() + static_cast<std::ptrdiff_t>(index), element);
    }
}

template <class T, class HolesOf>
void appendHoles(std::vector<Hole>& out, const std::vector<std::pair<std::size_t, T>>& removed,
                 HolesOf holesOf) {
    for (const auto& entry : removed) holesOf(out, entry.second);
}

}  // namespace

ResizeBoard::ResizeBoard(const Board& board, EdgeChange change, std::string label)
    : change_(change), oldRows_(board.rows), oldCols_(board.cols), label_(std::move(label)) {
    if (newRows() < 1 || newCols() < 1) {
        throw std::invalid_argument("a board needs at least one row and one column");
    }
}

void ResizeBoard::apply(Board& board) {
    requireInStep(board.rows == oldRows_ && board.cols == oldCols_, label(),
                  "the board is not the size expected");
    const Offset by{change_.top, change_.left};
    const Bounds bounds{newRows(), newCols()};
    shiftAndDrop(board.cuts, by, bounds, cuts_);
    shiftAndDrop(board.parts, by, bounds, parts_);
    shiftAndDrop(board.links, by, bounds, links_);
    shiftAndDrop(board.wires, by, bounds, wires_);
    board.rows = bounds.rows;
    board.cols = bounds.cols;
}

void ResizeBoard::revert(Board& board) {
    requireInStep(board.rows == newRows() && board.cols == newCols(), label(),
                  "the board is not the size expected");
    const Offset by{change_.top, change_.left};
    unshiftAndRestore(board.cuts, by, cuts_);
    unshiftAndRestore(board.parts, by, parts_);
    unshiftAndRestore(board.links, by, links_);
    unshiftAndRestore(board.wires, by, wires_);
    board.rows = oldRows_;
    board.cols = oldCols_;
}

std::string ResizeBoard::label() const {
    if (!label_.empty()) return label_;
    return "Resize board to " + std::to_string(newRows()) + " \u00d7 " + std::to_string(newCols());
}

std::vector<Hole> ResizeBoard::touched() const {
    std::vector<Hole> holes;
    appendHoles(holes, cuts_, [](auto& out, const Cut& c) { out.push_back(c.hole); });
    appendHoles(holes, parts_, [](auto& out, const Part& p) {
        for (const Pin& pin : p.pins) out.push_back(pin.hole);
    });
    appendHoles(holes, links_, [](auto& out, const Link& l) {
        out.push_back(l.from);
        out.push_back(l.to);
    });
    appendHoles(holes, wires_, [](auto& out, const Wire& w) {
        if (w.from.hole) out.push_back(*w.from.hole);
        if (w.to.hole) out.push_back(*w.to.hole);
    });
    return holes;
}

std::optional<HoleArea> usedArea(const Board& board) {
    std::optional<HoleArea> area;
    auto include = [&area](Hole h) {
        if (!area) {
            area = HoleArea{h, h};
            return;
        }
        area->first = Hole{std::min(area->first.row, h.row), std::min(area->first.col, h.col)};
        area->last = Hole{std::max(area->last.row, h.row), std::max(area->last.col, h.col)};
    };
    for (const Cut& cut : board.cuts) {
        include(cut.hole);
        if (cut.kind == Cut::Kind::Between) include(Hole{cut.hole.row, cut.hole.col + 1});
    }
    for (const Part& part : board.parts) {
        for (const Pin& pin : part.pins) include(pin.hole);
    }
    for (const Link& link : board.links) {
        include(link.from);
        include(link.to);
    }
    for (const Wire& wire : board.wires) {
        if (wire.from.hole) include(*wire.from.hole);
        if (wire.to.hole) include(*wire.to.hole);
    }
    return area;
}

std::unique_ptr<Command> trimToUsedArea(const Board& board, int margin) {
    const auto area = usedArea(board);
    if (!area) return nullptr;
    const int m = std::max(margin, 0);
    // Negative numbers take holes away; std::min keeps a margin from growing the board.
    EdgeChange change;
    change.top = std::min(0, m - area->first.row);
    change.left = std::min(0, m - area->first.col);
    change.bottom = std::min(0, m - (board.rows - 1 - area->last.row));
    change.right = std::min(0, m - (board.cols - 1 - area->last.col));
    if (change == EdgeChange{}) return nullptr;
    return std::make_unique<ResizeBoard>(board, change, "Trim board to used area");
}

}  // namespace netcheck::edit
