#include "netcheck/layout/supply_nets.hpp"

#include <cctype>

namespace netcheck {

namespace {

std::string upper(const std::string& text) {
    std::string out;
    for (char c : text) out += static_cast<char>(std::toupper(static_cast<unsigned char>(c)));
    return out;
}

bool positiveName(const std::string& name) {
    const std::string u = upper(name);
    return u == "VCC" || u == "VDD" || u == "V+" || u == "VIN" || u == "VBAT" || u == "VS" ||
           (!u.empty() && u.front() == '+') || u.rfind("VCC", 0) == 0 || u.rfind("VDD", 0) == 0;
}

bool groundName(const std::string& name) {
    const std::string u = upper(name);
    return u == "0" || u == "0V" || u == "GND" || u == "VSS" || u == "V-" || u == "VEE" ||
           u.rfind("GND", 0) == 0;
}

// The net of a part's pin, for parts of the kinds given.
std::optional<std::string> netOfKindPin(const Circuit& circuit,
                                        std::initializer_list<const char*> kinds, const char* pin) {
    for (const auto& [ref, part] : circuit.parts) {
        for (const char* kind : kinds) {
            if (part.kind != kind) continue;
            if (auto net = circuit.netOf({ref, pin})) return net;
        }
    }
    return std::nullopt;
}

}  // namespace

SupplyNets findSupplyNets(const Circuit& circuit) {
    SupplyNets nets;
    nets.positive = netOfKindPin(circuit, {"battery", "dc-jack"}, "+");
    nets.ground = netOfKindPin(circuit, {"battery", "dc-jack"}, "-");
    if (!nets.ground) nets.ground = netOfKindPin(circuit, {"regulator"}, "GND");
    for (const auto& [name, pins] : circuit.nets) {
        if (!nets.positive && positiveName(name) && name != nets.ground) nets.positive = name;
        if (!nets.ground && groundName(name) && name != nets.positive) nets.ground = name;
    }
    if (nets.positive && nets.positive == nets.ground) nets.ground.reset();
    return nets;
}

}  // namespace netcheck
