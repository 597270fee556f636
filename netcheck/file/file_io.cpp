// POSIX file handling for saving and reading documents. The save is the usual sequence for
// crash-safe replacement: temporary file in the same folder (so the rename is atomic), fsync,
// rename, fsync of the folder.
#include "netcheck/file/file_io.hpp"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#include <filesystem>
#include <random>
#include <system_error>

namespace netcheck {

namespace {

namespace fs = std::filesystem;

// Closes a file descriptor when it goes out of scope.
class Descriptor {
public:
    explicit Descriptor(int fd) : fd_(fd) {}
    Descriptor(const Descriptor&) = delete;
    Descriptor& operator=(const Descriptor&) = delete;
    ~Descriptor() {
        if (fd_ >= 0) ::close(fd_);
    }
    int get() const { return fd_; }
    /// Closes now and reports the errno of a failed close (some file systems report a full disk
    /// only here), or 0.
    int close() {
        const int fd = fd_;
        fd_ = -1;
        return ::close(fd) == 0 ? 0 : errno;
    }

private:
    int fd_;
};

// What an errno means to a maker, for the step that failed.
std::string reason(int error) {
    switch (error) {
        case EACCES:
        case EPERM:
            return "the folder is read-only (no permission to write there)";
        case EROFS:
            return "the disk is mounted read-only";
        case ENOENT:
            return "the folder does not exist";
        case ENOTDIR:
            return "part of the path is not a folder";
        case EISDIR:
            return "it is a folder";
        case ENOSPC:
            return "the disk is full";
        case EDQUOT:
            return "the disk quota is used up";
        case EFBIG:
            return "the file is too large for the disk";
        case EIO:
            return "input/output error (the disk may be failing)";
        case ENAMETOOLONG:
            return "the name is too long";
        default:
            return std::generic_category().message(error);
    }
}

std::string failure(std::string_view what, const std::string& path, int error) {
    return std::string(what) + " " + path + ": " + reason(error);
}

// A name no other save uses at the same time: ".<name>.<random>.tmp" beside the target.
std::string temporaryName(const fs::path& target) {
    std::random_device random;
    const auto tag = std::to_string(random()) + std::to_string(random());
    return (target.parent_path() / ("." + target.filename().string() + "." + tag + ".tmp"))
        .string();
}

// Creates the temporary file with the mode a new file would get (or the old file's mode).
int createTemporary(const fs::path& target, std::string& tempPath, const struct stat* old) {
    for (int attempt = 0; attempt < 8; ++attempt) {
        tempPath = temporaryName(target);
        const int fd = ::open(tempPath.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_CLOEXEC, 0666);
        if (fd >= 0) {
            if (old != nullptr) (void)::fchmod(fd, old->st_mode & 07777);
            return fd;
        }
        if (errno != EEXIST) return -errno;
    }
    return -EEXIST;
}

// Fills the open file `fd` with a copy of `source`, through `options.writeBytes`; 0 or errno.
int copyInto(int fd, const fs::path& source, const SaveOptions& options) {
    const int in = ::open(source.c_str(), O_RDONLY | O_CLOEXEC);
    if (in < 0) return errno;
    Descriptor input(in);
    struct stat info {};
    if (::fstat(in, &info) == 0) (void)::fchmod(fd, info.st_mode & 07777);
    const auto& write = options.writeBytes ? options.writeBytes : writeAll;
    char buffer[65536];
    for (;;) {
        const ssize_t got = ::read(in, buffer, sizeof buffer);
        if (got < 0) {
            if (errno == EINTR) continue;
            return errno;
        }
        if (got == 0) break;
        if (const int error = write(fd, std::string_view(buffer, static_cast<std::size_t>(got))))
            return error;
    }
    return ::fsync(fd) == 0 ? 0 : errno;
}

// A new backup of `target` under a temporary name: a hard link when the file system allows
// (protected_hardlinks refuses it for another user's file), else a whole, flushed copy.
int makeBackupTemporary(const fs::path& target, const std::string& tempPath,
                        const SaveOptions& options) {
    const auto& link = options.linkBackup ? options.linkBackup : hardLink;
    if (link(target.c_str(), tempPath.c_str()) == 0) return 0;
    const int fd = ::open(tempPath.c_str(), O_WRONLY | O_CREAT | O_EXCL | O_CLOEXEC, 0600);
    if (fd < 0) return errno;
    Descriptor copy(fd);
    if (const int error = copyInto(fd, target, options)) return error;
    return copy.close();
}

// Makes `<target>.bak` the present version. The old backup is replaced only by a complete new
// one (rename), so a failure at any step leaves the old backup and no partial file.
int keepBackup(const fs::path& target, const SaveOptions& options) {
    const fs::path backup = target.string() + ".bak";
    const std::string tempPath = temporaryName(backup);
    int error = makeBackupTemporary(target, tempPath, options);
    if (error == 0 && ::rename(tempPath.c_str(), backup.c_str()) != 0) error = errno;
    if (error != 0) ::unlink(tempPath.c_str());
    return error;
}

// Makes the rename itself durable; some file systems cannot sync a folder, which is harmless.
void syncFolder(const fs::path& folder) {
    const int fd =
        ::open(folder.empty() ? "." : folder.c_str(), O_RDONLY | O_DIRECTORY | O_CLOEXEC);
    if (fd < 0) return;
    (void)::fsync(fd);
    ::close(fd);
}

// Writes, flushes and closes the temporary file; returns the errno of the first failure.
int fillTemporary(Descriptor& file, std::string_view contents, const SaveOptions& options) {
    const auto& write = options.writeBytes ? options.writeBytes : writeAll;
    if (const int error = write(file.get(), contents)) return error;
    if (::fsync(file.get()) != 0) return errno;
    return file.close();
}

// What kind of special file this is, in a maker's words.
std::string fileKind(const struct stat& info) {
    if (S_ISFIFO(info.st_mode)) return "a pipe or FIFO";
    if (S_ISSOCK(info.st_mode)) return "a socket";
    if (S_ISCHR(info.st_mode) || S_ISBLK(info.st_mode)) return "a device";
    return "a special file";
}

}  // namespace

int hardLink(const char* from, const char* to) {
    return ::link(from, to) == 0 ? 0 : errno;
}

int writeAll(int fd, std::string_view bytes) {
    while (!bytes.empty()) {
        const ssize_t written = ::write(fd, bytes.data(), bytes.size());
        if (written < 0) {
            if (errno == EINTR) continue;
            return errno;
        }
        if (written == 0) return EIO;
        bytes.remove_prefix(static_cast<std::size_t>(written));
    }
    return 0;
}

std::optional<std::string> saveFileAtomically(const std::string& path, std::string_view contents,
                                              const SaveOptions& options) {
    std::error_code error;
    fs::path target = path;
    // Replace what a link points to, not the link.
    if (fs::is_symlink(fs::symlink_status(target, error))) {
        target = fs::canonical(target, error);
        if (error) return "cannot write " + path + ": the link points nowhere";
    }
    struct stat old {};
    const bool exists = ::stat(target.c_str(), &old) == 0;
    if (exists && S_ISDIR(old.st_mode)) return failure("cannot write", path, EISDIR);
    if (exists && !S_ISREG(old.st_mode)) return "cannot write " + path + ": it is not a plain file";

    std::string tempPath;
    const int fd = createTemporary(target, tempPath, exists ? &old : nullptr);
    if (fd < 0) return failure("cannot write", path, -fd);
    Descriptor file(fd);

    if (const int failed = fillTemporary(file, contents, options)) {
        ::unlink(tempPath.c_str());
        return failure("cannot write", path, failed);
    }
    if (exists && options.keepBackup) {
        if (const int failed = keepBackup(target, options)) {
            ::unlink(tempPath.c_str());
            return failure("cannot keep the previous version of", path, failed);
        }
    }
    if (::rename(tempPath.c_str(), target.c_str()) != 0) {
        const int failed = errno;
        ::unlink(tempPath.c_str());
        return failure("cannot replace", path, failed);
    }
    syncFolder(target.parent_path());
    return std::nullopt;
}

ReadResult<std::string> readFileLimited(const std::string& path, std::size_t maxBytes) {
    ReadResult<std::string> result;
    auto fail = [&](std::string message) {
        result.error = FileError{path, 0, 0, "", std::move(message)};
        return result;
    };
    // Non-blocking so that opening a FIFO with no writer returns at once instead of waiting
    // forever; such a file is refused below before anything is read.
    const int fd = ::open(path.c_str(), O_RDONLY | O_CLOEXEC | O_NONBLOCK | O_NOCTTY);
    if (fd < 0) {
        if (errno == ENOENT) return fail("no such file");
        if (errno == EACCES) return fail("no permission to read this file");
        return fail("cannot open: " + std::generic_category().message(errno));
    }
    Descriptor file(fd);
    struct stat info {};
    if (::fstat(fd, &info) != 0) return fail(std::generic_category().message(errno));
    if (S_ISDIR(info.st_mode)) return fail("this is a folder, not a file");
    // Pipes, FIFOs, sockets and devices can block or never end: only plain files are read.
    if (!S_ISREG(info.st_mode)) return fail("this is not a plain file (" + fileKind(info) + ")");
    if (static_cast<std::size_t>(info.st_size) > maxBytes) {
        return fail("the file is " + std::to_string(info.st_size) + " bytes, too large (the " +
                    "limit is " + std::to_string(maxBytes) + " bytes)");
    }
    // The size may still grow while reading: read at most one byte past the limit to tell.
    std::string text;
    char buffer[65536];
    for (;;) {
        const ssize_t got = ::read(fd, buffer, sizeof buffer);
        if (got < 0) {
            if (errno == EINTR) continue;
            return fail("cannot read: " + std::generic_category().message(errno));
        }
        if (got == 0) break;
        text.append(buffer, static_cast<std::size_t>(got));
        if (text.size() > maxBytes) {
            return fail("the file grew past the limit while being read (the limit is " +
                        std::to_string(maxBytes) + " bytes)");
        }
    }
    result.value = std::move(text);
    return result;
}

}  // namespace netcheck
