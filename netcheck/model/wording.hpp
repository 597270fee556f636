// Lists and counts in messages, written the same way by the report, the panels and the sheet.
#pragma once

#include <cstddef>
#include <string>
#include <string_view>
#include <vector>

namespace netcheck {

/// "R1, R2, C3": the items with `separator` between them.
std::string joined(const std::vector<std::string>& items, std::string_view separator = ", ");

/// "R1", "R1 and R2", "R1, R2 and R3".
std::string listed(const std::vector<std::string>& items);

/// "1 lead", "3 leads".
std::string plural(std::size_t count, std::string_view word);

}  // namespace netcheck
