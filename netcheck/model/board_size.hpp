// How Stripsmith writes a board's size, in one place so every panel, message and sheet says it in
// the same order: holes across (along a strip) x strips, and millimetres as width x height.
#pragma once

#include <string>

namespace netcheck {

struct Board;

/// The order sizeInHoles() uses, for a label beside it: "holes across x strips".
inline constexpr const char* kHolesOrder = "holes across x strips";
/// The order sizeInMm() uses: "width x height".
inline constexpr const char* kMillimetresOrder = "width x height";

/// "24 x 10 holes": holes along a strip (columns), then strips (rows).
std::string sizeInHoles(int holesAcross, int strips);

/// "61.0 x 25.4 mm": width then height, `decimals` places, rounded half away from zero.
std::string sizeInMm(double widthMm, double heightMm, int decimals = 1);

/// "24 x 10 holes (61.0 x 25.4 mm)" for a whole board.
std::string boardSize(const Board& board, int decimals = 1);

}  // namespace netcheck
