// The copper side, mirrored: copper strips or pads, holes, where leads come through, links on
// the copper side, and every cut drawn boldly in pure red with its number.
#include <cmath>
#include <string>

#include "board_view.hpp"
#include "sheet_text.hpp"

namespace sheet {

namespace {

using netcheck::Cut;
using netcheck::Hole;

constexpr Rgb kCopper{0.93, 0.76, 0.58};
constexpr Rgb kCopperEdge{0.72, 0.50, 0.30};

void drawStrips(cairo_t* cr, const ViewContext& context) {
    const Tile& tile = context.view.tile;
    double half = context.pitch() * 0.39;
    for (int row = tile.row0; row < tile.row0 + tile.rows; ++row) {
        Point a = context.at({row, tile.col0});
        Point b = context.at({row, tile.col0 + tile.cols - 1});
        double left = std::min(a.x, b.x) - context.pitch() / 2;
        double width = std::abs(b.x - a.x) + context.pitch();
        cairo_rectangle(cr, left, a.y - half, width, 2 * half);
    }
    setColour(cr, kCopper);
    cairo_fill_preserve(cr);
    setColour(cr, kCopperEdge);
    cairo_set_line_width(cr, 0.1);
    cairo_stroke(cr);
}

void drawPads(cairo_t* cr, const ViewContext& context) {
    const Tile& tile = context.view.tile;
    double half = context.pitch() * 0.38;
    for (int row = tile.row0; row < tile.row0 + tile.rows; ++row) {
        for (int col = tile.col0; col < tile.col0 + tile.cols; ++col) {
            Point c = context.at({row, col});
            cairo_rectangle(cr, c.x - half, c.y - half, 2 * half, 2 * half);
        }
    }
    setColour(cr, kCopper);
    cairo_fill(cr);
}

/// Solder joints: every lead and link end, so the board can be matched to the print.
void drawSolderPoints(cairo_t* cr, const ViewContext& context) {
    auto dot = [&](Hole hole) {
        if (!context.shows(hole)) return;
        Point c = context.at(hole);
        cairo_new_sub_path(cr);
        cairo_arc(cr, c.x, c.y, context.holeRadius() * 0.8, 0, 2 * M_PI);
    };
    for (const auto& part : context.board.parts) {
        for (const auto& pin : part.pins) dot(pin.hole);
    }
    for (const auto& link : context.board.links) {
        dot(link.from);
        dot(link.to);
    }
    for (const auto& wire : context.board.wires) {
        if (wire.from.isHole()) dot(*wire.from.hole);
        if (wire.to.isHole()) dot(*wire.to.hole);
    }
    cairo_set_source_rgb(cr, 0.45, 0.45, 0.45);
    cairo_fill(cr);
}

void drawCopperLinks(cairo_t* cr, const ViewContext& context) {
    cairo_set_line_cap(cr, CAIRO_LINE_CAP_ROUND);
    for (const auto& link : context.board.links) {
        if (!link.copperSide) continue;
        Point a = context.at(link.from), b = context.at(link.to);
        cairo_move_to(cr, a.x, a.y);
        cairo_line_to(cr, b.x, b.y);
        cairo_set_source_rgb(cr, 0.3, 0.3, 0.3);
        cairo_set_line_width(cr, 0.5);
        cairo_stroke(cr);
    }
    cairo_set_line_cap(cr, CAIRO_LINE_CAP_BUTT);
}

/// Where a cut's mark is: the hole, or the middle of the gap after it.
Point cutCentre(const ViewContext& context, const Cut& cut) {
    Point a = context.at(cut.hole);
    if (cut.kind == Cut::Kind::Hole) return a;
    Point b = context.at({cut.hole.row, cut.hole.col + 1});
    return {(a.x + b.x) / 2, a.y};
}

/// One path per cut: a ring with a cross for a hole cut, a bar across the strip for a cut
/// between holes.
void drawCutMark(cairo_t* cr, const ViewContext& context, const Cut& cut) {
    Point c = cutCentre(context, cut);
    double p = context.pitch();
    cairo_new_path(cr);
    if (cut.kind == Cut::Kind::Hole) {
        double r = 0.36 * p;
        cairo_arc(cr, c.x, c.y, r, 0, 2 * M_PI);
        double d = r * 0.7071;
        cairo_move_to(cr, c.x - d, c.y - d);
        cairo_line_to(cr, c.x + d, c.y + d);
        cairo_move_to(cr, c.x - d, c.y + d);
        cairo_line_to(cr, c.x + d, c.y - d);
        cairo_set_line_width(cr, 0.12 * p);
    } else {
        cairo_move_to(cr, c.x, c.y - 0.45 * p);
        cairo_line_to(cr, c.x, c.y + 0.45 * p);
        cairo_set_line_width(cr, 0.22 * p);
    }
    cairo_set_source_rgb(cr, kCutRed[0], kCutRed[1], kCutRed[2]);
    cairo_stroke(cr);
}

void drawCuts(cairo_t* cr, const ViewContext& context) {
    for (std::size_t i = 0; i < context.cuts.size(); ++i) {
        if (context.shows(context.cuts[i].hole)) drawCutMark(cr, context, context.cuts[i]);
    }
    drawPlacedLabels(cr, context,
                     copperSideLabels(cr, context.board, context.cuts, context.pitch()));
}

}  // namespace

void drawCopperSide(cairo_t* cr, const ViewContext& context) {
    if (context.board.copper == netcheck::CopperPattern::Strips) {
        drawStrips(cr, context);
    } else {
        drawPads(cr, context);
    }
    drawHoles(cr, context, 0.35);
    drawSolderPoints(cr, context);
    drawCopperLinks(cr, context);
    drawCuts(cr, context);
}

}  // namespace sheet
