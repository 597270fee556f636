// Wire colours as makers write them ("red", "Black", "grey"), turned into printable inks.
#pragma once

#include <optional>
#include <string_view>

#include "sheet_text.hpp"

namespace sheet {

/// The ink for a colour name (case-insensitive, "gray"/"purple" accepted); nullopt when unknown.
std::optional<Rgb> wireColour(std::string_view name);

/// True for colours too pale to show on white paper without an outline.
bool isPale(Rgb colour);

}  // namespace sheet
