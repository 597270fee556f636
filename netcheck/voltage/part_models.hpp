// How each part kind enters a DC operating point: the SPICE element(s) and model it becomes, the
// parameters a tolerance analysis varies, and the DC paths it offers between its pins.
#pragma once

#include <functional>
#include <optional>
#include <span>
#include <string>
#include <vector>

#include <nlohmann/json.hpp>

#include "netcheck/model/circuit.hpp"

namespace netcheck {

/// One varied parameter of a part: nominal value and the range drawn from.
struct SpreadParameter {
    std::string name;  ///< "R", "BF", "IDSS" ...
    double nominal = 0;
    double low = 0;
    double high = 0;
    bool logScale = false;
};

/// A DC path between two pins of a part. It counts as conducting when V(sensePlus) - V(senseMinus)
/// is at least `threshold`, or always when sensePlus is -1 (resistors, sources). Used to tell the
/// nets the simulation really sets from those it could only guess.
struct DcPath {
    int a = 0;
    int b = 0;
    int sensePlus = -1;
    int senseMinus = -1;
    double threshold = 0;
    bool source = false;  ///< a voltage source: holds b as firmly as a
};

/// A part as the DC deck sees it.
struct DcModel {
    /// Simulated: in the deck. Open: carries no DC current (capacitors, crystals, connectors with
    /// nothing plugged in). LeftOut: no model (ICs, switches): nets on its pins are unknown.
    enum class Role { Simulated, Open, LeftOut };
    Role role = Role::LeftOut;
    std::vector<std::string> pins;  ///< the part's pins the element uses, in element order
    std::vector<SpreadParameter> parameters;
    /// Deck lines for element base name `name`, one node per pin, one value per parameter.
    std::function<std::vector<std::string>(const std::string& name,
                                           const std::vector<std::string>& nodes,
                                           std::span<const double> values)>
        write;
    std::vector<DcPath> paths;
    std::string summary;  ///< the model in words (figures from memory say so)
    std::string reason;   ///< why Open or LeftOut
    bool supply = false;  ///< a battery or DC jack
};

struct DcModelOptions {
    std::optional<double> supplyVolts;  ///< for batteries and DC jacks whose value names none
};

/// The model of one part. `overrides` is the part's "spice_model" object, e.g. {"BF": 140,
/// "IS": 1.5e-15}, {"IDSS": 0.008, "VP": -6}, {"polarity": "pnp"}, {"wiper": 0.25} for a pot;
/// a parameter set there is taken as measured and not varied.
DcModel dcModelFor(const CircuitPart& part, const nlohmann::json& overrides,
                   const DcModelOptions& options);

/// Every parameter at its nominal value.
std::vector<double> nominalValues(const DcModel& model);

}  // namespace netcheck
