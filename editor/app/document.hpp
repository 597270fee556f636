// The open document: the board, where it lives on disk, its undo history and its check result.
#pragma once

#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "netcheck/board.hpp"
#include "netcheck/check.hpp"
#include "netcheck/check_report.hpp"
#include "netcheck/connectivity.hpp"
#include "netcheck/edit/history.hpp"

namespace stripsmith {

/// Owns the Board. Every change goes through perform()/undo()/redo(), which re-run the check.
class Document {
public:
    Document();

    const netcheck::Board& board() const { return board_; }
    const std::string& path() const { return path_; }
    bool readOnly() const { return readOnly_; }
    bool modified() const { return history_.isModified() || unsavedImport_; }
    const netcheck::edit::History& history() const { return history_; }

    /// Applies a command and records it for undo. Ignored (returns false) when read-only.
    bool perform(std::unique_ptr<netcheck::edit::Command> command, int mergeKey = 0);
    void endMerge() { history_.endMerge(); }
    bool undo();
    bool redo();

    /// Starts over with `board` (after New/Open/restore). `unsaved` marks a restored recovery.
    void reset(netcheck::Board board, std::string path, bool readOnly = false, bool unsaved = false);
    /// Records that the document now lives at `path` and matches it.
    void markSaved(std::string path);

    /// Check result and traced copper for the present board.
    const netcheck::CheckReport& report() const { return report_; }
    const netcheck::Connectivity& connectivity() const { return *connectivity_; }
    /// Every island's holes and pins, indexed by island id.
    const std::vector<netcheck::Island>& islands() const { return islands_; }
    /// Bumped on every change, so views can cache derived data.
    unsigned revision() const { return revision_; }

    /// Net of the intended circuit carried by an island (by any of its pins), if known.
    std::optional<std::string> netOfIsland(int island) const;

private:
    void recheck();

    netcheck::Board board_;
    std::string path_;
    bool readOnly_ = false;
    bool unsavedImport_ = false;
    netcheck::edit::History history_;
    netcheck::Checker checker_;  // re-checks on every edit in the same memory
    netcheck::CheckReport report_;
    std::unique_ptr<netcheck::Connectivity> connectivity_;
    std::vector<netcheck::Island> islands_;
    unsigned revision_ = 0;
};

}  // namespace stripsmith
