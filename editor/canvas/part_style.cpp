#include "editor/canvas/part_style.hpp"

#include <cstdlib>

namespace stripsmith {
namespace {

std::string extraString(const netcheck::Part& part, const char* key) {
    auto it = part.extra.find(key);
    if (it == part.extra.end() || !it->is_string()) return {};
    return it->get<std::string>();
}

bool axial(BodyStyle style) {
    return style == BodyStyle::Resistor || style == BodyStyle::Diode;
}

}  // namespace

BodyStyle bodyStyleOf(const netcheck::Part& part) {
    const std::string& k = part.kind;
    const std::string package = extraString(part, "package");
    if (k == "resistor" || k == "fuse" || k == "inductor") return BodyStyle::Resistor;
    if (k == "capacitor") {
        if (package == "ceramic") return BodyStyle::CeramicCap;
        if (package == "film") return BodyStyle::FilmCap;
        return part.pins.size() == 2 && std::abs(part.pins[0].hole.col - part.pins[1].hole.col) +
                                                    std::abs(part.pins[0].hole.row - part.pins[1].hole.row) <= 1
                   ? BodyStyle::CeramicCap
                   : BodyStyle::FilmCap;
    }
    if (k == "electrolytic") return BodyStyle::Electrolytic;
    if (k == "diode" || k == "zener") return BodyStyle::Diode;
    if (k == "led") return BodyStyle::Led;
    if (k == "bjt" || k == "jfet" || k == "mosfet" || k == "regulator") return BodyStyle::ToPackage;
    if (k == "ic") return BodyStyle::Dip;
    if (k == "trimmer" || k == "pot") return BodyStyle::Trimmer;
    if (k == "header" || k == "wire-terminal") return BodyStyle::Header;
    if (k == "crystal") return BodyStyle::FilmCap;
    return BodyStyle::Generic;
}

bool isStanding(const netcheck::Part& part) {
    const std::string body = extraString(part, "body");
    if (body == "standing") return true;
    if (body == "lying") return false;
    if (part.pins.size() != 2 || !axial(bodyStyleOf(part))) return false;
    const int dr = part.pins[0].hole.row - part.pins[1].hole.row;
    const int dc = part.pins[0].hole.col - part.pins[1].hole.col;
    return dr * dr + dc * dc <= 2;
}

std::string pinoutLabel(const netcheck::Part& part) {
    std::string label = extraString(part, "pinout");
    if (!label.empty()) return label;
    for (const netcheck::Pin& pin : part.pins) label += (label.empty() ? "" : "-") + pin.name;
    return label;
}

}  // namespace stripsmith
