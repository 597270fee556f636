// Export: every element line is followed by the annotations that make the importer give back
// exactly this part; a plain resistor needs none.
#include "netcheck/spice/spice_export.hpp"

#include <algorithm>
#include <cctype>
#include <map>
#include <optional>
#include <set>
#include <vector>

#include "netcheck/model/part_kinds.hpp"
#include "netcheck/model/value.hpp"
#include "netcheck/spice/detail/spice_deck.hpp"
#include "netcheck/spice/detail/spice_elements.hpp"
#include "netcheck/spice/spice_number.hpp"

namespace netcheck {

namespace {

using spice::lower;

bool safeChar(char c) {
    return std::isalnum(static_cast<unsigned char>(c)) != 0 || c == '_';
}

std::string sanitize(std::string_view text) {
    std::string out;
    for (char c : text) out += safeChar(c) ? c : '_';
    return out.empty() ? "_" : out;
}

bool isSafe(std::string_view text) {
    return !text.empty() && std::all_of(text.begin(), text.end(), safeChar);
}

std::string join(const std::vector<std::string>& items) {
    std::string out;
    for (const std::string& item : items) out += " " + item;
    return out;
}

/// SPICE letter usable for a part, or 'X' (empty subcircuit call).
char letterFor(const CircuitPart& part, std::size_t pinCount) {
    const std::string& kind = part.kind;
    const bool hasQuantity = parseQuantity(part.value).has_value();
    if ((kind == "resistor" || kind == "inductor") && pinCount == 2 && hasQuantity) {
        return kind == "resistor" ? 'R' : 'L';
    }
    if ((kind == "capacitor" || kind == "electrolytic") && pinCount == 2 && hasQuantity) return 'C';
    if ((kind == "diode" || kind == "led" || kind == "zener") && pinCount == 2) return 'D';
    if (kind == "bjt" && (pinCount == 3 || pinCount == 4)) return 'Q';
    if (kind == "jfet" && pinCount == 3) return 'J';
    if (kind == "mosfet" && (pinCount == 3 || pinCount == 4)) return 'M';
    return 'X';
}

class DeckWriter {
public:
    explicit DeckWriter(const Circuit& circuit) : circuit_(circuit) {}

    std::string write(std::string_view title) {
        assignNodes();
        for (const auto& [ref, part] : circuit_.parts) writePart(ref, part);
        std::string deck;
        std::string heading(title.empty() ? "circuit" : title);
        std::replace(heading.begin(), heading.end(), '\n', ' ');
        std::replace(heading.begin(), heading.end(), '\r', ' ');
        deck += heading + "\n";
        deck +=
            "* Written by Stripsmith. Lines starting *@ are Stripsmith annotations (pots, part\n";
        deck += "* kinds, board refs); SPICE programs read them as comments.\n";
        for (const std::string& line : netLines_) deck += line + "\n";
        for (const auto& [key, model] : models_)
            deck += ".model " + model.first + " " + model.second + "\n";
        for (const std::string& line : stubLines_) deck += line + "\n";
        for (const std::string& line : body_) deck += line + "\n";
        deck += ".end\n";
        return deck;
    }

private:
    /// A fresh name whose lower-case form is not in `used`.
    static std::string unique(std::string base, std::set<std::string>& used) {
        std::string name = base;
        for (int n = 2; used.contains(lower(name)); ++n) name = base + "_" + std::to_string(n);
        used.insert(lower(name));
        return name;
    }

    void assignNodes() {
        usedNodes_ = {"0", "gnd"};
        for (const auto& [net, pins] : circuit_.nets) {
            std::string node;
            if (net == "GND") {
                node = "0";
            } else {
                node = unique(sanitize(net), usedNodes_);
                if (node != net) netLines_.push_back("*@net " + node + " " + net);
            }
            for (const PinRef& pin : pins) pinNodes_[pin] = node;
        }
    }

