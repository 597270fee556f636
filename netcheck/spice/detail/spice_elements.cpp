// Terminal order per element letter (ngspice manual, element chapters; SPICE3 rules):
// R, C, L n+ n-; D anode cathode model; Q collector base emitter [substrate] model; J drain gate
// source model; M drain gate source bulk model; X nodes... subcircuit; V, I n+ n- [DC] value.
#include "netcheck/spice/detail/spice_elements.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdio>
#include <utility>

#include "netcheck/model/part_kinds.hpp"
#include "netcheck/model/value.hpp"
#include "netcheck/spice/spice_number.hpp"

namespace netcheck::spice {

namespace {

std::string inQuotes(std::string_view text) {
    return "\"" + std::string(text) + "\"";
}

void requireFields(const DeckLine& line, std::size_t count, std::string_view usage) {
    if (line.fields.size() >= count) return;
    throw DeckError{line.line, "element " + line.fields.front().text + " has too few fields (" +
                                   std::string(usage) + ")"};
}

/// Node fields must be plain names, not `name=value` parameters.
std::vector<std::string> nodesOf(const DeckLine& line, std::size_t count, std::string_view usage) {
    std::vector<std::string> nodes;
    for (std::size_t i = 1; i <= count; ++i) {
        if (line.fields[i].key) {
            throw DeckError{line.line, "element " + line.fields.front().text +
                                           " has a parameter where a node should be (" +
                                           std::string(usage) + ")"};
        }
        nodes.push_back(line.fields[i].text);
    }
    return nodes;
}

/// The value field of R, C, L: the field after the nodes, or `r=`/`c=`/`l=` given by name.
std::optional<std::string> valueField(const DeckLine& line, char letter) {
    const auto& f = line.fields;
    if (f.size() > 3 && !f[3].key) return f[3].text;
    const std::string names[] = {std::string(1, letter), letter == 'r'   ? "resistance"
                                                         : letter == 'c' ? "capacitance"
                                                                         : "inductance"};
    for (std::size_t i = 3; i + 1 < f.size(); ++i) {
        if (!f[i].key) continue;
        const std::string key = lower(f[i].text);
        if (key == names[0] || key == names[1]) return f[i + 1].text;
    }
    return std::nullopt;
}

/// Reads a number field, warning on IEC-style codes that SPICE reads differently.
std::optional<double> readNumber(const std::string& field, int line, const ReadContext& context) {
    if (!looksNumeric(field)) return std::nullopt;
    const auto number = parseSpiceNumber(field);
    if (!number) throw DeckError{line, "bad number " + inQuotes(field)};
    if (number->iecReading && *number->iecReading != number->value) {
        char spice[40];
        std::snprintf(spice, sizeof spice, "%g", number->value);
        context.note(line, "value " + inQuotes(field) + " reads as " + spice +
                               " under SPICE rules (" + formatSpiceNumber(*number->iecReading) +
                               " if meant as IEC 60062 code " + upper(field) + ")");
    }
    return number->value;
}

ElementPart twoTerminal(const DeckLine& line, char letter, const ReadContext& context) {
    requireFields(line, 4,
                  std::string(1, static_cast<char>(std::toupper(letter))) + "name n+ n- value");
    ElementPart part;
    part.kind = defaultKind(letter);
    part.nodes = nodesOf(line, 2, "n+ n- value");
    const auto field = valueField(line, letter);
    if (!field) throw DeckError{line.line, "element " + line.fields.front().text + " has no value"};
    part.magnitude = readNumber(*field, line.line, context);
    if (part.magnitude) {
        part.value = canonicalValue(*part.magnitude, part.kind);
    } else {
        part.value = *field;
        context.note(line.line, line.fields.front().text + ": value " + inQuotes(*field) +
                                    " is not a number; kept as text");
    }
    return part;
}

/// Q c b e [substrate] model: the fourth node is a substrate unless that field names a `.model`
/// (ngspice decides the same way), or, with no `.model` for either, a number (area) follows it.
ElementPart bipolar(const DeckLine& line, const ReadContext& context) {
    requireFields(line, 5, "Qname collector base emitter [substrate] model");
    const auto& f = line.fields;
    bool substrate = false;
    if (f.size() > 5 && !f[4].key && !f[5].key) {
        const bool fourthIsModel = context.modelNames.contains(lower(f[4].text));
        const bool fifthIsModel = context.modelNames.contains(lower(f[5].text));
        substrate = !fourthIsModel && (fifthIsModel || !looksNumeric(f[5].text));
    }
    ElementPart part;
    part.kind = "bjt";
    part.nodes = nodesOf(line, substrate ? 4 : 3, "collector base emitter [substrate] model");
    part.value = f[part.nodes.size() + 1].text;
    return part;
}

ElementPart withModel(const DeckLine& line, std::size_t nodeCount, std::string_view usage) {
    requireFields(line, nodeCount + 2, usage);
    ElementPart part;
    part.nodes = nodesOf(line, nodeCount, usage);
    part.value = line.fields[nodeCount + 1].text;
    if (line.fields[nodeCount + 1].key) {
        throw DeckError{line.line, "element " + line.fields.front().text +
                                       " has a parameter where the model name should be (" +
                                       std::string(usage) + ")"};
    }
    return part;
}

/// X n1 n2 ... subckt [params: a=1 ...]: the last plain field before any parameter is the name.
ElementPart subcircuitCall(const DeckLine& line) {
    std::size_t end = line.fields.size();
    for (std::size_t i = 1; i < line.fields.size(); ++i) {
        if (line.fields[i].key || lower(line.fields[i].text) == "params:") {
            end = i;
            break;
        }
    }
    if (end < 2) {
        throw DeckError{line.line, "element " + line.fields.front().text +
                                       " has no subcircuit name (Xname nodes... subcircuit)"};
    }
    ElementPart part;
    part.kind = "ic";
    for (std::size_t i = 1; i + 1 < end; ++i) part.nodes.push_back(line.fields[i].text);
    part.subckt = line.fields[end - 1].text;
    part.value = part.subckt;
    return part;
}

/// V, I n+ n- [DC] value ...: the DC value if there is one, else the rest as text.
ElementPart source(const DeckLine& line, const ReadContext& context) {
    requireFields(line, 3, "name n+ n- [DC] value");
    ElementPart part;
    part.kind = "battery";
    part.nodes = nodesOf(line, 2, "n+ n- [DC] value");
    std::size_t at = 3;
    if (at < line.fields.size() && lower(line.fields[at].text) == "dc") ++at;
    if (at < line.fields.size()) {
        part.magnitude = readNumber(line.fields[at].text, line.line, context);
        if (part.magnitude) {
            char text[40];
            std::snprintf(text, sizeof text, "%gV", *part.magnitude);
            part.value = text;
        }
    }
    return part;
}

}  // namespace

void ReadContext::note(int line, const std::string& text) const {
    if (notes != nullptr) notes->push_back(fileName + ":" + std::to_string(line) + ": " + text);
}

std::string defaultKind(char letter) {
    switch (std::tolower(static_cast<unsigned char>(letter))) {
        case 'r':
            return "resistor";
        case 'c':
            return "capacitor";
        case 'l':
            return "inductor";
        case 'd':
            return "diode";
        case 'q':
            return "bjt";
        case 'j':
            return "jfet";
        case 'm':
            return "mosfet";
        case 'v':
            return "battery";
        default:
            return "ic";
    }
}

char elementLetterFor(std::string_view kind) {
    for (char letter : std::string_view("RCLDQJM")) {
        if (defaultKind(letter) == kind) return letter;
    }
    return 'X';
}

std::vector<std::string> defaultPins(char letter, std::size_t nodeCount) {
    switch (std::tolower(static_cast<unsigned char>(letter))) {
        case 'r':
        case 'c':
        case 'l':
            return {"1", "2"};
        case 'd':
            return {"A", "K"};
        case 'q':
            return nodeCount == 4 ? std::vector<std::string>{"C", "B", "E", "S"}
                                  : std::vector<std::string>{"C", "B", "E"};
        case 'j':
            return {"D", "G", "S"};
        case 'm':
            return nodeCount == 4 ? std::vector<std::string>{"D", "G", "S", "B"}
                                  : std::vector<std::string>{"D", "G", "S"};
        case 'v':
        case 'i':
            return {"+", "-"};
        default:
            return {};
    }
}

std::vector<std::string> pinsForKind(const std::vector<std::string>& pins, std::string_view oldKind,
                                     std::string_view newKind) {
    const PartKind* from = findPartKind(oldKind);
    const PartKind* to = findPartKind(newKind);
    if (from == nullptr || to == nullptr || from->pins.size() != pins.size() ||
        to->pins.size() != pins.size() ||
        !std::equal(pins.begin(), pins.end(), from->pins.begin())) {
        return pins;
    }
    return std::vector<std::string>(to->pins.begin(), to->pins.end());
}

std::string canonicalValue(double magnitude, std::string_view kind) {
    const auto readsBack = [magnitude](const std::string& text) {
        const auto q = parseQuantity(text);
        return q && std::fabs(q->magnitude - magnitude) <= 1e-9 * std::fabs(magnitude);
    };
    const std::string iec = formatIec(magnitude, kind != "resistor" && kind != "pot");
    if (readsBack(iec)) return iec;
    // Outside the IEC code's range: board-file SI prefixes (M mega, m milli), then plain digits.
    static constexpr std::pair<const char*, double> kPrefixes[] = {
        {"T", 1e12}, {"G", 1e9},  {"M", 1e6},  {"k", 1e3},  {"", 1},
        {"m", 1e-3}, {"u", 1e-6}, {"n", 1e-9}, {"p", 1e-12}};
    for (const auto& [prefix, scale] : kPrefixes) {
        char text[48];
        std::snprintf(text, sizeof text, "%.12g%s", magnitude / scale, prefix);
        if (readsBack(text)) return text;
    }
    char text[48];
    std::snprintf(text, sizeof text, "%.12g", magnitude);
    return text;
}

std::string refForName(std::string_view name) {
    if (name.size() > 2 && (name[0] == 'x' || name[0] == 'X') &&
        std::isalpha(static_cast<unsigned char>(name[1])) != 0) {
        return upper(name.substr(1));
    }
    return upper(name);
}

std::optional<ElementPart> readElement(const DeckLine& line, const ReadContext& context,
                                       bool sourcesAsParts) {
    const std::string& name = line.fields.front().text;
    const char letter = static_cast<char>(std::tolower(static_cast<unsigned char>(name.front())));
    std::optional<ElementPart> part;
    switch (letter) {
        case 'r':
        case 'c':
        case 'l':
            part = twoTerminal(line, letter, context);
            break;
        case 'd':
            part = withModel(line, 2, "Dname anode cathode model");
            part->kind = "diode";
            break;
        case 'q':
            part = bipolar(line, context);
            break;
        case 'j':
            part = withModel(line, 3, "Jname drain gate source model");
            part->kind = "jfet";
            break;
        case 'm':
            part = withModel(line, 4, "Mname drain gate source bulk model");
            part->kind = "mosfet";
            if (lower(part->nodes[3]) == lower(part->nodes[2])) {
                // A discrete MOSFET has its bulk joined to the source inside: three leads.
                part->nodes.pop_back();
            }
            break;
        case 'x':
            part = subcircuitCall(line);
            break;
        case 'v':
        case 'i': {
            ElementPart supply = source(line, context);
            if (!sourcesAsParts || letter == 'i') {
                context.note(line.line, name + " (" + supply.nodes[0] + " to " + supply.nodes[1] +
                                            ") ignored: " +
                                            (letter == 'i' ? "current sources have no board part"
                                                           : "sources are not read as parts"));
                return std::nullopt;
            }
            context.note(line.line, name + " read as an off-board supply (battery, + on " +
                                        supply.nodes[0] + ")");
            part = std::move(supply);
            break;
        }
        default:
            context.note(line.line, name + " ignored: SPICE element letter " +
                                        std::string(1, static_cast<char>(std::toupper(letter))) +
                                        " has no board part");
            return std::nullopt;
    }
    part->name = name;
    part->ref = refForName(name);
    part->line = line.line;
    if (part->pins.empty()) part->pins = defaultPins(letter, part->nodes.size());
    return part;
}

}  // namespace netcheck::spice
