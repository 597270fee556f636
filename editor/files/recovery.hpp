// Autosave to recovery copies that belong to the editor that wrote them, and finding the copies of
// editors that ended without closing properly.
//
// Every running editor owns a slot in the recovery folder, "editor-<pid>-<tag>": a ".lock" file it
// holds locked with flock(2) for its whole life (the kernel drops the lock when the process ends,
// even by SIGKILL), a ".info.json" naming the file it has open, and, while it has unsaved changes,
// a ".board.json" with the autosaved board. A slot whose lock can be taken belongs to an editor
// that has ended: its copy is offered back. Whoever holds a slot's lock is the only one to write,
// offer or delete its copy, so one editor never removes another's, and two editors starting at
// once never offer the same copy.
#pragma once

#include <optional>
#include <string>
#include <utility>
#include <vector>

namespace stripsmith {

/// The recovery folder: $STRIPSMITH_RECOVERY_DIR, else $XDG_STATE_HOME/stripsmith/recovery, else
/// ~/.local/state/stripsmith/recovery.
std::string recoveryFolder();

/// Seconds between autosaves: $STRIPSMITH_AUTOSAVE_SECONDS when a positive number, else 60.
double autosaveInterval();

/// What a recovery copy holds besides the board: where the board was last saved.
struct RecoveryFile {
    std::string boardText;     ///< the autosaved board, board file format
    std::string originalPath;  ///< empty for a board never saved
};

/// A slot of the recovery folder with its lock held: this editor's own, or one taken over from an
/// editor that ended. Moving keeps the lock; destroying releases it and keeps the files.
class RecoverySlot {
public:
    RecoverySlot() = default;  ///< no slot: autosave off
    RecoverySlot(RecoverySlot&& other) noexcept;
    RecoverySlot& operator=(RecoverySlot&& other) noexcept;
    RecoverySlot(const RecoverySlot&) = delete;
    RecoverySlot& operator=(const RecoverySlot&) = delete;
    ~RecoverySlot();

    /// A new slot of this editor in `folder` (created if missing), or the reason there is none.
    static std::optional<RecoverySlot> create(const std::string& folder, std::string& error);

    bool active() const { return lock_ >= 0; }
    /// The slot's files without their endings: "<folder>/editor-<pid>-<tag>".
    const std::string& base() const { return base_; }
    /// Writes the autosaved board and where it was last saved (each atomically).
    std::optional<std::string> write(const RecoveryFile& recovery);
    /// Records the file this editor has open, for other editors to see (editorsWithOpen).
    void setOpenFile(const std::string& path);
    /// Removes the autosaved board (after a save); the slot stays this editor's.
    void clearCopy();
    /// Removes the slot's files, then releases it: a clean exit, or Discard of a left copy.
    void remove();

    /// The slot "<folder>/<name>" when its owner has ended (its lock can be taken), else nullopt.
    static std::optional<RecoverySlot> takeOver(const std::string& folder, const std::string& name);
    /// The copy in the slot, if it holds one.
    std::optional<RecoveryFile> read() const;

private:
    RecoverySlot(std::string base, int lock) : base_(std::move(base)), lock_(lock) {}

    std::string base_;  // folder/editor-<pid>-<tag>, without an ending
    int lock_ = -1;
    std::optional<std::string> openFile_;
};

/// The copy left by an editor that ended without closing properly, its slot locked so that no
/// other editor offers it meanwhile.
struct LeftCopy {
    RecoverySlot slot;
    RecoveryFile file;
};

/// A copy left in `folder` by an editor that is no longer running, if any (a copy kept by an
/// earlier version, "recovery.board.json", counts too). Slots of ended editors that hold no copy
/// are tidied away on the way.
std::optional<LeftCopy> findLeftCopy(const std::string& folder);

/// Process ids of the other running editors that have `path` open.
std::vector<long> editorsWithOpen(const std::string& folder, const std::string& path);

}  // namespace stripsmith
