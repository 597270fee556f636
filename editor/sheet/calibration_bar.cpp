#include "calibration_bar.hpp"

#include <cmath>
#include <cstdio>
#include <string>

#include "sheet_text.hpp"

namespace sheet {

namespace {

/// Alternating black and white 10 mm blocks with millimetre ticks and labels every 10 mm.
void drawMillimetreScale(cairo_t* cr, double x, double y) {
    const double height = 2.0;
    for (int block = 0; block < 5; ++block) {
        cairo_rectangle(cr, x + block * 10.0, y, 10.0, height);
        cairo_set_source_rgb(cr, block % 2 == 0 ? 0.0 : 1.0, block % 2 == 0 ? 0.0 : 1.0,
                             block % 2 == 0 ? 0.0 : 1.0);
        cairo_fill(cr);
    }
    cairo_set_source_rgb(cr, 0, 0, 0);
    cairo_set_line_width(cr, 0.2);
    cairo_rectangle(cr, x, y, kCalibrationLengthMm, height);
    cairo_stroke(cr);
    cairo_set_line_width(cr, 0.12);
    for (int mm = 0; mm <= 50; ++mm) {
        double tick = mm % 10 == 0 ? 1.6 : mm % 5 == 0 ? 1.1 : 0.6;
        cairo_move_to(cr, x + mm, y + height);
        cairo_line_to(cr, x + mm, y + height + tick);
    }
    cairo_stroke(cr);
    setFont(cr, kSmallMm);
    for (int mm = 0; mm <= 50; mm += 10) {
        drawText(cr, x + mm, y + height + 3.8, std::to_string(mm), Align::Centre);
    }
    drawText(cr, x + kCalibrationLengthMm + 2.0, y + height + 0.2, "mm");
}

/// Eleven ticks one hole pitch apart with a hole drawn at each: lay it on the board.
void drawHoleRuler(cairo_t* cr, double x, double y, double pitch) {
    cairo_set_source_rgb(cr, 0, 0, 0);
    cairo_set_line_width(cr, 0.2);
    cairo_move_to(cr, x, y + 2.0);
    cairo_line_to(cr, x + 10 * pitch, y + 2.0);
    for (int hole = 0; hole <= 10; ++hole) {
        cairo_move_to(cr, x + hole * pitch, y + 2.0);
        cairo_line_to(cr, x + hole * pitch, y + (hole % 5 == 0 ? 3.6 : 3.0));
    }
    cairo_stroke(cr);
    for (int hole = 0; hole <= 10; ++hole) {
        cairo_new_sub_path(cr);
        cairo_arc(cr, x + hole * pitch, y + 0.9, 0.18 * pitch, 0, 2 * M_PI);
    }
    cairo_stroke(cr);
    setFont(cr, kSmallMm);
    char text[96];
    std::snprintf(text, sizeof text, "10 holes = %.2f mm (pitch %.2f mm)", 10 * pitch, pitch);
    drawText(cr, x, y + 5.8, text);
}

}  // namespace

void drawCalibrationBar(cairo_t* cr, const Rect& area, double pitchMm) {
    setColour(cr, kInk);
    setFont(cr, kBodyMm, Weight::Bold);
    drawText(cr, area.x, area.y + 3.0,
             "Print at 100% / actual size (no \"fit to page\"); measure this bar: it must be "
             "exactly 50 mm.");
    double top = area.y + 5.5;
    drawMillimetreScale(cr, area.x, top);
    drawHoleRuler(cr, area.x + kCalibrationLengthMm + 14.0, top, pitchMm);
}

}  // namespace sheet
