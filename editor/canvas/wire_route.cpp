#include "editor/canvas/wire_route.hpp"

#include <algorithm>
#include <cmath>

namespace stripsmith {

namespace {

// The ring around the board: clear of the row letters and hole numbers (0.75 pitch out) and
// inside the default off-board column (3 pitches out). Each wire runs in its own lane.
constexpr float kRingFirst = 1.3f;
constexpr float kRingLane = 0.25f;
constexpr int kRingLanes = 6;
// A lug is reached from below (its part's body is above it), through the gap before the next
// part in the column.
constexpr float kBelowLug = 0.6f;
constexpr float kBelowLugLane = 0.15f;
constexpr int kBelowLugLanes = 4;

struct Ring {
    float x0, y0, x1, y1;
    float width() const { return x1 - x0; }
    float height() const { return y1 - y0; }
    float perimeter() const { return 2 * (width() + height()); }
};

Ring ringFor(const netcheck::Board& board, std::size_t lane) {
    const float m = kRingFirst + kRingLane * static_cast<float>(lane % kRingLanes);
    return {-m, -m, static_cast<float>(board.cols) + m, static_cast<float>(board.rows) + m};
}

/// Distance along the ring, clockwise from its top-left corner, of a point on it.
float along(const Ring& r, ImVec2 p) {
    if (p.y <= r.y0) return p.x - r.x0;
    if (p.x >= r.x1) return r.width() + (p.y - r.y0);
    if (p.y >= r.y1) return r.width() + r.height() + (r.x1 - p.x);
    return 2 * r.width() + r.height() + (r.y1 - p.y);
}

/// The ring's corners, clockwise from the top-left, at their distances along it.
std::vector<std::pair<float, ImVec2>> corners(const Ring& r) {
    return {{0.0f, {r.x0, r.y0}},
            {r.width(), {r.x1, r.y0}},
            {r.width() + r.height(), {r.x1, r.y1}},
            {2 * r.width() + r.height(), {r.x0, r.y1}}};
}

/// Appends the corners passed going from `a` to `b` round the ring the shorter way, then `b`.
void walkRing(const Ring& r, ImVec2 a, ImVec2 b, std::vector<ImVec2>& path) {
    const float p = r.perimeter();
    const float ta = along(r, a), tb = along(r, b);
    const float clockwise = std::fmod(tb - ta + p, p);
    const bool forward = clockwise <= p - clockwise;
    auto cs = corners(r);
    std::vector<std::pair<float, ImVec2>> passed;
    for (const auto& [t, c] : cs) {
        const float from = forward ? std::fmod(t - ta + p, p) : std::fmod(ta - t + p, p);
        const float span = forward ? clockwise : p - clockwise;
        if (from > 1e-4f && from < span - 1e-4f) passed.emplace_back(from, c);
    }
    std::sort(passed.begin(), passed.end(), [](auto x, auto y) { return x.first < y.first; });
    for (const auto& [t, c] : passed) path.push_back(c);
    path.push_back(b);
}

/// The nearest point of the ring to a point (outside it: the clamp; inside: the nearest side).
ImVec2 ontoRing(const Ring& r, ImVec2 p) {
    const bool inside = p.x > r.x0 && p.x < r.x1 && p.y > r.y0 && p.y < r.y1;
    if (!inside) return {std::clamp(p.x, r.x0, r.x1), std::clamp(p.y, r.y0, r.y1)};
    const float dl = p.x - r.x0, dr = r.x1 - p.x, dt = p.y - r.y0, db = r.y1 - p.y;
    const float least = std::min({dl, dr, dt, db});
    if (least == dr) return {r.x1, p.y};
    if (least == dl) return {r.x0, p.y};
    if (least == db) return {p.x, r.y1};
    return {p.x, r.y0};
}

/// From a hole out to the ring: a half-step into the corner of its cell, then along the gap
/// between rows (or columns) to the ring. Returns the points after the hole centre.
std::vector<ImVec2> exitLeg(const netcheck::Board& board, netcheck::Hole h, const Ring& ring) {
    const float cx = static_cast<float>(h.col) + 0.5f, cy = static_cast<float>(h.row) + 0.5f;
    // The gap below (right of) the hole, or above (left of) it on the last row (column).
    const float gapY = h.row + 1 < board.rows ? cy + 0.5f : cy - 0.5f;
    const float gapX = h.col + 1 < board.cols ? cx + 0.5f : cx - 0.5f;
    switch (nearestEdge(board, h)) {
    case BoardEdge::Right: return {{cx + 0.5f, gapY}, {ring.x1, gapY}};
    case BoardEdge::Left: return {{cx - 0.5f, gapY}, {ring.x0, gapY}};
    case BoardEdge::Bottom: return {{gapX, cy + 0.5f}, {gapX, ring.y1}};
    case BoardEdge::Top: return {{gapX, cy - 0.5f}, {gapX, ring.y0}};
    }
    return {};
}

std::optional<ImVec2> lugPosition(const netcheck::Board& board,
                                  const std::vector<OffboardSpot>& spots,
                                  const netcheck::Endpoint& end) {
    if (end.isHole()) return std::nullopt;
    return endpointPosition(board, spots, end);
}

/// From the ring to a lug: to the point below the lug, turning once, then up to it.
void approachLug(const Ring& ring, ImVec2 onRing, ImVec2 below, ImVec2 lug,
                 std::vector<ImVec2>& path) {
    const bool beside = below.x < ring.x0 || below.x > ring.x1;
    path.push_back(beside ? ImVec2{onRing.x, below.y} : ImVec2{below.x, onRing.y});
    path.push_back(below);
    path.push_back(lug);
}

/// One end's way out: the hole and its exit leg, or the lug and the point below it.
struct EndWay {
    std::vector<ImVec2> points;  ///< from the end outwards
    bool lug = false;
};

std::optional<EndWay> wayOut(const netcheck::Board& board, const std::vector<OffboardSpot>& spots,
                             const netcheck::Endpoint& end, const Ring& ring, std::size_t lane) {
    EndWay way;
    if (end.isHole()) {
        const netcheck::Hole h = *end.hole;
        way.points.push_back({static_cast<float>(h.col) + 0.5f, static_cast<float>(h.row) + 0.5f});
        for (ImVec2 p : exitLeg(board, h, ring)) way.points.push_back(p);
        return way;
    }
    const auto lug = lugPosition(board, spots, end);
    if (!lug) return std::nullopt;
    const float drop = kBelowLug + kBelowLugLane * static_cast<float>(lane % kBelowLugLanes);
    way.points = {*lug, {lug->x, lug->y + drop}};
    way.lug = true;
    return way;
}

}  // namespace

BoardEdge nearestEdge(const netcheck::Board& board, netcheck::Hole hole) {
    const int right = board.cols - 1 - hole.col, left = hole.col;
    const int bottom = board.rows - 1 - hole.row, top = hole.row;
    const int least = std::min({right, left, bottom, top});
    if (least == right) return BoardEdge::Right;
    if (least == left) return BoardEdge::Left;
    if (least == bottom) return BoardEdge::Bottom;
    return BoardEdge::Top;
}

std::vector<ImVec2> wireRoute(const netcheck::Board& board, const std::vector<OffboardSpot>& spots,
                              const netcheck::Wire& wire, std::size_t lane) {
    const Ring ring = ringFor(board, lane);
    const auto from = wayOut(board, spots, wire.from, ring, lane);
    const auto to = wayOut(board, spots, wire.to, ring, lane);
    if (!from || !to) return {};
    std::vector<ImVec2> path = from->points;
    if (from->lug && to->lug) {
        // Lug to lug: below both, across, and up.
        const float under = std::max(from->points.back().y, to->points.back().y);
        path.push_back({from->points.back().x, under});
        path.push_back({to->points.back().x, under});
    } else if (!from->lug && !to->lug) {
        walkRing(ring, path.back(), to->points.back(), path);
    } else {
        // Hole at one end, lug at the other: worked out from the hole, reversed if need be.
        const EndWay& hole = from->lug ? *to : *from;
        const EndWay& lug = from->lug ? *from : *to;
        std::vector<ImVec2> out = hole.points;
        const ImVec2 below = lug.points.back();
        const ImVec2 meet = ontoRing(ring, below);
        walkRing(ring, out.back(), meet, out);
        approachLug(ring, meet, below, lug.points.front(), out);
        if (from->lug) std::reverse(out.begin(), out.end());
        return out;
    }
    for (auto it = to->points.rbegin(); it != to->points.rend(); ++it) path.push_back(*it);
    return path;
}

}  // namespace stripsmith
