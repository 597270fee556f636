// Where off-board parts and their lugs sit beside the board (board units), shared by drawing and
// hit-testing so both agree.
#pragma once

#include <optional>
#include <vector>

#include <imgui.h>

#include "editor/canvas/board_transform.hpp"
#include "netcheck/model/board.hpp"

namespace stripsmith {

/// One off-board part's box and lug positions, in board units.
struct OffboardSpot {
    std::size_t index = 0;      ///< into board.offboard
    ImVec2 min;                 ///< body box
    ImVec2 max;
    std::vector<ImVec2> lugs;   ///< one per pin, in pin order
};

/// Each part where the maker put it (its `place`), else in a column to the right of the board
/// (component side), stacked by its position in the board's list.
std::vector<OffboardSpot> layoutOffboard(const netcheck::Board& board);

/// Where the maker put a part: the top-left corner of its body in board units (hole pitches
/// from the board's top-left corner, component side), kept in the part's extra key `place` as
/// {"x": .., "y": ..}. None when unset or unusable (not two finite numbers within reach).
std::optional<ImVec2> placeOf(const netcheck::OffboardPart& part);
/// The part with its body's top-left corner at `corner` (board units, to 0.01 pitch).
netcheck::OffboardPart placedAt(netcheck::OffboardPart part, ImVec2 corner);

/// Board-unit position of a wire end: a hole centre or a lug.
std::optional<ImVec2> endpointPosition(const netcheck::Board& board,
                                       const std::vector<OffboardSpot>& spots,
                                       const netcheck::Endpoint& end);

/// The lug within `radius` pitches of a board point.
std::optional<netcheck::PinRef> lugAt(const netcheck::Board& board,
                                      const std::vector<OffboardSpot>& spots, ImVec2 point,
                                      float radius = 0.5f);

/// The off-board part whose box contains a board point.
std::optional<std::size_t> offboardAt(const std::vector<OffboardSpot>& spots, ImVec2 point);

/// Everything drawn (board, its labels, off-board parts) in view units, for fit-to-board.
ViewBounds contentBounds(const netcheck::Board& board, const std::vector<OffboardSpot>& spots,
                         bool mirrored);

}  // namespace stripsmith
