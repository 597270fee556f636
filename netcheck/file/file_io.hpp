// Saving files so a failure never costs the previous version, and reading files within a limit.
#pragma once

#include <cstddef>
#include <functional>
#include <optional>
#include <string>
#include <string_view>

#include "netcheck/file/board_file.hpp"

namespace netcheck {

/// Writes all of `bytes` to the open file `fd`, retrying short writes. Returns 0, or the errno
/// of the failure (ENOSPC for a full disk).
int writeAll(int fd, std::string_view bytes);

/// Makes `to` a hard link to `from`, as link(2) does. Returns 0, or the errno of the failure.
int hardLink(const char* from, const char* to);

/// How saveFileAtomically works; the defaults are what the editor and the CLI want.
struct SaveOptions {
    /// Keep the file being replaced as `<path>.bak`.
    bool keepBackup = true;
    /// Writes the new contents into the temporary file, as writeAll does. Tests pass their own
    /// to make the write fail the way a full disk does.
    std::function<int(int fd, std::string_view bytes)> writeBytes = writeAll;
    /// Links the backup to the file being replaced, as hardLink does. Tests pass their own to
    /// refuse it the way fs.protected_hardlinks does for a file owned by another user.
    std::function<int(const char* from, const char* to)> linkBackup = hardLink;
};

/// Saves `contents` to `path` without ever leaving a half-written file: writes a temporary file
/// in the same folder, flushes it to the disk, keeps the previous version as `<path>.bak`, and
/// renames the temporary file over `path`. The backup too is made beside it (a hard link, else a
/// copy) and renamed over the old `.bak` only when complete: a failed backup leaves the old one. A symbolic link at `path` is kept and its target
/// replaced. Returns nullopt on success; on failure the file at `path` is untouched, no
/// temporary file is left, and the message says what failed in plain words, e.g.
/// "cannot write /x/y.board.json: the folder is read-only".
std::optional<std::string> saveFileAtomically(const std::string& path, std::string_view contents,
                                              const SaveOptions& options = {});

/// Reads a whole file of at most `maxBytes` bytes. Missing files, folders, unreadable files,
/// files that are not plain files (FIFOs, pipes, sockets, devices: they may block or never end)
/// and files over the limit give an error naming the file; all of these are refused before
/// anything is read.
ReadResult<std::string> readFileLimited(const std::string& path, std::size_t maxBytes);

}  // namespace netcheck
