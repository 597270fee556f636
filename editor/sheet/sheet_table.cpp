#include "sheet_table.hpp"

#include <algorithm>

namespace sheet {

namespace {

constexpr double kLineMm = 3.3;
constexpr double kPadMm = 1.2;
constexpr double kTickMm = 5.0;

std::vector<double> columnWidths(cairo_t* cr, const Table& table, double total) {
    std::vector<double> widths(table.columns.size(), 0.0);
    double fixed = 0, weights = 0;
    for (std::size_t c = 0; c < table.columns.size(); ++c) {
        const TableColumn& column = table.columns[c];
        if (column.wrapWeight > 0) {
            weights += column.wrapWeight;
            continue;
        }
        setFont(cr, kBodyMm, Weight::Bold);
        double width = textWidth(cr, column.title);
        setFont(cr, kBodyMm);
        for (const auto& row : table.rows) width = std::max(width, textWidth(cr, row[c]));
        widths[c] = std::min(width + 2 * kPadMm, total * 0.3);
        fixed += widths[c];
    }
    double rest = std::max(total - fixed, 20.0);
    for (std::size_t c = 0; c < table.columns.size(); ++c) {
        if (table.columns[c].wrapWeight > 0)
            widths[c] = rest * table.columns[c].wrapWeight / weights;
    }
    return widths;
}

double cellX(double left, double width, Align align) {
    return align == Align::Left    ? left + kPadMm
           : align == Align::Right ? left + width - kPadMm
                                   : left + width / 2;
}

void drawHeaderRow(PageFlow& flow, const Table& table, const std::vector<double>& widths,
                   double left) {
    cairo_t* cr = flow.cr();
    double top = flow.place(kLineMm + kPadMm);
    cairo_set_source_rgb(cr, 0.85, 0.85, 0.85);
    cairo_rectangle(cr, flow.left(), top, flow.width(), kLineMm + kPadMm);
    cairo_fill(cr);
    setColour(cr, kInk);
    setFont(cr, kBodyMm, Weight::Bold);
    double x = left;
    for (std::size_t c = 0; c < table.columns.size(); ++c) {
        drawText(cr, cellX(x, widths[c], table.columns[c].align), top + kLineMm - 0.3,
                 fitText(cr, table.columns[c].title, widths[c] - kPadMm), table.columns[c].align);
        x += widths[c];
    }
}

void drawTickBox(cairo_t* cr, double x, double top) {
    cairo_set_source_rgb(cr, 0, 0, 0);
    cairo_set_line_width(cr, 0.25);
    cairo_rectangle(cr, x + 0.8, top + 0.7, 2.6, 2.6);
    cairo_stroke(cr);
}

}  // namespace

void drawTable(PageFlow& flow, const Table& table) {
    cairo_t* cr = flow.cr();
    double left = flow.left() + (table.tickBoxes ? kTickMm : 0);
    auto widths = columnWidths(cr, table, flow.width() - (left - flow.left()));
    flow.ensure(3 * (kLineMm + kPadMm));
    drawHeaderRow(flow, table, widths, left);
    for (std::size_t r = 0; r < table.rows.size(); ++r) {
        setFont(cr, kBodyMm);
        std::vector<std::vector<std::string>> cells;
        std::size_t lines = 1;
        for (std::size_t c = 0; c < table.columns.size(); ++c) {
            const std::string& text = table.rows[r][c];
            cells.push_back(table.columns[c].wrapWeight > 0
                                ? wrapText(cr, text, widths[c] - 2 * kPadMm)
                                : std::vector<std::string>{fitText(cr, text, widths[c] - kPadMm)});
            lines = std::max(lines, cells.back().size());
        }
        double height = lines * kLineMm + kPadMm;
        double top = flow.place(height);
        if (flow.startedPage()) {
            drawHeaderRow(flow, table, widths, left);
            top = flow.place(height);
        }
        if (r % 2 == 1) {
            cairo_set_source_rgb(cr, 0.95, 0.95, 0.95);
            cairo_rectangle(cr, flow.left(), top, flow.width(), height);
            cairo_fill(cr);
        }
        if (table.tickBoxes) drawTickBox(cr, flow.left(), top);
        setColour(cr, kInk);
        setFont(cr, kBodyMm);
        double x = left;
        for (std::size_t c = 0; c < cells.size(); ++c) {
            for (std::size_t line = 0; line < cells[c].size(); ++line) {
                drawText(cr, cellX(x, widths[c], table.columns[c].align),
                         top + (line + 1) * kLineMm - 0.3, cells[c][line], table.columns[c].align);
            }
            x += widths[c];
        }
    }
    flow.skip(4.0);
}

void drawHeading(PageFlow& flow, const std::string& text, double keepWithMm) {
    cairo_t* cr = flow.cr();
    flow.ensure(kHeadingMm + 2.5 + keepWithMm);
    double top = flow.place(kHeadingMm + 2.5);
    setColour(cr, kInk);
    setFont(cr, kHeadingMm, Weight::Bold);
    drawText(cr, flow.left(), top + kHeadingMm, text);
}

void drawParagraph(PageFlow& flow, const std::string& text, Weight weight) {
    cairo_t* cr = flow.cr();
    setFont(cr, kBodyMm, weight);
    for (const std::string& line : wrapText(cr, text, flow.width())) {
        double top = flow.place(kLineMm);
        setColour(cr, kInk);
        setFont(cr, kBodyMm, weight);
        drawText(cr, flow.left(), top + kLineMm - 0.3, line);
    }
    flow.skip(1.5);
}

}  // namespace sheet
