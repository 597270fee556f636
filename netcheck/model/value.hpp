// Component values: IEC 60062 letter-and-digit codes and SI prefixes, as makers write them.
#pragma once

#include <optional>
#include <string>
#include <string_view>

namespace netcheck {

/// A value read from text such as "4k7", "4.7 kΩ", "100nF", "R47", "B100k", "100k lin".
struct Quantity {
    double magnitude = 0;  ///< in base units (ohms, farads, henries)
    std::string taper;     ///< pot taper as written ("B", "lin", "log"...), empty when none
    bool operator==(const Quantity&) const = default;
};

/// Board-file rules: the multiplier letter may stand in place of the decimal point (IEC 60062),
/// `M` is mega, `m` milli for non-resistance use, `u`/`µ` micro; unit words are ignored.
std::optional<Quantity> parseQuantity(std::string_view text);

/// True when both parse to the same magnitude (relative 1e-9) and the same taper (case-insensitive,
/// "lin"/"linear" and "log"/"audio" folded); otherwise compares trimmed text case-insensitively.
bool sameValue(std::string_view a, std::string_view b);

/// Shortest IEC 60062 code for a magnitude: 4700 -> "4k7", 0.47 -> "R47", 1e-7 -> "100n" when
/// `capacitance`, etc.
std::string formatIec(double magnitude, bool capacitance);

}  // namespace netcheck
