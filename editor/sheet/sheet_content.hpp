// What the sheet lists, derived from the board without any drawing: numbered cuts, the bill of
// materials, link and wiring lists and the assembly order. Kept apart so it can be tested alone.
#pragma once

#include <string>
#include <vector>

#include "netcheck/model/board.hpp"

namespace sheet {

/// The board's cuts in the order they are numbered on the sheet (by row, then hole, then kind);
/// cut number i is element i - 1.
std::vector<netcheck::Cut> numberedCuts(const netcheck::Board& board);

/// Where a hole (or the gap after it) is counted from the left edge, as seen from one side.
/// On the component side hole 1 is first from the left; seen from the copper side the same hole
/// is `cols`-th from the left.
int fromLeftComponent(const netcheck::Board& board, int col);
int fromLeftCopper(const netcheck::Board& board, int col);

/// One line of the bill of materials: parts of the same kind and value.
struct BomLine {
    int quantity = 0;
    std::vector<std::string> refs;  ///< in natural order (R2 before R10)
    std::string value;
    std::string kind;   ///< file name of the kind
    std::string label;  ///< readable kind, e.g. "Electrolytic capacitor"
    std::string notes;  ///< colour bands, pinout, taper, "off-board" ...
};

/// Groups on-board and off-board parts by kind and value (values compared as quantities, so
/// "4k7" and "4.7k" share a line), ordered by kind then value.
std::vector<BomLine> billOfMaterials(const netcheck::Board& board);

/// "yellow violet red gold" for a resistor value (IEC 60062), empty when it cannot be coded.
std::string colourBandsText(const std::string& value, double tolerancePercent);

/// One row of the wiring list.
struct WiringLine {
    std::string from;
    std::string to;
    std::string colour;  ///< as written, or "(not given)"
    std::string note;    ///< what the off-board end is, e.g. "VR1 pot 100k, lug 2"
};
std::vector<WiringLine> wiringList(const netcheck::Board& board);

/// One row of the link list.
struct LinkLine {
    std::string from;
    std::string to;
    double lengthMm = 0;  ///< centre to centre
    bool copperSide = false;
    bool insulated = false;  ///< sleeve it: it lies across leads or other links
};
std::vector<LinkLine> linkList(const netcheck::Board& board);

/// One step of the assembly checklist, in build order (common practice: cuts first, then links,
/// then parts from the lowest to the tallest, off-board wiring last).
struct AssemblyStep {
    std::string text;
    std::vector<std::string> refs;  ///< parts fitted in this step (may be empty)
};
std::vector<AssemblyStep> assemblyOrder(const netcheck::Board& board);

/// Sorts references naturally: letters, then the number by value ("R2" < "R10").
bool refLess(const std::string& a, const std::string& b);

/// "24 x 10 holes (60.96 x 25.40 mm)".
std::string boardSizeText(const netcheck::Board& board);

}  // namespace sheet
