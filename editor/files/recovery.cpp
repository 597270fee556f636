#include "editor/files/recovery.hpp"

#include <fcntl.h>
#include <sys/file.h>
#include <sys/stat.h>
#include <unistd.h>

#include <algorithm>
#include <cerrno>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <random>
#include <sstream>
#include <system_error>

#include <nlohmann/json.hpp>

#include "netcheck/file/file_io.hpp"

namespace stripsmith {

namespace fs = std::filesystem;

namespace {
constexpr const char* kPrefix = "editor-";
constexpr const char* kLock = ".lock";
constexpr const char* kBoard = ".board.json";
constexpr const char* kInfo = ".info.json";

std::optional<std::string> readText(const std::string& path) {
    std::ifstream in(path, std::ios::binary);
    if (!in) return std::nullopt;
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

// The slot's info file: the file its editor has open, and the editor's process id.
std::optional<nlohmann::json> readInfo(const std::string& base) {
    auto text = readText(base + kInfo);
    if (!text) return std::nullopt;
    auto json = nlohmann::json::parse(*text, nullptr, false);
    if (!json.is_object()) return std::nullopt;
    return json;
}

std::string stringMember(const nlohmann::json& object, const char* key) {
    const auto it = object.find(key);
    return it != object.end() && it->is_string() ? it->get<std::string>() : std::string();
}

// Names of the slots in `folder` ("editor-<pid>-<tag>"), found by their lock files.
std::vector<std::string> slotNames(const std::string& folder) {
    std::vector<std::string> names;
    std::error_code ec;
    for (fs::directory_iterator it(folder, ec), end; !ec && it != end; it.increment(ec)) {
        const std::string file = it->path().filename().string();
        if (file.rfind(kPrefix, 0) == 0 && file.ends_with(kLock))
            names.push_back(file.substr(0, file.size() - std::string(kLock).size()));
    }
    std::sort(names.begin(), names.end());
    return names;
}

// Whether the lock file at `path` is still the one open as `fd` (its owner may have removed it
// between our open and our lock; a lock on a removed file guards nothing).
bool stillThere(int fd, const std::string& path) {
    struct stat open {}, named {};
    return ::fstat(fd, &open) == 0 && ::stat(path.c_str(), &named) == 0 &&
           open.st_dev == named.st_dev && open.st_ino == named.st_ino;
}

// Paths are recorded whole, so an editor started in another folder reads them the same.
std::string absolute(const std::string& path) {
    if (path.empty()) return path;
    std::error_code ec;
    const fs::path whole = fs::absolute(path, ec);
    return ec ? path : whole.lexically_normal().string();
}

std::string comparable(const std::string& path) {
    std::error_code ec;
    const fs::path canonical = fs::weakly_canonical(fs::absolute(path, ec), ec);
    return ec ? path : canonical.string();
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

// ---- the slot -----------------------------------------------------------------------------------

RecoverySlot::RecoverySlot(RecoverySlot&& other) noexcept
    : base_(std::move(other.base_)), lock_(std::exchange(other.lock_, -1)),
      openFile_(std::move(other.openFile_)) {}

RecoverySlot& RecoverySlot::operator=(RecoverySlot&& other) noexcept {
    if (this != &other) {
        if (lock_ >= 0) ::close(lock_);
        base_ = std::move(other.base_);
        lock_ = std::exchange(other.lock_, -1);
        openFile_ = std::move(other.openFile_);
    }
    return *this;
}

RecoverySlot::~RecoverySlot() {
    if (lock_ >= 0) ::close(lock_);  // the lock goes with the descriptor; the files stay
}

std::optional<RecoverySlot> RecoverySlot::create(const std::string& folder, std::string& error) {
    std::error_code ec;
    fs::create_directories(folder, ec);
    if (ec) {
        error = "cannot create the recovery folder " + folder + ": " + ec.message();
        return std::nullopt;
    }
    std::random_device random;
    for (int attempt = 0; attempt < 8; ++attempt) {
        const std::string base = (fs::path(folder) / (kPrefix + std::to_string(::getpid()) + "-" +
                                                      std::to_string(random())))
                                     .string();
        const int fd = ::open((base + kLock).c_str(), O_RDWR | O_CREAT | O_EXCL | O_CLOEXEC, 0600);
        if (fd < 0 && errno == EEXIST) continue;
        if (fd < 0) break;
        if (::flock(fd, LOCK_EX | LOCK_NB) != 0) {
            ::close(fd);
            break;
        }
        return RecoverySlot(base, fd);
    }
    error = "cannot make a recovery copy in " + folder + ": " +
            std::generic_category().message(errno);
    return std::nullopt;
}

std::optional<RecoverySlot> RecoverySlot::takeOver(const std::string& folder,
                                                   const std::string& name) {
    const std::string base = (fs::path(folder) / name).string();
    const int fd = ::open((base + kLock).c_str(), O_RDWR | O_CLOEXEC);
    if (fd < 0) return std::nullopt;
    // Held by a running editor (or by another editor offering it right now): not ours.
    if (::flock(fd, LOCK_EX | LOCK_NB) != 0 || !stillThere(fd, base + kLock)) {
        ::close(fd);
        return std::nullopt;
    }
    return RecoverySlot(base, fd);
}

std::optional<std::string> RecoverySlot::write(const RecoveryFile& recovery) {
    if (!active()) return "autosave is off";
    netcheck::SaveOptions options;
    options.keepBackup = false;
    const nlohmann::json info = {{"original_path", absolute(recovery.originalPath)},
                                 {"pid", static_cast<long>(::getpid())}};
    if (auto error = netcheck::saveFileAtomically(base_ + kInfo, info.dump(2), options))
        return error;
    openFile_ = recovery.originalPath;
    return netcheck::saveFileAtomically(base_ + kBoard, recovery.boardText, options);
}

void RecoverySlot::setOpenFile(const std::string& path) {
    if (!active() || openFile_ == path) return;
    openFile_ = path;
    netcheck::SaveOptions options;
    options.keepBackup = false;
    const nlohmann::json info = {{"original_path", absolute(path)}, {"pid", static_cast<long>(::getpid())}};
    // Only a courtesy to other editors (editorsWithOpen): a failure here costs no work.
    (void)netcheck::saveFileAtomically(base_ + kInfo, info.dump(2), options);
}

void RecoverySlot::clearCopy() {
    if (active()) ::unlink((base_ + kBoard).c_str());
}

void RecoverySlot::remove() {
    if (!active()) return;
    // The lock file last: while it exists and is locked, the slot is known to be taken.
    for (const char* ending : {kBoard, kInfo, kLock}) ::unlink((base_ + ending).c_str());
    ::close(std::exchange(lock_, -1));
}

std::optional<RecoveryFile> RecoverySlot::read() const {
    auto board = readText(base_ + kBoard);
    if (!board) return std::nullopt;
    RecoveryFile recovery;
    recovery.boardText = std::move(*board);
    if (auto info = readInfo(base_)) recovery.originalPath = stringMember(*info, "original_path");
    return recovery;
}

// ---- other editors' slots -----------------------------------------------------------------------

namespace {

// Versions before slots kept one copy, "recovery.board.json" beside "recovery.info.json". Such a
// copy is moved into a slot of its own, released at once, so it is offered like any left copy.
// The rename claims it: of two editors starting at once, one moves it.
void adoptOldCopy(const std::string& folder) {
    const std::string oldBoard = (fs::path(folder) / "recovery.board.json").string();
    const std::string oldInfo = (fs::path(folder) / "recovery.info.json").string();
    if (::access(oldBoard.c_str(), F_OK) != 0) return;
    std::string error;
    auto slot = RecoverySlot::create(folder, error);
    if (!slot) return;
    const std::string base = slot->base();
    if (::rename(oldBoard.c_str(), (base + kBoard).c_str()) != 0) {
        slot->remove();
        return;
    }
    std::string original;
    if (auto info = readText(oldInfo)) {
        const auto json = nlohmann::json::parse(*info, nullptr, false);
        if (json.is_object()) original = stringMember(json, "original_path");
    }
    netcheck::SaveOptions options;
    options.keepBackup = false;
    const nlohmann::json info = {{"original_path", original}, {"pid", 0}};
    (void)netcheck::saveFileAtomically(base + kInfo, info.dump(2), options);
    ::unlink(oldInfo.c_str());
}

}  // namespace

std::optional<LeftCopy> findLeftCopy(const std::string& folder) {
    adoptOldCopy(folder);
    for (const std::string& name : slotNames(folder)) {
        auto slot = RecoverySlot::takeOver(folder, name);
        if (!slot) continue;
        if (auto file = slot->read()) return LeftCopy{std::move(*slot), std::move(*file)};
        slot->remove();  // ended with nothing unsaved: nothing to offer
    }
    return std::nullopt;
}

std::vector<long> editorsWithOpen(const std::string& folder, const std::string& path) {
    std::vector<long> pids;
    if (folder.empty() || path.empty()) return pids;
    const std::string wanted = comparable(path);
    for (const std::string& name : slotNames(folder)) {
        const std::string base = (fs::path(folder) / name).string();
        const auto info = readInfo(base);
        if (!info) continue;
        const long pid = info->value("pid", 0L);
        if (pid == static_cast<long>(::getpid())) continue;
        const std::string open = stringMember(*info, "original_path");
        if (open.empty() || comparable(open) != wanted) continue;
        // A slot whose lock can be taken belongs to an editor that has ended.
        if (RecoverySlot::takeOver(folder, name)) continue;
        pids.push_back(pid);
    }
    return pids;
}

}  // namespace stripsmith
