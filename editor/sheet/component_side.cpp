// The component side: faint strips, holes, where the cuts are underneath, links, parts with
// reference and value, and off-board wires with their colour names.
#include <algorithm>
#include <cmath>
#include <string>
#include <vector>

#include "board_view.hpp"
#include "netcheck/model/part_kinds.hpp"
#include "sheet_text.hpp"
#include "wire_colours.hpp"

namespace sheet {

namespace {

using netcheck::Hole;
using netcheck::Part;

/// The strips show through faintly so the maker sees which holes are joined.
void drawFaintStrips(cairo_t* cr, const ViewContext& context) {
    if (context.board.copper != netcheck::CopperPattern::Strips) return;
    const Tile& tile = context.view.tile;
    for (int row = tile.row0; row < tile.row0 + tile.rows; ++row) {
        Point a = context.at({row, tile.col0});
        cairo_rectangle(cr, context.view.board.x, a.y - context.pitch() * 0.3, context.view.board.w,
                        context.pitch() * 0.6);
    }
    cairo_set_source_rgb(cr, 0.95, 0.92, 0.87);
    cairo_fill(cr);
}

/// Thin pink crosses where the copper is cut, so the top view agrees with the copper view.
void drawCutHints(cairo_t* cr, const ViewContext& context) {
    double d = context.pitch() * 0.22;
    for (const auto& cut : context.cuts) {
        if (!context.shows(cut.hole)) continue;
        Point c = context.at(cut.hole);
        if (cut.kind == netcheck::Cut::Kind::Between) {
            c.x += context.pitch() / 2;
            cairo_move_to(cr, c.x, c.y - 1.6 * d);
            cairo_line_to(cr, c.x, c.y + 1.6 * d);
            continue;
        }
        cairo_move_to(cr, c.x - d, c.y - d);
        cairo_line_to(cr, c.x + d, c.y + d);
        cairo_move_to(cr, c.x - d, c.y + d);
        cairo_line_to(cr, c.x + d, c.y - d);
    }
    cairo_set_source_rgb(cr, 0.95, 0.55, 0.55);
    cairo_set_line_width(cr, 0.2);
    cairo_stroke(cr);
}

constexpr Rgb kSleeve{0.62, 0.85, 0.68};  // prints as a pale band in grey too

void drawLinks(cairo_t* cr, const ViewContext& context) {
    cairo_set_line_cap(cr, CAIRO_LINE_CAP_ROUND);
    for (const auto& link : context.board.links) {
        if (link.copperSide) continue;
        Point a = context.at(link.from), b = context.at(link.to);
        if (link.insulated) {  // a wide pale band short of the ends: slide a sleeve on this one
            auto along = [&](double t) { return Point{a.x + (b.x - a.x) * t, a.y + (b.y - a.y) * t}; };
            const Point from = along(0.15), to = along(0.85);
            cairo_move_to(cr, from.x, from.y);
            cairo_line_to(cr, to.x, to.y);
            cairo_set_source_rgb(cr, kSleeve.r, kSleeve.g, kSleeve.b);
            cairo_set_line_width(cr, 1.3);
            cairo_stroke(cr);
        }
        cairo_move_to(cr, a.x, a.y);
        cairo_line_to(cr, b.x, b.y);
        cairo_set_source_rgb(cr, 0.25, 0.45, 0.25);
        cairo_set_line_width(cr, 0.55);
        cairo_stroke(cr);
        for (Point end : {a, b}) {
            cairo_new_sub_path(cr);
            cairo_arc(cr, end.x, end.y, context.holeRadius(), 0, 2 * M_PI);
        }
        cairo_fill(cr);
    }
    cairo_set_line_cap(cr, CAIRO_LINE_CAP_BUTT);
}

Rgb bodyFill(const std::string& kind) {
    if (kind == "resistor") return {0.93, 0.85, 0.68};
    if (kind == "electrolytic") return {0.72, 0.80, 0.95};
    if (kind == "capacitor") return {0.98, 0.88, 0.60};
    if (kind == "diode" || kind == "zener" || kind == "led") return {0.90, 0.90, 0.90};
    return {0.86, 0.86, 0.86};
}

void fillAndOutline(cairo_t* cr, Rgb fill) {
    setColour(cr, fill);
    cairo_fill_preserve(cr);
    cairo_set_source_rgb(cr, 0.15, 0.15, 0.15);
    cairo_set_line_width(cr, 0.2);
    cairo_stroke(cr);
}

bool isCathode(const std::string& pin) {
    return pin == "K" || pin == "-";
}

/// A two-lead part: the leads, a body along them (a disc when the leads are one hole apart:
/// the part stands on end), a band or sign for polarity, and the label.
void drawTwoLeadPart(cairo_t* cr, const ViewContext& context, const Part& part) {
    Point a = context.at(part.pins[0].hole), b = context.at(part.pins[1].hole);
    double length = std::hypot(b.x - a.x, b.y - a.y);
    double p = context.pitch();
    cairo_move_to(cr, a.x, a.y);
    cairo_line_to(cr, b.x, b.y);
    cairo_set_source_rgb(cr, 0.2, 0.2, 0.2);
    cairo_set_line_width(cr, 0.25);
    cairo_stroke(cr);
    Point mid{(a.x + b.x) / 2, (a.y + b.y) / 2};
    if (length < 1.5 * p) {
        cairo_arc(cr, a.x, a.y, 0.45 * p, 0, 2 * M_PI);
        fillAndOutline(cr, bodyFill(part.kind));
    } else {
        double angle = std::atan2(b.y - a.y, b.x - a.x);
        double body = std::max(length - 1.1 * p, 0.8 * p);
        cairo_save(cr);
        cairo_translate(cr, mid.x, mid.y);
        cairo_rotate(cr, angle);
        cairo_rectangle(cr, -body / 2, -0.32 * p, body, 0.64 * p);
        fillAndOutline(cr, bodyFill(part.kind));
        for (int end = 0; end < 2; ++end) {
            if (!isCathode(part.pins[end].name)) continue;
            double x = end == 0 ? -body / 2 : body / 2 - 0.2 * p;
            cairo_rectangle(cr, x, -0.32 * p, 0.2 * p, 0.64 * p);
            cairo_set_source_rgb(cr, 0.15, 0.15, 0.15);
            cairo_fill(cr);
        }
        cairo_restore(cr);
    }
}

/// A part with three or more leads: a box around them, pin 1 marked, the label inside.
void drawManyLeadPart(cairo_t* cr, const ViewContext& context, const Part& part) {
    double left = 1e9, right = -1e9, top = 1e9, bottom = -1e9;
    for (const auto& pin : part.pins) {
        Point c = context.at(pin.hole);
        left = std::min(left, c.x), right = std::max(right, c.x);
        top = std::min(top, c.y), bottom = std::max(bottom, c.y);
    }
    double pad = 0.4 * context.pitch();
    cairo_rectangle(cr, left - pad, top - pad, right - left + 2 * pad, bottom - top + 2 * pad);
    cairo_set_source_rgba(cr, 0.86, 0.86, 0.86, 0.75);
    cairo_fill_preserve(cr);
    cairo_set_source_rgb(cr, 0.15, 0.15, 0.15);
    cairo_set_line_width(cr, 0.25);
    cairo_stroke(cr);
    cairo_set_line_width(cr, 0.15);
    for (const auto& pin : part.pins) {
        Point c = context.at(pin.hole);
        cairo_new_sub_path(cr);
        cairo_arc(cr, c.x, c.y, context.holeRadius(), 0, 2 * M_PI);
    }
    cairo_stroke(cr);
    Point first = context.at(part.pins.front().hole);
    cairo_rectangle(cr, first.x - 0.3 * context.pitch(), first.y - 0.3 * context.pitch(),
                    0.6 * context.pitch(), 0.6 * context.pitch());
    cairo_fill(cr);
}

void drawPart(cairo_t* cr, const ViewContext& context, const Part& part) {
    if (part.pins.empty()) return;
    if (part.pins.size() == 2) {
        drawTwoLeadPart(cr, context, part);
        return;
    }
    if (part.pins.size() >= 3) {
        drawManyLeadPart(cr, context, part);
        return;
    }
    Point c = context.at(part.pins.front().hole);
    cairo_arc(cr, c.x, c.y, 0.4 * context.pitch(), 0, 2 * M_PI);
    fillAndOutline(cr, bodyFill(part.kind));
}

/// A ring in the wire's colour at the hole (its tag is one of the placed labels).
void drawWireEnd(cairo_t* cr, const ViewContext& context, Hole hole, const std::string& colour) {
    if (!context.shows(hole)) return;
    Point c = context.at(hole);
    Rgb ink = wireColour(colour).value_or(Rgb{0.5, 0.5, 0.5});
    cairo_new_path(cr);
    cairo_arc(cr, c.x, c.y, 0.42 * context.pitch(), 0, 2 * M_PI);
    if (isPale(ink)) {
        cairo_set_source_rgb(cr, 0.3, 0.3, 0.3);
        cairo_set_line_width(cr, 0.55);
        cairo_stroke_preserve(cr);
    }
    setColour(cr, ink);
    cairo_set_line_width(cr, 0.4);
    cairo_stroke(cr);
}

void drawWires(cairo_t* cr, const ViewContext& context) {
    for (const auto& wire : context.board.wires) {
        if (wire.from.isHole()) drawWireEnd(cr, context, *wire.from.hole, wire.color);
        if (wire.to.isHole()) drawWireEnd(cr, context, *wire.to.hole, wire.color);
    }
}

}  // namespace

void drawComponentSide(cairo_t* cr, const ViewContext& context) {
    drawFaintStrips(cr, context);
    drawHoles(cr, context, 0.55);
    drawCutHints(cr, context);
    drawLinks(cr, context);
    for (const auto& part : context.board.parts) drawPart(cr, context, part);
    drawWires(cr, context);
    drawPlacedLabels(cr, context, componentSideLabels(cr, context.board, context.pitch()));
}

}  // namespace sheet
