// Reading component values the way makers and IEC 60062 write them.
//
// Multiplier letters: p 1e-12, n 1e-9, u/µ 1e-6, m 1e-3, R/r 1, k/K 1e3, M 1e6, G 1e9, T 1e12, and
// "meg"/"Meg"/"MEG" 1e6. Small multipliers are lower case only, so type names such as "1N4148" are
// not read as quantities. Case decides between milli and mega: "2.2mH" and "4m7" are milli, "4M7"
// and "1 MΩ" are mega. (SPICE's rule that M is milli belongs to the SPICE importer only.)
// The letter may stand in place of the decimal point: "4k7" = 4.7k, "R47" = 0.47.
#include "netcheck/model/value.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <charconv>
#include <cmath>
#include <cstdio>
#include <cstdlib>

namespace netcheck {

namespace {

struct Multiplier {
    std::string_view token;
    double factor;
};

// Longer tokens first so that "meg" wins over "m".
// clang-format off
constexpr std::array kMultipliers{
    Multiplier{"meg", 1e6},  Multiplier{"MEG", 1e6},   Multiplier{"Meg", 1e6},
    Multiplier{"\xC2\xB5", 1e-6},  // µ MICRO SIGN
    Multiplier{"\xCE\xBC", 1e-6},  // μ GREEK SMALL LETTER MU, often typed for it
    Multiplier{"p", 1e-12},  Multiplier{"n", 1e-9},    Multiplier{"u", 1e-6},
    Multiplier{"m", 1e-3},   Multiplier{"R", 1.0},     Multiplier{"r", 1.0},
    Multiplier{"k", 1e3},    Multiplier{"K", 1e3},     Multiplier{"M", 1e6},
    Multiplier{"G", 1e9},    Multiplier{"T", 1e12},
};

// Unit words and symbols that may follow a value; they carry no information for comparison.
constexpr std::array<std::string_view, 7> kUnits{
    "\xCE\xA9",      // Ω GREEK CAPITAL LETTER OMEGA
    "\xE2\x84\xA6",  // Ω OHM SIGN
    "ohms", "ohm", "F", "H", "f",
};
// clang-format on

constexpr std::array<std::string_view, 8> kTaperWords{"lin",   "linear",  "log",     "logarithmic",
                                                      "audio", "antilog", "reverse", "rev"};

bool isSpace(char c) {
    return std::isspace(static_cast<unsigned char>(c)) != 0;
}
bool isDigit(char c) {
    return c >= '0' && c <= '9';
}
bool isTaperLetter(char c) {
    return c == 'A' || c == 'B' || c == 'C';
}

std::string lower(std::string_view text) {
    std::string out(text);
    std::transform(out.begin(), out.end(), out.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return out;
}

std::string_view trim(std::string_view text) {
    while (!text.empty() && isSpace(text.front())) text.remove_prefix(1);
    while (!text.empty() && isSpace(text.back())) text.remove_suffix(1);
    return text;
}

bool endsWithIgnoringCase(std::string_view text, std::string_view tail) {
    return text.size() >= tail.size() &&
           lower(text.substr(text.size() - tail.size())) == lower(tail);
}

// Takes a taper off the front ("B100k") or the back ("100kB", "100k lin", "100k (log)").
std::string takeTaper(std::string_view& text) {
    const std::size_t blank = text.find_last_of(" \t(");
    if (blank != std::string_view::npos) {
        std::string_view word = text.substr(blank + 1);
        if (!word.empty() && word.back() == ')') word.remove_suffix(1);
        const std::string folded = lower(word);
        const bool isWord =
            std::find(kTaperWords.begin(), kTaperWords.end(), folded) != kTaperWords.end();
        if (isWord || (word.size() == 1 && isTaperLetter(word[0]))) {
            text = trim(text.substr(0, blank));
            return std::string(word);
        }
    }
    if (text.size() >= 2 && isTaperLetter(text[0]) && isDigit(text[1])) {
        const std::string letter(1, text[0]);
        text.remove_prefix(1);
        return letter;
    }
    if (text.size() >= 2 && isTaperLetter(text.back())) {
        const char before = text[text.size() - 2];
        const bool afterNumber =
            isDigit(before) || std::string_view("kKMRrGT").find(before) != std::string_view::npos;
        if (afterNumber) {
            const std::string letter(1, text.back());
            text.remove_suffix(1);
            return letter;
        }
    }
    return {};
}

void dropUnit(std::string_view& text) {
    for (std::string_view unit : kUnits) {
        const bool caseless = unit.size() > 1 && unit[0] == 'o';
        const bool match = caseless ? endsWithIgnoringCase(text, unit) : text.ends_with(unit);
        if (match && text.size() > unit.size()) {
            text = trim(text.substr(0, text.size() - unit.size()));
            return;
        }
    }
}

const Multiplier* multiplierAt(std::string_view text) {
    for (const Multiplier& m : kMultipliers) {
        if (text.starts_with(m.token)) return &m;
    }
    return nullptr;
}

// "4.7", "4k7", "4.7k", "4.7 k", "R47", "470R", "4700".
std::optional<double> parseNumber(std::string_view text) {
    std::size_t i = 0;
    std::string digits;
    bool point = false;
    for (; i < text.size() && (isDigit(text[i]) || text[i] == '.' || text[i] == ','); ++i) {
        if (text[i] == '.' || text[i] == ',') {
            if (point) return std::nullopt;
            point = true;
            digits.push_back('.');
        } else {
            digits.push_back(text[i]);
        }
    }
    const bool hadDigits = digits.find_first_of("0123456789") != std::string::npos;
    if (hadDigits) {
        while (i < text.size() && isSpace(text[i])) ++i;  // "4.7 k"
    }
    double factor = 1.0;
    if (i < text.size()) {
        const Multiplier* m = multiplierAt(text.substr(i));
        if (!m) return std::nullopt;
        factor = m->factor;
        i += m->token.size();
        std::string_view fraction = text.substr(i);
        if (!fraction.empty()) {
            if (point || !std::all_of(fraction.begin(), fraction.end(), isDigit)) {
                return std::nullopt;
            }
            digits += "." + std::string(fraction);
        }
    }
    if (digits.find_first_of("0123456789") == std::string::npos) return std::nullopt;
    if (digits.front() == '.') digits.insert(digits.begin(), '0');
    double mantissa = 0;
    const auto [end, ec] = std::from_chars(digits.data(), digits.data() + digits.size(), mantissa);
    if (ec != std::errc() || end != digits.data() + digits.size()) return std::nullopt;
    return mantissa * factor;
}

std::string foldTaper(std::string_view taper) {
    std::string folded = lower(taper);
    if (folded == "linear") return "lin";
    if (folded == "audio" || folded == "logarithmic") return "log";
    return folded;
}

std::string formatG(double value) {
    std::array<char, 32> buffer{};
    std::snprintf(buffer.data(), buffer.size(), "%.6g", value);
    return buffer.data();
}

}  // namespace

std::optional<Quantity> parseQuantity(std::string_view text) {
    text = trim(text);
    Quantity quantity;
    quantity.taper = takeTaper(text);
    dropUnit(text);
    const auto magnitude = parseNumber(text);
    if (!magnitude || !std::isfinite(*magnitude)) return std::nullopt;
    quantity.magnitude = *magnitude;
    return quantity;
}

bool sameValue(std::string_view a, std::string_view b) {
    const auto qa = parseQuantity(a);
    const auto qb = parseQuantity(b);
    if (qa && qb) {
        const double scale = std::max(std::fabs(qa->magnitude), std::fabs(qb->magnitude));
        return std::fabs(qa->magnitude - qb->magnitude) <= 1e-9 * scale &&
               foldTaper(qa->taper) == foldTaper(qb->taper);
    }
    return lower(trim(a)) == lower(trim(b));
}

std::string formatIec(double magnitude, bool capacitance) {
    if (!std::isfinite(magnitude) || magnitude < 0) return formatG(magnitude);
    if (magnitude == 0) return "0R";
    static constexpr std::array<Multiplier, 5> kResistance{
        Multiplier{"R", 1.0}, {"k", 1e3}, {"M", 1e6}, {"G", 1e9}, {"T", 1e12}};
    static constexpr std::array<Multiplier, 5> kCapacitance{
        Multiplier{"p", 1e-12}, {"n", 1e-9}, {"u", 1e-6}, {"m", 1e-3}, {"R", 1.0}};
    const auto& scale = capacitance ? kCapacitance : kResistance;
    // Round first so that 99.9999999n becomes 100n rather than 99n9999999.
    // strtod, not stod: stod throws for subnormal magnitudes such as 1e-310 (found by fuzzing).
    const double rounded = std::strtod(formatG(magnitude).c_str(), nullptr);
    const Multiplier* unit = &scale.front();
    for (const Multiplier& m : scale) {
        if (rounded >= m.factor * (1 - 1e-12)) unit = &m;
    }
    std::string digits = formatG(rounded / unit->factor);
    if (digits.find('e') != std::string::npos) return formatG(magnitude);
    const std::size_t point = digits.find('.');
    if (point == std::string::npos) return digits + std::string(unit->token);
    digits.replace(point, 1, unit->token);
    if (digits.starts_with("0") && point == 1) digits.erase(0, 1);  // "0R47" -> "R47"
    return digits;
}

}  // namespace netcheck
