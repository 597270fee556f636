// Formatting a file error the way compilers do, so editors and terminals can jump to it.
#include "netcheck/file/file_error.hpp"

#include "netcheck/model/printable.hpp"

namespace netcheck {

std::string FileError::describe() const {
    std::string text = file.empty() ? std::string("<input>") : file;
    // Appended piece by piece: GCC 12 warns (-Wrestrict, falsely) on `":" + std::to_string(n)`.
    if (line > 0) {
        text.append(":").append(std::to_string(line));
        if (column > 0) text.append(":").append(std::to_string(column));
    }
    text.append(": ");
    if (!path.empty()) text.append(path).append(": ");
    // The file name and the message may quote text from the file: shown on a terminal, an
    // escape sequence in it must not act.
    return escapeControls(text.append(message));
}

}  // namespace netcheck
