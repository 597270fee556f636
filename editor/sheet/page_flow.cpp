#include "page_flow.hpp"

#include <utility>

namespace sheet {

PageFlow::PageFlow(cairo_t* cr, std::optional<Rect> firstArea, const Rect& area,
                   std::function<void()> startPage)
    : cr_(cr),
      firstArea_(firstArea),
      area_(area),
      current_(area),
      startPage_(std::move(startPage)) {}

double PageFlow::place(double height) {
    int before = pages_;
    ensure(height);
    startedPage_ = pages_ != before;
    double top = y_;
    y_ += height;
    return top;
}

void PageFlow::ensure(double height) {
    if (!onPage_ && firstArea_) {
        current_ = *firstArea_;
        inFirstArea_ = onPage_ = true;
        y_ = current_.y;
    }
    // At the top of a fresh page a block taller than the page is placed anyway.
    bool atTop = onPage_ && !inFirstArea_ && y_ <= current_.y;
    if (!onPage_ || (y_ + height > current_.bottom() && !atTop)) {
        startPage_();
        ++pages_;
        current_ = area_;
        onPage_ = true;
        inFirstArea_ = false;
        y_ = current_.y;
    }
}

void PageFlow::skip(double mm) {
    if (onPage_ && y_ > current_.y) y_ += mm;
}

}  // namespace sheet
