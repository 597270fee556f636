#include "wire_colours.hpp"

#include <algorithm>
#include <cctype>
#include <string>
#include <utility>

namespace sheet {

std::optional<Rgb> wireColour(std::string_view name) {
    std::string lower(name);
    std::transform(lower.begin(), lower.end(), lower.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    // Inks chosen to print distinguishably; red is kept off pure red, which marks cuts.
    static const std::pair<const char*, Rgb> kColours[] = {
        {"black", {0.1, 0.1, 0.1}},   {"brown", {0.50, 0.30, 0.12}}, {"red", {0.85, 0.12, 0.12}},
        {"orange", {1.0, 0.55, 0.0}}, {"yellow", {0.95, 0.85, 0.0}}, {"green", {0.1, 0.6, 0.15}},
        {"blue", {0.1, 0.3, 0.85}},   {"violet", {0.55, 0.2, 0.75}}, {"purple", {0.55, 0.2, 0.75}},
        {"grey", {0.55, 0.55, 0.55}}, {"gray", {0.55, 0.55, 0.55}},  {"white", {1.0, 1.0, 1.0}},
        {"pink", {1.0, 0.55, 0.7}}};
    for (const auto& [known, rgb] : kColours) {
        if (lower == known) return rgb;
    }
    return std::nullopt;
}

bool isPale(Rgb colour) {
    return 0.3 * colour.r + 0.59 * colour.g + 0.11 * colour.b > 0.75;
}

}  // namespace sheet
