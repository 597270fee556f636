#include "label_placement.hpp"

#include <algorithm>
#include <cmath>
#include <optional>

namespace labels {

namespace {

// Half the side of the square a pin or used hole keeps clear: its lead end or solder ring
// (about 0.2 pitch) with a little air.
constexpr double kPinHalf = 0.25;
// Half the side kept clear around a wire's end: the sheet rings it in the wire's colour.
constexpr double kWireEndHalf = 0.45;
// Half the side kept clear around a hole cut: the ring the canvas draws (0.44 pitch) and its line.
constexpr double kHoleCutHalf = 0.5;
// A cut between holes: a bar across the strip.
constexpr double kBetweenCutHalfWidth = 0.12;
constexpr double kBetweenCutHalfHeight = 0.46;
// A body's reach beyond the box round its pins.
constexpr double kBodySpare = 0.35;
// Gap between an anchor and a label beside it: clears a pin's square.
constexpr double kBeside = 0.3;
// The search for a free place with a leader: steps and reach, in pitches.
constexpr double kSearchStep = 0.25;
constexpr int kSearchSteps = 32;  // up to 8 pitches each way
// Shared edges are not overlaps: rounding must not turn touching boxes into overlapping ones.
constexpr double kTouch = 1e-9;

/// What a place must keep clear of.
struct Clearance {
    const std::vector<Box>& obstacles;
    const std::vector<Box>& placed;
    const Box& area;
    const std::vector<Body>* bodies;  ///< others' bodies too, or null
    int owner;

