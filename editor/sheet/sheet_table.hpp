// Tables on the list pages: a heading row, wrapped cells, optional tick boxes for the bench.
#pragma once

#include <string>
#include <vector>

#include "page_flow.hpp"
#include "sheet_text.hpp"

namespace sheet {

/// One column. Columns with `wrapWeight` 0 are as wide as their widest cell; the others share
/// the rest of the width by weight and wrap their text.
struct TableColumn {
    std::string title;
    double wrapWeight = 0;
    Align align = Align::Left;
};

struct Table {
    std::vector<TableColumn> columns;
    std::vector<std::vector<std::string>> rows;  ///< one string per column
    bool tickBoxes = false;                      ///< an empty box before each row
};

/// Draws the table down the flow; the heading row is repeated on every new page.
void drawTable(PageFlow& flow, const Table& table);

/// A section heading, kept on the same page as at least `keepWithMm` of what follows.
void drawHeading(PageFlow& flow, const std::string& text, double keepWithMm = 12.0);

/// A paragraph of wrapped body text.
void drawParagraph(PageFlow& flow, const std::string& text, Weight weight = Weight::Normal);

}  // namespace sheet
