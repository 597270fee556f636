// The open document: the board, where it lives on disk, its undo history and its check result.
#pragma once

#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "netcheck/model/board.hpp"
#include "netcheck/check/check.hpp"
#include "netcheck/check/check_report.hpp"
#include "netcheck/check/connectivity.hpp"
#include "netcheck/edit/history.hpp"
#include "netcheck/repair/repair_plan.hpp"

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
    /// The repair plan for the present board (empty when it has no errors); the report's errors
    /// carry the step that clears them.
    const netcheck::RepairPlan& plan() const { return plan_; }
    const netcheck::Connectivity& connectivity() const { return checker_.copper(); }
    /// Holes and pins of island `id`; null when there is no such island.
    const netcheck::Island* island(int id) const;
    /// Bumped on every change, so views can cache derived data.
    unsigned revision() const { return revision_; }

    /// Net of the intended circuit carried by an island (by any of its pins), if known.
    std::optional<std::string> netOfIsland(int island) const;

private:
    void recheck();
    // Island details are worked out for the island asked for (the one under the pointer, asked
    // every frame) and kept until it or the board changes: listing every island on each edit
    // would cost a large board more than its check.
    struct IslandDetails {
        unsigned revision = 0;
        netcheck::Island island{-1, {}, {}};
        std::optional<std::string> net;
    };
    const IslandDetails* details(int id) const;

    netcheck::Board board_;
    std::string path_;
    bool readOnly_ = false;
    bool unsavedImport_ = false;
    netcheck::edit::History history_;
    netcheck::Checker checker_;  // re-checks on every edit in the same memory
    netcheck::CheckReport report_;
    netcheck::RepairPlan plan_;
    unsigned revision_ = 0;
    mutable IslandDetails details_;
};

}  // namespace stripsmith
