// Which board element lies under a point (board units), for selecting and for tools.
#pragma once

#include <optional>
#include <vector>

#include <imgui.h>

#include "editor/canvas/offboard_layout.hpp"
#include "netcheck/edit/selection_commands.hpp"

namespace stripsmith {

/// The topmost element at a board point: parts, then links, wires, off-board parts, cuts.
std::optional<netcheck::edit::ElementRef> elementAt(const netcheck::Board& board,
                                                    const std::vector<OffboardSpot>& spots,
                                                    ImVec2 point);

/// A part's pin under the point: (part index, pin index).
std::optional<std::pair<std::size_t, std::size_t>> pinAt(const netcheck::Board& board, ImVec2 point);

/// Holes an element occupies (empty for off-board parts).
std::vector<netcheck::Hole> holesOf(const netcheck::Board& board, const netcheck::edit::ElementRef& ref);

/// Every element whose holes all lie inside the rectangle (board units), off-board parts whose
/// box does.
std::vector<netcheck::edit::ElementRef> elementsInBox(const netcheck::Board& board,
                                                      const std::vector<OffboardSpot>& spots,
                                                      ImVec2 a, ImVec2 b);

/// Distance from a point to a segment.
float distanceToSegment(ImVec2 p, ImVec2 a, ImVec2 b);

}  // namespace stripsmith
