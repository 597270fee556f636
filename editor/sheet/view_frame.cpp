// Around a view: the caption saying which side it is, hole numbers, strip letters, the board
// outline and, on a split board, where the neighbouring pages overlap.
#include <string>

#include "board_view.hpp"
#include "sheet_text.hpp"

namespace sheet {

namespace {

using netcheck::Hole;

std::string tileText(const ViewContext& context) {
    const Tile& tile = context.view.tile;
    if (!context.plan.split) return {};
    return "   (strips " + netcheck::rowName(tile.row0) + "–" +
           netcheck::rowName(tile.row0 + tile.rows - 1) + ", holes " +
           std::to_string(tile.col0 + 1) + "–" + std::to_string(tile.col0 + tile.cols) + ")";
}

void drawCaption(cairo_t* cr, const ViewContext& context) {
    const Rect& board = context.view.board;
    double left = board.x - kViewLettersMm;
    double baseline = board.y - kViewNumbersMm - 1.6;
    if (context.view.side == Side::Component) {
        setFont(cr, 2.8, Weight::Bold);
        setColour(cr, kInk);
        drawText(
            cr, left, baseline,
            "COMPONENT SIDE — parts go in from this side; hole 1 at the left" + tileText(context));
        return;
    }
    // The copper side is the one people get wrong: white on black so it cannot be missed.
    setFont(cr, 2.8, Weight::Bold);
    std::string text = "COPPER SIDE — seen from below, MIRRORED: hole 1 at the RIGHT. Cut here." +
                       tileText(context);
    double width = textWidth(cr, text);
    cairo_set_source_rgb(cr, 0, 0, 0);
    cairo_rectangle(cr, left - 0.6, baseline - 2.8, width + 1.2, 3.8);
    cairo_fill(cr);
    cairo_set_source_rgb(cr, 1, 1, 1);
    drawText(cr, left, baseline, text);
}

bool numberShown(int col, int cols) {
    if (cols < 100) return true;
    return col == 0 || (col + 1) % 5 == 0;
}

void drawNumbersAndLetters(cairo_t* cr, const ViewContext& context) {
    const Tile& tile = context.view.tile;
    const Rect& board = context.view.board;
    setColour(cr, kInk);
    setFont(cr, kTinyMm, Weight::Normal);
    for (int col = tile.col0; col < tile.col0 + tile.cols; ++col) {
        if (!numberShown(col, context.board.cols)) continue;
        Point centre = context.at({tile.row0, col});
        drawText(cr, centre.x, board.y - 0.8, std::to_string(col + 1), Align::Centre);
    }
    setFont(cr, 1.8, Weight::Bold);
    for (int row = tile.row0; row < tile.row0 + tile.rows; ++row) {
        Point centre = context.at({row, tile.col0});
        double baseline = centre.y + 0.65;
        std::string letter = netcheck::rowName(row);
        drawText(cr, board.x - kViewLettersMm / 2, baseline, letter, Align::Centre);
        drawText(cr, board.right() + kViewLettersMm / 2, baseline, letter, Align::Centre);
    }
}

void drawOutline(cairo_t* cr, const ViewContext& context) {
    const Rect& board = context.view.board;
    cairo_set_source_rgb(cr, 0.2, 0.2, 0.2);
    cairo_set_line_width(cr, 0.3);
    cairo_rectangle(cr, board.x, board.y, board.w, board.h);
    cairo_stroke(cr);
}

const ViewPlacement* findView(const SheetPlan& plan, Side side, int gridRow, int gridCol) {
    for (const ViewPlacement& view : plan.views) {
        if (view.side == side && view.tile.gridRow == gridRow && view.tile.gridCol == gridCol) {
            return &view;
        }
    }
    return nullptr;
}

/// Shades the holes shared with a neighbouring page and notes that page's number.
void markOverlap(cairo_t* cr, const ViewContext& context, const ViewPlacement& other) {
    const Tile& a = context.view.tile;
    const Tile& b = other.tile;
    int row0 = std::max(a.row0, b.row0), row1 = std::min(a.row0 + a.rows, b.row0 + b.rows);
    int col0 = std::max(a.col0, b.col0), col1 = std::min(a.col0 + a.cols, b.col0 + b.cols);
    if (row0 >= row1 || col0 >= col1) return;
    Point p = context.at({row0, col0});
    Point q = context.at({row1 - 1, col1 - 1});
    double half = context.pitch() / 2;
    Rect shared{std::min(p.x, q.x) - half, p.y - half, std::abs(q.x - p.x) + 2 * half,
                q.y - p.y + 2 * half};
    cairo_set_source_rgba(cr, 0.2, 0.4, 0.9, 0.10);
    cairo_rectangle(cr, shared.x, shared.y, shared.w, shared.h);
    cairo_fill(cr);
    double dash[] = {1.2, 0.8};
    cairo_set_dash(cr, dash, 2, 0);
    cairo_set_source_rgb(cr, 0.2, 0.4, 0.9);
    cairo_set_line_width(cr, 0.35);
    cairo_rectangle(cr, shared.x, shared.y, shared.w, shared.h);
    cairo_stroke(cr);
    cairo_set_dash(cr, nullptr, 0, 0);

    const Rect& board = context.view.board;
    std::string note = "overlap with page " + std::to_string(other.pageIndex + 1);
    setFont(cr, kSmallMm, Weight::Bold);
    double centreX = shared.x + shared.w / 2;
    bool beside = shared.h >= board.h - 0.01;  // a left/right neighbour shares full columns
    if (beside) {
        bool atRight = shared.right() >= board.right() - 0.01;
        drawText(cr, atRight ? board.right() : board.x, board.bottom() + 2.6,
                 atRight ? note + " →" : "← " + note, atRight ? Align::Right : Align::Left);
    } else {
        bool below = shared.bottom() >= board.bottom() - 0.01;
        if (below) {
            drawText(cr, centreX, board.bottom() + 2.6, note + " ↓", Align::Centre);
        } else {
            drawText(cr, board.right(), board.y - kViewNumbersMm - 1.6, note + " ↑", Align::Right);
        }
    }
}

}  // namespace

void drawOverlapMarks(cairo_t* cr, const ViewContext& context) {
    if (!context.plan.split) return;
    const Tile& tile = context.view.tile;
    const int steps[4][2] = {{0, -1}, {0, 1}, {-1, 0}, {1, 0}};
    for (const auto& step : steps) {
        const ViewPlacement* other = findView(context.plan, context.view.side,
                                              tile.gridRow + step[0], tile.gridCol + step[1]);
        if (other) markOverlap(cr, context, *other);
    }
}

void drawViewFrame(cairo_t* cr, const ViewContext& context) {
    drawCaption(cr, context);
    drawNumbersAndLetters(cr, context);
    drawOutline(cr, context);
}

}  // namespace sheet
