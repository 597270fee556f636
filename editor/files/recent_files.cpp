#include "editor/files/recent_files.hpp"

#include <algorithm>
#include <cstdlib>
#include <filesystem>
#include <fstream>

namespace stripsmith {

namespace fs = std::filesystem;

std::string RecentFiles::defaultFile() {
    if (const char* config = std::getenv("XDG_CONFIG_HOME"); config && *config)
        return (fs::path(config) / "stripsmith" / "recent.txt").string();
    const char* home = std::getenv("HOME");
    return (fs::path(home ? home : ".") / ".config" / "stripsmith" / "recent.txt").string();
}

void RecentFiles::load(std::string file) {
    file_ = std::move(file);
    paths_.clear();
    std::ifstream in(file_);
    for (std::string line; std::getline(in, line);)
        if (!line.empty()) paths_.push_back(line);
}

void RecentFiles::add(const std::string& path) {
    paths_.erase(std::remove(paths_.begin(), paths_.end(), path), paths_.end());
    paths_.insert(paths_.begin(), path);
    if (paths_.size() > 10) paths_.resize(10);
    if (file_.empty()) return;
    std::error_code ec;
    fs::create_directories(fs::path(file_).parent_path(), ec);
    std::ofstream out(file_);
    for (const auto& p : paths_) out << p << '\n';
}

}  // namespace stripsmith
