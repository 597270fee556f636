// Reading and writing the intended circuit: {"parts": {...}, "nets": {...}}.
#include <map>
#include <unordered_map>

#include "netcheck/file/board_file.hpp"
#include "netcheck/file/circuit_json.hpp"
#include "netcheck/model/name_rules.hpp"

namespace netcheck {

namespace {

CircuitPart readCircuitPart(JsonReader& reader, const Json& object) {
    reader.expectObject(object);
    CircuitPart part;
    part.kind = reader.textMember(object, "kind", true);
    part.value = reader.textMember(object, "value", false);
    if (const Json* pins = JsonReader::find(object, "pins")) {
        const auto step = reader.enter("pins");
        part.pins = reader.asStringArray(*pins);
        for (std::size_t i = 0; i < part.pins.size(); ++i) {
            const auto at = reader.enter(i);
            reader.expectPinName(part.pins[i], "pin name");
        }
    }
    part.extra = reader.extras(object, {"kind", "value", "pins"});
    return part;
}

void readParts(JsonReader& reader, const Json& parts, const ReadLimits& limits, Circuit& circuit) {
    reader.expectObject(parts);
    if (parts.size() > limits.maxParts) {
        reader.fail("more than " + std::to_string(limits.maxParts) + " parts");
    }
    std::unordered_map<std::string, std::string> spelling;  // ref identity -> ref as written
    for (const auto& [ref, object] : parts.items()) {
        const auto step = reader.enter(ref);
        reader.expectRef(ref);
        const auto [first, fresh] = spelling.emplace(refIdentity(ref), ref);
        if (!fresh) {
            reader.fail("duplicate ref " + inQuotes(ref) + " (also " + inQuotes(first->second) +
                        "; refs that differ only in case are one part)");
        }
        circuit.parts[ref] = readCircuitPart(reader, object);
    }
}

void readNets(JsonReader& reader, const Json& nets, Circuit& circuit) {
    reader.expectObject(nets);
    std::map<PinRef, std::string> netOfPin;
    for (const auto& [name, list] : nets.items()) {
        const auto step = reader.enter(name);
        if (name.empty()) reader.fail("net name is empty");
        reader.expectArray(list);
        std::vector<PinRef>& pins = circuit.nets[name];
        for (std::size_t i = 0; i < list.size(); ++i) {
            const auto at = reader.enter(i);
            const std::string text = reader.asString(list[i]);
            const auto pin = PinRef::parse(text);
            if (!pin) reader.fail("pin " + inQuotes(text) + " is not written REF.PIN (like R1.2)");
            reader.expectRef(pin->ref);
            const auto [it, fresh] = netOfPin.emplace(*pin, name);
            if (!fresh) {
                reader.fail(it->second == name
                                ? text + " is listed twice in net " + name
                                : text + " is in nets " + it->second + " and " + name);
            }
            pins.push_back(*pin);
        }
    }
}

}  // namespace

Circuit readCircuitObject(JsonReader& reader, const Json& object, const ReadLimits& limits) {
    reader.expectObject(object);
    Circuit circuit;
    if (const Json* parts = JsonReader::find(object, "parts")) {
        const auto step = reader.enter("parts");
        readParts(reader, *parts, limits, circuit);
    }
    if (const Json* nets = JsonReader::find(object, "nets")) {
        const auto step = reader.enter("nets");
        readNets(reader, *nets, circuit);
    }
    circuit.extra = reader.extras(object, {"parts", "nets"});
    return circuit;
}

Json circuitToJson(const Circuit& circuit) {
    Json out = Json::object();
    Json parts = Json::object();
    for (const auto& [ref, part] : circuit.parts) {
        Json entry = Json::object();
        entry["kind"] = part.kind;
        entry["value"] = part.value;
        if (!part.pins.empty()) entry["pins"] = part.pins;
        appendExtras(entry, part.extra);
        appendMember(parts, ref, std::move(entry));
    }
    Json nets = Json::object();
    for (const auto& [name, pins] : circuit.nets) {
        Json list = Json::array();
        for (const PinRef& pin : pins) list.push_back(pin.name());
        appendMember(nets, name, std::move(list));
    }
    out["parts"] = std::move(parts);
    out["nets"] = std::move(nets);
    appendExtras(out, circuit.extra);
    return out;
}

ReadResult<Circuit> readCircuit(std::string_view text, std::string_view fileName,
                                const ReadLimits& limits) {
    return readDocument<Circuit>(text, fileName, limits, [&](JsonReader& reader, const Json& root) {
        return readCircuitObject(reader, root, limits);
    });
}

std::string writeCircuit(const Circuit& circuit) {
    return dumpDocument(circuitToJson(circuit));
}

}  // namespace netcheck
