// Finding where in a JSON text a value sits, so errors found after parsing can name a line.
// Private to the file readers.
#pragma once

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace netcheck {

/// One step of a JSON path: an object key or an array index.
struct PathStep {
    std::string key;
    std::size_t index = 0;
    bool isIndex = false;
};
using JsonPath = std::vector<PathStep>;

/// `parts[3].pins.2`; keys that are not plain words are quoted: `nets["A B"]`.
std::string pathText(const JsonPath& path);

/// 1-based line and column (in characters, not bytes) of a byte offset.
struct TextPosition {
    int line = 1;
    int column = 1;
};
TextPosition positionAt(std::string_view text, std::size_t offset);

/// Byte offset where the value at `path` starts, in a text that parses as JSON. Nullopt when the
/// path is not in the text.
std::optional<std::size_t> findValue(std::string_view text, const JsonPath& path);

/// Byte offset of the first bracket that opens nesting level `maxDepth + 1`, if any. Scans
/// without recursion so it is safe on any input.
std::optional<std::size_t> findTooDeep(std::string_view text, int maxDepth);

}  // namespace netcheck
