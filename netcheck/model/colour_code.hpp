// Resistor colour bands (IEC 60062 colour code).
#pragma once

#include <optional>
#include <string_view>
#include <vector>

namespace netcheck {

enum class BandColour {
    Black,
    Brown,
    Red,
    Orange,
    Yellow,
    Green,
    Blue,
    Violet,
    Grey,
    White,
    Gold,
    Silver,
    Pink,
    None
};

std::string_view bandName(BandColour colour);

/// Bands for a resistance at a tolerance in percent: two significant figures for 5 % and wider,
/// three for 2 % and tighter; then multiplier, then tolerance. Nullopt when it cannot be coded.
std::optional<std::vector<BandColour>> resistorBands(double ohms, double tolerancePercent = 5.0);

}  // namespace netcheck
