#include "page_layout.hpp"

#include <algorithm>
#include <cmath>

namespace sheet {

namespace {

constexpr double kHeaderMm = 24.0;
constexpr double kCalibrationMm = 16.0;
constexpr double kCautionsMm = 27.0;
constexpr double kGapMm = 3.0;

/// Splits `count` holes into even spans of at most `maxSpan`, neighbours sharing `overlap`.
std::vector<std::pair<int, int>> splitSpan(int count, int maxSpan, int overlap) {
    maxSpan = std::max(1, maxSpan);
    overlap = std::clamp(overlap, 0, maxSpan / 2);
    if (count <= maxSpan) return {{0, count}};
    int pieces = (count - overlap + (maxSpan - overlap) - 1) / (maxSpan - overlap);
    int span = (count + (pieces - 1) * overlap + pieces - 1) / pieces;
    std::vector<std::pair<int, int>> spans;
    for (int i = 0; i < pieces; ++i) {
        int start = i * (span - overlap);
        spans.push_back({start, std::min(span, count - start)});
    }
    return spans;
}

PageFrame makeFrame(const Rect& content) {
    PageFrame frame;
    frame.header = {content.x, content.y, content.w, kHeaderMm};
    frame.cautions = {content.x, content.bottom() - kCautionsMm, content.w, kCautionsMm};
    frame.calibration = {content.x, frame.cautions.y - kCalibrationMm, content.w, kCalibrationMm};
    double viewsTop = frame.header.bottom() + kGapMm;
    frame.views = {content.x, viewsTop, content.w, frame.calibration.y - kGapMm - viewsTop};
    return frame;
}

double viewWidth(int cols, double pitch) {
    return cols * pitch + 2 * kViewLettersMm;
}
double viewHeight(int rows, double pitch) {
    return kViewCaptionMm + kViewNumbersMm + rows * pitch + kViewBottomMm;
}

/// Board rectangle of a view whose outer box starts at (left, top).
Rect boardRect(double left, double top, const Tile& tile, double pitch) {
    return {left + kViewLettersMm, top + kViewCaptionMm + kViewNumbersMm, tile.cols * pitch,
            tile.rows * pitch};
}

/// Both sides on page 1, stacked or side by side; false when they do not fit.
bool placeTogether(SheetPlan& plan, const Tile& whole) {
    const Rect& area = plan.frame.views;
    double w = viewWidth(whole.cols, plan.pitchMm);
    double h = viewHeight(whole.rows, plan.pitchMm);
    double left = area.x;
    if (w <= area.w && 2 * h + 2 * kGapMm <= area.h) {
        plan.views.push_back(
            {Side::Component, whole, boardRect(left, area.y, whole, plan.pitchMm)});
        double top = area.y + h + 2 * kGapMm;
        plan.views.push_back({Side::Copper, whole, boardRect(left, top, whole, plan.pitchMm)});
        return true;
    }
    if (2 * w + 2 * kGapMm <= area.w && h <= area.h) {
        double gap = (area.w - 2 * w) / 3;
        plan.views.push_back(
            {Side::Component, whole, boardRect(area.x + gap, area.y, whole, plan.pitchMm)});
        plan.views.push_back(
            {Side::Copper, whole, boardRect(area.x + 2 * gap + w, area.y, whole, plan.pitchMm)});
        return true;
    }
    return false;
}

/// One page per tile: component tiles first, then copper tiles in the order they lie on the
/// bench when the board is turned over (left to right as seen from below).
void placeTiles(SheetPlan& plan) {
    const Rect& area = plan.frame.views;
    int page = 0;
    for (Side side : {Side::Component, Side::Copper}) {
        for (int gr = 0; gr < plan.grid.gridRows; ++gr) {
            for (int gc = 0; gc < plan.grid.gridCols; ++gc) {
                int col = side == Side::Copper ? plan.grid.gridCols - 1 - gc : gc;
                const Tile& tile = plan.grid.at(gr, col);
                double left = area.x;
                plan.views.push_back(
                    {side, tile, boardRect(left, area.y, tile, plan.pitchMm), page++});
            }
        }
    }
    plan.boardPageCount = page;
}

}  // namespace

TileGrid tileBoard(int rows, int cols, int maxRows, int maxCols, int overlap) {
    TileGrid grid;
    auto rowSpans = splitSpan(rows, maxRows, overlap);
    auto colSpans = splitSpan(cols, maxCols, overlap);
    grid.gridRows = static_cast<int>(rowSpans.size());
    grid.gridCols = static_cast<int>(colSpans.size());
    for (int gr = 0; gr < grid.gridRows; ++gr) {
        for (int gc = 0; gc < grid.gridCols; ++gc) {
            grid.tiles.push_back({rowSpans[gr].first, rowSpans[gr].second, colSpans[gc].first,
                                  colSpans[gc].second, gr, gc});
        }
    }
    return grid;
}

SheetPlan planSheet(const netcheck::Board& board, const SheetOptions& options) {
    SheetPlan plan;
    plan.paper = paperSize(options.paper);
    plan.pitchMm = board.pitchMm;
    plan.content = {options.marginMm, options.marginMm, plan.paper.widthMm - 2 * options.marginMm,
                    plan.paper.heightMm - 2 * options.marginMm};
    plan.frame = makeFrame(plan.content);
    Tile whole{0, board.rows, 0, board.cols, 0, 0};
    plan.grid.tiles = {whole};
    if (placeTogether(plan, whole)) {
        plan.boardPageCount = 1;
        return plan;
    }
    const Rect& area = plan.frame.views;
    int maxCols = static_cast<int>(std::floor((area.w - 2 * kViewLettersMm) / plan.pitchMm));
    int maxRows = static_cast<int>(
        std::floor((area.h - kViewCaptionMm - kViewNumbersMm - kViewBottomMm) / plan.pitchMm));
    plan.grid = tileBoard(board.rows, board.cols, maxRows, maxCols, options.overlapHoles);
    plan.split = plan.grid.tiles.size() > 1;
    placeTiles(plan);
    return plan;
}

Point holeCentre(const ViewPlacement& view, double pitchMm, netcheck::Hole hole) {
    int along = hole.col - view.tile.col0;
    if (view.side == Side::Copper) along = view.tile.cols - 1 - along;
    return {view.board.x + (along + 0.5) * pitchMm,
            view.board.y + (hole.row - view.tile.row0 + 0.5) * pitchMm};
}

bool tileHas(const Tile& tile, netcheck::Hole hole) {
    return hole.row >= tile.row0 && hole.row < tile.row0 + tile.rows && hole.col >= tile.col0 &&
           hole.col < tile.col0 + tile.cols;
}

}  // namespace sheet
