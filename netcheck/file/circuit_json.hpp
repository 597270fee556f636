// The circuit object, shared by board files (embedded "circuit") and circuit files. Private.
#pragma once

#include "netcheck/model/circuit.hpp"
#include "netcheck/file/detail/json_reader.hpp"

namespace netcheck {

/// Reads {"parts": {ref: {kind, value, pins?}}, "nets": {name: ["R1.1", ...]}} at the reader's
/// current path. A pin may be in one net only.
Circuit readCircuitObject(JsonReader& reader, const Json& object, const ReadLimits& limits);

/// The circuit object in file form: parts, nets, then unknown keys.
Json circuitToJson(const Circuit& circuit);

}  // namespace netcheck
