// Preferred resistor values (IEC 60063 E12 and E24): the nearest ones either side of a value.
#pragma once

#include <optional>
#include <span>
#include <string_view>

namespace netcheck {

/// An IEC 60063 series of preferred values.
enum class PreferredSeries { E12, E24 };

/// The series' values in one decade, 1.0 up to below 10 (the published table: rounding the
/// geometric series 10^(i/n) gives other values at 2.7 ... 4.7 and 8.2).
std::span<const double> decadeValues(PreferredSeries series);

std::string_view seriesName(PreferredSeries series);

/// The preferred values nearest below (at most `value`) and above (at least `value`); both equal
/// `value` when it is a preferred value. Nullopt for values that are not positive and finite.
struct PreferredNeighbours {
    double below = 0;
    double above = 0;
};
std::optional<PreferredNeighbours> preferredNeighbours(double value, PreferredSeries series);

}  // namespace netcheck
