// Wording shared by the Edit menu labels of the commands.
#pragma once

#include <string>
#include <string_view>

namespace netcheck::edit {

/// "A1–C1": the two ends of a link or wire joined by an en dash (U+2013).
std::string joinedName(std::string_view from, std::string_view to);

}  // namespace netcheck::edit
