#include "netcheck/edit/circuit_edits.hpp"

#include <algorithm>
#include <cctype>
#include <set>

namespace netcheck {
namespace {


std::string lowered(std::string text) {
    std::transform(text.begin(), text.end(), text.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return text;
}

void dropEmptyNets(Circuit& circuit) {
    std::erase_if(circuit.nets, [](const auto& net) { return net.second.empty(); });
}

void removePinsWhere(Circuit& circuit, const auto& doomed) {
    for (auto& [name, pins] : circuit.nets) std::erase_if(pins, doomed);
    dropEmptyNets(circuit);
}

std::string badRef(const Circuit& circuit, const std::string& ref, const std::string& keep) {
    if (ref.empty()) return "A part needs a reference, such as R1.";
    if (ref.find('.') != std::string::npos || ref.find(' ') != std::string::npos)
        return "A reference cannot hold a '.' or a space: " + ref;
    if (ref != keep && circuit.parts.count(ref)) return ref + " is already in the circuit.";
    return {};
}

}  // namespace

CircuitEdit addCircuitPart(const Circuit& circuit, const std::string& ref,
                           const CircuitPart& part) {
    if (auto problem = badRef(circuit, ref, {}); !problem.empty()) return problem;
    Circuit out = circuit;
    out.parts[ref] = part;
    return out;
}

CircuitEdit removeCircuitPart(const Circuit& circuit, const std::string& ref) {
    if (!circuit.parts.count(ref)) return ref + " is not in the circuit.";
    Circuit out = circuit;
    out.parts.erase(ref);
    removePinsWhere(out, [&](const PinRef& pin) { return pin.ref == ref; });
    return out;
}

CircuitEdit editCircuitPart(const Circuit& circuit, const std::string& ref,
                            const std::string& newRef, const CircuitPart& part) {
    if (!circuit.parts.count(ref)) return ref + " is not in the circuit.";
    if (auto problem = badRef(circuit, newRef, ref); !problem.empty()) return problem;
    Circuit out = circuit;
    out.parts.erase(ref);
    out.parts[newRef] = part;
    // A declared pin list says which pins exist; pins it no longer names leave their nets.
    if (!part.pins.empty()) {
        removePinsWhere(out, [&](const PinRef& pin) {
            return pin.ref == ref &&
                   std::find(part.pins.begin(), part.pins.end(), pin.pin) == part.pins.end();
        });
    }
    for (auto& [name, pins] : out.nets)
        for (PinRef& pin : pins)
            if (pin.ref == ref) pin.ref = newRef;
    return out;
}

CircuitEdit assignPinToNet(const Circuit& circuit, const PinRef& pin, const std::string& net) {
    if (pin.ref.empty() || pin.pin.empty()) return "A pin needs a part and a pin name.";
    if (circuit.netOf(pin) == net) return circuit;
    Circuit out = circuit;
    removePinsWhere(out, [&](const PinRef& p) { return p == pin; });
    if (!net.empty()) out.nets[net].push_back(pin);
    return out;
}

CircuitEdit addNet(const Circuit& circuit, const std::string& name,
                   const std::vector<PinRef>& pins) {
    if (name.empty()) return "A net needs a name.";
    if (circuit.nets.count(name))
        return "There is already a net " + name + "; give its pins their net in the Parts tab.";
    if (pins.empty()) return "A net needs at least one pin, such as R1.2.";
    Circuit out = circuit;
    removePinsWhere(out, [&](const PinRef& p) {
        return std::find(pins.begin(), pins.end(), p) != pins.end();
    });
    auto& added = out.nets[name];
    for (const PinRef& pin : pins)
        if (std::find(added.begin(), added.end(), pin) == added.end()) added.push_back(pin);
    return out;
}

CircuitEdit renameNet(const Circuit& circuit, const std::string& from, const std::string& to) {
    if (!circuit.nets.count(from)) return "There is no net " + from + ".";
    if (to.empty()) return "A net needs a name.";
    if (to == from) return circuit;
    if (circuit.nets.count(to))
        return "There is already a net " + to + "; merge the two nets to join them.";
    Circuit out = circuit;
    auto node = out.nets.extract(from);
    node.key() = to;
    out.nets.insert(std::move(node));
    return out;
}

CircuitEdit mergeNets(const Circuit& circuit, const std::string& from, const std::string& into) {
    if (!circuit.nets.count(from)) return "There is no net " + from + ".";
    if (!circuit.nets.count(into)) return "There is no net " + into + ".";
    if (from == into) return "Choose two different nets to merge.";
    Circuit out = circuit;
    auto& target = out.nets[into];
    for (const PinRef& pin : out.nets[from])
        if (std::find(target.begin(), target.end(), pin) == target.end()) target.push_back(pin);
    out.nets.erase(from);
    return out;
}

std::vector<std::string> netNameSuggestions(const Circuit& circuit, const std::string& typed,
                                            std::size_t limit) {
    const std::string key = lowered(typed);
    std::vector<std::string> starting, containing;
    for (const auto& [name, pins] : circuit.nets) {
        const auto at = lowered(name).find(key);
        if (at == 0)
            starting.push_back(name);
        else if (at != std::string::npos)
            containing.push_back(name);
    }
    starting.insert(starting.end(), containing.begin(), containing.end());
    if (starting.size() > limit) starting.resize(limit);
    return starting;
}

std::vector<std::string> pinsOfPart(const Circuit& circuit, const std::string& ref) {
    const auto part = circuit.parts.find(ref);
    if (part != circuit.parts.end() && !part->second.pins.empty()) return part->second.pins;
    std::set<std::string> named;
    for (const auto& [name, pins] : circuit.nets)
        for (const PinRef& pin : pins)
            if (pin.ref == ref) named.insert(pin.pin);
    return {named.begin(), named.end()};
}

}  // namespace netcheck
