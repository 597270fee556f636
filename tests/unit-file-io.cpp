// Saving atomically (temporary file, flush, backup, rename) and reading within a size limit.
// Failures are real ones from the kernel: a folder the user may not write to (checked as an
// unprivileged user when the tests run as root), and a full disk (/dev/full returns ENOSPC,
// Linux null(4) man page).
#include <fcntl.h>
#include <sys/stat.h>
#include <sys/wait.h>
#include <unistd.h>

#include <filesystem>
#include <fstream>
#include <functional>
#include <random>
#include <sstream>

#include <doctest/doctest.h>

#include "netcheck/file/file_io.hpp"

using namespace netcheck;
namespace fs = std::filesystem;

namespace {

// A fresh empty folder, removed afterwards.
struct TempFolder {
    fs::path path;
    TempFolder() {
        std::random_device random;
        path = fs::temp_directory_path() / ("stripsmith-file-io-" + std::to_string(random()));
        fs::create_directories(path);
    }
    ~TempFolder() {
        std::error_code ignored;
        fs::permissions(path, fs::perms::owner_all, ignored);
        fs::remove_all(path, ignored);
    }
    std::string operator/(const std::string& name) const { return (path / name).string(); }
};

std::string slurp(const std::string& path) {
    std::ifstream in(path, std::ios::binary);
    std::stringstream text;
    text << in.rdbuf();
    return text.str();
}

void spit(const std::string& path, const std::string& text) {
    std::ofstream(path, std::ios::binary) << text;
}

int fileCount(const fs::path& folder) {
    int count = 0;
    for ([[maybe_unused]] const auto& entry : fs::directory_iterator(folder)) ++count;
    return count;
}

// Runs `task` as a user without write permission on `folder` and returns what it printed.
// Root may write anywhere, so as root the task runs in a child that has become "nobody" (65534);
// otherwise the folder is made read-only for its owner.
std::string runWithoutWritePermission(const fs::path& folder,
                                      const std::function<std::string()>& task) {
    if (::geteuid() != 0) {
        fs::permissions(folder, fs::perms::owner_read | fs::perms::owner_exec);
        std::string said = task();
        fs::permissions(folder, fs::perms::owner_all);
        return said;
    }
    fs::permissions(folder, fs::perms::owner_all | fs::perms::group_read | fs::perms::group_exec |
                                fs::perms::others_read | fs::perms::others_exec);
    int pipeFds[2];
    REQUIRE(::pipe(pipeFds) == 0);
    const pid_t child = ::fork();
    REQUIRE(child >= 0);
    if (child == 0) {
        ::close(pipeFds[0]);
        if (::setgid(65534) != 0 || ::setuid(65534) != 0) ::_exit(3);
        const std::string said = task();
        (void)writeAll(pipeFds[1], said);
        ::_exit(0);
    }
    ::close(pipeFds[1]);
    std::string said;
    char buffer[512];
    for (ssize_t got; (got = ::read(pipeFds[0], buffer, sizeof buffer)) > 0;) {
        said.append(buffer, static_cast<std::size_t>(got));
    }
    ::close(pipeFds[0]);
    int status = 0;
    ::waitpid(child, &status, 0);
    REQUIRE(WIFEXITED(status));
    REQUIRE(WEXITSTATUS(status) == 0);
    return said;
}

}  // namespace

