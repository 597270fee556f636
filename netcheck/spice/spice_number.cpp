// SPICE scale suffixes (ngspice manual, ch. 2): T 1e12, G 1e9, MEG 1e6, K 1e3, M 1e-3, U 1e-6,
// N 1e-9, P 1e-12, F 1e-15, MIL 25.4e-6; letters after a number or suffix are ignored.
#include "netcheck/spice/spice_number.hpp"

#include <array>
#include <cctype>
#include <cmath>
#include <cstdio>
#include <cstdlib>

#include "netcheck/model/value.hpp"
#include "netcheck/spice/detail/spice_deck.hpp"

namespace netcheck::spice {

namespace {

bool isDigit(char c) {
    return c >= '0' && c <= '9';
}
bool isLetter(char c) {
    return std::isalpha(static_cast<unsigned char>(c)) != 0;
}

struct Suffix {
    std::string_view text;
    double scale;
};

// Longest first, so "meg" and "mil" win over "m".
constexpr std::array<Suffix, 11> kSuffixes{{{"meg", 1e6},
                                            {"mil", 25.4e-6},
                                            {"t", 1e12},
                                            {"g", 1e9},
                                            {"k", 1e3},
                                            {"m", 1e-3},
                                            {"u", 1e-6},
                                            {"n", 1e-9},
                                            {"p", 1e-12},
                                            {"f", 1e-15},
                                            {"", 1}}};

/// Length of the mantissa and exponent at the start of `s` (0 when there is no digit).
std::size_t numberLength(std::string_view s, bool& plainInteger) {
    std::size_t i = 0;
    if (i < s.size() && (s[i] == '+' || s[i] == '-')) ++i;
    std::size_t digits = 0;
    while (i < s.size() && isDigit(s[i])) ++i, ++digits;
    plainInteger = true;
    if (i < s.size() && s[i] == '.') {
        plainInteger = false;
        ++i;
        while (i < s.size() && isDigit(s[i])) ++i, ++digits;
    }
    if (digits == 0) return 0;
    if (i < s.size() && (s[i] == 'e' || s[i] == 'E')) {
        std::size_t j = i + 1;
        if (j < s.size() && (s[j] == '+' || s[j] == '-')) ++j;
        if (j < s.size() && isDigit(s[j])) {
            while (j < s.size() && isDigit(s[j])) ++j;
            plainInteger = false;
            i = j;
        }
    }
    return i;
}

/// "4K7", "2M2", "4R7", "1n5": digits, one multiplier letter, digits (IEC 60062 letter-and-digit
/// code). Read with the board-file rules, which follow IEC 60062.
std::optional<double> iecReading(std::string_view field, std::size_t numberEnd, bool plainInteger) {
    if (!plainInteger || field.front() == '+' || field.front() == '-') return std::nullopt;
    if (numberEnd + 1 >= field.size()) return std::nullopt;
    const char letter =
        static_cast<char>(std::tolower(static_cast<unsigned char>(field[numberEnd])));
    if (std::string_view("rkmgtunpf").find(letter) == std::string_view::npos) return std::nullopt;
    if (!isDigit(field[numberEnd + 1])) return std::nullopt;
    std::size_t end = numberEnd + 1;
    while (end < field.size() && isDigit(field[end])) ++end;
    std::string code(field.substr(0, end));
    // SPICE is case-insensitive, so 2M2 and 2m2 are the same token to it; a maker writing an IEC
    // code means mega with a capital M and milli (capacitance) with a small m.
    if (const auto q = parseQuantity(code)) return q->magnitude;
    return std::nullopt;
}

}  // namespace

bool looksNumeric(std::string_view field) {
    if (field.empty()) return false;
    const char c = field.front();
    return isDigit(c) || c == '.' || c == '+' || c == '-';
}

std::optional<SpiceNumber> parseSpiceNumber(std::string_view field) {
    bool plainInteger = true;
    const std::size_t length = numberLength(field, plainInteger);
    if (length == 0) return std::nullopt;
    const std::string mantissa(field.substr(0, length));
    const double base = std::strtod(mantissa.c_str(), nullptr);
    const std::string tail = lower(field.substr(length));
    for (const Suffix& suffix : kSuffixes) {
        if (!tail.starts_with(suffix.text)) continue;
        for (char c : std::string_view(tail).substr(suffix.text.size())) {
            if (!isLetter(c) && !isDigit(c) && c != '_') return std::nullopt;
        }
        SpiceNumber out;
        out.value = base * suffix.scale;
        out.iecReading = iecReading(field, length, plainInteger);
        if (!std::isfinite(out.value)) return std::nullopt;
        return out;
    }
    return std::nullopt;
}

std::string formatSpiceNumber(double value, int digits) {
    if (value == 0) return "0";
    const double size = std::fabs(value);
    char buf[40];
    if (size >= 1e15 || size < 1e-15) {
        std::snprintf(buf, sizeof buf, "%.*g", digits, value);
        return buf;
    }
    // The largest scale not above the value; MIL is a length unit, not a scale to write with.
    const Suffix* pick = nullptr;
    for (const Suffix& s : kSuffixes) {
        if (s.text == "mil" || size < s.scale * (1 - 1e-12)) continue;
        if (pick == nullptr || s.scale > pick->scale) pick = &s;
    }
    std::snprintf(buf, sizeof buf, "%.*g", digits, value / pick->scale);
    return std::string(buf) + std::string(pick->text);
}

}  // namespace netcheck::spice
