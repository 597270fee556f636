#include "editor/tools/hit_test.hpp"

#include <algorithm>
#include <cmath>

#include "editor/canvas/part_style.hpp"
#include "editor/canvas/wire_route.hpp"

namespace stripsmith {

using netcheck::edit::ElementRef;

namespace {

ImVec2 centre(netcheck::Hole h) { return {static_cast<float>(h.col) + 0.5f, static_cast<float>(h.row) + 0.5f}; }

/// Inside a transistor's D-shaped body as the canvas draws it: a half disc on one side of the
/// line through the first and last lead, its flat face 0.3 pitch behind that line.
bool toPackageBodyHit(const netcheck::Part& part, ImVec2 p) {
    const ImVec2 a = centre(part.pins.front().hole), b = centre(part.pins.back().hole);
    const float dx = b.x - a.x, dy = b.y - a.y;
    const float len = std::sqrt(dx * dx + dy * dy);
    const ImVec2 d = len > 0.01f ? ImVec2{dx / len, dy / len} : ImVec2{1, 0};
    const ImVec2 n{-d.y, d.x};
    const float radius = std::max(len * 0.5f + 0.45f, 0.8f);
    const ImVec2 flat{(a.x + b.x) / 2 - n.x * 0.3f, (a.y + b.y) / 2 - n.y * 0.3f};
    const float rx = p.x - flat.x, ry = p.y - flat.y;
    return rx * n.x + ry * n.y >= 0 && rx * rx + ry * ry <= radius * radius;
}

bool partHit(const netcheck::Part& part, ImVec2 p) {
    if (part.pins.size() >= 2 && bodyStyleOf(part) == BodyStyle::ToPackage && toPackageBodyHit(part, p))
        return true;
    for (std::size_t i = 0; i < part.pins.size(); ++i) {
        if (distanceToSegment(p, centre(part.pins[i].hole), centre(part.pins[i].hole)) < 0.45f) return true;
        if (i > 0 && distanceToSegment(p, centre(part.pins[i - 1].hole), centre(part.pins[i].hole)) < 0.35f) return true;
    }
    if (part.pins.size() > 2) {
        float x0 = 1e9f, y0 = 1e9f, x1 = -1e9f, y1 = -1e9f;
        for (const auto& pin : part.pins) {
            const ImVec2 c = centre(pin.hole);
            x0 = std::min(x0, c.x); y0 = std::min(y0, c.y); x1 = std::max(x1, c.x); y1 = std::max(y1, c.y);
        }
        return p.x >= x0 - 0.4f && p.x <= x1 + 0.4f && p.y >= y0 - 0.4f && p.y <= y1 + 0.4f;
    }
    return false;
}

}  // namespace

float distanceToSegment(ImVec2 p, ImVec2 a, ImVec2 b) {
    const float dx = b.x - a.x, dy = b.y - a.y;
    const float len2 = dx * dx + dy * dy;
    float t = len2 > 0 ? ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2 : 0.0f;
    t = std::clamp(t, 0.0f, 1.0f);
    const float ex = a.x + t * dx - p.x, ey = a.y + t * dy - p.y;
    return std::sqrt(ex * ex + ey * ey);
}

std::optional<ElementRef> elementAt(const netcheck::Board& board, const std::vector<OffboardSpot>& spots,
                                    ImVec2 point) {
    // Later parts are drawn on top, so they win.
    for (std::size_t i = board.parts.size(); i-- > 0;)
        if (partHit(board.parts[i], point)) return ElementRef{ElementRef::Kind::Part, i};
    for (std::size_t i = board.links.size(); i-- > 0;)
        if (distanceToSegment(point, centre(board.links[i].from), centre(board.links[i].to)) < 0.3f)
            return ElementRef{ElementRef::Kind::Link, i};
    for (std::size_t i = board.wires.size(); i-- > 0;) {
        // Along the path the wire is drawn on, bend by bend.
        const std::vector<ImVec2> route = wireRoute(board, spots, board.wires[i], i);
        for (std::size_t j = 1; j < route.size(); ++j)
            if (distanceToSegment(point, route[j - 1], route[j]) < 0.3f) return ElementRef{ElementRef::Kind::Wire, i};
    }
    if (auto index = offboardAt(spots, point)) return ElementRef{ElementRef::Kind::Offboard, *index};
    const int row = static_cast<int>(std::floor(point.y));
    for (std::size_t i = board.cuts.size(); i-- > 0;) {
        const netcheck::Cut& cut = board.cuts[i];
        if (cut.hole.row != row) continue;
        const float x = cut.kind == netcheck::Cut::Kind::Hole ? static_cast<float>(cut.hole.col) + 0.5f
                                                               : static_cast<float>(cut.hole.col) + 1.0f;
        if (std::fabs(point.x - x) < 0.3f) return ElementRef{ElementRef::Kind::Cut, i};
    }
    return std::nullopt;
}

std::optional<std::pair<std::size_t, std::size_t>> pinAt(const netcheck::Board& board, ImVec2 point) {
    for (std::size_t i = board.parts.size(); i-- > 0;)
        for (std::size_t j = 0; j < board.parts[i].pins.size(); ++j) {
            const ImVec2 c = centre(board.parts[i].pins[j].hole);
            if (std::fabs(point.x - c.x) < 0.35f && std::fabs(point.y - c.y) < 0.35f) return std::pair{i, j};
        }
    return std::nullopt;
}

std::vector<netcheck::Hole> holesOf(const netcheck::Board& board, const ElementRef& ref) {
    using K = ElementRef::Kind;
    std::vector<netcheck::Hole> holes;
    switch (ref.kind) {
    case K::Part:
        for (const auto& pin : board.parts.at(ref.index).pins) holes.push_back(pin.hole);
        break;
    case K::Link:
        holes = {board.links.at(ref.index).from, board.links.at(ref.index).to};
        break;
    case K::Cut: {
        const auto& cut = board.cuts.at(ref.index);
        holes.push_back(cut.hole);
        if (cut.kind == netcheck::Cut::Kind::Between) holes.push_back({cut.hole.row, cut.hole.col + 1});
        break;
    }
    case K::Wire:
        for (const auto* end : {&board.wires.at(ref.index).from, &board.wires.at(ref.index).to})
            if (end->hole) holes.push_back(*end->hole);
        break;
    case K::Offboard:
        break;
    }
    return holes;
}

std::vector<ElementRef> elementsInBox(const netcheck::Board& board, const std::vector<OffboardSpot>& spots,
                                      ImVec2 a, ImVec2 b) {
    const ImVec2 lo{std::min(a.x, b.x), std::min(a.y, b.y)}, hi{std::max(a.x, b.x), std::max(a.y, b.y)};
    auto inside = [&](ImVec2 p) { return p.x >= lo.x && p.x <= hi.x && p.y >= lo.y && p.y <= hi.y; };
    std::vector<ElementRef> found;
    auto consider = [&](ElementRef::Kind kind, std::size_t count) {
        for (std::size_t i = 0; i < count; ++i) {
            const ElementRef ref{kind, i};
            const auto holes = holesOf(board, ref);
            if (!holes.empty() && std::all_of(holes.begin(), holes.end(), [&](auto h) { return inside(centre(h)); }))
                found.push_back(ref);
        }
    };
    consider(ElementRef::Kind::Part, board.parts.size());
    consider(ElementRef::Kind::Link, board.links.size());
    consider(ElementRef::Kind::Cut, board.cuts.size());
    consider(ElementRef::Kind::Wire, board.wires.size());
    for (const OffboardSpot& s : spots)
        if (inside(s.min) && inside(s.max)) found.push_back({ElementRef::Kind::Offboard, s.index});
    return found;
}

}  // namespace stripsmith
