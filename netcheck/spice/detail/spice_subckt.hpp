// Subcircuit definitions (.subckt ... .ends) and their expansion into parts. Private to the
// importer.
#pragma once

#include <map>
#include <set>
#include <string>
#include <unordered_map>
#include <vector>

#include "netcheck/file/read_limits.hpp"
#include "netcheck/spice/detail/spice_deck.hpp"
#include "netcheck/spice/detail/spice_elements.hpp"

namespace netcheck::spice {

/// The top level of a deck or one subcircuit definition, with its elements already read.
struct Scope {
    std::string name;                   ///< as written; empty for the top level
    std::vector<std::string> ports;     ///< as written
    int line = 0;                       ///< the .subckt line
    std::vector<ElementPart> elements;  ///< in deck order
    /// Lower-case element name -> its line: finds a duplicate name in one look-up.
    std::unordered_map<std::string, int> elementLines;
    std::vector<DeckLine> annotations;  ///< `*@` lines inside this scope
};

/// Every scope of a deck. Nested definitions are hoisted: subcircuit names are global.
struct DeckScopes {
    Scope top;
    std::map<std::string, Scope> subckts;  ///< by lower-case name
    std::set<std::string> globals;         ///< lower-case node names from `.global`
};

/// Splits the deck into scopes, reads every element and notes ignored dot-commands. Throws
/// DeckError for an unterminated `.subckt`, a stray `.ends`, duplicate names in a scope, and
/// more elements than `limits.maxParts` (counted as they are read, before any other work).
DeckScopes collectScopes(const Deck& deck, const ReadContext& context, bool sourcesAsParts,
                         const ReadLimits& limits);

/// Checks every subcircuit call: the subcircuit exists, the node count matches its ports, and no
/// definition calls itself, directly or through others (up to `limits.maxDepth` deep).
void checkCalls(const DeckScopes& scopes, const ReadLimits& limits);

/// Node keys (lower-case, hierarchical "x1.n1", ground "0") and the name each is shown with.
struct NodeNames {
    std::map<std::string, std::string> shown;  ///< key -> first spelling ("X1.n1")
    std::map<std::string, int> lines;          ///< key -> line where first seen
};

/// The top scope's parts with nodes replaced by node keys. With `flatten`, calls of subcircuits
/// that have elements are replaced by those elements (refs "X1.R3", local nodes "X1.n"); calls of
/// empty subcircuits stay parts. Each scope's annotations are applied to its own parts.
std::vector<ElementPart> expandTop(const DeckScopes& scopes, bool flatten,
                                   const ReadContext& context, const ReadLimits& limits,
                                   NodeNames& names,
                                   std::map<std::string, std::string>& netOverrides);

}  // namespace netcheck::spice
