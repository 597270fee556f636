// The board document: names of cuts and wire ends, lookups by reference designator.
#include "netcheck/model/board.hpp"

namespace netcheck {

std::string cutName(const Cut& cut) {
    if (cut.kind == Cut::Kind::Hole) return holeName(cut.hole);
    return holeName(cut.hole) + "|" + holeName(Hole{cut.hole.row, cut.hole.col + 1});
}

std::string linkName(const Link& link) {
    return holeName(link.from) + "-" + holeName(link.to);
}

const Pin* Part::findPin(std::string_view name) const {
    for (const Pin& pin : pins) {
        if (pin.name == name) return &pin;
    }
    return nullptr;
}

std::string Endpoint::name() const {
    return hole ? holeName(*hole) : lug.name();
}

const Part* Board::findPart(std::string_view ref) const {
    for (const Part& part : parts) {
        if (part.ref == ref) return &part;
    }
    return nullptr;
}

const OffboardPart* Board::findOffboard(std::string_view ref) const {
    for (const OffboardPart& part : offboard) {
        if (part.ref == ref) return &part;
    }
    return nullptr;
}

}  // namespace netcheck
