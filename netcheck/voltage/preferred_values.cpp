// The tables are IEC 60063's (see REFERENCE-FACTS); values are compared with a relative margin so
// that 4.7e3 computed as 4.7 * 1000 counts as the preferred value itself.
#include "netcheck/voltage/preferred_values.hpp"

#include <array>
#include <cmath>
#include <cstdio>
#include <cstdlib>

namespace netcheck {

namespace {

constexpr std::array<double, 12> kE12{1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2};
constexpr std::array<double, 24> kE24{1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0,
                                      3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1};
constexpr double kSame = 1e-9;

/// 8.2 * 100 is 819.999...: rounded to 12 significant digits it prints and compares as 820.
double tidy(double value) {
    char text[32];
    std::snprintf(text, sizeof text, "%.12g", value);
    return std::strtod(text, nullptr);
}

}  // namespace

std::span<const double> decadeValues(PreferredSeries series) {
    if (series == PreferredSeries::E12) return kE12;
    return kE24;
}

std::string_view seriesName(PreferredSeries series) {
    return series == PreferredSeries::E12 ? "E12" : "E24";
}

std::optional<PreferredNeighbours> preferredNeighbours(double value, PreferredSeries series) {
    if (!std::isfinite(value) || value <= 0) return std::nullopt;
    const double decade = std::pow(10.0, std::floor(std::log10(value)));
    const std::span<const double> table = decadeValues(series);
    // Candidates from the decade below to the decade above cover values next to a decade edge.
    PreferredNeighbours found{0, 0};
    for (const double scale : {decade / 10, decade, decade * 10}) {
        for (const double mantissa : table) {
            const double candidate = tidy(mantissa * scale);
            if (candidate <= value * (1 + kSame) && candidate > found.below) found.below = candidate;
            if (candidate >= value * (1 - kSame) && (found.above == 0 || candidate < found.above)) {
                found.above = candidate;
            }
        }
    }
    return found;
}

}  // namespace netcheck
