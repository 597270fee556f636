// Default DC parameters of semiconductors and regulators when the part sets none. All are typical
// figures written from memory of common datasheets and SPICE models, or common practice (LED
// forward voltage by colour), and are labelled so wherever they are shown. A part overrides any
// of them with its "spice_model" object (see part_models.hpp).
#pragma once

#include <optional>
#include <string>
#include <string_view>

namespace netcheck {

/// A value spread: the nominal figure and the range a tolerance analysis draws from.
struct Spread {
    double nominal = 0;
    double low = 0;
    double high = 0;
    bool logScale = false;  ///< spread given as a factor (x0.5 .. x2): drawn on a log scale
};

/// Small-signal diode or rectifier (SPICE D model: IS, N, RS).
struct DiodeDefaults {
    std::string basis;  ///< e.g. "1N4148 (from memory)"
    double is = 0, n = 1, rs = 0;
};
DiodeDefaults diodeDefaults(std::string_view value);

/// Forward voltage of an LED at 10 mA by the colour named in its value (common practice); nullopt
/// when the value names no colour.
struct LedColour {
    std::string colour;
    double forwardVolts = 0;
};
std::optional<LedColour> ledColour(std::string_view value);

/// Breakdown voltage of a zener from its value: "5V1", "BZX55C5V1", "4.7V". Nullopt when absent.
std::optional<double> zenerVolts(std::string_view value);

/// Polarity of a transistor from its part number: true for PNP / P-channel, false for NPN /
/// N-channel, nullopt when the number is not in the table (the value may also say "PNP").
std::optional<bool> bjtIsPnp(std::string_view value);
std::optional<bool> fetIsPChannel(std::string_view value, bool jfet);

/// Generic small-signal bipolar transistor (Gummel-Poon without Early effect or capacitances).
struct BjtDefaults {
    Spread bf{300, 150, 600, true};     ///< current gain hFE
    Spread is{1e-14, 0.5e-14, 2e-14, true};  ///< saturation current (VBE spread about +-18 mV)
    double br = 5;
};

/// JFET square-law figures: IDSS and VP (magnitudes; VP's sign follows the channel).
struct JfetDefaults {
    std::string basis;
    Spread idss;  ///< amperes
    Spread vp;    ///< volts, magnitude
};
JfetDefaults jfetDefaults(std::string_view value);

/// Generic small enhancement MOSFET (level 1), roughly a 2N7000 / BS170 or BS250.
struct MosfetDefaults {
    Spread vto{2.1, 1.4, 2.8, false};  ///< threshold magnitude, volts
    Spread kp{0.1, 0.05, 0.2, true};   ///< transconductance factor, A/V^2
};

/// Fixed linear regulator: output (negative for 79xx), dropout, output tolerance.
struct RegulatorDefaults {
    std::string basis;
    double volts = 0;
    double dropout = 2.0;
    double tolerance = 0.04;
};
std::optional<RegulatorDefaults> regulatorDefaults(std::string_view value);

}  // namespace netcheck
