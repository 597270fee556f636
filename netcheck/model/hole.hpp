// Hole names on the strip grid: row letters down the side, hole numbers along the strip.
#pragma once

#include <compare>
#include <optional>
#include <string>
#include <string_view>

namespace netcheck {

/// A hole position, zero-based. Row 0 is strip A (top); column 0 is hole 1, at the left as seen
/// from the component side.
struct Hole {
    int row = 0;
    int col = 0;
    auto operator<=>(const Hole&) const = default;
};

/// Row letters in spreadsheet style: 0 -> "A", 25 -> "Z", 26 -> "AA", 52 -> "BA".
std::string rowName(int row);

/// "C12" for {row 2, col 11}.
std::string holeName(Hole hole);

/// Reads "C12" or "c12" (letters then a number >= 1). Board bounds are not checked here.
std::optional<Hole> parseHole(std::string_view text);

}  // namespace netcheck
