// One draw function per canvas layer, called in this order by the canvas.
#pragma once

#include <optional>
#include <set>
#include <string>
#include <vector>

#include "editor/canvas/canvas_frame.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/check/connectivity.hpp"
#include "netcheck/edit/selection_commands.hpp"

namespace stripsmith {

using Selected = std::set<netcheck::edit::ElementRef>;

/// The board outline and substrate, for the side shown.
void drawSubstrate(const CanvasFrame& f, const netcheck::Board& board);
/// Copper strips (or pads) and the holes.
void drawCopper(const CanvasFrame& f, const netcheck::Board& board);
/// Row letters on both sides, hole numbers above and below.
void drawEdgeLabels(const CanvasFrame& f, const netcheck::Board& board);
/// Hole cuts (copper ring drilled away) and between cuts (a scored gap), strongest on the copper side.
void drawCuts(const CanvasFrame& f, const netcheck::Board& board, const Selected& selected);
/// Wire links between holes.
void drawLinks(const CanvasFrame& f, const netcheck::Board& board, const Selected& selected);
/// Part bodies and leads (component side, see-through) or solder joints (copper side).
/// `hoveredPart` shows pin names of that part.
void drawParts(const CanvasFrame& f, const netcheck::Board& board, const Selected& selected,
               std::optional<std::size_t> hoveredPart);
/// Off-board parts beside the board with their named lugs.
void drawOffboardParts(const CanvasFrame& f, const netcheck::Board& board, const Selected& selected);
/// Flying leads from lug to hole or lug, in their colour.
void drawWires(const CanvasFrame& f, const netcheck::Board& board, const Selected& selected);
/// Everything joined to the hovered hole: the island's holes, and the links and wires inside it.
void drawIslandHighlight(const CanvasFrame& f, const netcheck::Board& board,
                         const netcheck::Island& island);
/// A finding: its copper path, pieces, suggested cut or links, and its hole.
void drawFindingHighlight(const CanvasFrame& f, const netcheck::Board& board,
                          const netcheck::Finding& finding);
/// Marks every error's hole lightly so faults are visible without opening the list.
void drawFindingMarks(const CanvasFrame& f, const netcheck::CheckReport& report);

/// Rough screen size of text for a zoom, or 0 when too small to read.
float canvasTextSize(const CanvasFrame& f, float pitchFraction);

}  // namespace stripsmith
