// Turning a finding's suggested fix into a command, and where on the board a finding lies.
#pragma once

#include <memory>
#include <optional>

#include <imgui.h>

#include "netcheck/check/check_report.hpp"
#include "netcheck/edit/command.hpp"

namespace stripsmith {

/// The suggested cut (if not already there) or the suggested links, as one undoable command;
/// nullptr when the finding suggests nothing that can be applied.
std::unique_ptr<netcheck::edit::Command> fixCommand(const netcheck::Board& board,
                                                   const netcheck::Finding& finding);

/// A board point (board units) to centre the view on for a finding.
std::optional<ImVec2> findingLocation(const netcheck::Board& board, const netcheck::Finding& finding);

}  // namespace stripsmith
