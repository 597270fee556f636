// What the repair search compares between a board and its edited copy: the errors, each by an
// identity that survives edits (type, part, nets, hole), and the bare-link contacts (private to
// the repair planner).
#pragma once

#include <string>
#include <vector>

#include "netcheck/check/check_report.hpp"

namespace netcheck {

struct BoardHealth {
    std::vector<std::string> errors;    ///< sorted; one per error, repeats kept
    std::vector<std::string> contacts;  ///< sorted: link-over-lead and links-touch warnings

    explicit BoardHealth(const CheckReport& report);
    int errorCount() const { return static_cast<int>(errors.size()); }
    /// True when `after` has no error and no contact that this board lacks.
    bool noWorseThan(const BoardHealth& before) const;
};

/// "short|BASE1,COL2", "reversed-part|C2", "shared-hole|F7": equal for the same fault on two
/// versions of a board.
std::string findingKey(const Finding& finding);

}  // namespace netcheck
