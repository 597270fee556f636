// What a part's value text says beyond its quantity: a tolerance ("10k 1%"), a voltage ("9V",
// "3V3"), an LED colour ("red 5 mm").
#pragma once

#include <optional>
#include <string>
#include <string_view>

namespace netcheck {

/// The tolerance written in the value as a fraction: "10k 1%" -> 0.01. Nullopt when none.
std::optional<double> toleranceInValue(std::string_view value);

/// The value with any "N%" word taken out, for parseQuantity: "10k 1%" -> "10k".
std::string withoutTolerance(std::string_view value);

/// A voltage written in the value: "9V", "9 V", "12V DC", "4.5V", "3V3" (3.3 V, the letter as
/// decimal point), "-5V". Nullopt when the text names no voltage ("2.1 mm").
std::optional<double> voltageInValue(std::string_view value);

/// Lower-case copy, for looking up words such as colours and part numbers.
std::string lowerCase(std::string_view text);

}  // namespace netcheck
