// One true-scale view of the board (one side, one tile) on a page: frame, copper or parts, cuts.
#pragma once

#include <vector>

#include <cairo.h>

#include "netcheck/model/board.hpp"
#include "page_layout.hpp"
#include "sheet_labels.hpp"

namespace sheet {

/// What every layer of a view draws from. Cairo user space is millimetres on the page.
struct ViewContext {
    const netcheck::Board& board;
    const SheetPlan& plan;
    const ViewPlacement& view;
    const std::vector<netcheck::Cut>& cuts;  ///< numbered: cut i + 1 is cuts[i]

    double pitch() const { return plan.pitchMm; }
    Point at(netcheck::Hole hole) const { return holeCentre(view, plan.pitchMm, hole); }
    /// A point in board units (hole {r,c} centred at (c + 0.5, r + 0.5), component side).
    Point atBoard(double x, double y) const {
        const Tile& tile = view.tile;
        const double along = view.side == Side::Copper ? tile.col0 + tile.cols - x : x - tile.col0;
        return {view.board.x + along * pitch(), view.board.y + (y - tile.row0) * pitch()};
    }
    bool shows(netcheck::Hole hole) const { return tileHas(view.tile, hole); }
    /// Radius of a drawn hole (about 1 mm on a 0.1 in board).
    double holeRadius() const { return 0.18 * plan.pitchMm; }
};

/// Ink of cut marks. Pure red is used for nothing else on the sheet.
inline constexpr double kCutRed[3] = {1.0, 0.0, 0.0};

/// Draws the view: captions, numbers and letters, then the side's layers clipped to the board.
void drawBoardView(cairo_t* cr, const ViewContext& context);

/// Layers of the component side: faint strips, holes, cut hints, links, parts, off-board wires.
void drawComponentSide(cairo_t* cr, const ViewContext& context);

/// Layers of the copper side: copper, holes, solder points, copper-side links, numbered cuts.
void drawCopperSide(cairo_t* cr, const ViewContext& context);

/// Caption, column numbers, row letters, board outline and overlap marks around a view.
void drawViewFrame(cairo_t* cr, const ViewContext& context);

/// On a split board: shades the holes shared with each neighbouring page and names that page.
void drawOverlapMarks(cairo_t* cr, const ViewContext& context);

/// Labels placed by `placeLabels`, each with a thin leader to its anchor when it sits away.
void drawPlacedLabels(cairo_t* cr, const ViewContext& context,
                      const std::vector<SheetLabel>& labels);

/// Every hole of the tile: a white disc of `holeRadius()` in a thin ring of `outlineGrey`.
void drawHoles(cairo_t* cr, const ViewContext& context, double outlineGrey);

}  // namespace sheet
