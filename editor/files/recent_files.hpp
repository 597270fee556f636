// The list of recently opened boards, kept in the config folder.
#pragma once

#include <string>
#include <vector>

namespace stripsmith {

class RecentFiles {
public:
    /// Reads the list from `file` (one path a line); missing file = empty list.
    void load(std::string file);
    /// Puts `path` first (once), keeps at most 10, and writes the list back.
    void add(const std::string& path);
    const std::vector<std::string>& paths() const { return paths_; }

    /// $XDG_CONFIG_HOME/stripsmith/recent.txt, else ~/.config/stripsmith/recent.txt.
    static std::string defaultFile();

private:
    std::string file_;
    std::vector<std::string> paths_;
};

}  // namespace stripsmith
