#include "editor/canvas/board_transform.hpp"

#include <algorithm>
#include <cmath>

namespace stripsmith {

std::optional<netcheck::Hole> holeAt(ImVec2 board, int rows, int cols, float radius) {
    const int col = static_cast<int>(std::floor(board.x));
    const int row = static_cast<int>(std::floor(board.y));
    if (row < 0 || row >= rows || col < 0 || col >= cols) return std::nullopt;
    const float dx = board.x - (static_cast<float>(col) + 0.5f);
    const float dy = board.y - (static_cast<float>(row) + 0.5f);
    if (dx * dx + dy * dy > radius * radius) return std::nullopt;
    return netcheck::Hole{row, col};
}

std::optional<netcheck::Cut> cutAt(ImVec2 board, int rows, int cols) {
    const int row = static_cast<int>(std::floor(board.y));
    if (row < 0 || row >= rows || board.x < 0 || board.x >= static_cast<float>(cols)) return std::nullopt;
    const int col = static_cast<int>(std::floor(board.x));
    const float dx = board.x - (static_cast<float>(col) + 0.5f);
    if (std::fabs(dx) <= 0.3f) return netcheck::Cut{{row, col}, netcheck::Cut::Kind::Hole};
    // The gap at the nearest cell edge: between hole `left` and `left + 1`.
    const int left = dx > 0 ? col : col - 1;
    if (left < 0 || left + 1 >= cols) return std::nullopt;
    return netcheck::Cut{{row, left}, netcheck::Cut::Kind::Between};
}

ImVec2 zoomAbout(ImVec2 origin, float oldPx, float newPx, ImVec2 cursor) {
    const float ux = (cursor.x - origin.x) / oldPx;
    const float uy = (cursor.y - origin.y) / oldPx;
    return {cursor.x - ux * newPx, cursor.y - uy * newPx};
}

BoardTransform fitTransform(const ViewBounds& bounds, ImVec2 screenMin, ImVec2 screenMax, int cols,
                            bool mirrored) {
    const float margin = 16.0f;
    const float w = std::max(1.0f, screenMax.x - screenMin.x - 2 * margin);
    const float h = std::max(1.0f, screenMax.y - screenMin.y - 2 * margin);
    const float bw = std::max(1.0f, bounds.max.x - bounds.min.x);
    const float bh = std::max(1.0f, bounds.max.y - bounds.min.y);
    BoardTransform t;
    t.holePx = std::clamp(std::min(w / bw, h / bh), 2.0f, 96.0f);
    t.cols = cols;
    t.mirrored = mirrored;
    const float cx = (screenMin.x + screenMax.x) * 0.5f;
    const float cy = (screenMin.y + screenMax.y) * 0.5f;
    t.origin = {std::round(cx - (bounds.min.x + bw * 0.5f) * t.holePx),
                std::round(cy - (bounds.min.y + bh * 0.5f) * t.holePx)};
    return t;
}

}  // namespace stripsmith
