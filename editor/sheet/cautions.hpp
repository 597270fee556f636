// The cautions printed at the foot of every board page.
#pragma once

#include <string>
#include <vector>

#include <cairo.h>

#include "page_layout.hpp"

namespace sheet {

/// The caution lines, most important first.
std::vector<std::string> cautionLines();

/// Draws the cautions inside `area`, leaving its last line free for the page footer.
void drawCautions(cairo_t* cr, const Rect& area);

/// "Stripsmith build sheet · <title> · page 2 of 5" at the bottom of the content area.
void drawPageFooter(cairo_t* cr, const Rect& content, const std::string& title, int pageIndex,
                    int pageCount);

}  // namespace sheet
