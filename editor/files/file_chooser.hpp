// Our own file chooser in ImGui: type a path, or browse folders and pick a file.
#pragma once

#include <functional>
#include <string>
#include <vector>

namespace stripsmith {

/// One chooser dialog at a time. open() shows it; draw() each frame returns when a path is picked.
class FileChooser {
public:
    enum class Purpose { OpenBoard, SaveBoard, OpenCircuit, ExportSheet, ExportCircuit };

    /// Shows the chooser in `folder` (or the current folder), with `name` typed in.
    void open(Purpose purpose, std::string folder, std::string name = {});
    bool isOpen() const { return open_; }
    Purpose purpose() const { return purpose_; }

    /// Draws the modal; returns true on the frame a path was chosen (then `chosen()` holds it).
    bool draw();
    const std::string& chosen() const { return chosen_; }

    /// Entries of a folder for browsing: sub-folders (with a trailing '/') first, then files whose
    /// name ends with one of `suffixes` (all files when empty); both sorted, hidden entries skipped.
    static std::vector<std::string> listFolder(const std::string& folder,
                                               const std::vector<std::string>& suffixes);

    /// `typed` read relative to `folder` unless absolute; "~" expands to $HOME.
    static std::string resolve(const std::string& folder, const std::string& typed);

private:
    void refresh();
    bool accept();

    bool open_ = false;
    bool justOpened_ = false;
    Purpose purpose_ = Purpose::OpenBoard;
    std::string folder_;
    std::string typed_;
    std::string chosen_;
    std::string error_;
    std::vector<std::string> entries_;
};

}  // namespace stripsmith
