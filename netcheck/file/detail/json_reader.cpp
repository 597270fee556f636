// Parsing with limits and walking documents with located errors.
#include "netcheck/file/detail/json_reader.hpp"

#include <algorithm>
#include <cctype>
#include <cmath>
#include <cstdlib>
#include <string>

#include "netcheck/file/detail/number_spellings.hpp"
#include "netcheck/model/name_rules.hpp"

namespace netcheck {

namespace {

// Offset of the first number outside strings that a double cannot hold.
std::optional<std::size_t> findHugeNumber(std::string_view text) {
    for (std::size_t i = 0; i < text.size(); ++i) {
        if (text[i] == '"') {
            for (++i; i < text.size() && text[i] != '"'; ++i) {
                if (text[i] == '\\') ++i;
            }
        } else if (text[i] == '-' || std::isdigit(static_cast<unsigned char>(text[i]))) {
            const std::size_t end = text.find_first_not_of("0123456789+-.eE", i);
            const std::string number(text.substr(i, end == std::string_view::npos ? end : end - i));
            if (!std::isfinite(std::strtod(number.c_str(), nullptr))) return i;
            i += number.size() - 1;
        }
    }
    return std::nullopt;
}

FileError errorAt(std::string_view text, std::string_view fileName, std::size_t offset,
                  std::string message) {
    const TextPosition at = positionAt(text, offset);
    FileError error;
    error.file = std::string(fileName);
    error.line = at.line;
    error.column = at.column;
    error.message = std::move(message);
    return error;
}

bool isBlank(std::string_view text) {
    return std::all_of(text.begin(), text.end(),
                       [](char c) { return c == ' ' || c == '\t' || c == '\n' || c == '\r'; });
}

// nlohmann's message reads "[json.exception.parse_error.101] parse error at line 3, column 5:
// syntax error while parsing value - invalid literal; last read: '24 }<U+000A>x'; expected end of
// input". We report our own position and the text around it is in the file, so keep only the
// reason: "JSON syntax error while parsing value: invalid literal; expected end of input".
std::string syntaxMessage(const nlohmann::json::parse_error& e) {
    std::string what = e.what();
    const std::size_t column = what.find("column ");
    const std::size_t colon = what.find(": ", column == std::string::npos ? 0 : column);
    if (colon != std::string::npos) what.erase(0, colon + 2);
    const std::string lastRead = "; last read: '";
    if (const std::size_t from = what.find(lastRead); from != std::string::npos) {
        const std::size_t to = what.find("'; ", from + lastRead.size());
        what.erase(from, to == std::string::npos ? std::string::npos : to + 1 - from);
    }
    if (const std::size_t dash = what.find(" - "); dash != std::string::npos) {
        what.replace(dash, 3, ": ");
    }
    return "JSON " + what;
}

// Builds the document like nlohmann's own DOM parser, but appends object members instead of
// looking each key up first: ordered objects search linearly, which made large objects (a
// circuit with thousands of parts) quadratic. Duplicate keys are found by a separate scan.
//
// It also notes the spelling of every number that would be written back differently (see
// number_spellings.hpp), by the number's JSON pointer.
class AppendingBuilder {
public:
    AppendingBuilder(Json& root, std::string_view text, NumberSpellings& spellings)
        : root_(root), numbers_(text), spellings_(spellings) {}

    bool null() { return add(nullptr); }
    bool boolean(bool value) { return add(value); }
    bool number_integer(Json::number_integer_t value) { return number(Json(value)); }
    bool number_unsigned(Json::number_unsigned_t value) { return number(Json(value)); }
    bool number_float(Json::number_float_t value, const std::string&) {
        return number(Json(value));
    }
    bool string(std::string& value) { return add(std::move(value)); }
    bool binary(Json::binary_t& value) { return add(Json::binary(std::move(value))); }
    bool key(std::string& name) {
        key_ = std::move(name);
        return true;
    }
    bool start_object(std::size_t) { return open(Json::object()); }
    bool start_array(std::size_t) { return open(Json::array()); }
    bool end_object() { return close(); }
    bool end_array() { return close(); }
    bool parse_error(std::size_t, const std::string&, const nlohmann::detail::exception& e) {
        if (const auto* syntax = dynamic_cast<const Json::parse_error*>(&e)) throw *syntax;
        // A number beyond a double (406) arrives here too; readJson turns it into its own message.
        if (const auto* range = dynamic_cast<const Json::out_of_range*>(&e)) throw *range;
        throw Json::parse_error::create(101, 0, e.what(), nullptr);
    }

private:
    // Containers on the stack stay put: their parent gets no new member while they are open.
    template <class Value>
    bool add(Value&& value) {
        place(Json(std::forward<Value>(value)));
        return true;
    }
    bool number(Json value) {
        // nlohmann gives no text for integers, and "-0" arrives as 0: the token is found anew.
        const std::string_view spelling = numbers_.next();
        if (value.dump() != spelling) spellings_.record(nextPointer(), spelling);
        return add(std::move(value));
    }
    bool open(Json container) {
        pointers_.push_back(nextPointer());
        open_.push_back(place(std::move(container)));
        return true;
    }
    bool close() {
        open_.pop_back();
        pointers_.pop_back();
        return true;
    }
    // The JSON pointer of the value about to be placed.
    std::string nextPointer() const {
        if (open_.empty()) return "";
        const Json& parent = *open_.back();
        return pointers_.back() + "/" +
               (parent.is_array() ? std::to_string(parent.size()) : pointerToken(key_));
    }
    Json* place(Json value) {
        if (open_.empty()) {
            root_ = std::move(value);
            return &root_;
        }
        Json& parent = *open_.back();
        if (parent.is_array()) {
            auto& items = parent.get_ref<Json::array_t&>();
            items.push_back(std::move(value));
            return &items.back();
        }
        auto& members = parent.get_ref<Json::object_t&>();
        members.emplace_back(std::move(key_), std::move(value));  // the vector's, not a lookup
        return &members.back().second;
    }

