// A tiny JSON scanner: just enough to walk a valid text to the value at a path.
#include "netcheck/file/detail/json_locator.hpp"

#include <set>

#include <nlohmann/json.hpp>

namespace netcheck {

namespace {

bool isPlainKey(std::string_view key) {
    if (key.empty()) return false;
    for (char c : key) {
        const bool plain = (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') ||
                           (c >= '0' && c <= '9') || c == '_' || c == '-' || c == '+';
        if (!plain) return false;
    }
    return true;
}

bool isContinuationByte(char c) {
    return (static_cast<unsigned char>(c) & 0xC0) == 0x80;
}

std::string decodeKey(std::string_view raw) {
    if (raw.find('\\') == std::string_view::npos) return std::string(raw);
    try {
        return nlohmann::json::parse("\"" + std::string(raw) + "\"").get<std::string>();
    } catch (const nlohmann::json::exception&) {
        return std::string(raw);
    }
}

// End of the string token starting at `start` (the opening quote); returns one past the closing
// quote.
std::size_t stringEnd(std::string_view text, std::size_t start) {
    std::size_t pos = start + 1;
    while (pos < text.size() && text[pos] != '"') pos += text[pos] == '\\' ? 2 : 1;
    return std::min(pos + 1, text.size());
}

/// Walks one JSON value at a time. The text is known to parse, so errors only stop the walk.
class Scanner {
public:
    explicit Scanner(std::string_view text) : text_(text) {
        if (text_.substr(0, 3) == "\xEF\xBB\xBF") pos_ = 3;  // nlohmann skips a UTF-8 BOM too
    }

    std::optional<std::size_t> find(const JsonPath& path) {
        skipSpace();
        for (const PathStep& step : path) {
            if (!(step.isIndex ? enterIndex(step.index) : enterKey(step.key))) return std::nullopt;
        }
        return pos_;
    }

private:
    char peek() const { return pos_ < text_.size() ? text_[pos_] : '\0'; }

    void skipSpace() {
        while (pos_ < text_.size() &&
               (peek() == ' ' || peek() == '\t' || peek() == '\n' || peek() == '\r')) {
            ++pos_;
        }
    }

    // Returns the raw text of a string token (without quotes) and moves past it.
    std::string_view skipString() {
        const std::size_t start = pos_;
        pos_ = stringEnd(text_, start);
        return text_.substr(start + 1, pos_ - start - 2);
    }

    // Skips any value; containers are skipped by counting brackets, not by recursion.
    void skipValue() {
        if (peek() == '"') {
            skipString();
        } else if (peek() == '{' || peek() == '[') {
            int depth = 0;
            do {
                const char c = peek();
                if (c == '"') {
                    skipString();
                    continue;
                }
                if (c == '{' || c == '[') ++depth;
                if (c == '}' || c == ']') --depth;
                ++pos_;
            } while (depth > 0 && pos_ < text_.size());
        } else {
            while (pos_ < text_.size() && peek() != ',' && peek() != '}' && peek() != ']' &&
                   peek() != ' ' && peek() != '\n' && peek() != '\r' && peek() != '\t') {
                ++pos_;
            }
        }
        skipSpace();
    }

    bool enterKey(const std::string& key) {
        if (peek() != '{') return false;
        ++pos_;
        skipSpace();
        while (peek() == '"') {
            const std::string name = decodeKey(skipString());
            skipSpace();
            if (peek() != ':') return false;
            ++pos_;
            skipSpace();
            if (name == key) return true;
            skipValue();
            if (peek() == ',') ++pos_;
            skipSpace();
        }
        return false;
    }

    bool enterIndex(std::size_t index) {
        if (peek() != '[') return false;
        ++pos_;
        skipSpace();
        for (std::size_t i = 0; peek() != ']' && pos_ < text_.size(); ++i) {
            if (i == index) return true;
            skipValue();
            if (peek() == ',') ++pos_;
            skipSpace();
        }
        return false;
    }

    std::string_view text_;
    std::size_t pos_ = 0;
};

}  // namespace

std::string pathText(const JsonPath& path) {
    std::string text;
    for (const PathStep& step : path) {
        if (step.isIndex) {
            text += "[" + std::to_string(step.index) + "]";
        } else if (isPlainKey(step.key)) {
            if (!text.empty()) text += ".";
            text += step.key;
        } else {
            text += "[" +
                    nlohmann::json(step.key).dump(-1, ' ', false,
                                                  nlohmann::json::error_handler_t::replace) +
                    "]";
        }
    }
    return text;
}

TextPosition positionAt(std::string_view text, std::size_t offset) {
    TextPosition at;
    offset = std::min(offset, text.size());
    // A byte order mark is not a character a maker can see in an editor.
    const std::size_t first =
        text.substr(0, 3) == "\xEF\xBB\xBF" ? std::min<std::size_t>(3, offset) : 0;
    for (std::size_t i = first; i < offset; ++i) {
        if (text[i] == '\n') {
            ++at.line;
            at.column = 1;
        } else if (!isContinuationByte(text[i])) {
            ++at.column;
        }
    }
    return at;
}

std::optional<std::size_t> findValue(std::string_view text, const JsonPath& path) {
    return Scanner(text).find(path);
}

std::optional<DuplicateKey> findDuplicateKey(std::string_view text) {
    struct Frame {
        bool isArray = false;
        bool expectKey = false;
        std::size_t index = 0;
        std::string key;
        std::set<std::string> keys;
    };
    std::vector<Frame> frames;
    for (std::size_t pos = 0; pos < text.size();) {
        const char c = text[pos];
        if (c == '{' || c == '[') {
            frames.push_back(Frame{c == '[', c == '{', 0, {}, {}});
        } else if ((c == '}' || c == ']') && !frames.empty()) {
            frames.pop_back();
        } else if (c == ',' && !frames.empty()) {
            frames.back().index += 1;
            frames.back().expectKey = !frames.back().isArray;
        } else if (c == '"') {
            const std::size_t end = stringEnd(text, pos);
            if (!frames.empty() && frames.back().expectKey) {
                Frame& object = frames.back();
                object.expectKey = false;
                object.key = decodeKey(text.substr(pos + 1, end - pos - 2));
                if (!object.keys.insert(object.key).second) {
                    DuplicateKey duplicate{{}, pos};
                    for (const Frame& frame : frames) {
                        duplicate.path.push_back(PathStep{frame.key, frame.index, frame.isArray});
                    }
                    return duplicate;
                }
            }
            pos = end;
            continue;
        }
        ++pos;
    }
    return std::nullopt;
}

std::optional<std::size_t> findTooDeep(std::string_view text, int maxDepth) {
    int depth = 0;
    bool inString = false;
    for (std::size_t i = 0; i < text.size(); ++i) {
        const char c = text[i];
        if (inString) {
            if (c == '\\') {
                ++i;
            } else if (c == '"') {
                inString = false;
            }
        } else if (c == '"') {
            inString = true;
        } else if (c == '{' || c == '[') {
            if (++depth > maxDepth) return i;
        } else if (c == '}' || c == ']') {
            --depth;
        }
    }
    return std::nullopt;
}

std::optional<std::size_t> findValueBeyond(std::string_view text, std::size_t maxValues) {
    std::vector<char> open;   // '{' or '[' of each container around the scan
    bool expectValue = true;  // the next token starts a value (not a key, not a separator)
    std::size_t count = 0;
    for (std::size_t i = 0; i < text.size(); ++i) {
        const char c = text[i];
        if (c == ' ' || c == '\t' || c == '\n' || c == '\r') continue;
        if (expectValue) {
            expectValue = false;
            // ']' right after '[' closes an empty array: no value there.
            if (c != ']' && ++count > maxValues) return i;
        }
        if (c == '"') {
            for (++i; i < text.size() && text[i] != '"'; ++i) {
                if (text[i] == '\\') ++i;
            }
        } else if (c == '{' || c == '[') {
            open.push_back(c);
            expectValue = c == '[';
        } else if (c == '}' || c == ']') {
            if (!open.empty()) open.pop_back();
        } else if (c == ':') {
            expectValue = true;
        } else if (c == ',') {
            expectValue = !open.empty() && open.back() == '[';
        }
    }
    return std::nullopt;
}

}  // namespace netcheck
