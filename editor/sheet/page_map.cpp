#include "page_map.hpp"

#include <algorithm>
#include <string>

#include "sheet_text.hpp"

namespace sheet {

void drawPageMap(cairo_t* cr, const Rect& area, const SheetPlan& plan,
                 const ViewPlacement& current) {
    if (!plan.split) return;
    double boardW = plan.grid.tiles.back().col0 + plan.grid.tiles.back().cols;
    double boardH = plan.grid.tiles.back().row0 + plan.grid.tiles.back().rows;
    setColour(cr, kInk);
    setFont(cr, kSmallMm, Weight::Bold);
    drawText(cr, area.x, area.y + 2.2,
             current.side == Side::Copper ? "Page map (copper side)" : "Page map (component side)");
    Rect box{area.x, area.y + 3.5, area.w, area.h - 3.5};
    double scale = std::min(box.w / boardW, box.h / boardH);
    for (const ViewPlacement& view : plan.views) {
        if (view.side != current.side) continue;
        const Tile& tile = view.tile;
        double col = current.side == Side::Copper ? boardW - tile.col0 - tile.cols : tile.col0;
        Rect cell{box.x + col * scale, box.y + tile.row0 * scale, tile.cols * scale,
                  tile.rows * scale};
        bool here = view.pageIndex == current.pageIndex;
        cairo_rectangle(cr, cell.x, cell.y, cell.w, cell.h);
        cairo_set_source_rgba(cr, 0.2, 0.4, 0.9, here ? 0.35 : 0.06);
        cairo_fill_preserve(cr);
        cairo_set_source_rgb(cr, 0.2, 0.4, 0.9);
        cairo_set_line_width(cr, 0.25);
        cairo_stroke(cr);
        setColour(cr, kInk);
        setFont(cr, kSmallMm, here ? Weight::Bold : Weight::Normal);
        drawText(cr, cell.x + 1.0, cell.y + 2.4, "p." + std::to_string(view.pageIndex + 1));
    }
}

}  // namespace sheet
