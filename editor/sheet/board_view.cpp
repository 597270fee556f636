#include "board_view.hpp"

#include <cmath>

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
