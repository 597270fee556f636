#include "sheet_text.hpp"

#include <string>

#include "netcheck/model/printable.hpp"

namespace sheet {

void setColour(cairo_t* cr, Rgb colour) {
    cairo_set_source_rgb(cr, colour.r, colour.g, colour.b);
}

void prepareText(cairo_t* cr) {
    cairo_font_options_t* options = cairo_font_options_create();
    cairo_font_options_set_hint_metrics(options, CAIRO_HINT_METRICS_OFF);
    cairo_font_options_set_hint_style(options, CAIRO_HINT_STYLE_NONE);
    cairo_set_font_options(cr, options);
    cairo_font_options_destroy(options);
}

void setFont(cairo_t* cr, double sizeMm, Weight weight) {
    cairo_select_font_face(
        cr, "DejaVu Sans", CAIRO_FONT_SLANT_NORMAL,
        weight == Weight::Bold ? CAIRO_FONT_WEIGHT_BOLD : CAIRO_FONT_WEIGHT_NORMAL);
    cairo_set_font_size(cr, sizeMm);
}

double textWidth(cairo_t* cr, std::string_view text) {
    const std::string owned = netcheck::escapeControls(text);
    cairo_text_extents_t extents;
    cairo_text_extents(cr, owned.c_str(), &extents);
    return extents.x_advance;
}

void drawText(cairo_t* cr, double x, double y, std::string_view text, Align align) {
    // Text from the board file: control characters would draw as nothing (or end the string at
    // a NUL), so they are written out as escapes, as every other output does.
    const std::string owned = netcheck::escapeControls(text);
    double width = align == Align::Left ? 0.0 : textWidth(cr, owned);
    double left = align == Align::Left ? x : align == Align::Centre ? x - width / 2 : x - width;
    cairo_move_to(cr, left, y);
    cairo_show_text(cr, owned.c_str());
    cairo_new_path(cr);
}

namespace {

// Cap height is close to 0.73 em in DejaVu Sans; centring on it looks centred for digits.
double capHeight(cairo_t* cr) {
    cairo_font_extents_t font;
    cairo_font_extents(cr, &font);
    return font.ascent / 0.928 * 0.73;
}

}  // namespace

LabelSize labelSize(cairo_t* cr, std::string_view text) {
    const double size = capHeight(cr);
    const double pad = size * 0.25;
    return {textWidth(cr, text) + 2 * pad, size + 2 * pad};
}

void drawLabel(cairo_t* cr, double x, double y, std::string_view text, Rgb ink) {
    double size = capHeight(cr);
    double width = textWidth(cr, text);
    double pad = size * 0.25;
    cairo_set_source_rgba(cr, 1, 1, 1, 0.85);
    cairo_rectangle(cr, x - width / 2 - pad, y - size / 2 - pad, width + 2 * pad, size + 2 * pad);
    cairo_fill(cr);
    setColour(cr, ink);
    drawText(cr, x, y + size / 2, text, Align::Centre);
}

std::vector<std::string> wrapText(cairo_t* cr, std::string_view text, double widthMm) {
    std::vector<std::string> lines;
    std::string line;
    size_t start = 0;
    while (start <= text.size()) {
        size_t end = text.find(' ', start);
        if (end == std::string_view::npos) end = text.size();
        std::string word(text.substr(start, end - start));
        std::string candidate = line.empty() ? word : line + " " + word;
        if (!line.empty() && textWidth(cr, candidate) > widthMm) {
            lines.push_back(line);
            line = word;
        } else {
            line = candidate;
        }
        start = end + 1;
    }
    if (!line.empty() || lines.empty()) lines.push_back(line);
    return lines;
}

std::string fitText(cairo_t* cr, std::string_view text, double widthMm) {
    std::string result(text);
    if (textWidth(cr, result) <= widthMm) return result;
    while (!result.empty()) {
        // Drop whole UTF-8 sequences, not single bytes.
        while (!result.empty() && (static_cast<unsigned char>(result.back()) & 0xC0) == 0x80) {
            result.pop_back();
        }
        if (!result.empty()) result.pop_back();
        if (textWidth(cr, result + "…") <= widthMm) return result + "…";
    }
    return "…";
}

}  // namespace sheet
