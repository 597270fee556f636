// The mouse over the canvas this frame, in board terms: read by the canvas, acted on by the tools.
#pragma once

#include <optional>

#include <imgui.h>

#include "netcheck/model/board.hpp"

namespace stripsmith {

struct CanvasInput {
    ImVec2 board{0, 0};                   ///< board units under the mouse
    bool hovered = false;                 ///< mouse over the canvas (and no popup above it)
    std::optional<netcheck::Hole> hole;   ///< hole under the mouse (nearest cell)
    std::optional<netcheck::PinRef> lug;  ///< off-board lug under the mouse
    bool pressed = false;                 ///< left button went down this frame
    bool released = false;                ///< left button went up this frame
    bool down = false;                    ///< left button held
    bool shift = false;
};

}  // namespace stripsmith
