#include "editor/canvas/palette.hpp"

#include <array>
#include <cctype>
#include <string>
#include <string_view>

namespace stripsmith::palette {

ImU32 wireColour(const char* name) {
    struct Entry { std::string_view word; ImU32 colour; };
    static constexpr std::array<Entry, 14> kColours{{
        {"red", rgba(220, 40, 40)},      {"black", rgba(30, 30, 30)},
        {"yellow", rgba(240, 210, 40)},  {"green", rgba(40, 170, 70)},
        {"blue", rgba(50, 100, 230)},    {"white", rgba(245, 245, 245)},
        {"orange", rgba(245, 140, 30)},  {"brown", rgba(130, 80, 40)},
        {"grey", rgba(140, 140, 140)},   {"gray", rgba(140, 140, 140)},
        {"violet", rgba(150, 70, 200)},  {"purple", rgba(150, 70, 200)},
        {"pink", rgba(245, 130, 180)},   {"bare", rgba(190, 195, 200)},
    }};
    std::string lower;
    for (const char* c = name; c && *c; ++c) lower += static_cast<char>(std::tolower(static_cast<unsigned char>(*c)));
    for (const Entry& e : kColours)
        if (lower == e.word) return e.colour;
    return rgba(200, 204, 210);
}

ImU32 pieceColour(int index) {
    static constexpr std::array<ImU32, 6> kPieces{rgba(80, 200, 255), rgba(255, 120, 200),
                                                 rgba(140, 255, 120), rgba(255, 200, 80),
                                                 rgba(190, 140, 255), rgba(120, 255, 230)};
    return kPieces[static_cast<std::size_t>(index) % kPieces.size()];
}

}  // namespace stripsmith::palette
