#include "editor/canvas/canvas_frame.hpp"

#include <algorithm>
#include <cmath>

namespace stripsmith {

CanvasFrame makeCanvasFrame(ImDrawList* draw, const BoardTransform& t, ImVec2 clipMin, ImVec2 clipMax,
                            Side side, const netcheck::Board& board) {
    CanvasFrame f;
    f.draw = draw;
    f.t = t;
    f.clipMin = clipMin;
    f.clipMax = clipMax;
    f.side = side;
    f.spots = layoutOffboard(board);
    const ImVec2 a = t.toBoard(clipMin);
    const ImVec2 b = t.toBoard(clipMax);
    f.firstRow = std::max(0, static_cast<int>(std::floor(std::min(a.y, b.y))) - 1);
    f.lastRow = std::min(board.rows - 1, static_cast<int>(std::ceil(std::max(a.y, b.y))) + 1);
    f.firstCol = std::max(0, static_cast<int>(std::floor(std::min(a.x, b.x))) - 1);
    f.lastCol = std::min(board.cols - 1, static_cast<int>(std::ceil(std::max(a.x, b.x))) + 1);
    return f;
}

}  // namespace stripsmith
