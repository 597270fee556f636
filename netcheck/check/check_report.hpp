// The result of checking a board: findings in the trade's words, each located on the board.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/check/connectivity.hpp"

namespace netcheck {

enum class Severity { Error, Warning };

/// One thing wrong (or worth a look). `type` is one of: short, open, missing-part, extra-part,
/// pin-mismatch, value-mismatch, reversed-part, shared-hole, pin-on-cut (errors); value-differs,
/// pot-reversed, dangling-lead, trim (warnings). Fields not used by a type stay empty.
struct Finding {
    std::string type;
    Severity severity = Severity::Error;
    std::string message;                      ///< one line, with hole names
    std::string ref;                          ///< part concerned
    std::string net;                          ///< open: the net
    std::vector<std::string> nets;            ///< short: every net in the island, sorted
    std::vector<std::vector<PinRef>> pieces;  ///< open: pins of each piece
    std::optional<Hole> hole;                 ///< shared-hole, pin-on-cut, dangling-lead
    std::vector<Hole> path;                   ///< short: shortest copper path between two nets
    std::vector<Hole> holes;                  ///< every hole worth highlighting
    std::optional<Cut> suggestedCut;          ///< short: one cut that separates without opening
    std::vector<Link> suggestedLinks;         ///< open: links that join the pieces
    std::string fix;                          ///< the suggested fix in words (may be empty)
};

struct CheckReport {
    bool hasCircuit = false;
    std::vector<Finding> errors;
    std::vector<Finding> warnings;
    std::vector<Island> islands;  ///< without a circuit: islands that hold at least one pin
    bool ok() const { return errors.empty(); }
};

}  // namespace netcheck
