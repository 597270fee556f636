#include "netcheck/model/link_geometry.hpp"

#include <algorithm>

namespace netcheck {

bool isBare(const Board& board, const Link& link) {
    return !link.copperSide && !link.insulated && board.contains(link.from) &&
           board.contains(link.to);
}

double contactReach(const Board& board) {
    return std::min(kLinkContactMm / board.pitchMm, 0.5);
}

std::optional<std::string> crossingPlace(const Link& first, const Link& second) {
    const std::int64_t c1 = cross(first.from, first.to, second.from);
    const std::int64_t c2 = cross(first.from, first.to, second.to);
    const std::int64_t c3 = cross(second.from, second.to, first.from);
    const std::int64_t c4 = cross(second.from, second.to, first.to);
    auto opposite = [](std::int64_t x, std::int64_t y) {
        return (x > 0 && y < 0) || (x < 0 && y > 0);
    };
    if (!opposite(c1, c2) || !opposite(c3, c4)) return std::nullopt;
    const std::int64_t dr = first.to.row - first.from.row;
    const std::int64_t dc = first.to.col - first.from.col;
    const std::int64_t span = c3 - c4;  // never zero for wires that cross
    const bool onHole = (c3 * dr) % span == 0 && (c3 * dc) % span == 0;
    const double t = static_cast<double>(c3) / static_cast<double>(span);
    const Hole nearest{first.from.row + static_cast<int>(std::lround(t * static_cast<double>(dr))),
                       first.from.col + static_cast<int>(std::lround(t * static_cast<double>(dc)))};
    return (onHole ? "at " : "near ") + holeName(nearest);
}

}  // namespace netcheck
