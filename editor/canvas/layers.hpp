// One draw function per canvas layer, called in this order by the canvas. Each takes the frame:
// where to draw and what.
#pragma once

#include <cstddef>
#include <optional>
#include <vector>

#include "editor/app/selection.hpp"
#include "editor/canvas/canvas_frame.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/check/connectivity.hpp"
#include "netcheck/repair/repair_step.hpp"
#include "netcheck/voltage/bench_voltages.hpp"

namespace stripsmith {

/// The canvas geometry of one frame plus what the layers draw in it.
struct LayerFrame : CanvasFrame {
    LayerFrame(const CanvasFrame& geometry, const netcheck::Board& board, const Selected& selected,
               const netcheck::CheckReport& report)
        : CanvasFrame(geometry), board(board), selected(selected), report(report) {}

    const netcheck::Board& board;
    const Selected& selected;
    const netcheck::CheckReport& report;
    std::optional<std::size_t> hoveredPart;           ///< its pin names are shown
    const netcheck::Island* hoveredIsland = nullptr;  ///< lit up with everything joined to it
    const netcheck::Finding* focusedFinding = nullptr;
    const netcheck::RepairStep* previewStep = nullptr;  ///< shown ghosted before it is applied
    const netcheck::BenchVoltagesResult* voltages = nullptr;  ///< View > Bench voltages, when on
    bool voltagesStale = false;  ///< the figures are for an earlier revision of the board
};

/// The board outline and substrate, for the side shown.
void drawSubstrate(const LayerFrame& f);
/// Copper strips (or pads) and the holes.
void drawCopper(const LayerFrame& f);
/// Row letters on both sides, hole numbers above and below; pinned to the canvas edges when
/// the board's own edges are scrolled out of view.
void drawEdgeLabels(const LayerFrame& f);

/// Where the edge labels go on screen: the centres of the two columns of row letters and of the
/// two rows of hole numbers, each pinned (moved in to the canvas edge) or beside the board.
struct EdgeLabelPlaces {
    float size = 0;  ///< font size in pixels; 0 when too small to draw
    float leftX = 0, rightX = 0, topY = 0, bottomY = 0;
    bool leftPinned = false, rightPinned = false, topPinned = false, bottomPinned = false;
};
EdgeLabelPlaces edgeLabelPlaces(const CanvasFrame& f, int rows, int cols);
/// Everything joined to the hovered hole: the island's holes, and the links and wires inside it.
void drawIslandHighlight(const LayerFrame& f);
/// Wire links between holes.
void drawLinks(const LayerFrame& f);
/// Part bodies and leads (component side, see-through) or solder joints (copper side), with the
/// pin names of the hovered part.
void drawParts(const LayerFrame& f);
/// Hole cuts (copper ring drilled away) and between cuts (a scored gap), strongest on the copper
/// side.
void drawCuts(const LayerFrame& f);
/// Off-board parts beside the board with their named lugs.
void drawOffboardParts(const LayerFrame& f);
/// Flying leads from lug to hole or lug, in their colour.
void drawWires(const LayerFrame& f);
/// Part names, pin names and polarity marks, placed clear of pins, used holes, cuts and each
/// other (layer_labels.cpp), above the wires.
void drawLabels(const LayerFrame& f);
/// The board itself, every layer above in the one order both the canvas and the layout preview
/// use: copper, the hovered island, links, cuts under the part bodies, off-board parts, wires,
/// labels above the wires, and the edge labels last (pinned over whatever lies at the edge).
void drawBoard(const LayerFrame& f);
/// Marks every error's hole lightly so faults are visible without opening the list.
void drawFindingMarks(const LayerFrame& f);
/// The focused finding: its copper path, pieces, suggested cut or links, and its hole.
void drawFindingHighlight(const LayerFrame& f);
/// The repair step chosen in the Check panel, before it is applied: what goes in the suggestion
/// colour (a new cut, link or lead position), what goes away crossed out in the error colour.
void drawRepairPreview(const LayerFrame& f);
/// The expected voltage of each net at its probe hole, and the cautions (View > Bench voltages).
void drawBenchVoltages(const LayerFrame& f);
/// The caption naming the side shown, over the top-left of the canvas.
void drawSideCaption(const LayerFrame& f);

/// Rough screen size of text for a zoom, or 0 when too small to read.
float canvasTextSize(const CanvasFrame& f, float pitchFraction);

}  // namespace stripsmith
