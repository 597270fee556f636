// Numbers in keys Stripsmith does not know keep the spelling they had in the file: parsed into
// doubles and written back, 123456789012345678901234567890 would become 1.2345678901234568e+29,
// -0 would become 0 and 1E2 would become 100.0. Private to the file readers and writers.
//
// Reading records where a number's text differs from how it would be written again; the unknown
// members of each object (the `extra` of the model) carry those spellings under a reserved key
// that no file may use, so the values themselves stay ordinary numbers for whoever reads them.
// Writing puts a spelling back only while the number still has the value it was read with.
#pragma once

#include <map>
#include <string>
#include <string_view>

#include <nlohmann/json.hpp>

#include "netcheck/file/detail/json_locator.hpp"

namespace netcheck {

/// The reserved member of an `extra` object that holds its members' number spellings:
/// {"member": {"/json/pointer/inside/it": "original text"}}. It starts with a NUL, which no
/// file's key may hold.
inline const std::string kSpellingsKey = std::string("\0spellings", 10);

/// "/parts/3/place/x": a JSON pointer (RFC 6901) to the value at `path`.
std::string jsonPointer(const JsonPath& path);

/// A key as one step of a JSON pointer: '~' written "~0" and '/' written "~1".
std::string pointerToken(std::string_view key);

/// Number spellings of one document that differ from how the numbers would be written again,
/// by the JSON pointer of the number.
class NumberSpellings {
public:
    /// Records `text` as the spelling of the number at `pointer`.
    void record(const std::string& pointer, std::string_view text);
    /// The spellings of numbers inside the value at `pointer`, by pointer relative to it; an
    /// empty object when there are none.
    nlohmann::json inside(const std::string& pointer) const;
    bool empty() const { return byPointer_.empty(); }

private:
    std::map<std::string, std::string> byPointer_;
};

/// Finds the text of each number token of a JSON text in order, skipping strings: the n-th call
/// gives the n-th number, which is the n-th number a parser reports.
class NumberTokens {
public:
    explicit NumberTokens(std::string_view text) : text_(text) {}
    std::string_view next();

private:
    std::string_view text_;
    std::size_t at_ = 0;
};

/// Document text with 2-space indent and a final newline (invalid UTF-8 replaced rather than
/// thrown). The members of `extra` objects carrying kSpellingsKey are written with their
/// original number spellings where the values are unchanged; the reserved key is not written.
std::string writeJsonText(const nlohmann::ordered_json& document);

}  // namespace netcheck
