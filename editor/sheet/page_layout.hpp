// Page layout of the sheet: regions of a board page, splitting a large board into tiles that
// overlap, and which view (side, tile) goes where on which page. Pure geometry, in millimetres.
#pragma once

#include <vector>

#include "netcheck/model/board.hpp"
#include "paper.hpp"
#include "sheet.hpp"

namespace sheet {

/// An axis-aligned rectangle in millimetres, y down.
struct Rect {
    double x = 0, y = 0, w = 0, h = 0;
    double right() const { return x + w; }
    double bottom() const { return y + h; }
};

/// A point in millimetres on the page.
struct Point {
    double x = 0, y = 0;
};

/// Which face of the board a view shows.
enum class Side { Component, Copper };

/// A block of holes shown on one page: rows [row0, row0 + rows), columns [col0, col0 + cols).
/// gridRow/gridCol place it in the grid of tiles (as seen from the component side).
struct Tile {
    int row0 = 0, rows = 0, col0 = 0, cols = 0;
    int gridRow = 0, gridCol = 0;
};

/// How a board is split: gridRows x gridCols tiles in row-major order.
struct TileGrid {
    int gridRows = 1, gridCols = 1;
    std::vector<Tile> tiles;
    const Tile& at(int gridRow, int gridCol) const { return tiles[gridRow * gridCols + gridCol]; }
};

/// Splits rows x cols holes into the fewest even tiles of at most maxRows x maxCols holes, each
/// sharing `overlap` rows/columns with its neighbours (overlap is reduced when a tile is tiny).
TileGrid tileBoard(int rows, int cols, int maxRows, int maxCols, int overlap);

/// One view of the board on a page. `board` is the true-scale rectangle of the tile's holes
/// (tile.cols x tile.rows pitches); the view's captions and letters sit around it.
struct ViewPlacement {
    Side side = Side::Component;
    Tile tile;
    Rect board;
    int pageIndex = 0;  ///< zero-based page the view is on
};

/// Space around a view's board rectangle for its caption, column numbers and row letters.
inline constexpr double kViewCaptionMm = 6.0;
inline constexpr double kViewNumbersMm = 3.5;
inline constexpr double kViewLettersMm = 4.5;
inline constexpr double kViewBottomMm = 4.0;

/// The regions of a page that shows the board.
struct PageFrame {
    Rect header;       ///< title, board size, check banner (page map at its right when split)
    Rect views;        ///< the board views
    Rect calibration;  ///< calibration bar
    Rect cautions;     ///< cautions and page number
};

/// Everything the sheet needs to know about where things go.
struct SheetPlan {
    PaperSize paper;
    Rect content;     ///< paper inside the margins
    PageFrame frame;  ///< the same on every board page
    double pitchMm = 2.54;
    TileGrid grid;
    bool split = false;  ///< board split into tiles over several pages
    int boardPageCount = 0;
    std::vector<ViewPlacement> views;  ///< all views, in page order
};

/// Lays out the board pages. Both sides share page 1 when they fit (stacked, else side by side),
/// else one page per side, else one page per tile of each side.
SheetPlan planSheet(const netcheck::Board& board, const SheetOptions& options);

/// Centre of `hole` in a view (the copper side is mirrored left-right: hole 1 at the right).
Point holeCentre(const ViewPlacement& view, double pitchMm, netcheck::Hole hole);

/// True when the tile shows the hole.
bool tileHas(const Tile& tile, netcheck::Hole hole);

}  // namespace sheet
