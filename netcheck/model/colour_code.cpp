// The IEC 60062 resistor colour code: digit bands, a multiplier band, a tolerance band.
#include "netcheck/model/colour_code.hpp"

#include <array>
#include <cmath>

namespace netcheck {

namespace {

struct Tolerance {
    double percent;
    BandColour colour;
};

// IEC 60062 tolerance colours. Orange, yellow and grey are left out: published tables disagree.
constexpr std::array kTolerances{
    Tolerance{1.0, BandColour::Brown},   Tolerance{2.0, BandColour::Red},
    Tolerance{0.5, BandColour::Green},   Tolerance{0.25, BandColour::Blue},
    Tolerance{0.1, BandColour::Violet},  Tolerance{5.0, BandColour::Gold},
    Tolerance{10.0, BandColour::Silver}, Tolerance{20.0, BandColour::None},
};

std::optional<BandColour> toleranceBand(double percent) {
    for (const Tolerance& t : kTolerances) {
        if (std::fabs(t.percent - percent) < 1e-9) return t.colour;
    }
    return std::nullopt;
}

// Multiplier band for 10^exponent: gold 0.1, silver 0.01, pink 0.001, else the digit colour.
std::optional<BandColour> multiplierBand(int exponent) {
    if (exponent >= 0 && exponent <= 9) return static_cast<BandColour>(exponent);
    if (exponent == -1) return BandColour::Gold;
    if (exponent == -2) return BandColour::Silver;
    if (exponent == -3) return BandColour::Pink;
    return std::nullopt;
}

}  // namespace

std::string_view bandName(BandColour colour) {
    static constexpr std::array<std::string_view, 14> kNames{
        "black",  "brown", "red",   "orange", "yellow", "green", "blue",
        "violet", "grey",  "white", "gold",   "silver", "pink",  "none"};
    return kNames[static_cast<std::size_t>(colour)];
}

std::optional<std::vector<BandColour>> resistorBands(double ohms, double tolerancePercent) {
    const auto tolerance = toleranceBand(tolerancePercent);
    if (!tolerance || !std::isfinite(ohms) || ohms < 0) return std::nullopt;
    if (ohms == 0) return std::vector<BandColour>{BandColour::Black};  // zero-ohm link: one band
    const int figures = tolerancePercent >= 5.0 ? 2 : 3;
    int exponent = static_cast<int>(std::floor(std::log10(ohms))) - (figures - 1);
    long long significand = std::llround(ohms / std::pow(10.0, exponent));
    if (significand >= static_cast<long long>(std::pow(10, figures))) {  // log10 rounded down
        ++exponent;
        significand = std::llround(ohms / std::pow(10.0, exponent));
    }
    if (std::fabs(static_cast<double>(significand) * std::pow(10.0, exponent) - ohms) >
        1e-9 * ohms) {
        return std::nullopt;  // needs more significant figures than the bands carry
    }
    const auto multiplier = multiplierBand(exponent);
    if (!multiplier) return std::nullopt;
    std::vector<BandColour> bands;
    for (int i = figures - 1; i >= 0; --i) {
        bands.push_back(
            static_cast<BandColour>(significand / static_cast<long long>(std::pow(10, i)) % 10));
    }
    bands.push_back(*multiplier);
    if (*tolerance != BandColour::None) bands.push_back(*tolerance);
    return bands;
}

}  // namespace netcheck