    Json& root_;
    std::vector<Json*> open_;
    std::vector<std::string> pointers_;  // JSON pointer of each open container
    std::string key_;
    NumberTokens numbers_;
    NumberSpellings& spellings_;
};

std::string typeName(const Json& value) {
    if (value.is_number()) return "a number";
    if (value.is_string()) return "a string";
    if (value.is_boolean()) return "true/false";
    if (value.is_null()) return "null";
    if (value.is_array()) return "an array";
    return "an object";
}

}  // namespace

std::string inQuotes(std::string_view text) {
    return nlohmann::json(std::string(text))
        .dump(-1, ' ', false, nlohmann::json::error_handler_t::replace);
}

ReadResult<Json> parseJsonText(std::string_view text, std::string_view fileName,
                               const ReadLimits& limits, NumberSpellings& spellings) {
    ReadResult<Json> result;
    if (text.size() > limits.maxBytes) {
        result.error =
            errorAt(text, fileName, 0,
                    "the file is " + std::to_string(text.size()) +
                        " bytes, more than the limit of " + std::to_string(limits.maxBytes));
        result.error->line = 0;
        result.error->column = 0;
        return result;
    }
    if (isBlank(text)) {
        result.error = errorAt(text, fileName, 0, "the file is empty");
        return result;
    }
    // Checked before parsing: nlohmann's parser recurses and a hostile file could exhaust the
    // stack.
    if (auto deep = findTooDeep(text, limits.maxDepth)) {
        result.error =
            errorAt(text, fileName, *deep,
                    "nesting is deeper than " + std::to_string(limits.maxDepth) + " levels");
        return result;
    }
    // Counted before parsing too: the memory a document takes grows with its values, not its
    // bytes.
    if (auto beyond = findValueBeyond(text, limits.maxValues)) {
        result.error = errorAt(text, fileName, *beyond,
                               "more than " + std::to_string(limits.maxValues) +
                                   " JSON values, the limit (each object, array, string, number, "
                                   "true, false and null is one)");
        return result;
    }
    try {
        Json document;
        AppendingBuilder builder(document, text, spellings);
        Json::sax_parse(text.begin(), text.end(), &builder);
        if (!document.is_object()) {
            result.error = errorAt(text, fileName, findValue(text, {}).value_or(0),
                                   "the file holds " + typeName(document) + ", not a JSON object");
            return result;
        }
        // Checked after parsing, on text known to be valid: nlohmann keeps one of the values.
        if (auto duplicate = findDuplicateKey(text)) {
            result.error = errorAt(
                text, fileName, duplicate->offset,
                "key " + inQuotes(duplicate->path.back().key) + " appears twice in one object");
            result.error->path = pathText(duplicate->path);
            return result;
        }
        result.value = std::move(document);
    } catch (const nlohmann::json::parse_error& e) {
        // e.byte counts from 1 and points at the character where reading stopped.
        result.error = errorAt(text, fileName, e.byte > 0 ? e.byte - 1 : 0, syntaxMessage(e));
    } catch (const nlohmann::json::out_of_range&) {
        // A number beyond the range of a double, such as 1e400 (found by fuzzing).
        result.error = errorAt(text, fileName, findHugeNumber(text).value_or(0),
                               "a number is too large (beyond 1.8e308)");
    }
    return result;
}

FileError locateError(std::string_view text, std::string_view fileName,
                      const InvalidInput& problem) {
    FileError error =
        errorAt(text, fileName, findValue(text, problem.path).value_or(0), problem.message);
    error.path = pathText(problem.path);
    error.newerVersion = problem.newerVersion;
    return error;
}

JsonReader::Step JsonReader::enter(std::string key) {
    path_.push_back(PathStep{std::move(key), 0, false});
    return Step(path_);
}

JsonReader::Step JsonReader::enter(std::size_t index) {
    path_.push_back(PathStep{{}, index, true});
    return Step(path_);
}

void JsonReader::fail(std::string message) const {
    throw InvalidInput{path_, std::move(message), false};
}

const Json* JsonReader::find(const Json& object, std::string_view key) {
    const auto it = object.find(key);
    return it == object.end() ? nullptr : &*it;
}

const Json& JsonReader::require(const Json& object, std::string_view key) const {
    const Json* member = find(object, key);
    if (!member) fail("missing " + inQuotes(key));
    return *member;
}

void JsonReader::expectObject(const Json& value) const {
    if (!value.is_object()) fail("must be an object {...}, not " + typeName(value));
}

void JsonReader::expectArray(const Json& value) const {
    if (!value.is_array()) fail("must be an array [...], not " + typeName(value));
}

std::string JsonReader::asString(const Json& value) const {
    if (!value.is_string()) fail("must be a string, not " + typeName(value));
    return value.get<std::string>();
}

std::string JsonReader::stringMember(const Json& object, std::string_view key, bool required) {
    const Json* member = required ? &require(object, key) : find(object, key);
    if (!member) return {};
    const auto step = enter(std::string(key));
    return asString(*member);
}

long long JsonReader::asInteger(const Json& value) const {
    if (value.is_number_float()) fail("must be a whole number, not " + value.dump());
    if (!value.is_number_integer()) fail("must be a whole number, not " + typeName(value));
    if (value.is_number_unsigned() &&
        value.get<unsigned long long>() > static_cast<unsigned long long>(1) << 62) {
        fail("the number is too large");
    }
    return value.get<long long>();
}

std::vector<std::string> JsonReader::asStringArray(const Json& value) {
    expectArray(value);
    std::vector<std::string> strings;
    strings.reserve(value.size());
    for (std::size_t i = 0; i < value.size(); ++i) {
        const auto step = enter(i);
        strings.push_back(asString(value[i]));
    }
    return strings;
}

void JsonReader::expectRef(std::string_view ref) const {
    // A '.' is allowed: "X1.R1.2" still splits at the last '.' (flattened subcircuit parts).
    if (const auto problem = refProblem(ref)) {
        fail(ref.empty() ? "ref " + *problem : "ref " + inQuotes(ref) + " " + *problem);
    }
}

void JsonReader::expectPinName(std::string_view name, std::string_view what) const {
    if (name.empty()) fail(std::string(what) + " is empty");
    const std::string named = std::string(what) + " " + inQuotes(name);
    if (name.find('.') != std::string_view::npos) fail(named + " may not contain blanks or '.'");
    if (const auto problem = refProblem(name)) fail(named + " " + *problem);
}

std::string JsonReader::textMember(const Json& object, std::string_view key, bool required) {
    const Json* member = required ? &require(object, key) : find(object, key);
    if (!member) return {};
    const auto step = enter(std::string(key));
    std::string text = asString(*member);
    if (const auto problem = textProblem(text)) {
        fail(std::string(key) + " " + inQuotes(text) + " " + *problem);
    }
    return text;
}

nlohmann::json JsonReader::extras(const Json& object,
                                  std::initializer_list<std::string_view> known) {
    nlohmann::json kept = nlohmann::json::object();
    nlohmann::json spellings = nlohmann::json::object();
    for (const auto& [key, value] : object.items()) {
        if (std::find(known.begin(), known.end(), key) != known.end()) continue;
        const auto step = enter(key);
        if (key == kSpellingsKey) fail("this key is reserved");
        kept[key] = nlohmann::json(value);
        if (spellings_.empty()) continue;
        nlohmann::json inside = spellings_.inside(jsonPointer(path_));
        if (!inside.empty()) spellings[key] = std::move(inside);
    }
    if (!spellings.empty()) kept[kSpellingsKey] = std::move(spellings);
    return kept;
}

void appendMember(Json& object, std::string key, Json value) {
    object.get_ref<Json::object_t&>().emplace_back(std::move(key), std::move(value));
}

void appendExtras(Json& out, const nlohmann::json& extra) {
    if (!extra.is_object()) return;
    for (const auto& [key, value] : extra.items()) {
        if (!out.contains(key)) out[key] = Json(value);
    }
}

std::string dumpDocument(const Json& document) {
    return writeJsonText(document);
}

}  // namespace netcheck
