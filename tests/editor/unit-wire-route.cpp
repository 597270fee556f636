// Flying wires on the canvas: on every sample each wire leaves the board at the edge nearest its
// hole, stays off the board after that, and passes through no lug or pin it does not end on.
// Checked on the drawn path with plain geometry, independent of how the path is made.
#include <doctest/doctest.h>

#include <algorithm>
#include <cmath>
#include <string>
#include <vector>

#include "../test_support.hpp"
#include "editor/canvas/offboard_layout.hpp"
#include "editor/canvas/wire_route.hpp"
#include "netcheck/file/board_file.hpp"

using namespace stripsmith;

namespace {

using test_support::readSample;

// A lug is drawn 0.28 pitch round, a lead end 0.17, a chip's pin 0.2 square: a wire nearer
// than this to one looks joined to it.
constexpr float kLugClear = 0.35f;
constexpr float kPinClear = 0.3f;

float distanceToSegment(ImVec2 p, ImVec2 a, ImVec2 b) {
    const float dx = b.x - a.x, dy = b.y - a.y, len2 = dx * dx + dy * dy;
    const float t = len2 > 0 ? std::clamp(((p.x - a.x) * dx + (p.y - a.y) * dy) / len2, 0.0f, 1.0f) : 0.0f;
    return std::hypot(a.x + t * dx - p.x, a.y + t * dy - p.y);
}

bool same(ImVec2 a, ImVec2 b) { return std::fabs(a.x - b.x) < 1e-4f && std::fabs(a.y - b.y) < 1e-4f; }

/// Length of the segment a-b inside the rectangle [0, w] x [0, h] (clipped, Liang-Barsky).
float lengthInside(ImVec2 a, ImVec2 b, float w, float h) {
    float t0 = 0, t1 = 1;
    const float dx = b.x - a.x, dy = b.y - a.y;
    const float p[4] = {-dx, dx, -dy, dy}, q[4] = {a.x, w - a.x, a.y, h - a.y};
    for (int i = 0; i < 4; ++i) {
        if (p[i] == 0) {
            if (q[i] < 0) return 0;
            continue;
        }
        const float r = q[i] / p[i];
        if (p[i] < 0) t0 = std::max(t0, r);
        else t1 = std::min(t1, r);
    }
    return t1 > t0 ? (t1 - t0) * std::hypot(dx, dy) : 0.0f;
}

/// Distance from a hole's centre to the nearest board edge, and which edge ('L','R','T','B').
std::pair<float, char> nearestEdgeOf(const netcheck::Board& board, netcheck::Hole h) {
    const float x = h.col + 0.5f, y = h.row + 0.5f;
    const std::pair<float, char> edges[4] = {{static_cast<float>(board.cols) - x, 'R'},
                                             {x, 'L'},
                                             {static_cast<float>(board.rows) - y, 'B'},
                                             {y, 'T'}};
    return *std::min_element(std::begin(edges), std::end(edges),
                             [](auto a, auto b) { return a.first < b.first; });
}

/// Which edge the path from a hole first crosses going out.
char edgeCrossed(const netcheck::Board& board, const std::vector<ImVec2>& path) {
    const float w = static_cast<float>(board.cols), h = static_cast<float>(board.rows);
    for (ImVec2 p : path) {
        if (p.x > w) return 'R';
        if (p.x < 0) return 'L';
        if (p.y > h) return 'B';
        if (p.y < 0) return 'T';
    }
    return '?';
}

struct Problems {
    int throughLug = 0, throughPin = 0, wrongEdge = 0, backOverBoard = 0;
    int total() const { return throughLug + throughPin + wrongEdge + backOverBoard; }
};

void checkWire(const netcheck::Board& board, const std::vector<OffboardSpot>& spots,
               std::size_t index, Problems& problems) {
    const netcheck::Wire& wire = board.wires[index];
    const std::vector<ImVec2> path = wireRoute(board, spots, wire, index);
    REQUIRE(path.size() >= 2);
    const auto from = endpointPosition(board, spots, wire.from);
    const auto to = endpointPosition(board, spots, wire.to);
    REQUIRE((from && to));
    CHECK(same(path.front(), *from));
    CHECK(same(path.back(), *to));
    auto passes = [&](ImVec2 c, float clear) {
        if (same(c, *from) || same(c, *to)) return false;
        for (std::size_t i = 1; i < path.size(); ++i)
            if (distanceToSegment(c, path[i - 1], path[i]) < clear) return true;
        return false;
    };
    for (const OffboardSpot& spot : spots)
        for (ImVec2 lug : spot.lugs) problems.throughLug += passes(lug, kLugClear);
    for (const auto& part : board.parts)
        for (const auto& pin : part.pins)
            problems.throughPin += passes({pin.hole.col + 0.5f, pin.hole.row + 0.5f}, kPinClear);
    // Out at the nearest edge, and no more on the board than the way out from each hole end.
    float allowed = 0;
    const float w = static_cast<float>(board.cols), h = static_cast<float>(board.rows);
    if (wire.from.isHole()) {
        const auto [reach, edge] = nearestEdgeOf(board, *wire.from.hole);
        allowed += reach + 0.75f;  // the way out runs along a gap half a pitch off the hole
        problems.wrongEdge += edgeCrossed(board, path) != edge;
    }
    if (wire.to.isHole()) {
        const auto [reach, edge] = nearestEdgeOf(board, *wire.to.hole);
        allowed += reach + 0.75f;
        problems.wrongEdge += edgeCrossed(board, {path.rbegin(), path.rend()}) != edge;
    }
    float inside = 0;
    for (std::size_t i = 1; i < path.size(); ++i) inside += lengthInside(path[i - 1], path[i], w, h);
    problems.backOverBoard += inside > allowed + 1e-3f;
}

}  // namespace

