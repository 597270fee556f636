// Paper sizes and the millimetre/point conversion used by every page of the sheet.
#pragma once

#include <optional>
#include <string_view>

#include "sheet.hpp"

namespace sheet {

/// 1 in = 25.4 mm exactly; a PDF point is 1/72 in (ISO 32000-1 default user space).
inline constexpr double kPointsPerMm = 72.0 / 25.4;

/// Width and height of a sheet of paper, portrait, in millimetres.
struct PaperSize {
    double widthMm = 0;
    double heightMm = 0;
};

/// A4 is 210 x 297 mm (ISO 216); US Letter is 8.5 x 11 in.
PaperSize paperSize(Paper paper);

/// "a4" or "letter" (case-insensitive); nullopt otherwise.
std::optional<Paper> parsePaper(std::string_view text);

}  // namespace sheet
