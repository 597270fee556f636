// The tables behind device_defaults.hpp. Figures are from memory of datasheets and vendor SPICE
// models (typical values, not guaranteed ones); the spreads follow the datasheets' min-max where
// we remember them and are deliberately wide elsewhere.
#include "netcheck/voltage/device_defaults.hpp"

#include <algorithm>
#include <array>
#include <cctype>
#include <regex>

#include "netcheck/voltage/value_reading.hpp"

namespace netcheck {

namespace {

bool contains(const std::string& text, std::string_view word) {
    return text.find(word) != std::string::npos;
}

template <std::size_t N>
bool containsAny(const std::string& text, const std::array<std::string_view, N>& words) {
    for (const std::string_view word : words) {
        if (contains(text, word)) return true;
    }
    return false;
}

}  // namespace

DiodeDefaults diodeDefaults(std::string_view value) {
    const std::string text = lowerCase(value);
    if (containsAny(text, std::array<std::string_view, 4>{"1n58", "bat4", "bat8", "schottky"})) {
        return {"1N5817 Schottky (from memory)", 3.2e-5, 1.37, 0.05};
    }
    if (contains(text, "1n400") || contains(text, "1n540")) {
        return {"1N4001 rectifier (from memory)", 1.4e-8, 1.98, 0.034};
    }
    return {"1N4148 small-signal (from memory)", 2.52e-9, 1.752, 0.568};
}

std::optional<LedColour> ledColour(std::string_view value) {
    // Forward voltage at about 10 mA, common practice for 3 mm and 5 mm indicator LEDs.
    static const std::array<LedColour, 9> kColours{{{"infrared", 1.2},
                                                    {"red", 1.9},
                                                    {"orange", 2.0},
                                                    {"amber", 2.0},
                                                    {"yellow", 2.1},
                                                    {"green", 2.2},
                                                    {"blue", 3.1},
                                                    {"white", 3.1},
                                                    {"violet", 3.2}}};
    const std::string text = lowerCase(value);
    for (const LedColour& colour : kColours) {
        if (contains(text, colour.colour)) return colour;
    }
    if (contains(text, "ir ")) return kColours[0];
    return std::nullopt;
}

std::optional<double> zenerVolts(std::string_view value) {
    // "BZX55C5V1", "5V1", "4.7V", "12 V": the voltage reader takes all of them.
    return voltageInValue(value);
}

std::optional<bool> bjtIsPnp(std::string_view value) {
    const std::string text = lowerCase(value);
    if (contains(text, "pnp")) return true;
    if (contains(text, "npn")) return false;
    static const std::array<std::string_view, 9> kPnp{"bc556", "bc557", "bc558", "bc559", "bc560",
                                                      "2n3906", "bc327", "2n2907", "2n5087"};
    static const std::array<std::string_view, 10> kNpn{"bc546", "bc547", "bc548", "bc549",
                                                       "bc550", "2n3904", "bc337", "2n2222",
                                                       "2n5088", "2n5089"};
    if (containsAny(text, kPnp)) return true;
    if (containsAny(text, kNpn)) return false;
    return std::nullopt;
}

std::optional<bool> fetIsPChannel(std::string_view value, bool jfet) {
    const std::string text = lowerCase(value);
    if (contains(text, "p-ch") || contains(text, "pch") || contains(text, "pjf") ||
        contains(text, "pmos")) {
        return true;
    }
    if (contains(text, "n-ch") || contains(text, "nch") || contains(text, "njf") ||
        contains(text, "nmos")) {
        return false;
    }
    if (jfet) {
        if (containsAny(text, std::array<std::string_view, 4>{"j175", "j176", "2n5460", "2n5461"}))
            return true;
        if (containsAny(text, std::array<std::string_view, 8>{"j201", "j113", "2n5457", "2n5458",
                                                              "2n5459", "mpf102", "2n3819",
                                                              "bf245"})) {
            return false;
        }
        return std::nullopt;
    }
    if (containsAny(text, std::array<std::string_view, 2>{"bs250", "tp06"})) return true;
    if (containsAny(text, std::array<std::string_view, 3>{"2n7000", "bs170", "2n7002"})) return false;
    return std::nullopt;
}

JfetDefaults jfetDefaults(std::string_view value) {
    // Datasheet min-max of IDSS and VP as remembered; nominal roughly the geometric middle.
    const std::string text = lowerCase(value);
    if (contains(text, "j201")) return {"J201 (from memory)", {0.5e-3, 0.2e-3, 1.0e-3, true}, {0.8, 0.3, 1.5, true}};
    if (contains(text, "2n5457")) return {"2N5457 (from memory)", {3e-3, 1e-3, 5e-3, true}, {1.8, 0.5, 6.0, true}};
    if (contains(text, "2n5458")) return {"2N5458 (from memory)", {4.5e-3, 2e-3, 9e-3, true}, {3.5, 1.0, 7.0, true}};
    if (contains(text, "mpf102")) return {"MPF102 (from memory)", {8e-3, 2e-3, 20e-3, true}, {4.0, 1.0, 8.0, true}};
    if (contains(text, "2n3819")) return {"2N3819 (from memory)", {10e-3, 2e-3, 20e-3, true}, {3.0, 1.0, 8.0, true}};
    return {"generic small-signal JFET", {3e-3, 1.5e-3, 6e-3, true}, {2.0, 1.2, 3.2, true}};
}

std::optional<RegulatorDefaults> regulatorDefaults(std::string_view value) {
    const std::string text = lowerCase(value);
    std::smatch match;
    static const std::regex kFixed("(78|79)(l|m)?(\\d\\d)");
    if (std::regex_search(text, match, kFixed)) {
        const double volts = std::stod(match[3].str());
        const bool negative = match[1].str() == "79";
        const bool low = match[2].str() == "l";
        return RegulatorDefaults{std::string(negative ? "79" : "78") + (low ? "Lxx" : "xx") +
                                     " (dropout from memory)",
                                 negative ? -volts : volts, low ? 1.7 : 2.0, 0.04};
    }
    if (contains(text, "1117")) {
        // "AMS1117-3.3" or "LM1117 3V3": the voltage after the number.
        static const std::regex kAfter("1117[^0-9]*(\\d+(\\.\\d+)?)");
        std::optional<double> volts = voltageInValue(text.substr(std::min(text.size(), text.find("1117") + 5)));
        if (!volts && std::regex_search(text, match, kAfter)) volts = std::stod(match[1].str());
        if (volts) return RegulatorDefaults{"1117 LDO (dropout from memory)", *volts, 1.2, 0.02};
    }
    if (const auto volts = voltageInValue(value)) {
        return RegulatorDefaults{"fixed regulator, dropout 2 V assumed", *volts, 2.0, 0.04};
    }
    return std::nullopt;
}

}  // namespace netcheck
