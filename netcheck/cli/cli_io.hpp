// What every netcheck command does with files and the terminal: read an input file through the
// limited reader with one located message on failure, and write to standard output making sure
// the text arrived.
#pragma once

#include <cerrno>
#include <iostream>
#include <optional>
#include <string>
#include <string_view>
#include <system_error>

#include "netcheck/file/file_io.hpp"
#include "netcheck/file/read_limits.hpp"
#include "netcheck/model/printable.hpp"

namespace netcheck_cli {

/// Reads and parses one input file; on failure prints the located error and returns nullopt.
/// The reader's notes go to stderr.
template <class Reader>
auto load(const std::string& path, Reader reader)
    -> decltype(reader(std::string_view{}, std::string_view{}).value) {
    netcheck::ReadResult<std::string> text =
        netcheck::readFileLimited(path, netcheck::ReadLimits{}.maxBytes);
    if (!text.ok()) {
        std::cerr << "netcheck: "
                  << (text.error ? text.error->describe() : netcheck::escapeControls(path)) << "\n";
        return std::nullopt;
    }
    auto result = reader(*text.value, path);
    if (!result.ok()) {
        std::cerr << "netcheck: "
                  << (result.error ? result.error->describe()
                                   : netcheck::escapeControls(path) + ": unreadable")
                  << "\n";
        return std::nullopt;
    }
    for (const std::string& note : result.notes) {
        std::cerr << "netcheck: note: " << netcheck::escapeControls(note) << "\n";
    }
    return std::move(result.value);
}

/// Writes to standard output and makes sure it arrived: a full disk or a closed output must not
/// pass for an empty report with a success status.
inline bool emit(const std::string& text) {
    errno = 0;
    std::cout << text;
    std::cout.flush();
    if (std::cout.good()) return true;
    const int error = errno;
    std::cerr << "netcheck: cannot write the report to standard output"
              << (error != 0 ? ": " + std::generic_category().message(error) : std::string())
              << "\n";
    return false;
}

}  // namespace netcheck_cli