    std::string nodeOf(const std::string& ref, const std::string& pin) {
        if (const auto found = pinNodes_.find(PinRef{ref, pin}); found != pinNodes_.end()) {
            return found->second;
        }
        // An unconnected pin: a node of its own, which `*@net NODE` (no name) leaves out of the
        // nets again on import.
        const std::string node = unique("nc_" + sanitize(ref) + "_" + sanitize(pin), usedNodes_);
        netLines_.push_back("*@net " + node);
        return node;
    }

    std::vector<std::string> pinsOf(const std::string& ref, const CircuitPart& part) const {
        if (!part.pins.empty()) return part.pins;
        std::vector<std::string> pins;
        for (const auto& [net, members] : circuit_.nets) {
            for (const PinRef& pin : members) {
                if (pin.ref == ref) pins.push_back(pin.pin);
            }
        }
        return pins;
    }

    std::string elementName(char letter, const std::string& ref) {
        std::string base = sanitize(ref);
        if (std::tolower(static_cast<unsigned char>(base.front())) != std::tolower(letter)) {
            base = std::string(1, letter) + base;
        }
        return unique(base, usedNames_);
    }

    std::string modelName(char letter, const std::string& value) {
        static const std::map<char, std::string> kTypes{
            {'D', "D"}, {'Q', "NPN"}, {'J', "NJF"}, {'M', "NMOS"}};
        std::string base = isSafe(value) ? value : sanitize(value.empty() ? "model" : value);
        // A model name must not be a node name (Q's fourth field is read as one or the other).
        for (int n = 2;; ++n) {
            const std::string key = lower(base);
            const auto found = models_.find(key);
            const bool clash =
                usedNodes_.contains(key) ||
                (found != models_.end() && found->second.second != kTypes.at(letter));
            if (!clash) break;
            base = sanitize(value.empty() ? "model" : value) + "_" + std::to_string(n);
        }
        models_.emplace(lower(base), std::make_pair(base, kTypes.at(letter)));
        return base;
    }

    std::string stubName(const CircuitPart& part, const std::vector<std::string>& ports) {
        std::string base = isSafe(part.value) ? part.value : "stub_" + sanitize(part.kind);
        for (int n = 2;; ++n) {
            const auto found = stubs_.find(lower(base));
            if (found == stubs_.end()) break;
            if (found->second == ports) return base;
            base = (isSafe(part.value) ? part.value : "stub_" + sanitize(part.kind)) + "_" +
                   std::to_string(n);
        }
        stubs_.emplace(lower(base), ports);
        stubLines_.push_back(".subckt " + base + join(ports));
        stubLines_.push_back(".ends " + base);
        return base;
    }

    static std::vector<std::string> portsFor(const std::vector<std::string>& pins) {
        std::set<std::string> seen{"0", "gnd"};
        bool usable = true;
        for (const std::string& pin : pins)
            usable = usable && isSafe(pin) && seen.insert(lower(pin)).second;
        if (usable) return pins;
        std::vector<std::string> ports;
        for (std::size_t i = 1; i <= pins.size(); ++i) ports.push_back("p" + std::to_string(i));
        return ports;
    }

    /// Annotations that turn what the importer reads from the element line into `part`.
    void annotate(const std::string& name, const std::string& ref, const CircuitPart& part,
                  const std::string& readKind, std::vector<std::string> readPins,
                  const std::optional<double>& magnitude, std::string readValue) {
        if (part.kind != readKind) {
            body_.push_back("*@kind " + name + " " + part.kind);
            readPins = spice::pinsForKind(readPins, readKind, part.kind);
            const PartKind* kind = findPartKind(part.kind);
            if (magnitude && kind != nullptr && kind->quantity) {
                readValue = spice::canonicalValue(*magnitude, part.kind);
            }
        }
        if (readPins != part.pins) body_.push_back("*@pins " + name + join(part.pins));
        if (readValue != part.value) {
            body_.push_back("*@value " + name + (part.value.empty() ? "" : " " + part.value));
        }
        if (spice::refForName(name) != ref) body_.push_back("*@ref " + name + " " + ref);
    }

