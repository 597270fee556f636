// Our own comment annotations (`*@pot`, `*@kind`, `*@pins`, `*@value`, `*@ref`, `*@net`), which
// say what a SPICE deck cannot: pots, electrolytics, LEDs, board refs. See README.md. Private.
#pragma once

#include <functional>
#include <map>
#include <string>
#include <vector>

#include "netcheck/spice/detail/spice_deck.hpp"
#include "netcheck/spice/detail/spice_elements.hpp"

namespace netcheck::spice {

/// Maps a node name as written in the annotation's scope to its node key.
using NodeResolver = std::function<std::string(const std::string&)>;

/// Applies one scope's annotations to that scope's parts (pots first, then the rest in order).
/// `netOverrides` (node key -> net name) is null inside subcircuits, where `*@net` is refused.
/// Throws DeckError for a malformed annotation or one naming an element that does not exist.
void applyAnnotations(std::vector<ElementPart>& parts, const std::vector<DeckLine>& annotations,
                      const ReadContext& context, const NodeResolver& resolve,
                      std::map<std::string, std::string>* netOverrides);

/// The annotation words, for messages and the exporter.
inline constexpr const char* kAnnotationWords = "pot, kind, pins, value, ref, net";

}  // namespace netcheck::spice
