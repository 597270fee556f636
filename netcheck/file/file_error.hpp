// A problem with an input file, located precisely enough for a maker to fix it.
#pragma once

#include <string>

namespace netcheck {

/// Where and what is wrong. `line`/`column` are 1-based (0 = unknown); `path` is a JSON path such
/// as `parts[3].pins.2` (empty when the text itself could not be parsed).
struct FileError {
    std::string file;
    int line = 0;
    int column = 0;
    std::string path;
    std::string message;
    /// Set when the file was written by a newer program version than this one reads; the editor
    /// may offer to open such a file read-only instead of treating it as damaged.
    bool newerVersion = false;
    /// "board.json:12:5: parts[3].pins.2: hole "Z99" is outside a 10x24 board", with control
    /// characters escaped (escapeControls) so that it is safe to print.
    std::string describe() const;
};

}  // namespace netcheck
