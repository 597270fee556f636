// Circuits written in a line or two for the bench-voltage tests.
#pragma once

#include <initializer_list>
#include <string>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/voltage/bench_voltages.hpp"

namespace voltage_support {

struct PartLine {
    std::string ref, kind, value;
    std::vector<std::string> pins;
    nlohmann::json model = nullptr;  ///< the part's "spice_model" settings, if any
};

struct NetLine {
    std::string name;
    std::vector<std::string> pins;  ///< "R1.2"
};

inline netcheck::Circuit circuitOf(std::initializer_list<PartLine> parts,
                                   std::initializer_list<NetLine> nets) {
    netcheck::Circuit circuit;
    for (const PartLine& line : parts) {
        netcheck::CircuitPart part{line.kind, line.value, line.pins, nlohmann::json::object()};
        if (!line.model.is_null()) part.extra["spice_model"] = line.model;
        circuit.parts[line.ref] = part;
    }
    for (const NetLine& net : nets) {
        for (const std::string& pin : net.pins) {
            circuit.nets[net.name].push_back(*netcheck::PinRef::parse(pin));
        }
    }
    return circuit;
}

/// A blank board holding only the circuit (no probe holes: the tests here look at voltages).
inline netcheck::Board boardWith(const netcheck::Circuit& circuit) {
    netcheck::Board board;
    board.circuit = circuit;
    return board;
}

inline const netcheck::NetReading& net(const netcheck::BenchVoltages& voltages,
                                       const std::string& name) {
    for (const netcheck::NetReading& reading : voltages.nets) {
        if (reading.net == name) return reading;
    }
    throw std::runtime_error("no net " + name);
}

}  // namespace voltage_support
