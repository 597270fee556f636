#include "editor/canvas/offboard_layout.hpp"

#include <algorithm>
#include <cmath>

namespace stripsmith {
namespace {
constexpr float kGapFromBoard = 3.0f;  // leaves room for the right-hand row letters
constexpr float kLugPitch = 1.5f;
constexpr float kBoxHeight = 1.8f;
constexpr float kStackPitch = 4.2f;
// A place further than this from the board (in pitches, about 2.5 m) is a damaged file, not a
// layout: the part goes back to the column rather than stretching the view to fit it.
constexpr double kFarthestPlace = 1000.0;

std::optional<float> coordinate(const nlohmann::json& place, const char* key) {
    auto it = place.find(key);
    if (it == place.end() || !it->is_number()) return std::nullopt;
    const double v = it->get<double>();
    if (!std::isfinite(v) || std::abs(v) > kFarthestPlace) return std::nullopt;
    return static_cast<float>(v);
}
}  // namespace

std::optional<ImVec2> placeOf(const netcheck::OffboardPart& part) {
    auto it = part.extra.find("place");
    if (it == part.extra.end() || !it->is_object()) return std::nullopt;
    const auto x = coordinate(*it, "x"), y = coordinate(*it, "y");
    if (!x || !y) return std::nullopt;
    return ImVec2{*x, *y};
}

netcheck::OffboardPart placedAt(netcheck::OffboardPart part, ImVec2 corner) {
    auto tidy = [](float v) { return std::round(static_cast<double>(v) * 100.0) / 100.0; };
    part.extra["place"] = {{"x", tidy(corner.x)}, {"y", tidy(corner.y)}};
    return part;
}

std::vector<OffboardSpot> layoutOffboard(const netcheck::Board& board) {
    std::vector<OffboardSpot> spots;
    const float column = static_cast<float>(board.cols) + kGapFromBoard;
    for (std::size_t i = 0; i < board.offboard.size(); ++i) {
        const auto& part = board.offboard[i];
        // In the column a part keeps its slot by list position, so moving one leaves the rest.
        const ImVec2 at = placeOf(part).value_or(ImVec2{column, 0.5f + static_cast<float>(i) * kStackPitch});
        const float n = static_cast<float>(std::max<std::size_t>(part.pins.size(), 1));
        OffboardSpot spot;
        spot.index = i;
        spot.min = at;
        spot.max = {at.x + std::max(4.0f, 1.0f + n * kLugPitch), at.y + kBoxHeight};
        for (std::size_t j = 0; j < part.pins.size(); ++j)
            spot.lugs.push_back({at.x + 1.0f + static_cast<float>(j) * kLugPitch, at.y + kBoxHeight + 0.7f});
        spots.push_back(std::move(spot));
    }
    return spots;
}

std::optional<ImVec2> endpointPosition(const netcheck::Board& board,
                                       const std::vector<OffboardSpot>& spots,
                                       const netcheck::Endpoint& end) {
    if (end.hole)
        return ImVec2{static_cast<float>(end.hole->col) + 0.5f, static_cast<float>(end.hole->row) + 0.5f};
    for (const OffboardSpot& spot : spots) {
        const auto& part = board.offboard[spot.index];
        if (part.ref != end.lug.ref) continue;
        for (std::size_t j = 0; j < part.pins.size(); ++j)
            if (part.pins[j] == end.lug.pin) return spot.lugs[j];
    }
    return std::nullopt;
}

std::optional<netcheck::PinRef> lugAt(const netcheck::Board& board,
                                      const std::vector<OffboardSpot>& spots, ImVec2 point,
                                      float radius) {
    for (const OffboardSpot& spot : spots) {
        const auto& part = board.offboard[spot.index];
        for (std::size_t j = 0; j < spot.lugs.size(); ++j) {
            const float dx = point.x - spot.lugs[j].x;
            const float dy = point.y - spot.lugs[j].y;
            if (dx * dx + dy * dy <= radius * radius) return netcheck::PinRef{part.ref, part.pins[j]};
        }
    }
    return std::nullopt;
}

std::optional<std::size_t> offboardAt(const std::vector<OffboardSpot>& spots, ImVec2 point) {
    for (const OffboardSpot& spot : spots)
        if (point.x >= spot.min.x && point.x <= spot.max.x && point.y >= spot.min.y && point.y <= spot.max.y)
            return spot.index;
    return std::nullopt;
}

ViewBounds contentBounds(const netcheck::Board& board, const std::vector<OffboardSpot>& spots,
                         bool mirrored) {
    const float cols = static_cast<float>(board.cols);
    float minX = -1.5f, maxX = cols + 1.5f, minY = -1.5f;
    float maxY = static_cast<float>(board.rows) + 1.5f;
    for (const OffboardSpot& s : spots) {
        const float a = mirrored ? cols - s.max.x : s.min.x;
        const float b = mirrored ? cols - s.min.x : s.max.x;
        minX = std::min(minX, a - 0.5f);
        maxX = std::max(maxX, b + 0.5f);
        minY = std::min(minY, s.min.y - 0.5f);
        maxY = std::max(maxY, s.max.y + 1.6f);
    }
    return {{minX, minY}, {maxX, maxY}};
}

}  // namespace stripsmith
