#include "editor/files/recovery.hpp"

#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <system_error>

#include <nlohmann/json.hpp>

#include "netcheck/file/file_io.hpp"

namespace stripsmith {

namespace fs = std::filesystem;

namespace {
constexpr const char* kBoardName = "recovery.board.json";
constexpr const char* kInfoName = "recovery.info.json";

std::optional<std::string> readText(const fs::path& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) return std::nullopt;
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}
}  // namespace

std::string recoveryFolder() {
    if (const char* dir = std::getenv("STRIPSMITH_RECOVERY_DIR"); dir && *dir) return dir;
    if (const char* state = std::getenv("XDG_STATE_HOME"); state && *state)
        return (fs::path(state) / "stripsmith" / "recovery").string();
    const char* home = std::getenv("HOME");
    return (fs::path(home ? home : ".") / ".local" / "state" / "stripsmith" / "recovery").string();
}

double autosaveInterval() {
    if (const char* text = std::getenv("STRIPSMITH_AUTOSAVE_SECONDS")) {
        char* end = nullptr;
        const double seconds = std::strtod(text, &end);
        if (end != text && seconds > 0) return seconds;
    }
    return 60.0;
}

std::optional<std::string> writeRecovery(const std::string& folder, const RecoveryFile& recovery) {
    std::error_code ec;
    fs::create_directories(folder, ec);
    if (ec) return "Cannot create the recovery folder " + folder + ": " + ec.message();
    const nlohmann::json info = {{"original_path", recovery.originalPath}};
    netcheck::SaveOptions options;
    options.keepBackup = false;
    if (auto error = netcheck::saveFileAtomically((fs::path(folder) / kInfoName).string(), info.dump(2), options))
        return error;
    return netcheck::saveFileAtomically((fs::path(folder) / kBoardName).string(), recovery.boardText, options);
}

std::optional<RecoveryFile> findRecovery(const std::string& folder) {
    auto board = readText(fs::path(folder) / kBoardName);
    if (!board) return std::nullopt;
    RecoveryFile recovery;
    recovery.boardText = std::move(*board);
    if (auto info = readText(fs::path(folder) / kInfoName)) {
        const auto json = nlohmann::json::parse(*info, nullptr, false);
        if (json.is_object() && json.contains("original_path") && json["original_path"].is_string())
            recovery.originalPath = json["original_path"].get<std::string>();
    }
    return recovery;
}

void clearRecovery(const std::string& folder) {
    std::error_code ec;
    for (const char* name : {kBoardName, kInfoName}) {
        fs::remove(fs::path(folder) / name, ec);
        fs::remove(fs::path(folder) / (std::string(name) + ".bak"), ec);
    }
}

}  // namespace stripsmith
