// Select tool: click, shift-click, box select, drag to move, drag a lead end to stretch.
#include <algorithm>
#include <cmath>

#include "editor/app/edit_actions.hpp"
#include "editor/canvas/palette.hpp"
#include "editor/tools/hit_test.hpp"
#include "editor/tools/tools.hpp"
#include "netcheck/edit/edit.hpp"

namespace stripsmith {

using netcheck::edit::ElementRef;

namespace {

bool selectionStaysOnBoard(const EditorApp& app, int rows, int cols) {
    const auto& board = app.doc.board();
    for (const ElementRef& ref : app.selection)
        for (const netcheck::Hole& h : holesOf(board, ref))
            if (!board.contains({h.row + rows, h.col + cols})) return false;
    return true;
}

// The hole cell under a board point, on the board or beside it (off-board parts move there too).
netcheck::Hole cellAt(ImVec2 board) {
    return {static_cast<int>(std::floor(board.y)), static_cast<int>(std::floor(board.x))};
}

void continueMove(EditorApp& app, const CanvasInput& in) {
    const netcheck::Hole cell = cellAt(in.board);
    const int rows = cell.row - app.tool.gestureStart.row;
    const int cols = cell.col - app.tool.gestureStart.col;
    const int dr = rows - app.tool.movedRows, dc = cols - app.tool.movedCols;
    if ((dr == 0 && dc == 0) || !selectionStaysOnBoard(app, dr, dc)) return;
    if (app.perform(moveCommand(app.doc.board(), app.selection, dr, dc), kMergeMove)) {
        app.tool.movedRows = rows;
        app.tool.movedCols = cols;
    }
}

void continueStretch(EditorApp& app, const CanvasInput& in) {
    const auto& board = app.doc.board();
    if (!in.hole || app.tool.stretchPart >= board.parts.size()) return;
    netcheck::Part part = board.parts[app.tool.stretchPart];
    auto& pin = part.pins.at(app.tool.stretchPin);
    if (pin.hole == *in.hole) return;
    for (const auto& other : part.pins)
        if (other.hole == *in.hole) return;  // both leads in one hole is never meant
    pin.hole = *in.hole;
    app.perform(std::make_unique<netcheck::edit::ReplacePart>(board, app.tool.stretchPart, part,
                                                             "Stretch " + part.ref),
                kMergeStretch);
}

void beginGesture(EditorApp& app, const CanvasInput& in, const CanvasFrame& f) {
    const auto& board = app.doc.board();
    // A lead end of a selected two-lead part: stretch it.
    if (auto pin = pinAt(board, in.board)) {
        const ElementRef ref{ElementRef::Kind::Part, pin->first};
        if (app.selection.count(ref) && board.parts[pin->first].pins.size() == 2 && !in.shift) {
            app.tool.gesture = ToolState::Gesture::Stretch;
            app.tool.stretchPart = pin->first;
            app.tool.stretchPin = pin->second;
            return;
        }
    }
    if (auto hit = elementAt(board, f.spots, in.board)) {
        if (in.shift) {
            if (!app.selection.erase(*hit)) app.selection.insert(*hit);
            return;
        }
        if (!app.selection.count(*hit)) app.selection = {*hit};
        app.tool.gesture = ToolState::Gesture::Move;
        app.tool.gestureStart = cellAt(in.board);
        app.tool.movedRows = app.tool.movedCols = 0;
        return;
    }
    if (!in.shift) app.selection.clear();
    app.tool.gesture = ToolState::Gesture::Box;
    app.tool.boxStart = in.board;
}

void finishBox(EditorApp& app, const CanvasInput& in, const CanvasFrame& f) {
    for (const ElementRef& ref : elementsInBox(app.doc.board(), f.spots, app.tool.boxStart, in.board))
        app.selection.insert(ref);
}

}  // namespace

void runSelectTool(EditorApp& app, const CanvasInput& in, const CanvasFrame& f) {
    if (in.pressed && in.hovered) beginGesture(app, in, f);
    if (in.down) {
        if (app.tool.gesture == ToolState::Gesture::Move) continueMove(app, in);
        if (app.tool.gesture == ToolState::Gesture::Stretch) continueStretch(app, in);
    }
    if (app.tool.gesture == ToolState::Gesture::Box) {
        const ImVec2 a = f.at(app.tool.boxStart), b = f.at(in.board);
        f.draw->AddRectFilled({std::min(a.x, b.x), std::min(a.y, b.y)}, {std::max(a.x, b.x), std::max(a.y, b.y)},
                              palette::rgba(60, 170, 255, 40));
        f.draw->AddRect({std::min(a.x, b.x), std::min(a.y, b.y)}, {std::max(a.x, b.x), std::max(a.y, b.y)},
                        palette::kSelection);
    }
    if (in.released) {
        if (app.tool.gesture == ToolState::Gesture::Box) finishBox(app, in, f);
        app.tool.gesture = ToolState::Gesture::None;
        app.doc.endMerge();
    }
}

}  // namespace stripsmith
