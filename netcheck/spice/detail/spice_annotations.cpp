// Annotations are comment lines to every SPICE program (`*` in column 1), so a deck that carries
// them still simulates unchanged.
#include "netcheck/spice/detail/spice_annotations.hpp"

#include <algorithm>
#include <cmath>

#include "netcheck/model/part_kinds.hpp"
#include "netcheck/model/value.hpp"

namespace netcheck::spice {

namespace {

std::string word(const DeckLine& line) {
    return line.fields.front().text;
}

[[noreturn]] void fail(const DeckLine& line, const std::string& message) {
    throw DeckError{line.line, "*@" + word(line) + ": " + message};
}

void requireArgs(const DeckLine& line, std::size_t count, std::string_view usage) {
    if (line.fields.size() < count + 1) fail(line, "expected " + std::string(usage));
}

std::vector<ElementPart>::iterator findPart(std::vector<ElementPart>& parts, const DeckLine& line,
                                            const std::string& name) {
    const auto found = std::find_if(parts.begin(), parts.end(), [&](const ElementPart& p) {
        return lower(p.name) == lower(name);
    });
    if (found != parts.end()) return found;
    // Or the ref the element reads as (XU1 -> U1).
    const auto byRef = std::find_if(parts.begin(), parts.end(), [&](const ElementPart& p) {
        return lower(p.ref) == lower(name);
    });
    if (byRef != parts.end()) return byRef;
    fail(line, "no element " + name + " here");
}

/// Text after the first word of an annotation's argument text ("R1 4.7 kOhm" -> "4.7 kOhm").
std::string afterFirstWord(const std::string& rest) {
    const std::size_t gap = rest.find_first_of(" \t");
    if (gap == std::string::npos) return "";
    const std::size_t start = rest.find_first_not_of(" \t", gap);
    return start == std::string::npos ? "" : rest.substr(start);
}

/// `*@pot VR1 = R5 R6 [taper=log]`: R5 runs from lug 1 to the wiper, R6 from the wiper to lug 3.
void makePot(std::vector<ElementPart>& parts, const DeckLine& line) {
    requireArgs(line, 3, "*@pot NAME = R_LUG1_TO_WIPER R_WIPER_TO_LUG3 [taper=log]");
    const std::string name = line.fields[1].text;
    std::string taper;
    for (std::size_t i = 4; i < line.fields.size(); ++i) {
        if (line.fields[i].key && lower(line.fields[i].text) == "taper" &&
            i + 1 < line.fields.size()) {
            taper = line.fields[++i].text;
        } else {
            fail(line, "unexpected \"" + line.fields[i].text + "\" (only taper=... may follow)");
        }
    }
    const ElementPart first = *findPart(parts, line, line.fields[2].text);
    const ElementPart second = *findPart(parts, line, line.fields[3].text);
    for (const ElementPart* r : {&first, &second}) {
        if (r->kind != "resistor") fail(line, r->name + " is not a resistor");
        if (!r->magnitude) fail(line, r->name + " has no numeric value");
    }
    if (lower(first.name) == lower(second.name)) fail(line, "the two resistors must differ");
    std::vector<std::string> shared;
    for (const std::string& node : first.nodes) {
        if (std::find(second.nodes.begin(), second.nodes.end(), node) != second.nodes.end()) {
            shared.push_back(node);
        }
    }
    if (shared.size() != 1 || first.nodes[0] == first.nodes[1] ||
        second.nodes[0] == second.nodes[1]) {
        fail(line, first.name + " and " + second.name + " must share exactly one node (the wiper)");
    }
    const std::string& wiper = shared.front();
    ElementPart pot;
    pot.name = name;
    pot.ref = upper(name);
    pot.kind = "pot";
    pot.magnitude = *first.magnitude + *second.magnitude;
    pot.value = canonicalValue(*pot.magnitude, "pot") + (taper.empty() ? "" : " " + taper);
    pot.pins = {"1", "2", "3"};
    pot.nodes = {first.nodes[0] == wiper ? first.nodes[1] : first.nodes[0], wiper,
                 second.nodes[0] == wiper ? second.nodes[1] : second.nodes[0]};
    pot.line = line.line;
    if (std::any_of(parts.begin(), parts.end(),
                    [&](const ElementPart& p) { return lower(p.name) == lower(name); })) {
        fail(line, "the name " + name + " is already an element");
    }
    const auto at = findPart(parts, line, first.name);
    *at = pot;
    parts.erase(findPart(parts, line, second.name));
}

/// `*@kind NAME kind`: two-terminal parts take the new kind's pin names (C -> electrolytic: +, -).
void setKind(ElementPart& part, const DeckLine& line, const ReadContext& context) {
    const std::string kind = line.fields[2].text;
    const PartKind* known = findPartKind(kind);
    if (known == nullptr) {
        context.note(line.line, "*@kind: \"" + kind + "\" is not a known part kind; " + part.name +
                                    " is kept as a generic part");
    }
    part.pins = pinsForKind(part.pins, part.kind, kind);
    if (part.magnitude && known != nullptr && known->quantity) {
        part.value = canonicalValue(*part.magnitude, kind);
    }
    part.kind = kind;
}

void setValue(ElementPart& part, const DeckLine& line, const ReadContext& context) {
    const std::string text = afterFirstWord(line.rest);
    if (part.magnitude) {
        const auto quantity = parseQuantity(text);
        const double tolerance = 1e-9 * std::max(1.0, std::abs(*part.magnitude));
        if (!quantity || std::abs(quantity->magnitude - *part.magnitude) > tolerance) {
            context.note(line.line, "*@value \"" + text + "\" for " + part.name +
                                        " does not match its value " + part.value +
                                        " in the deck; the deck's value is kept");
            return;
        }
    }
    part.value = text;
}

void applyOne(std::vector<ElementPart>& parts, const DeckLine& line, const ReadContext& context,
              const NodeResolver& resolve, std::map<std::string, std::string>* netOverrides) {
    const std::string what = word(line);
    if (what == "kind") {
        requireArgs(line, 2, "*@kind NAME kind");
        setKind(*findPart(parts, line, line.fields[1].text), line, context);
    } else if (what == "pins") {
        requireArgs(line, 2, "*@pins NAME pin pin ...");
        ElementPart& part = *findPart(parts, line, line.fields[1].text);
        if (line.fields.size() - 2 != part.nodes.size()) {
            fail(line, part.name + " has " + std::to_string(part.nodes.size()) + " pins, " +
                           std::to_string(line.fields.size() - 2) + " names given");
        }
        part.pins.clear();
        for (std::size_t i = 2; i < line.fields.size(); ++i)
            part.pins.push_back(line.fields[i].text);
    } else if (what == "value") {
        requireArgs(line, 1, "*@value NAME text");
        setValue(*findPart(parts, line, line.fields[1].text), line, context);
    } else if (what == "ref") {
        requireArgs(line, 2, "*@ref NAME REF");
        findPart(parts, line, line.fields[1].text)->ref = line.fields[2].text;
    } else if (what == "net") {
        requireArgs(line, 1, "*@net NODE [name]");
        if (netOverrides == nullptr) fail(line, "only allowed outside .subckt definitions");
        (*netOverrides)[resolve(line.fields[1].text)] = afterFirstWord(line.rest);
    } else if (what != "pot") {
        context.note(line.line, "*@" + what + " is not an annotation we know (" + kAnnotationWords +
                                    "); ignored");
    }
}

}  // namespace

void applyAnnotations(std::vector<ElementPart>& parts, const std::vector<DeckLine>& annotations,
                      const ReadContext& context, const NodeResolver& resolve,
                      std::map<std::string, std::string>* netOverrides) {
    for (const DeckLine& line : annotations) {
        if (word(line) == "pot") makePot(parts, line);
    }
    for (const DeckLine& line : annotations) applyOne(parts, line, context, resolve, netOverrides);
}

}  // namespace netcheck::spice
