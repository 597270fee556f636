// Board <-> screen coordinates, in one place. Board units: one unit per hole pitch, (0,0) at the
// top-left corner of hole A1's cell as seen from the component side, so hole {r,c} has its centre
// at (c + 0.5, r + 0.5). The copper side is the same board mirrored left-right.
#pragma once

#include <optional>

#include <imgui.h>

#include "netcheck/model/board.hpp"

namespace stripsmith {

/// Maps board units to screen pixels for one frame.
struct BoardTransform {
    ImVec2 origin{0, 0};  ///< screen position of view unit (0,0): the board's top-left on screen
    float holePx = 24;    ///< screen pixels per hole pitch (the zoom)
    int cols = 0;         ///< board width in holes (mirroring is about its centre line)
    bool mirrored = false;

    /// View units: board units after mirroring (what lies left-to-right on screen).
    float viewX(float boardX) const { return mirrored ? static_cast<float>(cols) - boardX : boardX; }
    ImVec2 toScreen(ImVec2 board) const {
        return {origin.x + viewX(board.x) * holePx, origin.y + board.y * holePx};
    }
    ImVec2 toBoard(ImVec2 screen) const {
        return {viewX((screen.x - origin.x) / holePx), (screen.y - origin.y) / holePx};
    }
    ImVec2 holeCentre(netcheck::Hole h) const {
        return toScreen({static_cast<float>(h.col) + 0.5f, static_cast<float>(h.row) + 0.5f});
    }
    /// Screen length of `units` hole pitches.
    float len(float units) const { return units * holePx; }
};

/// The hole whose centre lies within `radius` pitches of a board point (inside the board), if any.
std::optional<netcheck::Hole> holeAt(ImVec2 board, int rows, int cols, float radius = 0.5f);

/// What a click with the cut tool means at a board point: a hole cut near a hole centre (within
/// 0.3 pitch along the strip), otherwise a between cut across the gap nearest the point.
std::optional<netcheck::Cut> cutAt(ImVec2 board, int rows, int cols);

/// Keeps a board point fixed under the cursor while the zoom changes: returns the new origin.
ImVec2 zoomAbout(ImVec2 origin, float oldPx, float newPx, ImVec2 cursor);

/// Board-unit rectangle of everything drawn (board plus off-board parts), in view units.
struct ViewBounds {
    ImVec2 min;
    ImVec2 max;
};

/// Origin and zoom that fit `bounds` (view units) into a screen rectangle with a margin.
BoardTransform fitTransform(const ViewBounds& bounds, ImVec2 screenMin, ImVec2 screenMax, int cols,
                            bool mirrored);

}  // namespace stripsmith
