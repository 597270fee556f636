// What a file held when the editor last read or wrote it, so that a save notices when another
// editor (or any program) has saved the same file in between, instead of silently replacing it.
#pragma once

#include <cstdint>
#include <optional>
#include <string>
#include <string_view>

namespace stripsmith {

/// Size, modification time and a hash of the contents of a file.
struct DiskStamp {
    std::uint64_t size = 0;
    std::int64_t mtimeNs = 0;  ///< nanoseconds since the epoch
    std::uint64_t hash = 0;    ///< FNV-1a of the contents
    bool operator==(const DiskStamp&) const = default;
};

/// The stamp of `contents`, just read from or written to `path` (its time taken from the file).
DiskStamp stampOf(std::string_view contents, const std::string& path);

/// Whether the file at `path` no longer holds what `stamp` describes. A file that is gone has
/// nothing to lose, and one touched without a change in its contents is unchanged.
bool changedOnDisk(const DiskStamp& stamp, const std::string& path);

}  // namespace stripsmith
