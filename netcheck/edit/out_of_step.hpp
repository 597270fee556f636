// The error an edit command raises when the board is not in the state it was built against.
#pragma once

#include <stdexcept>
#include <string>
#include <string_view>

namespace netcheck::edit {

/// A command was applied or reverted on a board that does not hold what the command expects
/// (a programming error in the caller: commands must be undone in the reverse order they were
/// done). Raised before anything is changed, so the board stays consistent.
class OutOfStepError : public std::logic_error {
public:
    explicit OutOfStepError(const std::string& what) : std::logic_error(what) {}
};

/// Throws OutOfStepError("<label>: <what>") unless `ok`.
void requireInStep(bool ok, std::string_view label, std::string_view what);

}  // namespace netcheck::edit
