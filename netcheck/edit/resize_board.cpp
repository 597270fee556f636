#include "netcheck/edit/resize_board.hpp"

#include <algorithm>
#include <stdexcept>

#include "netcheck/edit/cut_commands.hpp"
#include "netcheck/edit/link_commands.hpp"
#include "netcheck/edit/out_of_step.hpp"
#include "netcheck/edit/part_commands.hpp"
#include "netcheck/edit/shift_holes.hpp"
#include "netcheck/edit/wire_commands.hpp"
#include "netcheck/model/board_size.hpp"

namespace netcheck::edit {

namespace {

struct Offset {
    int rows = 0;
    int cols = 0;
};

struct Bounds {
    int rows;
    int cols;
    bool has(Hole h) const { return h.row >= 0 && h.row < rows && h.col >= 0 && h.col < cols; }
};

// An element fits when every hole it names is on the board; for a between cut that includes the
// hole after it, so a cut at the last hole of a strip does not fit.
template <class List>
bool fits(const typename List::Element& element, Bounds bounds) {
    const auto holes = List::holes(element);
    return std::all_of(holes.begin(), holes.end(), [bounds](Hole h) { return bounds.has(h); });
}

// Moves every element by `by`; those that no longer fit leave the list and are kept, unmoved,
// with their old index.
template <class List>
void shiftAndDrop(Board& board, Offset by, Bounds bounds,
                  std::vector<std::pair<std::size_t, typename List::Element>>& removed) {
    auto& list = List::of(board);
    removed.clear();
    std::vector<typename List::Element> kept;
    kept.reserve(list.size());
    for (std::size_t i = 0; i < list.size(); ++i) {
        auto moved = list[i];
        shiftHoles(moved, by.rows, by.cols);
        if (fits<List>(moved, bounds)) {
            kept.push_back(std::move(moved));
        } else {
            removed.emplace_back(i, std::move(list[i]));
        }
    }
    list = std::move(kept);
}

// The inverse of shiftAndDrop: moves back, then reinserts in ascending index order, which puts
// each removed element at its old index.
template <class List>
void unshiftAndRestore(Board& board, Offset by,
                       const std::vector<std::pair<std::size_t, typename List::Element>>& removed) {
    auto& list = List::of(board);
    for (auto& element : list) shiftHoles(element, -by.rows, -by.cols);
    for (const auto& [index, element] : removed) {
        requireInStep(index <= list.size(), "Resize board", "cannot put a removed element back");
        list.insert(list.begin() + static_cast<std::ptrdiff_t>(index), element);
    }
}

template <class List>
void appendHoles(std::vector<Hole>& out,
                 const std::vector<std::pair<std::size_t, typename List::Element>>& removed) {
    for (const auto& entry : removed) {
        for (const Hole& h : List::holes(entry.second)) out.push_back(h);
    }
}

template <class List, class Include>
void includeAll(const Board& board, Include& include) {
    for (const auto& element : List::of(board)) {
        for (const Hole& h : List::holes(element)) include(h);
    }
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
    shiftAndDrop<CutList>(board, by, bounds, cuts_);
    shiftAndDrop<PartList>(board, by, bounds, parts_);
    shiftAndDrop<LinkList>(board, by, bounds, links_);
    shiftAndDrop<WireList>(board, by, bounds, wires_);
    board.rows = bounds.rows;
    board.cols = bounds.cols;
}

void ResizeBoard::revert(Board& board) {
    requireInStep(board.rows == newRows() && board.cols == newCols(), label(),
                  "the board is not the size expected");
    const Offset by{change_.top, change_.left};
    unshiftAndRestore<CutList>(board, by, cuts_);
    unshiftAndRestore<PartList>(board, by, parts_);
    unshiftAndRestore<LinkList>(board, by, links_);
    unshiftAndRestore<WireList>(board, by, wires_);
    board.rows = oldRows_;
    board.cols = oldCols_;
}

std::string ResizeBoard::label() const {
    if (!label_.empty()) return label_;
    return "Resize board to " + sizeInHoles(newCols(), newRows());
}

std::vector<Hole> ResizeBoard::touched() const {
    std::vector<Hole> holes;
    appendHoles<CutList>(holes, cuts_);
    appendHoles<PartList>(holes, parts_);
    appendHoles<LinkList>(holes, links_);
    appendHoles<WireList>(holes, wires_);
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
    includeAll<CutList>(board, include);
    includeAll<PartList>(board, include);
    includeAll<LinkList>(board, include);
    includeAll<WireList>(board, include);
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
