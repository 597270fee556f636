// ngspice's shared library, run in this process. It keeps global state, so every call goes
// through one mutex: callers on any thread may use it, one run at a time.
#pragma once

#include <string>
#include <vector>

namespace netcheck {

/// The node voltages of one DC operating point, or why there are none.
struct OperatingPoint {
    bool ok = false;
    std::string error;          ///< ngspice's own error lines when !ok
    std::vector<double> volts;  ///< per requested node, in order; "0" reads 0, NaN for a
                                ///< node no element of the deck touches
};

/// Loads `deck` (title line first, ".end" last), runs "op" and reads each of `nodes` (lower case,
/// as the deck names them). Frees the circuit and its results afterwards.
OperatingPoint runOperatingPoint(const std::vector<std::string>& deck,
                                 const std::vector<std::string>& nodes);

/// Several operating points in a row under one hold of the lock (a tolerance analysis).
std::vector<OperatingPoint> runOperatingPoints(const std::vector<std::vector<std::string>>& decks,
                                               const std::vector<std::string>& nodes);

}  // namespace netcheck
