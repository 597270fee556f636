#include "paper.hpp"

#include <algorithm>
#include <cctype>
#include <string>

namespace sheet {

PaperSize paperSize(Paper paper) {
    switch (paper) {
        case Paper::Letter:
            return {8.5 * 25.4, 11.0 * 25.4};
        case Paper::A4:
            break;
    }
    return {210.0, 297.0};
}

std::optional<Paper> parsePaper(std::string_view text) {
    std::string lower(text);
    std::transform(lower.begin(), lower.end(), lower.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    if (lower == "a4") return Paper::A4;
    if (lower == "letter") return Paper::Letter;
    return std::nullopt;
}

}  // namespace sheet
