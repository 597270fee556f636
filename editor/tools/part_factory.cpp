#include "editor/tools/part_factory.hpp"

#include <algorithm>

#include "netcheck/model/part_kinds.hpp"

namespace stripsmith {

using netcheck::Hole;
using netcheck::Part;

bool isTwoLead(std::string_view kind) {
    const netcheck::PartKind* k = netcheck::findPartKind(kind);
    return k && k->pins.size() == 2 && !k->offboard;
}

int defaultPinCount(std::string_view kind) {
    if (kind == "ic") return 8;
    if (kind == "header" || kind == "wire-terminal") return 4;
    const netcheck::PartKind* k = netcheck::findPartKind(kind);
    if (k && !k->pins.empty()) return static_cast<int>(k->pins.size());
    return 3;
}

std::vector<std::string> pinNamesFor(std::string_view kind, int count) {
    std::vector<std::string> names;
    const netcheck::PartKind* k = netcheck::findPartKind(kind);
    if (k && static_cast<int>(k->pins.size()) == count) {
        for (std::string_view n : k->pins) names.emplace_back(n);
        return names;
    }
    for (int i = 1; i <= count; ++i) names.push_back(std::to_string(i));
    return names;
}

Part makeTwoLeadPart(std::string_view kind, std::string ref, std::string value, Hole first, Hole second) {
    Part part;
    part.ref = std::move(ref);
    part.kind = std::string(kind);
    part.value = std::move(value);
    const auto names = pinNamesFor(kind, 2);
    part.pins = {{names[0], first}, {names[1], second}};
    return part;
}

namespace {

Hole turn(Hole offset, int quarterTurns) {
    // Clockwise on screen (rows down, columns right): (row, col) -> (col, -row).
    for (int i = 0; i < ((quarterTurns % 4) + 4) % 4; ++i) offset = {offset.col, -offset.row};
    return offset;
}

std::vector<Hole> footprint(std::string_view kind, int pinCount) {
    std::vector<Hole> offsets;
    if (kind == "ic") {
        const int half = std::max(1, pinCount / 2);
        for (int i = 0; i < half; ++i) offsets.push_back({i, 0});
        for (int i = half - 1; i >= 0; --i) offsets.push_back({i, 3});
        return offsets;
    }
    for (int i = 0; i < pinCount; ++i) offsets.push_back({i, 0});
    return offsets;
}

}  // namespace

Part makeMultiPinPart(std::string_view kind, std::string ref, std::string value, Hole anchor,
                      int quarterTurns, int pinCount) {
    Part part;
    part.ref = std::move(ref);
    part.kind = std::string(kind);
    part.value = std::move(value);
    const auto offsets = footprint(kind, pinCount);
    const auto names = pinNamesFor(kind, static_cast<int>(offsets.size()));
    for (std::size_t i = 0; i < offsets.size(); ++i) {
        const Hole o = turn(offsets[i], quarterTurns);
        part.pins.push_back({names[i], {anchor.row + o.row, anchor.col + o.col}});
    }
    if (!pinoutChoices(kind).empty()) {
        std::string label;
        for (const auto& n : names) label += (label.empty() ? "" : "-") + n;
        part.extra["pinout"] = label;
    }
    return part;
}

Hole defaultSecondHole(std::string_view kind, Hole first, bool standing) {
    const netcheck::PartKind* k = netcheck::findPartKind(kind);
    const int span = standing ? 1 : std::max(1, k ? k->span : 3);
    return {first.row, first.col + span};
}

Part rotatePart(const Part& part) {
    Part out = part;
    if (part.pins.empty()) return out;
    const Hole pivot = part.pins.front().hole;
    for (auto& pin : out.pins) {
        const Hole o = turn({pin.hole.row - pivot.row, pin.hole.col - pivot.col}, 1);
        pin.hole = {pivot.row + o.row, pivot.col + o.col};
    }
    return out;
}

Part movePart(const Part& part, int rows, int cols) {
    Part out = part;
    for (auto& pin : out.pins) pin.hole = {pin.hole.row + rows, pin.hole.col + cols};
    return out;
}

bool fitsOnBoard(const Part& part, const netcheck::Board& board) {
    return std::all_of(part.pins.begin(), part.pins.end(), [&](const netcheck::Pin& p) { return board.contains(p.hole); });
}

std::vector<std::string> pinoutChoices(std::string_view kind) {
    if (kind == "bjt") return {"E-B-C", "C-B-E", "B-C-E", "E-C-B", "B-E-C", "C-E-B"};
    if (kind == "jfet" || kind == "mosfet") return {"D-S-G", "G-S-D", "S-G-D", "D-G-S", "G-D-S", "S-D-G"};
    if (kind == "regulator") return {"IN-GND-OUT", "OUT-GND-IN", "GND-OUT-IN", "ADJ-OUT-IN"};
    return {};
}

std::optional<Part> applyPinout(const Part& part, std::string_view pinout) {
    std::vector<std::string> names;
    std::size_t start = 0;
    while (start <= pinout.size()) {
        const std::size_t dash = pinout.find('-', start);
        const std::size_t end = dash == std::string_view::npos ? pinout.size() : dash;
        if (end == start) return std::nullopt;
        names.emplace_back(pinout.substr(start, end - start));
        if (dash == std::string_view::npos) break;
        start = dash + 1;
    }
    if (names.size() != part.pins.size()) return std::nullopt;
    Part out = part;
    for (std::size_t i = 0; i < names.size(); ++i) out.pins[i].name = names[i];
    out.extra["pinout"] = std::string(pinout);
    return out;
}

}  // namespace stripsmith
