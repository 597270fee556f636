// The bench voltages as netcheck prints them: a text table or JSON.
#pragma once

#include <string>

#include <nlohmann/json.hpp>

#include "netcheck/voltage/bench_voltages.hpp"

namespace netcheck {

/// "4.50 V" style: two decimals, or three below 1 V.
std::string formatVolts(double volts);

/// Net, probe point, nominal, range; then notes, models and the cautions.
std::string formatBenchVoltagesText(const BenchVoltages& voltages);

/// {"ground", "method", "nets": [{"net", "state", "nominal", "min", "max", "probe", ...}],
/// "models", "notes", "cautions"}; volts as numbers, null where there is no figure.
nlohmann::json benchVoltagesJson(const BenchVoltages& voltages);

}  // namespace netcheck
