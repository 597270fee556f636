// Hole naming: spreadsheet-style row letters, 1-based hole numbers.
#include "netcheck/model/hole.hpp"

#include <algorithm>
#include <cctype>

namespace netcheck {

namespace {

// Longer names cannot come from a board within any sensible size limit and would overflow.
constexpr std::size_t kMaxRowLetters = 4;
constexpr std::size_t kMaxColumnDigits = 7;

}  // namespace

std::string rowName(int row) {
    std::string name;
    // Bijective base 26: A..Z, AA..AZ, BA.. (there is no "zero" letter).
    for (int n = row + 1; n > 0; n = (n - 1) / 26) {
        name.push_back(static_cast<char>('A' + (n - 1) % 26));
    }
    std::reverse(name.begin(), name.end());
    return name;
}

std::string holeName(Hole hole) {
    return rowName(hole.row) + std::to_string(hole.col + 1);
}

std::optional<Hole> parseHole(std::string_view text) {
    std::size_t letters = 0;
    int row = 0;
    while (letters < text.size() && std::isalpha(static_cast<unsigned char>(text[letters]))) {
        // Stop before a long run of letters overflows `row` (found by fuzzing).
        if (letters == kMaxRowLetters) return std::nullopt;
        row = row * 26 + (std::toupper(static_cast<unsigned char>(text[letters])) - 'A' + 1);
        ++letters;
    }
    const std::size_t digits = text.size() - letters;
    if (letters == 0 || letters > kMaxRowLetters || digits == 0 || digits > kMaxColumnDigits) {
        return std::nullopt;
    }
    int number = 0;
    for (char c : text.substr(letters)) {
        if (c < '0' || c > '9') return std::nullopt;
        number = number * 10 + (c - '0');
    }
    if (number < 1) return std::nullopt;
    return Hole{row - 1, number - 1};
}

}  // namespace netcheck