    bool writePot(const std::string& ref, const CircuitPart& part,
                  const std::vector<std::string>& pins, const std::vector<std::string>& nodes) {
        const auto quantity = parseQuantity(part.value);
        if (part.kind != "pot" || pins != std::vector<std::string>{"1", "2", "3"} || !quantity ||
            quantity->magnitude <= 0 || nodes[0] == nodes[1] || nodes[1] == nodes[2] ||
            nodes[0] == nodes[2] || !isSafe(ref)) {
            return false;
        }
        if (usedNames_.contains(lower(ref))) return false;
        usedNames_.insert(lower(ref));
        const std::string half = spice::formatSpiceNumber(quantity->magnitude / 2, 12);
        const std::string a = elementName('R', ref + "_A");
        const std::string b = elementName('R', ref + "_B");
        body_.push_back(a + " " + nodes[0] + " " + nodes[1] + " " + half);
        body_.push_back(b + " " + nodes[1] + " " + nodes[2] + " " + half);
        body_.push_back("*@pot " + ref + " = " + a + " " + b +
                        (quantity->taper.empty() ? "" : " taper=" + quantity->taper));
        const double sum = spice::parseSpiceNumber(half)->value * 2;
        const std::string readValue = spice::canonicalValue(sum, "pot") +
                                      (quantity->taper.empty() ? "" : " " + quantity->taper);
        if (readValue != part.value) body_.push_back("*@value " + ref + " " + part.value);
        if (spice::upper(ref) != ref) body_.push_back("*@ref " + ref + " " + ref);
        return true;
    }

    void writePart(const std::string& ref, const CircuitPart& part) {
        CircuitPart declared = part;
        declared.pins = pinsOf(ref, part);
        std::vector<std::string> nodes;
        for (const std::string& pin : declared.pins) nodes.push_back(nodeOf(ref, pin));
        if (writePot(ref, declared, declared.pins, nodes)) return;
        char letter = letterFor(declared, declared.pins.size());
        // The importer reads a bulk joined to the source as a three-lead MOSFET.
        if (letter == 'M' && nodes.size() == 4 && nodes[3] == nodes[2]) letter = 'X';
        const std::string name = elementName(letter, ref);
        std::optional<double> magnitude;
        std::string readValue;
        std::string line = name + join(nodes);
        std::vector<std::string> readPins = spice::defaultPins(letter, nodes.size());
        if (letter == 'R' || letter == 'C' || letter == 'L') {
            const std::string number =
                spice::formatSpiceNumber(parseQuantity(part.value)->magnitude, 12);
            magnitude = spice::parseSpiceNumber(number)->value;
            readValue = spice::canonicalValue(*magnitude, spice::defaultKind(letter));
            line += " " + number;
        } else if (letter == 'X') {
            const std::vector<std::string> ports = portsFor(declared.pins);
            readValue = stubName(declared, ports);
            readPins = ports;
            line += " " + readValue;
        } else {
            readValue = modelName(letter, part.value);
            if (letter == 'M' && nodes.size() == 3) line += " " + nodes[2];  // bulk on the source
            line += " " + readValue;
        }
        body_.push_back(line);
        annotate(name, ref, declared, spice::defaultKind(letter), readPins, magnitude, readValue);
    }

    const Circuit& circuit_;
    std::map<PinRef, std::string> pinNodes_;
    std::set<std::string> usedNodes_;
    std::set<std::string> usedNames_;
    std::map<std::string, std::pair<std::string, std::string>> models_;  // key -> (name, type)
    std::map<std::string, std::vector<std::string>> stubs_;              // key -> ports
    std::vector<std::string> netLines_;
    std::vector<std::string> stubLines_;
    std::vector<std::string> body_;
};

}  // namespace

std::string exportSpice(const Circuit& circuit, std::string_view title) {
    return DeckWriter(circuit).write(title);
}

}  // namespace netcheck
