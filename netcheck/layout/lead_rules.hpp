// How each kind of part stands on the board when the layout engine places it: the physical rules
// makers follow on a 0.1 in grid. Strips are rows; every on-board part stands in one column
// across strips (a DIP IC in two columns), so each lead lands on its own strip.
#pragma once

#include <string>
#include <vector>

#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// The ways a part can stand.
enum class LeadShape {
    TwoLead,   ///< two leads in one column, `spans` strips apart (either end up)
    InLine,    ///< three or more leads on adjacent strips in one column, in pin order (or reversed)
    Dip,       ///< dual in-line: pins 1..n/2 down one column, n/2+1..n up the column 3 to the right
    OffBoard,  ///< joined by flying wires only
};

/// The rule for one part of the circuit.
struct LeadRule {
    LeadShape shape = LeadShape::InLine;
    std::vector<int> spans;          ///< TwoLead: strips between the leads allowed, preferred first
    std::vector<std::string> pins;   ///< pin names in the order they stand (InLine, Dip, TwoLead)
    std::string body;                ///< TwoLead: "lying" or "standing" when the part says so
};

/// The rule for `part` (ref only for messages): by kind, the part's `body` ("standing" or
/// "lying", in extra) and its `pinout` ("E-B-C", in extra). `usedPins` are the pin names the
/// nets use, for parts that declare no pins.
LeadRule leadRule(const CircuitPart& part, const std::vector<std::string>& usedPins);

/// The rules as the README states them, one Markdown table row per kind.
std::string leadRulesMarkdown();

}  // namespace netcheck
