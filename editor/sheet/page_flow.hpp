// Flowing blocks of text and tables down the pages after the board pages, starting a new page
// when the current one is full.
#pragma once

#include <functional>
#include <optional>

#include <cairo.h>

#include "page_layout.hpp"

namespace sheet {

class PageFlow {
public:
    /// `startPage` ends the current page (if any) and prepares the next one, whose free area is
    /// `area`; it is called whenever a block does not fit. Blocks go first into `firstArea` (room
    /// left on a page already drawn) when given, else onto a new page.
    PageFlow(cairo_t* cr, std::optional<Rect> firstArea, const Rect& area,
             std::function<void()> startPage);

    cairo_t* cr() const { return cr_; }
    double left() const { return current_.x; }
    double width() const { return current_.w; }
    /// Top of a block `height` mm high, on a new page when the current one has less room.
    double place(double height);
    /// Starts a new page unless `height` mm are free on the current one; takes no space.
    void ensure(double height);
    /// True when the last place() call started a new page.
    bool startedPage() const { return startedPage_; }
    /// Pages started so far (not counting the page holding `firstArea`).
    int pageCount() const { return pages_; }
    /// Leaves vertical space (ignored at the top of a page).
    void skip(double mm);

private:
    cairo_t* cr_;
    std::optional<Rect> firstArea_;
    Rect area_;
    Rect current_;
    bool inFirstArea_ = false;
    std::function<void()> startPage_;
    double y_ = 0;
    bool onPage_ = false;
    bool startedPage_ = false;
    int pages_ = 0;
};

}  // namespace sheet
