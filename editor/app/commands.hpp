// The one way panels and tools change the board: they hand over a command, which is performed on
// the document (so undo is exact) with the outcome in the status line. A handle onto the editor's
// document and status line, cheap to copy; panels get this, never the document to change.
#pragma once

#include <memory>
#include <string>

#include "editor/app/document.hpp"
#include "editor/app/test_log.hpp"

namespace stripsmith {

/// Merge keys: commands of one gesture share a key so the gesture is one undo step.
inline constexpr int kMergeMove = 1;
inline constexpr int kMergeStretch = 2;
inline constexpr int kMergeArrowMove = 3;

class Commands {
public:
    Commands(Document& doc, std::string& status, const TestLog& log)
        : doc_(doc), status_(status), log_(log) {}

    /// Performs a command and reports it (or why it failed) in the status line.
    bool perform(std::unique_ptr<netcheck::edit::Command> command, int mergeKey = 0) const;
    bool undo() const;
    bool redo() const;
    /// Ends the present gesture: the next command is a step of its own.
    void endMerge() const { doc_.endMerge(); }
    /// Message for the status bar.
    void say(std::string message) const;

private:
    Document& doc_;
    std::string& status_;
    const TestLog& log_;
};

}  // namespace stripsmith
