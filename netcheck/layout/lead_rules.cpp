// The physical rules per kind, common practice on a 0.1 in grid (see /README.md, "Laying out from
// the circuit"); the kinds themselves are in model/part_kinds.cpp, whose `span` column gives the
// lying span used here.
//
// - Resistors, inductors, fuses, diodes and zeners lie with their leads at least the kind's span
//   apart (resistor, inductor, fuse 4; diode, zener 3) and up to two more; standing on end (body
//   "standing") 1 or 2. A part that does not say how it stands may do either: the engine picks
//   what fits, lying preferred.
// - Film capacitors and crystals 2 apart (5 mm lead pitch); radial electrolytics and LEDs 1.
// - Transistors, FETs, regulators and trimmers: three adjacent strips in one column, in the order
//   of the part's pinout (extra "pinout", e.g. "E-B-C"; else the circuit's pin order, else the
//   kind's), or that order turned round.
// - DIP ICs straddle: pins 1..n/2 down one column, n/2+1..n back up the column 3 holes to the
//   right (0.3 in), the strips between the two pin columns cut.
// - Headers, wire terminals and parts of unknown kind with three or more pins: adjacent strips in
//   one column, in pin order. Unknown two-lead parts: 1 to 4 apart.
// - Off-board kinds (pots, jacks, switches, DC jacks, battery snaps, panel LEDs): flying wires to
//   a hole of their net's strip at a board edge.
#include "netcheck/layout/lead_rules.hpp"

#include <algorithm>
#include <cstdlib>

#include "netcheck/model/part_kinds.hpp"

namespace netcheck {

namespace {

std::string extraText(const CircuitPart& part, const char* key) {
    const auto found = part.extra.find(key);
    return found != part.extra.end() && found->is_string() ? found->get<std::string>() : "";
}

std::vector<std::string> splitPinout(const std::string& pinout) {
    std::vector<std::string> names;
    std::size_t start = 0;
    while (start <= pinout.size()) {
        const std::size_t dash = pinout.find('-', start);
        const std::size_t end = dash == std::string::npos ? pinout.size() : dash;
        names.push_back(pinout.substr(start, end - start));
        if (dash == std::string::npos) break;
        start = dash + 1;
    }
    return names;
}

bool isNumber(const std::string& text) {
    return !text.empty() && std::all_of(text.begin(), text.end(), [](char c) { return c >= '0' && c <= '9'; });
}

// The part's pins in standing order: declared, else the kind's names when the nets use no
// others, else the names the nets use (numbers in numeric order).
std::vector<std::string> pinOrder(const CircuitPart& part, const PartKind* kind,
                                  const std::vector<std::string>& usedPins) {
    if (!part.pins.empty()) return part.pins;
    if (kind != nullptr && !kind->pins.empty()) {
        std::vector<std::string> names(kind->pins.begin(), kind->pins.end());
        const bool covers = std::all_of(usedPins.begin(), usedPins.end(), [&](const std::string& p) {
            return std::find(names.begin(), names.end(), p) != names.end();
        });
        if (covers) return names;
    }
    std::vector<std::string> names = usedPins;
    std::sort(names.begin(), names.end(), [](const std::string& a, const std::string& b) {
        if (isNumber(a) && isNumber(b) && a.size() != b.size()) return a.size() < b.size();
        return a < b;
    });
    return names;
}

// Lead spans of a two-lead part: lying from the kind's span up two more, standing 1 or 2.
std::vector<int> twoLeadSpans(const std::string& kindName, int kindSpan, const std::string& body) {
    const bool axial = kindName == "resistor" || kindName == "inductor" || kindName == "fuse" ||
                       kindName == "diode" || kindName == "zener";
    if (!axial) {
        if (kindSpan > 0) return {kindSpan};
        return {1, 2, 3, 4};
    }
    const std::vector<int> lying{kindSpan, kindSpan + 1, kindSpan + 2};
    const std::vector<int> standing{1, 2};
    if (body == "standing") return standing;
    if (body == "lying") return lying;
    std::vector<int> either = lying;
    either.insert(either.end(), standing.begin(), standing.end());
    return either;
}

}  // namespace

LeadRule leadRule(const CircuitPart& part, const std::vector<std::string>& usedPins) {
    const PartKind* kind = findPartKind(part.kind);
    LeadRule rule;
    rule.pins = pinOrder(part, kind, usedPins);
    rule.body = extraText(part, "body");
    if (kind != nullptr && kind->offboard) {
        rule.shape = LeadShape::OffBoard;
        return rule;
    }
    const std::string pinout = extraText(part, "pinout");
    if (!pinout.empty()) {
        std::vector<std::string> named = splitPinout(pinout);
        std::vector<std::string> sorted = named;
        std::vector<std::string> pins = rule.pins;
        std::sort(sorted.begin(), sorted.end());
        std::sort(pins.begin(), pins.end());
        if (sorted == pins) rule.pins = std::move(named);
    }
    if (part.kind == "ic" && rule.pins.size() >= 4 && rule.pins.size() % 2 == 0) {
        rule.shape = LeadShape::Dip;
    } else if (rule.pins.size() == 2) {
        rule.shape = LeadShape::TwoLead;
        rule.spans = twoLeadSpans(part.kind, kind != nullptr ? kind->span : 0, rule.body);
    } else {
        rule.shape = LeadShape::InLine;
    }
    return rule;
}

std::string leadRulesMarkdown() {
    return "| kinds | how they stand (strips are rows; leads in one column) |\n"
           "|---|---|\n"
           "| resistor, inductor, fuse | lying 4 to 6 strips apart, standing 1 or 2 (`body`: "
           "`lying` / `standing`; unset: either, lying preferred) |\n"
           "| diode, zener | lying 3 to 5 apart, standing 1 or 2 |\n"
           "| capacitor (film), crystal | 2 apart |\n"
           "| electrolytic, led | 1 apart |\n"
           "| bjt, jfet, mosfet, regulator, trimmer | three adjacent strips, in the part's "
           "`pinout` order (or turned round) |\n"
           "| ic (DIP) | pins 1..n/2 down one column, the rest up the column 3 holes right; the "
           "strips between cut |\n"
           "| header, wire-terminal, other multi-pin | adjacent strips, in pin order |\n"
           "| pot, jacks, switches, dc-jack, battery, panel-led | off the board: flying wires to "
           "its nets' strips at a board edge |\n";
}

}  // namespace netcheck
