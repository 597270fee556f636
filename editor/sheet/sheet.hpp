// The printable build sheet: the board at true scale (component side and mirrored copper side),
// a calibration bar, the parts and lists a maker works from, the check result and the cautions.
#pragma once

#include <optional>
#include <string>

#include "netcheck/model/board.hpp"

namespace sheet {

/// Paper sizes the sheet is laid out for (portrait).
enum class Paper { A4, Letter };

/// How the sheet is laid out.
struct SheetOptions {
    Paper paper = Paper::A4;
    double marginMm = 10.0;  ///< blank border kept on every side of every page
    int overlapHoles = 2;    ///< holes repeated on both neighbouring pages when a board is split
};

/// True when `outPath` ends in ".pdf" or ".svg" (any case): the formats exportSheet writes.
bool isSheetPath(const std::string& outPath);

/// Writes the sheet to `outPath`: PDF when it ends in ".pdf", SVG when ".svg" (case-insensitive;
/// an SVG holds all pages one under another, sized in millimetres). Returns an error message, or
/// nullopt when the file was written.
std::optional<std::string> exportSheet(const netcheck::Board& board, const SheetOptions& options,
                                       const std::string& outPath);

}  // namespace sheet
