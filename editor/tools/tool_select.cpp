// Select tool: click, shift-click, box select, drag to move, drag a lead end to stretch.
#include <algorithm>
#include <cmath>

#include "editor/tools/edit_actions.hpp"
#include "editor/canvas/palette.hpp"
#include "editor/tools/hit_test.hpp"
#include "editor/tools/tools.hpp"
#include "netcheck/edit/edit.hpp"

namespace stripsmith {

using netcheck::edit::ElementRef;

namespace {

bool selectionStaysOnBoard(const ToolContext& c, int rows, int cols) {
    const auto& board = c.doc.board();
    for (const ElementRef& ref : c.selection)
        for (const netcheck::Hole& h : holesOf(board, ref))
            if (!board.contains({h.row + rows, h.col + cols})) return false;
    return true;
}

// The hole cell under a board point, on the board or beside it (off-board parts move there too).
netcheck::Hole cellAt(ImVec2 board) {
    return {static_cast<int>(std::floor(board.y)), static_cast<int>(std::floor(board.x))};
}

void continueMove(const ToolContext& c, const CanvasInput& in) {
    const netcheck::Hole cell = cellAt(in.board);
    const int rows = cell.row - c.tool.gestureStart.row;
    const int cols = cell.col - c.tool.gestureStart.col;
    const int dr = rows - c.tool.movedRows, dc = cols - c.tool.movedCols;
    if ((dr == 0 && dc == 0) || !selectionStaysOnBoard(c, dr, dc)) return;
    if (c.commands.perform(moveCommand(c.doc.board(), c.selection, dr, dc), kMergeMove)) {
        c.tool.movedRows = rows;
        c.tool.movedCols = cols;
    }
}

void continueStretch(const ToolContext& c, const CanvasInput& in) {
    const auto& board = c.doc.board();
    if (!in.hole || c.tool.stretchPart >= board.parts.size()) return;
    netcheck::Part part = board.parts[c.tool.stretchPart];
    auto& pin = part.pins.at(c.tool.stretchPin);
    if (pin.hole == *in.hole) return;
    for (const auto& other : part.pins)
        if (other.hole == *in.hole) return;  // both leads in one hole is never meant
    pin.hole = *in.hole;
    c.commands.perform(std::make_unique<netcheck::edit::ReplacePart>(board, c.tool.stretchPart, part,
                                                             "Stretch " + part.ref),
                kMergeStretch);
}

void beginGesture(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f) {
    const auto& board = c.doc.board();
    // A lead end of a selected two-lead part: stretch it.
    if (auto pin = pinAt(board, in.board)) {
        const ElementRef ref{ElementRef::Kind::Part, pin->first};
        if (c.selection.count(ref) && board.parts[pin->first].pins.size() == 2 && !in.shift) {
            c.tool.gesture = ToolState::Gesture::Stretch;
            c.tool.stretchPart = pin->first;
            c.tool.stretchPin = pin->second;
            return;
        }
    }
    if (auto hit = elementAt(board, f.spots, in.board)) {
        if (in.shift) {
            if (!c.selection.erase(*hit)) c.selection.insert(*hit);
            return;
        }
        if (!c.selection.count(*hit)) c.selection = {*hit};
        c.tool.gesture = ToolState::Gesture::Move;
        c.tool.gestureStart = cellAt(in.board);
        c.tool.movedRows = c.tool.movedCols = 0;
        return;
    }
    if (!in.shift) c.selection.clear();
    c.tool.gesture = ToolState::Gesture::Box;
    c.tool.boxStart = in.board;
}

void finishBox(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f) {
    for (const ElementRef& ref : elementsInBox(c.doc.board(), f.spots, c.tool.boxStart, in.board))
        c.selection.insert(ref);
}

}  // namespace

void runSelectTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f) {
    if (in.pressed && in.hovered) beginGesture(c, in, f);
    if (in.down) {
        if (c.tool.gesture == ToolState::Gesture::Move) continueMove(c, in);
        if (c.tool.gesture == ToolState::Gesture::Stretch) continueStretch(c, in);
    }
    if (c.tool.gesture == ToolState::Gesture::Box) {
        const ImVec2 a = f.at(c.tool.boxStart), b = f.at(in.board);
        f.draw->AddRectFilled({std::min(a.x, b.x), std::min(a.y, b.y)}, {std::max(a.x, b.x), std::max(a.y, b.y)},
                              palette::rgba(60, 170, 255, 40));
        f.draw->AddRect({std::min(a.x, b.x), std::min(a.y, b.y)}, {std::max(a.x, b.x), std::max(a.y, b.y)},
                        palette::kSelection);
    }
    if (in.released) {
        if (c.tool.gesture == ToolState::Gesture::Box) finishBox(c, in, f);
        c.tool.gesture = ToolState::Gesture::None;
        c.commands.endMerge();
    }
}

}  // namespace stripsmith
