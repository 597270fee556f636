// Where a link lies over the hole grid: which holes a bare wire passes close to, and where two
// wires cross. The check warns of these contacts; the repair code keeps its new links clear of
// them. Geometry is in hole coordinates (row, col), where hole centres are whole numbers, so the
// tests that decide a crossing are exact integer arithmetic; only "how close" uses the pitch.
#pragma once

#include <cmath>
#include <cstdint>
#include <cstdlib>
#include <optional>
#include <string>

#include "netcheck/model/board.hpp"

namespace netcheck {

/// A lead touches a bare link when their centres come this close: a 0.6 mm tinned link wire and a
/// 0.6 mm lead (typical of small parts; common practice, not a standard) meet at 0.6 mm.
inline constexpr double kLinkContactMm = 0.6;

/// A component-side link, not sleeved, with both ends on the board: a wire that can touch.
bool isBare(const Board& board, const Link& link);

/// How near (in pitches) a lead must come to a wire to touch it on this board. At most half a
/// pitch: further out a lead is nearer the next hole's line, and boards finer than 1.2 mm are not
/// stripboard.
double contactReach(const Board& board);

/// Twice the signed area of the triangle a, b, p: zero when p lies on the line through a and b.
inline std::int64_t cross(Hole a, Hole b, Hole p) {
    return std::int64_t{b.col - a.col} * (p.row - a.row) -
           std::int64_t{b.row - a.row} * (p.col - a.col);
}

/// Calls visit(hole) for every hole whose centre lies within `reach` (at most a pitch) of the
/// wire, strictly between its ends (with `ends`, at them too). Walks the longer axis: in each of
/// its columns (or rows) a hole that close lies within one hole of where the wire crosses it.
template <typename Visit>
void forEachHoleNear(const Link& link, double reach, bool ends, Visit visit) {
    const Hole a = link.from;
    const Hole b = link.to;
    const int dr = b.row - a.row;
    const int dc = b.col - a.col;
    const double length2 = double{1} * dr * dr + double{1} * dc * dc;
    const bool alongCols = std::abs(dc) >= std::abs(dr);
    const int steps = alongCols ? std::abs(dc) : std::abs(dr);
    const int minorSpan = alongCols ? dr : dc;
    for (int s = ends ? 0 : 1; s <= (ends ? steps : steps - 1) && steps > 0; ++s) {
        const int major = (alongCols ? a.col : a.row) + ((alongCols ? dc : dr) > 0 ? s : -s);
        const double minor = (alongCols ? a.row : a.col) + double{1} * minorSpan * s / steps;
        for (auto m = static_cast<int>(std::floor(minor)) - 1;
             m <= static_cast<int>(std::ceil(minor)) + 1; ++m) {
            const Hole h = alongCols ? Hole{m, major} : Hole{major, m};
            const auto area = static_cast<double>(cross(a, b, h));
            if (area * area < reach * reach * length2) visit(h);
        }
    }
}

/// Where two wires cross at a point inside both: "at D3" on a hole centre, else "near D3" (the
/// nearest hole). Nothing when they do not cross, meet at an end of either or lie along each other
/// (an end on the other wire is a lead under it, not a crossing).
std::optional<std::string> crossingPlace(const Link& first, const Link& second);

}  // namespace netcheck
