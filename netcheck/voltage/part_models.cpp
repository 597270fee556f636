// One function per part kind. Element lines use the deck's node names; model names are the
// element's own name plus "m", so every part has its own model and its parameters can be varied
// on their own in a tolerance analysis.
#include "netcheck/voltage/part_models.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <map>

#include "netcheck/model/value.hpp"
#include "netcheck/voltage/device_defaults.hpp"
#include "netcheck/voltage/value_reading.hpp"

namespace netcheck {

namespace {

/// Thermal voltage at SPICE's default 27 degrees C.
constexpr double kThermalVolts = 0.025865;
/// Resistors without a tolerance in their value: the common 5 % carbon film.
constexpr double kResistorTolerance = 0.05;
/// Carbon pots and trimmers: +-20 % of the track (common practice).
constexpr double kPotTolerance = 0.20;
/// Junctions count as conducting from this forward voltage (silicon, about 1 uA).
constexpr double kJunctionOn = 0.45;

std::string number(double value) {
    char text[32];
    std::snprintf(text, sizeof text, "%.9g", value);
    return text;
}

/// The part's "spice_model" settings, read case-insensitively.
class Overrides {
public:
    explicit Overrides(const nlohmann::json& json) {
        if (!json.is_object()) return;
        for (const auto& [key, value] : json.items()) values_[lowerCase(key)] = value;
    }
    std::optional<double> number(const std::string& name) const {
        const auto found = values_.find(lowerCase(name));
        if (found == values_.end()) return std::nullopt;
        if (found->second.is_number()) return found->second.get<double>();
        if (found->second.is_string()) {
            if (auto quantity = parseQuantity(found->second.get<std::string>())) {
                return quantity->magnitude;
            }
        }
        return std::nullopt;
    }
    std::string text(const std::string& name) const {
        const auto found = values_.find(lowerCase(name));
        return found != values_.end() && found->second.is_string()
                   ? lowerCase(found->second.get<std::string>())
                   : std::string();
    }
    /// Numeric settings other than `handled`, as "NAME=value" for a .model line.
    std::string extraModelParameters(std::initializer_list<const char*> handled) const {
        std::string out;
        for (const auto& entry : values_) {
            const std::string& key = entry.first;  // a named binding: clang 14 cannot capture one
            const nlohmann::json& value = entry.second;
            const bool known = std::any_of(handled.begin(), handled.end(),
                                           [&](const char* name) { return lowerCase(name) == key; });
            if (known || !value.is_number()) continue;
            std::string upper = key;
            for (char& c : upper) c = static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
            out += " " + upper + "=" + netcheck::number(value.get<double>());
        }
        return out;
    }

private:
    static std::string number(double value) { return netcheck::number(value); }
    std::map<std::string, nlohmann::json> values_;
};

/// A parameter taken from the override when set (then not varied), else from `spread`.
SpreadParameter parameter(const std::string& name, const Spread& spread,
                          std::optional<double> measured) {
    if (measured) return {name, *measured, *measured, *measured, false};
    return {name, spread.nominal, spread.low, spread.high, spread.logScale};
}

SpreadParameter relative(const std::string& name, double nominal, double tolerance) {
    return {name, nominal, nominal * (1 - tolerance), nominal * (1 + tolerance), false};
}

DcModel leftOut(std::string reason) {
    DcModel model;
    model.role = DcModel::Role::LeftOut;
    model.reason = std::move(reason);
    return model;
}

DcModel open(std::string reason) {
    DcModel model;
    model.role = DcModel::Role::Open;
    model.reason = std::move(reason);
    return model;
}

/// The part's own pin names when it declares `count` of them, else the kind's defaults.
std::vector<std::string> plainPins(const CircuitPart& part, std::vector<std::string> defaults) {
    return part.pins.size() == defaults.size() ? part.pins : defaults;
}

/// True when the part declares no pins or every one of `needed`.
bool hasPins(const CircuitPart& part, const std::vector<std::string>& needed) {
    if (part.pins.empty()) return true;
    return std::all_of(needed.begin(), needed.end(), [&](const std::string& pin) {
        return std::find(part.pins.begin(), part.pins.end(), pin) != part.pins.end();
    });
}

DcPath always(int a, int b) {
    return {a, b, -1, -1, 0, false};
}

DcPath junction(int a, int b, int plus, int minus, double threshold) {
    return {a, b, plus, minus, threshold, false};
}

DcModel resistor(const CircuitPart& part) {
    const auto quantity = parseQuantity(withoutTolerance(part.value));
    if (!quantity || quantity->magnitude <= 0) {
        return leftOut("value \"" + part.value + "\" is not a resistance");
    }
    const double tolerance = toleranceInValue(part.value).value_or(kResistorTolerance);
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.pins = plainPins(part, {"1", "2"});
    model.parameters = {relative("R", quantity->magnitude, tolerance)};
    model.write = [](const std::string& name, const std::vector<std::string>& nodes,
                     std::span<const double> values) {
        return std::vector<std::string>{"R" + name + " " + nodes[0] + " " + nodes[1] + " " +
                                        number(values[0])};
    };
    model.paths = {always(0, 1)};
    model.summary = "resistor, " + number(tolerance * 100) + " %";
    return model;
}

/// Fraction of the track between lug 1 and the wiper at `travel` (0 at lug 1, 1 at lug 3).
double trackFraction(double travel, const std::string& law) {
    // Log (audio) law: 10 % of the track at mid-travel, the common approximation.
    if (law == "log") return (std::pow(10.0, 2 * travel) - 1) / 99;
    if (law == "reverse log") return 1 - (std::pow(10.0, 2 * (1 - travel)) - 1) / 99;
    return travel;
}

DcModel pot(const CircuitPart& part, const Overrides& overrides) {
    const auto quantity = parseQuantity(withoutTolerance(part.value));
    if (!quantity || quantity->magnitude <= 0) {
        return leftOut("value \"" + part.value + "\" is not a resistance");
    }
    const std::string taper = lowerCase(quantity->taper);
    std::string law = "linear";
    if (taper == "log" || taper == "logarithmic" || taper == "audio" || taper == "a") law = "log";
    if (taper == "c" || taper == "rev" || taper == "reverse") law = "reverse log";
    const double travel = std::clamp(overrides.number("wiper").value_or(0.5), 0.0, 1.0);
    const double fraction = std::clamp(trackFraction(travel, law), 1e-4, 1 - 1e-4);
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.pins = plainPins(part, {"1", "2", "3"});
    model.parameters = {relative("R", quantity->magnitude, kPotTolerance)};
    model.write = [fraction](const std::string& name, const std::vector<std::string>& nodes,
                             std::span<const double> values) {
        return std::vector<std::string>{
            "R" + name + "a " + nodes[0] + " " + nodes[1] + " " + number(values[0] * fraction),
            "R" + name + "b " + nodes[1] + " " + nodes[2] + " " +
                number(values[0] * (1 - fraction))};
    };
    model.paths = {always(0, 1), always(1, 2)};
    model.summary = "pot, wiper at " + number(travel * 100) + " % of travel from lug 1, " + law +
                    " law" + (taper == "a" ? " (taper letter A read as log)" : "") + ", track " +
                    number(kPotTolerance * 100) + " % (common practice)";
    return model;
}

DcModel diodeModel(const std::vector<std::string>& pins, const std::string& modelText,
                   std::vector<SpreadParameter> parameters,
                   std::function<std::string(std::span<const double>)> modelLine) {
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.pins = pins;
    model.parameters = std::move(parameters);
    model.write = [modelLine](const std::string& name, const std::vector<std::string>& nodes,
                              std::span<const double> values) {
        return std::vector<std::string>{
            "D" + name + " " + nodes[0] + " " + nodes[1] + " D" + name + "m",
            ".model D" + name + "m D(" + modelLine(values) + ")"};
    };
    model.summary = modelText;
    return model;
}

DcModel diode(const CircuitPart& part, const Overrides& overrides) {
    const DiodeDefaults defaults = diodeDefaults(part.value);
    const Spread isSpread{defaults.is, defaults.is / 2, defaults.is * 2, true};
    const double n = overrides.number("N").value_or(defaults.n);
    const double rs = overrides.number("RS").value_or(defaults.rs);
    DcModel model = diodeModel(
        {"A", "K"}, "diode, " + defaults.basis,
        {parameter("IS", isSpread, overrides.number("IS"))}, [n, rs](std::span<const double> v) {
            return "IS=" + number(v[0]) + " N=" + number(n) + " RS=" + number(rs);
        });
    model.paths = {junction(0, 1, 0, 1, kJunctionOn)};
    return model;
}

DcModel zener(const CircuitPart& part, const Overrides& overrides) {
    const auto volts = overrides.number("BV") ? overrides.number("BV") : zenerVolts(part.value);
    if (!volts || *volts <= 0) {
        return leftOut("no breakdown voltage in its value (write e.g. 5V1)");
    }
    const double tolerance = toleranceInValue(part.value).value_or(0.05);
    const DiodeDefaults forward = diodeDefaults("");
    SpreadParameter bv = relative("BV", *volts, tolerance);
    if (overrides.number("BV")) bv = parameter("BV", {}, volts);
    DcModel model = diodeModel(
        {"A", "K"},
        "zener, breakdown " + number(*volts) + " V at 5 mA, " + number(tolerance * 100) + " %",
        {bv}, [forward](std::span<const double> v) {
            return "IS=" + number(forward.is) + " N=" + number(forward.n) +
                   " RS=" + number(forward.rs) + " BV=" + number(v[0]) + " IBV=5m";
        });
    model.paths = {junction(0, 1, 0, 1, kJunctionOn), junction(1, 0, 1, 0, 0.9 * *volts)};
    return model;
}

DcModel led(const CircuitPart& part, const Overrides& overrides) {
    const std::optional<LedColour> colour = ledColour(part.value);
    const LedColour used = colour.value_or(LedColour{"red", 1.9});
    const double forward = overrides.number("VF").value_or(used.forwardVolts);
    const SpreadParameter vf = overrides.number("VF")
                                   ? parameter("VF", {}, forward)
                                   : SpreadParameter{"VF", forward, forward - 0.1, forward + 0.1};
    // An emission coefficient of 2 is typical of LEDs; IS is set so that VF drops at 10 mA.
    constexpr double kN = 2.0;
    constexpr double kAmps = 0.01;
    const std::string text =
        "LED, " + used.colour + ", " + number(forward) + " V at 10 mA +-0.1 V (common practice)" +
        (colour ? "" : "; the value names no colour: red assumed");
    DcModel model = diodeModel({"A", "K"}, text, {vf}, [](std::span<const double> v) {
        const double is = kAmps / std::expm1(v[0] / (kN * kThermalVolts));
        return "IS=" + number(is) + " N=" + number(kN);
    });
    model.paths = {junction(0, 1, 0, 1, 0.7 * forward)};
    return model;
}

/// "pnp" or "npn" (or "p"/"n") set on the part, else from the part number.
std::optional<bool> polarityOverride(const Overrides& overrides) {
    const std::string polarity = overrides.text("polarity");
    if (polarity == "pnp" || polarity == "p" || polarity == "p-channel") return true;
    if (polarity == "npn" || polarity == "n" || polarity == "n-channel") return false;
    return std::nullopt;
}

DcModel bjt(const CircuitPart& part, const Overrides& overrides) {
    const std::optional<bool> known = polarityOverride(overrides) ? polarityOverride(overrides)
                                                                  : bjtIsPnp(part.value);
    const bool pnp = known.value_or(false);
    const BjtDefaults defaults;
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.pins = {"C", "B", "E"};
    model.parameters = {parameter("BF", defaults.bf, overrides.number("BF")),
                        parameter("IS", defaults.is, overrides.number("IS"))};
    const std::string extra = overrides.extraModelParameters({"BF", "IS", "BR", "polarity"});
    const double br = overrides.number("BR").value_or(defaults.br);
    model.write = [pnp, extra, br](const std::string& name, const std::vector<std::string>& nodes,
                                   std::span<const double> values) {
        return std::vector<std::string>{
            "Q" + name + " " + nodes[0] + " " + nodes[1] + " " + nodes[2] + " Q" + name + "m",
            ".model Q" + name + "m " + (pnp ? "PNP" : "NPN") + "(IS=" + number(values[1]) +
                " BF=" + number(values[0]) + " BR=" + number(br) + extra + ")"};
    };
    // Pins 0 C, 1 B, 2 E; a PNP's junctions conduct the other way.
    const auto [plus, minus] = pnp ? std::pair{2, 1} : std::pair{1, 2};
    model.paths = {junction(1, 2, plus, minus, kJunctionOn),
                   junction(1, 0, pnp ? 0 : 1, pnp ? 1 : 0, kJunctionOn),
                   junction(0, 2, plus, minus, kJunctionOn)};
    model.summary = std::string(pnp ? "PNP" : "NPN") +
                    ", generic small-signal model (from memory): hFE 300 (150-600), IS 1e-14 A "
                    "(x0.5-x2)" +
                    (known ? "" : "; polarity not known from the value: NPN assumed");
    return model;
}

DcModel jfet(const CircuitPart& part, const Overrides& overrides) {
    const std::optional<bool> known = polarityOverride(overrides)
                                          ? polarityOverride(overrides)
                                          : fetIsPChannel(part.value, true);
    const bool pChannel = known.value_or(false);
    const JfetDefaults defaults = jfetDefaults(part.value);
    std::optional<double> vp = overrides.number("VP");
    if (vp) vp = std::abs(*vp);
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.pins = {"D", "G", "S"};
    model.parameters = {parameter("IDSS", defaults.idss, overrides.number("IDSS")),
                        parameter("VP", defaults.vp, vp)};
    const std::string extra = overrides.extraModelParameters({"IDSS", "VP", "polarity"});
    model.write = [pChannel, extra](const std::string& name, const std::vector<std::string>& nodes,
                                    std::span<const double> values) {
        // Square law: BETA = IDSS / VP^2, VTO = VP (negative for N-channel).
        const double beta = values[0] / (values[1] * values[1]);
        return std::vector<std::string>{
            "J" + name + " " + nodes[0] + " " + nodes[1] + " " + nodes[2] + " J" + name + "m",
            ".model J" + name + "m " + (pChannel ? "PJF" : "NJF") +
                "(VTO=" + number(pChannel ? values[1] : -values[1]) + " BETA=" + number(beta) +
                " LAMBDA=0" + extra + ")"};
    };
    const double pinchOff = model.parameters[1].nominal;
    model.paths = {junction(1, 2, pChannel ? 2 : 1, pChannel ? 1 : 2, kJunctionOn),
                   junction(1, 0, pChannel ? 0 : 1, pChannel ? 1 : 0, kJunctionOn),
                   junction(0, 2, pChannel ? 2 : 1, pChannel ? 1 : 2, -pinchOff)};
    char figures[160];
    std::snprintf(figures, sizeof figures, "IDSS %.3g mA (%.3g-%.3g), VP %s%.3g V (%.3g-%.3g)",
                  defaults.idss.nominal * 1e3, defaults.idss.low * 1e3, defaults.idss.high * 1e3,
                  pChannel ? "+" : "-", defaults.vp.nominal, defaults.vp.low, defaults.vp.high);
    model.summary = std::string(pChannel ? "P" : "N") + "-channel JFET, square law, " +
                    defaults.basis + ": " + figures +
                    (known ? "" : "; channel not known from the value: N assumed");
    return model;
}

DcModel mosfet(const CircuitPart& part, const Overrides& overrides) {
    const std::optional<bool> known = polarityOverride(overrides)
                                          ? polarityOverride(overrides)
                                          : fetIsPChannel(part.value, false);
    const bool pChannel = known.value_or(false);
    const MosfetDefaults defaults;
    std::optional<double> vto = overrides.number("VTO");
    if (vto) vto = std::abs(*vto);
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.pins = {"D", "G", "S"};
    model.parameters = {parameter("VTO", defaults.vto, vto),
                        parameter("KP", defaults.kp, overrides.number("KP"))};
    const std::string extra = overrides.extraModelParameters({"VTO", "KP", "polarity"});
    model.write = [pChannel, extra](const std::string& name, const std::vector<std::string>& nodes,
                                    std::span<const double> values) {
        // W = L, so the level-1 gain factor is KP itself; the body is tied to the source.
        return std::vector<std::string>{
            "M" + name + " " + nodes[0] + " " + nodes[1] + " " + nodes[2] + " " + nodes[2] +
                " M" + name + "m W=100u L=100u",
            ".model M" + name + "m " + (pChannel ? "PMOS" : "NMOS") + "(LEVEL=1 VTO=" +
                number(pChannel ? -values[0] : values[0]) + " KP=" + number(values[1]) + extra +
                ")"};
    };
    model.paths = {junction(0, 2, pChannel ? 2 : 1, pChannel ? 1 : 2,
                            model.parameters[0].nominal)};
    model.summary = std::string(pChannel ? "P" : "N") +
                    "-channel MOSFET, generic level-1 model (from memory): VTO 2.1 V (1.4-2.8), "
                    "KP 0.1 A/V^2 (x0.5-x2)" +
                    (known ? "" : "; channel not known from the value: N assumed");
    return model;
}

DcModel regulator(const CircuitPart& part, const Overrides& overrides) {
    std::optional<RegulatorDefaults> defaults = regulatorDefaults(part.value);
    if (const auto volts = overrides.number("VOUT")) {
        defaults = RegulatorDefaults{"set on the part", *volts, 2.0, 0.0};
    }
    if (!defaults) return leftOut("output voltage not known from its value (e.g. 7805)");
    const double dropout = overrides.number("dropout").value_or(defaults->dropout);
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.pins = {"IN", "GND", "OUT"};
    model.parameters = {relative("VOUT", defaults->volts, defaults->tolerance)};
    model.write = [dropout](const std::string& name, const std::vector<std::string>& nodes,
                            std::span<const double> values) {
        // An ideal source that follows the input less the dropout; the input carries the output
        // current (F mirrors the current through the zero-volt sense source).
        const std::string inner = "x_" + name;
        const std::string vin = "v(" + nodes[0] + "," + nodes[1] + ")";
        const std::string law = values[0] >= 0
                                    ? "min(" + number(values[0]) + ", max(" + vin + "-" +
                                          number(dropout) + ", 0))"
                                    : "max(" + number(values[0]) + ", min(" + vin + "+" +
                                          number(dropout) + ", 0))";
        return std::vector<std::string>{
            "B" + name + " " + inner + " " + nodes[1] + " V=" + law,
            "V" + name + "s " + inner + " " + nodes[2] + " 0",
            "F" + name + " " + nodes[0] + " " + nodes[1] + " V" + name + "s 1"};
    };
    model.paths = {always(0, 1), {2, 1, -1, -1, 0, true}};
    model.summary = "regulator, ideal " + number(defaults->volts) + " V source, dropout " +
                    number(dropout) + " V, " + number(defaults->tolerance * 100) + " % (" +
                    defaults->basis + ")";
    return model;
}

// A battery's voltage over its life: fresh alkaline cells read above the nominal, worn ones
// below it (10 %, common practice); a DC adapter or bench supply 5 % (common practice). A tolerance
// in the value ("9V 5%") is taken instead; a "V" override is taken as measured and not varied.
constexpr double kBatteryTolerance = 0.10;
constexpr double kAdapterTolerance = 0.05;

DcModel supply(const CircuitPart& part, const Overrides& overrides, const DcModelOptions& options) {
    const std::string value = withoutTolerance(part.value);
    const std::optional<double> volts = overrides.number("V") ? overrides.number("V")
                                        : voltageInValue(value)  ? voltageInValue(value)
                                                                 : options.supplyVolts;
    if (!volts) return leftOut("no voltage in its value (write e.g. 9V, or give --supply)");
    const double tolerance = overrides.number("V") ? 0.0
                             : toleranceInValue(part.value).value_or(
                                   part.kind == "battery" ? kBatteryTolerance : kAdapterTolerance);
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.supply = true;
    model.pins = {"+", "-"};
    model.parameters = {relative("V", *volts, tolerance)};
    model.write = [](const std::string& name, const std::vector<std::string>& nodes,
                     std::span<const double> values) {
        return std::vector<std::string>{"V" + name + " " + nodes[0] + " " + nodes[1] + " DC " +
                                        number(values[0])};
    };
    model.paths = {{0, 1, -1, -1, 0, true}};
    model.summary = "supply, " + number(*volts) + " V, " +
                    (tolerance == 0 ? std::string("as measured")
                                    : number(tolerance * 100) + " %" +
                                          (toleranceInValue(part.value) ? "" : " (common practice)"));
    return model;
}

DcModel fuse(const CircuitPart& part) {
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.pins = plainPins(part, {"1", "2"});
    model.write = [](const std::string& name, const std::vector<std::string>& nodes,
                     std::span<const double>) {
        return std::vector<std::string>{"V" + name + " " + nodes[0] + " " + nodes[1] + " 0"};
    };
    model.paths = {{0, 1, -1, -1, 0, true}};
    model.summary = "fuse, a short";
    return model;
}

DcModel inductor(const CircuitPart& part) {
    DcModel model;
    model.role = DcModel::Role::Simulated;
    model.pins = plainPins(part, {"1", "2"});
    model.write = [](const std::string& name, const std::vector<std::string>& nodes,
                     std::span<const double>) {
        // A short at DC; its winding resistance is not known.
        return std::vector<std::string>{"L" + name + " " + nodes[0] + " " + nodes[1] + " 1m"};
    };
    model.paths = {{0, 1, -1, -1, 0, true}};
    model.summary = "inductor, a short at DC";
    return model;
}

}  // namespace

std::vector<double> nominalValues(const DcModel& model) {
    std::vector<double> values;
    for (const SpreadParameter& parameter : model.parameters) values.push_back(parameter.nominal);
    return values;
}

DcModel dcModelFor(const CircuitPart& part, const nlohmann::json& overridesJson,
                   const DcModelOptions& options) {
    const Overrides overrides(overridesJson);
    const std::string& kind = part.kind;
    DcModel model;
    if (kind == "resistor") {
        model = resistor(part);
    } else if (kind == "pot" || kind == "trimmer") {
        model = pot(part, overrides);
    } else if (kind == "capacitor" || kind == "electrolytic" || kind == "crystal") {
        return open("open at DC");
    } else if (kind == "header" || kind == "wire-terminal" || kind == "jack" ||
               kind == "mono-jack" || kind == "stereo-jack") {
        return open("connector, taken as open (nothing plugged in)");
    } else if (kind == "inductor") {
        model = inductor(part);
    } else if (kind == "fuse") {
        model = fuse(part);
    } else if (kind == "diode") {
        model = diode(part, overrides);
    } else if (kind == "zener") {
        model = zener(part, overrides);
    } else if (kind == "led" || kind == "panel-led") {
        model = led(part, overrides);
    } else if (kind == "bjt") {
        model = bjt(part, overrides);
    } else if (kind == "jfet") {
        model = jfet(part, overrides);
    } else if (kind == "mosfet") {
        model = mosfet(part, overrides);
    } else if (kind == "regulator") {
        model = regulator(part, overrides);
    } else if (kind == "battery" || kind == "dc-jack") {
        model = supply(part, overrides, options);
    } else {
        return leftOut("no DC model for a part of kind " + kind);
    }
    if (model.role == DcModel::Role::Simulated && !hasPins(part, model.pins)) {
        return leftOut("its pins are not named as a " + kind + "'s are expected to be");
    }
    return model;
}

}  // namespace netcheck