TEST_CASE("file io") {
    TempFolder folder;
    const std::string board = folder / "amp.board.json";

    SUBCASE("saveFileAtomically") {
        SUBCASE("a new file: written whole, no backup, no temporary left") {
            CHECK_FALSE(saveFileAtomically(board, "first").has_value());
            CHECK(slurp(board) == "first");
            CHECK_FALSE(fs::exists(board + ".bak"));
            CHECK(fileCount(folder.path) == 1);
        }
        SUBCASE("replacing keeps the previous version as .bak, and the file's mode") {
            spit(board, "first");
            fs::permissions(board, fs::perms::owner_read | fs::perms::owner_write |
                                       fs::perms::group_read);
            CHECK_FALSE(saveFileAtomically(board, "second").has_value());
            CHECK_FALSE(saveFileAtomically(board, "third").has_value());
            CHECK(slurp(board) == "third");
            CHECK(slurp(board + ".bak") == "second");
            CHECK(fs::status(board).permissions() ==
                  (fs::perms::owner_read | fs::perms::owner_write | fs::perms::group_read));
            CHECK(fileCount(folder.path) == 2);
            SaveOptions noBackup;
            noBackup.keepBackup = false;
            CHECK_FALSE(saveFileAtomically(board, "fourth", noBackup).has_value());
            CHECK(slurp(board + ".bak") == "second");
        }
        SUBCASE("a link keeps pointing at the saved file") {
            spit(board, "first");
            const std::string link = folder / "link.board.json";
            fs::create_symlink(board, link);
            CHECK_FALSE(saveFileAtomically(link, "second").has_value());
            CHECK(fs::is_symlink(link));
            CHECK(slurp(board) == "second");
        }
        SUBCASE("a full disk leaves the old file and its backup alone and says so") {
            spit(board, "old");
            spit(board + ".bak", "older");
            SaveOptions diskFull;
            diskFull.writeBytes = [](int, std::string_view bytes) {
                // Write where the kernel itself reports a full disk.
                const int full = ::open("/dev/full", O_WRONLY | O_CLOEXEC);
                REQUIRE(full >= 0);
                const int error = writeAll(full, bytes);
                ::close(full);
                return error;
            };
            const auto message = saveFileAtomically(board, std::string(100000, 'x'), diskFull);
            REQUIRE(message.has_value());
            CHECK(*message == "cannot write " + board + ": the disk is full");
            CHECK(slurp(board) == "old");
            CHECK(slurp(board + ".bak") == "older");
            CHECK(fileCount(folder.path) == 2);
        }
        SUBCASE("a refused hard link and a full disk leave the old backup whole") {
            // The backup falls back to a copy when the link is refused (protected_hardlinks and a
            // file owned by another user); the disk fills up half way through that copy.
            spit(board, std::string(200000, 'o'));
            spit(board + ".bak", "older");
            SaveOptions options;
            options.linkBackup = [](const char*, const char*) { return EPERM; };
            int writes = 0;
            options.writeBytes = [&writes](int fd, std::string_view bytes) {
                if (++writes == 1) return writeAll(fd, bytes);  // the new contents
                (void)writeAll(fd, bytes.substr(0, bytes.size() / 2));
                return ENOSPC;
            };
            const auto message = saveFileAtomically(board, "new", options);
            REQUIRE(message.has_value());
            CHECK(*message == "cannot keep the previous version of " + board + ": the disk is full");
            CHECK(slurp(board) == std::string(200000, 'o'));
            CHECK(slurp(board + ".bak") == "older");
            CHECK(fileCount(folder.path) == 2);
        }
        SUBCASE("a refused hard link: the backup is a whole copy") {
            spit(board, "old");
            spit(board + ".bak", "older");
            SaveOptions options;
            options.linkBackup = [](const char*, const char*) { return EPERM; };
            CHECK_FALSE(saveFileAtomically(board, "new", options).has_value());
            CHECK(slurp(board) == "new");
            CHECK(slurp(board + ".bak") == "old");
            CHECK(fileCount(folder.path) == 2);
        }
        SUBCASE("a folder without write permission leaves the old file and says so") {
            spit(board, "old");
            const std::string said = runWithoutWritePermission(folder.path, [&] {
                return saveFileAtomically(board, "new").value_or("saved");
            });
            CHECK(said == "cannot write " + board +
                              ": the folder is read-only (no permission to write there)");
            CHECK(slurp(board) == "old");
            CHECK(fileCount(folder.path) == 1);
        }
        SUBCASE("missing folders and folders in the way") {
            const std::string nowhere = folder / "no/such/folder/a.board.json";
            CHECK(saveFileAtomically(nowhere, "x") ==
                  "cannot write " + nowhere + ": the folder does not exist");
            fs::create_directory(folder / "sub");
            CHECK(saveFileAtomically(folder / "sub", "x") ==
                  "cannot write " + (folder / "sub") + ": it is a folder");
        }
    }

    SUBCASE("readFileLimited") {
        SUBCASE("reads a file whole") {
            spit(board, std::string("{\n}\0tail", 8));
            const auto result = readFileLimited(board, 8);
            REQUIRE(result.ok());
            CHECK(result.value->size() == 8);
        }
        SUBCASE("clear errors naming the file") {
            auto result = readFileLimited(folder / "missing.board.json", 100);
            REQUIRE(result.error);
            CHECK(result.error->describe() == folder / "missing.board.json" + ": no such file");
            result = readFileLimited(folder.path.string(), 100);
            REQUIRE(result.error);
            CHECK(result.error->message == "this is a folder, not a file");
        }
        SUBCASE("a file over the limit is refused without reading it") {
            // A sparse 200 MiB file: reading it whole would take a while and the memory.
            spit(board, "");
            fs::resize_file(board, 200u * 1024u * 1024u);
            const auto result = readFileLimited(board, 64u * 1024u * 1024u);
            REQUIRE(result.error);
            CHECK(result.error->message ==
                  "the file is 209715200 bytes, too large (the limit is 67108864 bytes)");
            spit(board, "12345");
            CHECK(readFileLimited(board, 4).error.has_value());
            CHECK(readFileLimited(board, 5).ok());
        }
        SUBCASE("an endless device is refused before reading") {
            const auto result = readFileLimited("/dev/zero", 100000);
            REQUIRE(result.error);
            CHECK(result.error->message == "this is not a plain file (a device)");
        }
        SUBCASE("an unreadable file") {
            spit(board, "secret");
            fs::permissions(board, fs::perms::owner_write);
            const std::string said = runWithoutWritePermission(folder.path, [&] {
                const auto result = readFileLimited(board, 100);
                return result.error ? result.error->message : std::string("read");
            });
            CHECK(said == "no permission to read this file");
        }
    }
}
