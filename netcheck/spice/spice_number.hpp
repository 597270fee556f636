// Numbers in SPICE decks: mantissa, exponent and scale suffix (ngspice manual, ch. 2). Private to
// the importer and exporter.
#pragma once

#include <optional>
#include <string>
#include <string_view>

namespace netcheck::spice {

/// A number read from a deck field.
struct SpiceNumber {
    double value = 0;  ///< the SPICE reading (suffix M = milli, letters after the suffix ignored)
    /// Set when the field looks like an IEC 60062 letter-and-digit code (4K7, 2M2, 4R7, 1n5):
    /// the magnitude a maker most likely meant, which SPICE does not read.
    std::optional<double> iecReading;
};

/// Reads a field such as "4.7k", "10Kohm", "1MEG", "2.2u", "1e3", "5mil". Nullopt when the field
/// does not start with a number, or has characters other than letters and digits after it.
std::optional<SpiceNumber> parseSpiceNumber(std::string_view field);

/// True when the field starts like a number (sign, digit or decimal point), so a failed parse is a
/// malformed number rather than a name.
bool looksNumeric(std::string_view field);

/// Writes a magnitude as SPICE reads it back: "4.7k", "2.2meg", "100n", "1m" (milli), with at
/// most `digits` significant digits.
std::string formatSpiceNumber(double value, int digits = 6);

}  // namespace netcheck::spice
