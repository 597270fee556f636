#include "cautions.hpp"

#include "sheet_text.hpp"

namespace sheet {

std::vector<std::string> cautionLines() {
    return {
        "Low-voltage circuits only: at most 50 V AC or 120 V ripple-free DC (extra-low voltage, "
        "IEC 61140). Never mains: the gaps between strips are far too small.",
        "Solder in a ventilated place or with fume extraction: rosin flux fume can cause asthma "
        "(UK HSE, INDG248). Wash your hands after handling solder.",
        "Disconnect power before changing parts. Tape the terminals of stored 9 V batteries: a "
        "shorted battery can start a fire.",
        "Follow your local electrical codes and rules.",
    };
}

void drawCautions(cairo_t* cr, const Rect& area) {
    cairo_set_source_rgb(cr, 0.3, 0.3, 0.3);
    cairo_set_line_width(cr, 0.2);
    cairo_move_to(cr, area.x, area.y);
    cairo_line_to(cr, area.right(), area.y);
    cairo_stroke(cr);
    setColour(cr, kInk);
    setFont(cr, kSmallMm, Weight::Bold);
    double y = area.y + 2.8;
    drawText(cr, area.x, y, "CAUTIONS");
    double indent = textWidth(cr, "CAUTIONS") + 2.0;
    setFont(cr, kSmallMm);
    for (const std::string& line : cautionLines()) {
        for (const std::string& piece : wrapText(cr, "• " + line, area.w - indent)) {
            drawText(cr, area.x + indent, y, piece);
            y += 2.6;
        }
    }
}

void drawPageFooter(cairo_t* cr, const Rect& content, const std::string& title, int pageIndex,
                    int pageCount) {
    setColour(cr, kGreyInk);
    setFont(cr, kSmallMm);
    std::string name = "Stripsmith build sheet" + (title.empty() ? "" : " · " + title);
    drawText(cr, content.x, content.bottom(), name);
    drawText(cr, content.right(), content.bottom(),
             "page " + std::to_string(pageIndex + 1) + " of " + std::to_string(pageCount),
             Align::Right);
}

}  // namespace sheet
