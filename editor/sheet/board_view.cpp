#include "board_view.hpp"

#include <algorithm>
#include <cmath>

#include "sheet_text.hpp"

namespace sheet {

void drawBoardView(cairo_t* cr, const ViewContext& context) {
    drawViewFrame(cr, context);
    const Rect& board = context.view.board;
    cairo_save(cr);
    // Half a pitch of slack keeps parts at the edge whole while cutting off other tiles' parts.
    double slack = context.pitch();
    cairo_rectangle(cr, board.x - slack, board.y - slack, board.w + 2 * slack, board.h + 2 * slack);
    cairo_clip(cr);
    if (context.view.side == Side::Component) {
        drawComponentSide(cr, context);
    } else {
        drawCopperSide(cr, context);
    }
    cairo_restore(cr);
    drawOverlapMarks(cr, context);
}

namespace {

/// The point of `box` nearest (x, y): where a leader from the anchor meets the label.
Point nearestOnBox(const labels::Box& box, double x, double y) {
    return {std::clamp(x, box.x0, box.x1), std::clamp(y, box.y0, box.y1)};
}

}  // namespace

void drawPlacedLabels(cairo_t* cr, const ViewContext& context,
                      const std::vector<SheetLabel>& labels) {
    for (const SheetLabel& label : labels) {
        const labels::Box& box = label.placement.box;
        if (!label.placement.leader) continue;
        const Point near = nearestOnBox(box, label.anchorX, label.anchorY);
        const Point from = context.atBoard(label.anchorX, label.anchorY);
        const Point to = context.atBoard(near.x, near.y);
        cairo_move_to(cr, from.x, from.y);
        cairo_line_to(cr, to.x, to.y);
    }
    setColour(cr, kGreyInk);
    cairo_set_line_width(cr, 0.12);
    cairo_stroke(cr);
    for (const SheetLabel& label : labels) {
        const labels::Box& box = label.placement.box;
        const Point centre = context.atBoard(box.centreX(), box.centreY());
        setFont(cr, label.fontMm, label.weight);
        drawLabel(cr, centre.x, centre.y, label.text, label.ink);
    }
}

void drawHoles(cairo_t* cr, const ViewContext& context, double outlineGrey) {
    const Tile& tile = context.view.tile;
    double radius = context.holeRadius();
    // Fills only (a grey disc, then a white one inside): exact circles with no stroke width,
    // so each hole centre can be measured on the printed file.
    for (int pass = 0; pass < 2; ++pass) {
        double r = pass == 0 ? radius + 0.12 : radius;
        double grey = pass == 0 ? outlineGrey : 1.0;
        for (int row = tile.row0; row < tile.row0 + tile.rows; ++row) {
            for (int col = tile.col0; col < tile.col0 + tile.cols; ++col) {
                Point centre = context.at({row, col});
                cairo_new_path(cr);
                cairo_arc(cr, centre.x, centre.y, r, 0, 2 * M_PI);
                cairo_set_source_rgb(cr, grey, grey, grey);
                cairo_fill(cr);
            }
        }
    }
}

}  // namespace sheet
