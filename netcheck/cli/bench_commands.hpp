// netcheck's bench commands: --voltages (what the meter should read) and --jfet-bias.
#pragma once

#include <optional>
#include <string>
#include <vector>

namespace netcheck_cli {

/// Runs the command when `args` ask for --voltages or --jfet-bias and returns its exit status
/// (0 done, 2 unusable input); nullopt for every other command line.
std::optional<int> runBenchCommand(const std::vector<std::string>& args);

}  // namespace netcheck_cli
