// Shared machinery of the file readers: parsing with limits, walking a JSON document while
// tracking the path, and turning the first problem into a located FileError. Private.
#pragma once

#include <cstddef>
#include <initializer_list>
#include <string>
#include <string_view>

#include <nlohmann/json.hpp>

#include "netcheck/file/board_file.hpp"
#include "netcheck/file/file_error.hpp"
#include "netcheck/file/detail/json_locator.hpp"
#include "netcheck/file/detail/number_spellings.hpp"
#include "netcheck/file/read_limits.hpp"

namespace netcheck {

/// Documents are read with ordered objects so that pin order is the file order.
using Json = nlohmann::ordered_json;

/// Thrown by JsonReader::fail and caught by the public read functions.
struct InvalidInput {
    JsonPath path;
    std::string message;
    bool newerVersion = false;
};

/// Parses text as JSON after the size, emptiness and nesting checks; syntax errors carry the
/// line and column. The result is an object (other top-level values are an error). Numbers
/// that would be written back with another spelling are noted in `spellings`.
ReadResult<Json> parseJsonText(std::string_view text, std::string_view fileName,
                               const ReadLimits& limits, NumberSpellings& spellings);

/// The located error for a problem found while reading `text`.
FileError locateError(std::string_view text, std::string_view fileName,
                      const InvalidInput& problem);

/// Walks a parsed document. Each accessor checks the JSON type and fails with the path of the
/// offending value.
class JsonReader {
public:
    /// Leaves the path step on destruction.
    class Step {
    public:
        explicit Step(JsonPath& path) : path_(path) {}
        Step(const Step&) = delete;
        Step& operator=(const Step&) = delete;
        ~Step() { path_.pop_back(); }

    private:
        JsonPath& path_;
    };

    /// `spellings`: of the numbers in the document being read, kept with unknown members.
    explicit JsonReader(NumberSpellings spellings = {}) : spellings_(std::move(spellings)) {}

    [[nodiscard]] Step enter(std::string key);
    [[nodiscard]] Step enter(std::size_t index);
    const JsonPath& path() const { return path_; }
    std::string pathText() const { return netcheck::pathText(path_); }

    [[noreturn]] void fail(std::string message) const;

    /// The member, or nullptr when absent.
    static const Json* find(const Json& object, std::string_view key);
    /// The member; fails `missing "key"` at the object's path when absent.
    const Json& require(const Json& object, std::string_view key) const;

    void expectObject(const Json& value) const;
    void expectArray(const Json& value) const;
    /// Current value as a string.
    std::string asString(const Json& value) const;
    /// Member `key` as a string: "" when absent and not required.
    std::string stringMember(const Json& object, std::string_view key, bool required);
    /// Current value as an integer.
    long long asInteger(const Json& value) const;
    /// Array of strings at the current path.
    std::vector<std::string> asStringArray(const Json& value);
    /// Member `key` as a string that holds no control characters (kinds, values, colours):
    /// "" when absent and not required.
    std::string textMember(const Json& object, std::string_view key, bool required);
    /// Fails unless `ref` is a usable reference designator (refProblem: non-empty, no blanks,
    /// no control characters).
    void expectRef(std::string_view ref) const;
    /// Fails unless `name` is a usable pin or lug name (non-empty, no blanks, no '.', since
    /// "REF.PIN" splits at the last '.').
    void expectPinName(std::string_view name, std::string_view what) const;

    /// Unknown members of the object at the current path, kept for writing back, with the
    /// original spelling of their numbers (number_spellings.hpp).
    nlohmann::json extras(const Json& object, std::initializer_list<std::string_view> known);

private:
    JsonPath path_;
    NumberSpellings spellings_;
};

/// Parses `text` and reads the document with `read(JsonReader&, const Json&)`, turning the first
/// problem into a located error.
template <class T, class ReadDocument>
ReadResult<T> readDocument(std::string_view text, std::string_view fileName,
                           const ReadLimits& limits, ReadDocument read) {
    ReadResult<T> result;
    NumberSpellings spellings;
    ReadResult<Json> parsed = parseJsonText(text, fileName, limits, spellings);
    if (!parsed.ok()) {
        result.error = std::move(parsed.error);
        return result;
    }
    try {
        JsonReader reader(std::move(spellings));
        result.value = read(reader, *parsed.value);
    } catch (const InvalidInput& problem) {
        result.error = locateError(text, fileName, problem);
    }
    return result;
}

/// Quotes a string the JSON way for messages: "Z99".
std::string inQuotes(std::string_view text);

/// Appends a member whose key the caller knows is not in `object` yet, without the linear lookup
/// of ordered objects.
void appendMember(Json& object, std::string key, Json value);

/// Appends `extra` members that do not clash with keys already in `out` (with the spellings of
/// their numbers, which dumpDocument uses).
void appendExtras(Json& out, const nlohmann::json& extra);

/// JSON text with 2-space indent and a final newline; invalid UTF-8 replaced rather than thrown;
/// numbers of unknown members spelled as they were read (writeJsonText).
std::string dumpDocument(const Json& document);

}  // namespace netcheck
