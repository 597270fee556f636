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

/// A key written twice in one object (nlohmann would silently keep only one of the values).
struct DuplicateKey {
    JsonPath path;           ///< the object's path plus the key
    std::size_t offset = 0;  ///< where the second occurrence starts
};

/// The first duplicate key of a text that parses as JSON. Scans without recursion.
std::optional<DuplicateKey> findDuplicateKey(std::string_view text);

/// Byte offset of the first bracket that opens nesting level `maxDepth + 1`, if any. Scans
/// without recursion so it is safe on any input.
std::optional<std::size_t> findTooDeep(std::string_view text, int maxDepth);

/// Byte offset of value number `maxValues + 1` (each object, array, string, number, true, false
/// and null that is a value, not a key, counts one), if any. Scans without building anything, so
/// the count bounds the memory a document may take before it is parsed.
std::optional<std::size_t> findValueBeyond(std::string_view text, std::size_t maxValues);

}  // namespace netcheck