    bool allows(const Box& box) const {
        if (!area.contains(box)) return false;
        auto hits = [&](const Box& other) { return box.overlaps(other); };
        if (std::any_of(obstacles.begin(), obstacles.end(), hits)) return false;
        if (std::any_of(placed.begin(), placed.end(), hits)) return false;
        if (!bodies) return true;
        return std::none_of(bodies->begin(), bodies->end(), [&](const Body& body) {
            return body.owner != owner && box.overlaps(body.box);
        });
    }
};

/// The first choice, then beside the anchor: above, below, right, left, then the corners.
std::vector<Box> candidates(const Label& label) {
    const double up = label.anchorY - kBeside - label.height / 2;
    const double down = label.anchorY + kBeside + label.height / 2;
    const double right = label.anchorX + kBeside + label.width / 2;
    const double left = label.anchorX - kBeside - label.width / 2;
    const double spots[9][2] = {{label.firstX, label.firstY}, {label.anchorX, up},
                                {label.anchorX, down},        {right, label.anchorY},
                                {left, label.anchorY},        {right, up},
                                {left, up},                   {right, down},
                                {left, down}};
    std::vector<Box> boxes;
    for (const auto& spot : spots)
        boxes.push_back(boxAround(spot[0], spot[1], label.width, label.height));
    return boxes;
}

/// Offsets from the anchor on a grid, nearest first (ties in reading order), for the leader search.
std::vector<std::pair<double, double>> searchOffsets() {
    std::vector<std::pair<int, int>> steps;
    for (int dy = -kSearchSteps; dy <= kSearchSteps; ++dy)
        for (int dx = -kSearchSteps; dx <= kSearchSteps; ++dx) steps.emplace_back(dx, dy);
    std::stable_sort(steps.begin(), steps.end(), [](auto a, auto b) {
        const int da = a.first * a.first + a.second * a.second;
        const int db = b.first * b.first + b.second * b.second;
        if (da != db) return da < db;
        return std::pair{a.second, a.first} < std::pair{b.second, b.first};
    });
    std::vector<std::pair<double, double>> offsets;
    for (auto [dx, dy] : steps) offsets.emplace_back(dx * kSearchStep, dy * kSearchStep);
    return offsets;
}

// Leaders kept short while a place off other parts' bodies is sought.
constexpr double kNearReach = 2.5;

std::optional<Placement> firstFree(const Label& label, const Clearance& clear,
                                   const std::vector<std::pair<double, double>>& offsets,
                                   double reach) {
    for (const Box& box : candidates(label))
        if (clear.allows(box)) return Placement{box, false, true};
    for (auto [dx, dy] : offsets) {
        if (std::hypot(dx, dy) > reach) break;  // offsets come nearest first
        const Box box = boxAround(label.anchorX + dx, label.anchorY + dy, label.width, label.height);
        if (clear.allows(box)) return Placement{box, true, true};
    }
    return std::nullopt;
}

Placement place(const Label& label, const std::vector<Box>& obstacles,
                const std::vector<Box>& placed, const Box& area, const std::vector<Body>& bodies,
                const std::vector<std::pair<double, double>>& offsets) {
    const Clearance offBodies{obstacles, placed, area, &bodies, label.owner};
    if (auto found = firstFree(label, offBodies, offsets, kNearReach)) return *found;
    const Clearance overBodies{obstacles, placed, area, nullptr, label.owner};
    if (auto found = firstFree(label, overBodies, offsets, kSearchStep * kSearchSteps * 2))
        return *found;
    return {candidates(label).front(), false, false};
}

}  // namespace

bool Box::overlaps(const Box& other) const {
    return x0 < other.x1 - kTouch && other.x0 < x1 - kTouch && y0 < other.y1 - kTouch &&
           other.y0 < y1 - kTouch;
}

bool Box::contains(const Box& other) const {
    return other.x0 >= x0 - kTouch && other.x1 <= x1 + kTouch && other.y0 >= y0 - kTouch &&
           other.y1 <= y1 + kTouch;
}

Box boxAround(double x, double y, double w, double h) {
    return {x - w / 2, y - h / 2, x + w / 2, y + h / 2};
}

std::vector<Placement> placeLabels(const std::vector<Label>& labels,
                                   const std::vector<Box>& obstacles, const Box& area,
                                   const std::vector<Body>& bodies) {
    static const std::vector<std::pair<double, double>> offsets = searchOffsets();
    std::vector<Placement> placements;
    std::vector<Box> placed;
    for (const Label& label : labels) {
        placements.push_back(place(label, obstacles, placed, area, bodies, offsets));
        placed.push_back(placements.back().box);
    }
    return placements;
}

std::vector<Box> boardObstacles(const netcheck::Board& board) {
    std::vector<Box> boxes;
    auto hole = [&](netcheck::Hole h, double half) {
        boxes.push_back(boxAround(h.col + 0.5, h.row + 0.5, 2 * half, 2 * half));
    };
    for (const auto& part : board.parts)
        for (const auto& pin : part.pins) hole(pin.hole, kPinHalf);
    for (const auto& link : board.links) {
        hole(link.from, kPinHalf);
        hole(link.to, kPinHalf);
    }
    for (const auto& wire : board.wires) {
        if (wire.from.isHole()) hole(*wire.from.hole, kWireEndHalf);
        if (wire.to.isHole()) hole(*wire.to.hole, kWireEndHalf);
    }
    for (const auto& cut : board.cuts) {
        if (cut.kind == netcheck::Cut::Kind::Hole) {
            hole(cut.hole, kHoleCutHalf);
        } else {
            boxes.push_back(boxAround(cut.hole.col + 1.0, cut.hole.row + 0.5,
                                      2 * kBetweenCutHalfWidth, 2 * kBetweenCutHalfHeight));
        }
    }
    return boxes;
}

std::vector<Body> partBodies(const netcheck::Board& board) {
    std::vector<Body> bodies;
    for (std::size_t i = 0; i < board.parts.size(); ++i) {
        const auto& pins = board.parts[i].pins;
        if (pins.empty()) continue;
        Box box{1e18, 1e18, -1e18, -1e18};
        for (const auto& pin : pins) {
            box.x0 = std::min(box.x0, pin.hole.col + 0.5), box.x1 = std::max(box.x1, pin.hole.col + 0.5);
            box.y0 = std::min(box.y0, pin.hole.row + 0.5), box.y1 = std::max(box.y1, pin.hole.row + 0.5);
        }
        bodies.push_back({{box.x0 - kBodySpare, box.y0 - kBodySpare, box.x1 + kBodySpare,
                           box.y1 + kBodySpare},
                          static_cast<int>(i)});
    }
    return bodies;
}

Box boardArea(const netcheck::Board& board) {
    return {0, 0, static_cast<double>(board.cols), static_cast<double>(board.rows)};
}

}  // namespace labels
