// The per-frame canvas geometry, computed once and passed const& to every layer.
#pragma once

#include <algorithm>
#include <vector>

#include <imgui.h>

#include "editor/app/view_state.hpp"
#include "editor/canvas/board_transform.hpp"
#include "editor/canvas/offboard_layout.hpp"
#include "netcheck/model/board.hpp"

namespace stripsmith {

struct CanvasFrame {
    ImDrawList* draw = nullptr;
    BoardTransform t;
    ImVec2 clipMin;       ///< canvas rectangle on screen
    ImVec2 clipMax;
    Side side = Side::Component;
    std::vector<OffboardSpot> spots;
    int firstRow = 0;     ///< visible hole range (inclusive), for culling
    int lastRow = -1;
    int firstCol = 0;
    int lastCol = -1;

    /// Enough pixels per hole to draw text and fine detail.
    bool detailed() const { return t.holePx >= 14.0f; }
    /// Parts are drawn with bodies (component side and see-through).
    bool showsBodies() const { return side != Side::Copper; }
    /// True when a screen rectangle touches the canvas.
    bool visible(ImVec2 a, ImVec2 b) const {
        return std::max(a.x, b.x) >= clipMin.x && std::min(a.x, b.x) <= clipMax.x &&
               std::max(a.y, b.y) >= clipMin.y && std::min(a.y, b.y) <= clipMax.y;
    }
    ImVec2 hole(netcheck::Hole h) const { return t.holeCentre(h); }
    ImVec2 at(ImVec2 board) const { return t.toScreen(board); }
};

/// Builds the frame geometry for a canvas rectangle and transform.
CanvasFrame makeCanvasFrame(ImDrawList* draw, const BoardTransform& t, ImVec2 clipMin, ImVec2 clipMax,
                            Side side, const netcheck::Board& board);

}  // namespace stripsmith
