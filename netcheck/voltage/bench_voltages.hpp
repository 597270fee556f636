// What the meter should read: the expected DC voltage of every net of a board's circuit, its range
// over the parts' tolerances, and the hole to probe it at. For extra-low-voltage circuits only;
// the figures are estimates.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/model/circuit.hpp"
#include "netcheck/voltage/part_models.hpp"
#include "netcheck/voltage/settled_nets.hpp"
#include "netcheck/voltage/tolerance_analysis.hpp"

namespace netcheck {

struct BenchOptions {
    DcModelOptions models;
    ToleranceOptions tolerance;
    bool ranges = true;  ///< run the tolerance analysis
};

/// One net: the reading of a correct board, black lead on ground.
struct NetReading {
    std::string net;
    NetState state = NetState::Known;
    double nominal = 0;
    double low = 0;   ///< the range over tolerances (equal to nominal when not analysed)
    double high = 0;
    std::string probe;  ///< hole ("C1") or lug ("BT1.+"); empty when not on the board
    std::string why;    ///< why there is no number, for Unknown and NoDcPath
    bool split = false;  ///< the net's pins are on several islands of the board
    std::vector<PinRef> pins;
};

struct BenchVoltages {
    std::string ground;  ///< the net taken as 0 V (the black lead)
    std::string method;  ///< how the ranges were found
    std::vector<NetReading> nets;  ///< ground first, then in the circuit's net order
    std::vector<std::string> models;  ///< "Q1: NPN, generic ..." for every semiconductor and source
    std::vector<std::string> notes;   ///< parts left out or open, assumptions, board mismatch
    int failedRuns = 0;
};

struct BenchVoltagesResult {
    std::optional<BenchVoltages> value;
    std::string error;  ///< the circuit cannot be simulated (no supply, no ground, ngspice failed)
};

/// The circuit is `circuit`, else the board's own, else the board's copper taken as the circuit.
BenchVoltagesResult computeBenchVoltages(const Board& board, const Circuit* circuit,
                                         const BenchOptions& options);

/// The cautions every place that shows these figures repeats.
const std::vector<std::string>& benchCautions();

}  // namespace netcheck
