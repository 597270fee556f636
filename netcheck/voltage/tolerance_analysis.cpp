// Corners give the exact extremes when each voltage moves one way with each parameter (true of
// resistor networks and of most biasing); with more parameters than that allows, Monte Carlo
// draws each parameter uniformly within its limits, so the range is what that many sample boards
// gave, a little narrower than the worst case.
#include "netcheck/voltage/tolerance_analysis.hpp"

#include <algorithm>
#include <cmath>
#include <random>

#include "netcheck/voltage/ngspice_session.hpp"

namespace netcheck {

namespace {

/// A varied parameter's place in DeckValues and its scaled limits.
struct Varied {
    std::size_t part = 0;
    std::size_t index = 0;
    double low = 0;
    double high = 0;
    bool logScale = false;
};

std::vector<Varied> variedParameters(const DcDeck& deck, double scale) {
    std::vector<Varied> varied;
    for (std::size_t p = 0; p < deck.parts.size(); ++p) {
        const DcModel& model = deck.parts[p].model;
        if (model.role != DcModel::Role::Simulated) continue;
        for (std::size_t i = 0; i < model.parameters.size(); ++i) {
            const SpreadParameter& parameter = model.parameters[i];
            if (parameter.low == parameter.high) continue;
            Varied v{p, i, parameter.low, parameter.high, parameter.logScale};
            if (parameter.logScale && parameter.low > 0 && parameter.nominal > 0) {
                v.low = parameter.nominal * std::pow(parameter.low / parameter.nominal, scale);
                v.high = parameter.nominal * std::pow(parameter.high / parameter.nominal, scale);
            } else {
                v.low = parameter.nominal - (parameter.nominal - parameter.low) * scale;
                v.high = parameter.nominal + (parameter.high - parameter.nominal) * scale;
            }
            varied.push_back(v);
        }
    }
    return varied;
}

/// Uniform in [0, 1) from the generator's raw output: std::uniform_real_distribution may differ
/// between standard libraries, mt19937's sequence may not.
double unitDraw(std::mt19937& generator) {
    return static_cast<double>(generator()) / 4294967296.0;
}

double between(const Varied& v, double unit) {
    if (v.logScale && v.low > 0) return v.low * std::pow(v.high / v.low, unit);
    return v.low + (v.high - v.low) * unit;
}

}  // namespace

std::vector<DeckValues> toleranceRuns(const DcDeck& deck, const ToleranceOptions& options,
                                      std::string& method) {
    const std::vector<Varied> varied = variedParameters(deck, options.toleranceScale);
    const DeckValues nominal = deck.nominal();
    std::vector<DeckValues> runs;
    if (varied.empty()) {
        method = "none: no part has a tolerance";
        return runs;
    }
    if (static_cast<int>(varied.size()) <= options.maxCornerParameters) {
        const std::size_t corners = std::size_t{1} << varied.size();
        for (std::size_t corner = 0; corner < corners; ++corner) {
            DeckValues values = nominal;
            for (std::size_t k = 0; k < varied.size(); ++k) {
                const Varied& v = varied[k];
                values[v.part][v.index] = ((corner >> k) & 1U) != 0 ? v.high : v.low;
            }
            runs.push_back(std::move(values));
        }
        method = "corners: " + std::to_string(corners) + " runs, every combination of " +
                 std::to_string(varied.size()) + " parameters at their limits";
        return runs;
    }
    std::mt19937 generator(options.seed);
    for (int run = 0; run < options.monteCarloRuns; ++run) {
        DeckValues values = nominal;
        for (const Varied& v : varied) values[v.part][v.index] = between(v, unitDraw(generator));
        runs.push_back(std::move(values));
    }
    method = "Monte Carlo: " + std::to_string(options.monteCarloRuns) + " runs, seed " +
             std::to_string(options.seed) + ", " + std::to_string(varied.size()) +
             " parameters each uniform within its limits (the range is what those sample boards "
             "gave, a little inside the worst case)";
    return runs;
}

ToleranceResult analyseTolerances(const DcDeck& deck, const std::vector<double>& nominal,
                                  const ToleranceOptions& options) {
    ToleranceResult result;
    for (const double volts : nominal) result.ranges.push_back({volts, volts});
    const std::vector<DeckValues> runs = toleranceRuns(deck, options, result.method);
    std::vector<std::vector<std::string>> decks;
    decks.reserve(runs.size());
    for (const DeckValues& values : runs) decks.push_back(deck.lines(values));
    const std::vector<OperatingPoint> points = runOperatingPoints(decks, deck.nodes());
    for (const OperatingPoint& point : points) {
        if (!point.ok) {
            ++result.failedRuns;
            continue;
        }
        for (std::size_t net = 0; net < point.volts.size() && net < result.ranges.size(); ++net) {
            result.ranges[net].low = std::min(result.ranges[net].low, point.volts[net]);
            result.ranges[net].high = std::max(result.ranges[net].high, point.volts[net]);
        }
    }
    result.runs = static_cast<int>(runs.size());
    return result;
}

}  // namespace netcheck
