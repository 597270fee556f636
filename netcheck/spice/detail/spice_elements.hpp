// SPICE element lines read as parts: terminal order, pin names, kinds and values. Private to the
// importer.
#pragma once

#include <optional>
#include <set>
#include <string>
#include <string_view>
#include <vector>

#include "netcheck/spice/detail/spice_deck.hpp"

namespace netcheck::spice {

/// Where notes go and what the element reader needs to know about the deck.
struct ReadContext {
    std::string fileName;
    std::vector<std::string>* notes = nullptr;
    std::set<std::string> modelNames;  ///< lower-case names from `.model` lines
    /// Adds "file:line: text" to the notes.
    void note(int line, const std::string& text) const;
};

/// A deck element as a part. In a flattened subcircuit `name` is the path ("X1.R3").
struct ElementPart {
    std::string name;                 ///< element name as written, or the path of names
    std::string ref;                  ///< reference designator for the circuit
    std::string kind;                 ///< part kind (part_kinds.hpp)
    std::string value;                ///< canonical value text
    std::optional<double> magnitude;  ///< numeric value (R, C, L, sources)
    std::vector<std::string> pins;    ///< pin names, one per node
    std::vector<std::string> nodes;   ///< node names as written (node keys after expansion)
    std::string subckt;               ///< X: the subcircuit name as written
    int line = 0;
};

/// Reads one element line. Nullopt for element letters with no board part (noted). Throws
/// DeckError for too few fields or a malformed number.
std::optional<ElementPart> readElement(const DeckLine& line, const ReadContext& context,
                                       bool sourcesAsParts);

/// The element letter a part kind is written with (R, C, L, D, Q, J, M), or 'X' for the rest.
char elementLetterFor(std::string_view kind);

/// Pin names the importer gives an element with `nodeCount` nodes (for X: empty, the subcircuit
/// port names are used).
std::vector<std::string> defaultPins(char letter, std::size_t nodeCount);

/// Kind the importer gives an element letter ("resistor" for R ...; "ic" for X).
std::string defaultKind(char letter);

/// Pin names after a part with `pins`, read as `oldKind`, is declared `newKind`: when the pins
/// are the old kind's default names and the new kind has as many, they take the new kind's names
/// (capacitor 1, 2 -> electrolytic +, -); otherwise they stay (subcircuit port names).
std::vector<std::string> pinsForKind(const std::vector<std::string>& pins, std::string_view oldKind,
                                     std::string_view newKind);

/// The value text for a magnitude of a part kind: IEC 60062 code as board files write it.
std::string canonicalValue(double magnitude, std::string_view kind);

/// Reference for an element name: upper-case; an X name followed by a letter-led ref (XU1) is that
/// ref (U1), as schematic programs write subcircuit parts.
std::string refForName(std::string_view name);

}  // namespace netcheck::spice
