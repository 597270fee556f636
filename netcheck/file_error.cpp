// Formatting a file error the way compilers do, so editors and terminals can jump to it.
#include "file_error.hpp"

namespace netcheck {

std::string FileError::describe() const {
    std::string text = file.empty() ? std::string("<input>") : file;
    if (line > 0) {
        text += ":" + std::to_string(line);
        if (column > 0) text += ":" + std::to_string(column);
    }
    text += ": ";
    if (!path.empty()) text += path + ": ";
    return text + message;
}

}  // namespace netcheck
