// The range of each net's voltage over the parts' tolerances: every corner when few parameters
// vary, else Monte Carlo with a fixed seed (the same board always gives the same ranges).
#pragma once

#include <cstdint>
#include <string>
#include <vector>

#include "netcheck/voltage/dc_deck.hpp"

namespace netcheck {

struct ToleranceOptions {
    int maxCornerParameters = 8;  ///< up to 2^8 = 256 corner runs
    int monteCarloRuns = 200;
    std::uint32_t seed = 1;
    double toleranceScale = 1.0;  ///< widens (>1) or narrows every spread, for what-if and tests
};

struct VoltageRange {
    double low = 0;
    double high = 0;
};

struct ToleranceResult {
    /// "corners: 16 runs (4 parameters at their limits)" or "Monte Carlo: 200 runs, seed 1, ...".
    std::string method;
    std::vector<VoltageRange> ranges;  ///< per net; always contains the nominal voltage
    int runs = 0;
    int failedRuns = 0;  ///< runs where ngspice found no operating point (left out of the ranges)
};

/// The values of the varied parameters for every run; parameter i of part p is drawn from its
/// [low, high] (scaled about the nominal by options.toleranceScale).
std::vector<DeckValues> toleranceRuns(const DcDeck& deck, const ToleranceOptions& options,
                                      std::string& method);

/// Runs every set of values and takes the lowest and highest voltage of each net, together with
/// `nominal`.
ToleranceResult analyseTolerances(const DcDeck& deck, const std::vector<double>& nominal,
                                  const ToleranceOptions& options);

}  // namespace netcheck
