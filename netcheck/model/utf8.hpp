// Reading UTF-8 text one code point at a time, for the rules on names and for printing.
#pragma once

#include <cstddef>
#include <string_view>

namespace netcheck {

/// One code point of a UTF-8 text. `length` is the number of bytes it takes; a byte that does
/// not start a well-formed sequence (RFC 3629) is read alone with `wellFormed` false.
struct CodePoint {
    char32_t value = 0;
    std::size_t length = 1;
    bool wellFormed = true;
};

/// The code point starting at byte `at` (< text.size()).
CodePoint codePointAt(std::string_view text, std::size_t at);

/// C0 controls, DEL and C1 controls: characters that terminals act on instead of showing.
bool isControl(char32_t c);

}  // namespace netcheck
