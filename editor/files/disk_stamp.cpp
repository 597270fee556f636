#include "editor/files/disk_stamp.hpp"

#include <sys/stat.h>

#include "netcheck/file/file_io.hpp"
#include "netcheck/file/read_limits.hpp"

namespace stripsmith {

namespace {

std::uint64_t fnv1a(std::string_view bytes) {
    std::uint64_t hash = 14695981039346656037ull;
    for (const char c : bytes) {
        hash ^= static_cast<unsigned char>(c);
        hash *= 1099511628211ull;
    }
    return hash;
}

std::optional<std::int64_t> modified(const std::string& path) {
    struct stat info {};
    if (::stat(path.c_str(), &info) != 0) return std::nullopt;
    return static_cast<std::int64_t>(info.st_mtim.tv_sec) * 1000000000 + info.st_mtim.tv_nsec;
}

}  // namespace

DiskStamp stampOf(std::string_view contents, const std::string& path) {
    return DiskStamp{contents.size(), modified(path).value_or(0), fnv1a(contents)};
}

bool changedOnDisk(const DiskStamp& stamp, const std::string& path) {
    const auto time = modified(path);
    if (!time) return false;
    // The same size and time: the contents are still compared, as a save within one tick of a
    // coarse file system clock keeps the time.
    const auto text = netcheck::readFileLimited(path, netcheck::ReadLimits{}.maxBytes);
    if (!text.ok()) return true;  // now unreadable or too large: certainly not what was read
    return text.value->size() != stamp.size || fnv1a(*text.value) != stamp.hash;
}

}  // namespace stripsmith
