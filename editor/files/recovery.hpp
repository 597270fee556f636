// Autosave to a recovery file, and finding it again after a crash.
#pragma once

#include <optional>
#include <string>

namespace stripsmith {

/// The recovery folder: $STRIPSMITH_RECOVERY_DIR, else $XDG_STATE_HOME/stripsmith/recovery, else
/// ~/.local/state/stripsmith/recovery.
std::string recoveryFolder();

/// Seconds between autosaves: $STRIPSMITH_AUTOSAVE_SECONDS when a positive number, else 60.
double autosaveInterval();

/// What a recovery file holds besides the board: where the board was last saved.
struct RecoveryFile {
    std::string boardText;     ///< the autosaved board, board file format
    std::string originalPath;  ///< empty for a board never saved
};

/// Writes the recovery file (atomically). Returns an error message on failure.
std::optional<std::string> writeRecovery(const std::string& folder, const RecoveryFile& recovery);

/// The recovery file left by a session that did not end cleanly, if any.
std::optional<RecoveryFile> findRecovery(const std::string& folder);

/// Removes the recovery file (clean exit, after a save, or when the maker discards it).
void clearRecovery(const std::string& folder);

}  // namespace stripsmith
