// Keeping the spelling of numbers in unknown keys, and writing document text with it.
#include "netcheck/file/detail/number_spellings.hpp"

namespace netcheck {

namespace {

using OrderedJson = nlohmann::ordered_json;

std::string scalarText(const OrderedJson& value) {
    return value.dump(-1, ' ', false, nlohmann::json::error_handler_t::replace);
}

/// Writes a value with 2-space indent, exactly as nlohmann's dump(2) does, except for numbers
/// whose original spelling is known.
class TextWriter {
public:
    std::string text;

    // `spellings` maps pointers relative to the member being written (`pointer` is where this
    // value is inside it) to original spellings; null when there are none.
    void value(const OrderedJson& json, int depth, const OrderedJson* spellings,
               const std::string& pointer) {
        if (json.is_object()) {
            object(json, depth, spellings, pointer);
        } else if (json.is_array()) {
            array(json, depth, spellings, pointer);
        } else if (json.is_number() && spellings) {
            text += spelled(json, *spellings, pointer);
        } else {
            text += scalarText(json);
        }
    }

private:
    static std::string spelled(const OrderedJson& number, const OrderedJson& spellings,
                               const std::string& pointer) {
        const auto it = spellings.find(pointer);
        if (it == spellings.end() || !it->is_string()) return scalarText(number);
        // Only while the value is still the one read: an edited number is written afresh.
        const std::string& original = it->get_ref<const std::string&>();
        const OrderedJson read = OrderedJson::parse(original, nullptr, false);
        return read.is_number() && read == number ? original : scalarText(number);
    }

    void newline(int depth) {
        text += '\n';
        text.append(static_cast<std::size_t>(depth) * 2, ' ');
    }

    void object(const OrderedJson& json, int depth, const OrderedJson* spellings,
                const std::string& pointer) {
        const auto own = json.find(kSpellingsKey);
        const OrderedJson* ownSpellings = own != json.end() && own->is_object() ? &*own : nullptr;
        bool first = true;
        for (const auto& [key, member] : json.items()) {
            if (key == kSpellingsKey) continue;
            text += first ? "{" : ",";
            first = false;
            newline(depth + 1);
            text += scalarText(OrderedJson(key)) + ": ";
            if (ownSpellings) {
                const auto it = ownSpellings->find(key);
                value(member, depth + 1, it != ownSpellings->end() ? &*it : nullptr, "");
            } else {
                value(member, depth + 1, spellings,
                      spellings ? pointer + "/" + pointerToken(key) : std::string());
            }
        }
        if (first) {
            text += "{}";
            return;
        }
        newline(depth);
        text += '}';
    }

    void array(const OrderedJson& json, int depth, const OrderedJson* spellings,
               const std::string& pointer) {
        if (json.empty()) {
            text += "[]";
            return;
        }
        text += '[';
        for (std::size_t i = 0; i < json.size(); ++i) {
            if (i > 0) text += ',';
            newline(depth + 1);
            value(json[i], depth + 1, spellings,
                  spellings ? pointer + "/" + std::to_string(i) : std::string());
        }
        newline(depth);
        text += ']';
    }
};

}  // namespace

std::string pointerToken(std::string_view key) {
    std::string token;
    for (char c : key) {
        if (c == '~') {
            token += "~0";
        } else if (c == '/') {
            token += "~1";
        } else {
            token += c;
        }
    }
    return token;
}

std::string jsonPointer(const JsonPath& path) {
    std::string pointer;
    for (const PathStep& step : path) {
        pointer += '/';
        pointer += step.isIndex ? std::to_string(step.index) : pointerToken(step.key);
    }
    return pointer;
}

void NumberSpellings::record(const std::string& pointer, std::string_view text) {
    byPointer_.emplace(pointer, std::string(text));
}

nlohmann::json NumberSpellings::inside(const std::string& pointer) const {
    nlohmann::json found = nlohmann::json::object();
    for (auto it = byPointer_.lower_bound(pointer); it != byPointer_.end(); ++it) {
        const std::string& where = it->first;
        if (where.compare(0, pointer.size(), pointer) != 0) break;
        // "/a/b" is inside "/a" but "/ab" is not.
        if (where.size() > pointer.size() && where[pointer.size()] != '/') continue;
        found[where.substr(pointer.size())] = it->second;
    }
    return found;
}

std::string_view NumberTokens::next() {
    while (at_ < text_.size()) {
        const char c = text_[at_];
        if (c == '"') {
            for (++at_; at_ < text_.size() && text_[at_] != '"'; ++at_) {
                if (text_[at_] == '\\') ++at_;
            }
            ++at_;
        } else if (c == '-' || (c >= '0' && c <= '9')) {
            std::size_t end = text_.find_first_not_of("0123456789+-.eE", at_);
            if (end == std::string_view::npos) end = text_.size();
            const std::string_view token = text_.substr(at_, end - at_);
            at_ = end;
            return token;
        } else {
            ++at_;
        }
    }
    return {};
}

std::string writeJsonText(const nlohmann::ordered_json& document) {
    TextWriter writer;
    writer.value(document, 0, nullptr, "");
    writer.text += '\n';
    return writer.text;
}

}  // namespace netcheck
