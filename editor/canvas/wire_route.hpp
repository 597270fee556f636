// The path a flying wire is drawn along, shared by drawing and hit-testing. From a hole the wire
// leaves the board at the edge nearest that hole, running between rows (or columns) of holes so
// it crosses no pin; outside the board it follows a ring around it, in its own lane, and comes
// up to a lug from below, clear of the other lugs.
#pragma once

#include <cstddef>
#include <vector>

#include <imgui.h>

#include "editor/canvas/offboard_layout.hpp"
#include "netcheck/model/board.hpp"

namespace stripsmith {

/// Which edge of the board a hole's wire leaves by.
enum class BoardEdge { Right, Left, Bottom, Top };

/// The edge nearest a hole (ties: right, left, bottom, top).
BoardEdge nearestEdge(const netcheck::Board& board, netcheck::Hole hole);

/// The wire's path in board units, from its `from` end to its `to` end: empty when an end is
/// not found (a lug of a part not on the board's list). `lane` (the wire's index) keeps wires
/// apart where they run side by side.
std::vector<ImVec2> wireRoute(const netcheck::Board& board, const std::vector<OffboardSpot>& spots,
                              const netcheck::Wire& wire, std::size_t lane);

}  // namespace stripsmith
