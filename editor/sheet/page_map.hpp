// The page map of a board split over several pages: which part of the board is on which page.
#pragma once

#include <cairo.h>

#include "page_layout.hpp"

namespace sheet {

/// Draws the tiles of `current`'s side as seen from that side, each with its page number, the
/// current one filled, scaled to fit `area`. Nothing when the board is not split.
void drawPageMap(cairo_t* cr, const Rect& area, const SheetPlan& plan,
                 const ViewPlacement& current);

}  // namespace sheet
