// What the JFET bias panel keeps between frames: the figures typed in and the resistor to set.
// View state only: never in the document and never in undo.
#pragma once

#include <string>

namespace stripsmith {

struct JfetPanelState {
    bool open = false;
    bool measured = false;  ///< from two bench readings instead of the datasheet's IDSS and VP
    std::string supply = "9", drainResistor = "4k7", target = "4.5";
    std::string idss = "3m", vp = "-2";
    std::string rs1 = "1k", vd1, rs2 = "2k2", vd2;
    std::string sourceRef;  ///< the board's resistor that Apply changes
};

}  // namespace stripsmith
