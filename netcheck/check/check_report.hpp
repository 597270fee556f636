// The result of checking a board: findings in the trade's words, each located on the board.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "netcheck/check/connectivity.hpp"
#include "netcheck/check/finding_types.hpp"
#include "netcheck/model/board.hpp"

namespace netcheck {

/// One thing wrong (or worth a look). Fields not used by a type stay empty.
struct Finding {
    FindingType type = FindingType::Short;
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
    std::optional<Cut> cutToRemove;           ///< open: an existing cut whose removal mends it
    std::string fix;                          ///< the suggested fix in words (may be empty)
    int repairStep = -1;  ///< the repair plan's step (0-based) that clears it; -1: none

    /// A finding of `type` saying `message`, with the holes to highlight.
    static Finding of(FindingType type, std::string message, std::vector<Hole> holes = {}) {
        Finding finding;
        finding.type = type;
        finding.message = std::move(message);
        finding.holes = std::move(holes);
        return finding;
    }

    Severity severity() const { return findingTypeInfo(type).severity; }
    std::string_view id() const { return findingId(type); }
};

struct CheckReport {
    bool hasCircuit = false;
    std::vector<Finding> errors;
    std::vector<Finding> warnings;
    std::vector<Island> islands;  ///< without a circuit: islands that hold at least one pin
    bool ok() const { return errors.empty(); }
};

}  // namespace netcheck
