// The intended circuit: parts by reference designator and nets as lists of part pins.
#pragma once

#include <compare>
#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include <nlohmann/json.hpp>

namespace netcheck {

/// One pin of one part, written "R1.2" or "VR1.W". Refs and pin names are case-sensitive.
struct PinRef {
    std::string ref;
    std::string pin;
    std::string name() const { return ref + "." + pin; }
    /// Splits at the last '.'; nullopt when either side is empty.
    static std::optional<PinRef> parse(std::string_view text);
    auto operator<=>(const PinRef&) const = default;
};

/// A part of the intended circuit. `pins` lists the pin names it declares (may be empty: then the
/// pins named in `nets` are all it has).
struct CircuitPart {
    std::string kind;
    std::string value;
    std::vector<std::string> pins;
    nlohmann::json extra = nlohmann::json::object();  ///< unknown keys, kept for round trips
    bool operator==(const CircuitPart&) const = default;
};

/// What the schematic says must be joined, and nothing else.
struct Circuit {
    std::map<std::string, CircuitPart> parts;         ///< by ref
    std::map<std::string, std::vector<PinRef>> nets;  ///< net name -> its pins
    nlohmann::json extra = nlohmann::json::object();  ///< unknown keys, kept for round trips
    bool operator==(const Circuit&) const = default;

    /// Name of the net holding `pin`, if any.
    std::optional<std::string> netOf(const PinRef& pin) const;
};

}  // namespace netcheck
