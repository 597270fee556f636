// The labels of the sheet's board views, measured in the sheet's font and placed once per board
// (every tile of a split board shows the same places): part names and values, pin names and
// wire tags on the component side, cut numbers on the copper side.
#pragma once

#include <string>
#include <vector>

#include <cairo.h>

#include "label_placement.hpp"
#include "netcheck/model/board.hpp"
#include "sheet_text.hpp"

namespace sheet {

/// One label, placed. Positions are in board units (see label_placement.hpp), component side.
struct SheetLabel {
    std::string text;
    double fontMm = kTinyMm;
    Weight weight = Weight::Bold;
    Rgb ink = kInk;
    double anchorX = 0, anchorY = 0;  ///< what it names
    labels::Placement placement;
};

/// Pin names of small polarised parts, each part's reference and value, and at every wire end
/// on the board the tag naming the other end and the colour ("→VR1.3 red"). `cr` measures text.
std::vector<SheetLabel> componentSideLabels(cairo_t* cr, const netcheck::Board& board,
                                            double pitchMm);

/// The numbers of `cuts` (cut i + 1 is cuts[i]) beside their marks.
std::vector<SheetLabel> copperSideLabels(cairo_t* cr, const netcheck::Board& board,
                                         const std::vector<netcheck::Cut>& cuts, double pitchMm);

}  // namespace sheet
