// What the pointer is over on the canvas, worked out once a frame for the layers, the status line
// and paste-at-the-mouse.
#pragma once

#include <cstddef>
#include <optional>

#include "netcheck/model/board.hpp"

namespace stripsmith {

struct HoverState {
    std::optional<netcheck::Hole> hole;
    int island = -1;                      ///< copper island under the pointer, -1 for none
    std::optional<std::size_t> part;      ///< on-board part with a pin in the hovered hole
    std::optional<netcheck::PinRef> lug;  ///< off-board lug under the pointer
    bool spaceHeld = false;               ///< space held over the canvas: a left drag pans
};

}  // namespace stripsmith