TEST_CASE("wire routes: every sample's wires leave by the nearest edge, clear of lugs and pins") {
    const auto files = test_support::sourceFiles("samples", ".board.json");
    REQUIRE(files.size() >= 10);
    int wires = 0, total = 0;
    for (const std::string& file : files) {
        const netcheck::Board board = readSample(file);
        const auto spots = layoutOffboard(board);
        Problems problems;
        for (std::size_t i = 0; i < board.wires.size(); ++i) checkWire(board, spots, i, problems);
        wires += static_cast<int>(board.wires.size());
        MESSAGE(file << ": through a lug " << problems.throughLug << ", through a pin "
                     << problems.throughPin << ", wrong edge " << problems.wrongEdge
                     << ", back over the board " << problems.backOverBoard);
        CHECK(problems.total() == 0);
        total += problems.total();
    }
    MESSAGE(wires << " wires, " << total << " problems");
    CHECK(wires >= 20);
}

TEST_CASE("wire routes: round the board to a part placed on the far side, and hole to hole") {
    netcheck::Board board;
    board.rows = 10;
    board.cols = 20;
    board.parts.push_back({"R1", "resistor", "1k", {{"1", {4, 17}}, {"2", {4, 19}}}, {}});
    netcheck::OffboardPart pot{"VR1", "pot", "10k", {"1", "2", "3"}, {}};
    board.offboard.push_back(placedAt(pot, {-9.0f, 2.0f}));  // left of the board
    netcheck::Wire toPot;
    toPot.from = netcheck::Endpoint::atHole({5, 18});  // nearest the right edge
    toPot.to = netcheck::Endpoint::atLug({"VR1", "2"});
    netcheck::Wire across;
    across.from = netcheck::Endpoint::atHole({1, 2});   // nearest the top edge
    across.to = netcheck::Endpoint::atHole({8, 17});    // nearest the bottom edge
    board.wires = {toPot, across};
    const auto spots = layoutOffboard(board);
    Problems problems;
    for (std::size_t i = 0; i < board.wires.size(); ++i) checkWire(board, spots, i, problems);
    CHECK(problems.throughLug == 0);
    CHECK(problems.throughPin == 0);
    CHECK(problems.wrongEdge == 0);
    CHECK(problems.backOverBoard == 0);
    // The straight line the canvas drew before fails the same checks: it crosses the board.
    CHECK(lengthInside({18.5f, 5.5f}, spots[0].lugs[1], 20, 10) > 10.0f);
}
