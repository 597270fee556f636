// Deck lines by the ngspice rules (ngspice manual, ch. 2): the first line is the title, `*` lines
// are comments, `+` continues the line before, `$` after a blank, `//` and `;` end a line.
#include "netcheck/spice/detail/spice_deck.hpp"

#include <algorithm>
#include <cctype>

namespace netcheck::spice {

namespace {

constexpr std::size_t kNone = static_cast<std::size_t>(-1);

bool isBlank(char c) {
    return c == ' ' || c == '\t' || c == '\f' || c == '\v';
}

std::string_view trimLeft(std::string_view s) {
    while (!s.empty() && isBlank(s.front())) s.remove_prefix(1);
    return s;
}

std::string_view trim(std::string_view s) {
    s = trimLeft(s);
    while (!s.empty() && (isBlank(s.back()) || s.back() == '\r')) s.remove_suffix(1);
    return s;
}

/// The body without its end-of-line comment. ngspice takes `$` as a comment only after a blank
/// (`2k$ x` is a value followed by junk, `2k $x` a value and a comment).
std::string_view stripInlineComment(std::string_view body) {
    for (std::size_t i = 0; i < body.size(); ++i) {
        const char c = body[i];
        if (c == ';') return body.substr(0, i);
        if (c == '/' && i + 1 < body.size() && body[i + 1] == '/') return body.substr(0, i);
        if (c == '$' && (i == 0 || isBlank(body[i - 1]))) return body.substr(0, i);
    }
    return body;
}

std::vector<std::string_view> physicalLines(std::string_view text) {
    std::vector<std::string_view> lines;
    std::size_t start = 0;
    while (start <= text.size()) {
        std::size_t end = text.find('\n', start);
        if (end == std::string_view::npos) end = text.size();
        std::string_view line = text.substr(start, end - start);
        if (!line.empty() && line.back() == '\r') line.remove_suffix(1);
        lines.push_back(line);
        start = end + 1;
    }
    return lines;
}

DeckLine annotationLine(std::string_view afterAt, int lineNumber) {
    DeckLine out;
    out.type = DeckLine::Type::Annotation;
    out.line = lineNumber;
    std::size_t wordEnd = 0;
    while (wordEnd < afterAt.size() && !isBlank(afterAt[wordEnd])) ++wordEnd;
    out.fields.push_back(Field{lower(afterAt.substr(0, wordEnd)), false});
    out.rest = std::string(trim(afterAt.substr(wordEnd)));
    for (Field& f : splitFields(out.rest)) out.fields.push_back(std::move(f));
    return out;
}

}  // namespace

std::string lower(std::string_view text) {
    std::string out(text);
    std::transform(out.begin(), out.end(), out.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return out;
}

std::string upper(std::string_view text) {
    std::string out(text);
    std::transform(out.begin(), out.end(), out.begin(),
                   [](unsigned char c) { return static_cast<char>(std::toupper(c)); });
    return out;
}

std::vector<Field> splitFields(std::string_view body) {
    std::vector<Field> fields;
    std::size_t i = 0;
    auto isSeparator = [](char c) {
        return isBlank(c) || c == ',' || c == '=' || c == '(' || c == ')' || c == '\r';
    };
    while (i < body.size()) {
        if (body[i] == '=') {
            if (!fields.empty()) fields.back().key = true;
            ++i;
            continue;
        }
        if (isSeparator(body[i])) {
            ++i;
            continue;
        }
        std::size_t end = i;
        // Braced expressions ({r1*2}) are one field even with separators inside.
        if (body[i] == '{') {
            end = body.find('}', i);
            end = end == std::string_view::npos ? body.size() : end + 1;
        } else {
            while (end < body.size() && !isSeparator(body[end])) ++end;
        }
        fields.push_back(Field{std::string(body.substr(i, end - i)), false});
        i = end;
    }
    return fields;
}

Deck readDeck(std::string_view text) {
    Deck deck;
    const std::vector<std::string_view> lines = physicalLines(text);
    deck.title = std::string(trim(lines.front()));
    bool inControl = false;
    std::size_t continuable = kNone;  // index of the last non-comment line, which `+` extends
    for (std::size_t i = 1; i < lines.size(); ++i) {
        const int number = static_cast<int>(i) + 1;
        const std::string_view body = trimLeft(lines[i]);
        if (inControl) {
            if (lower(trim(stripInlineComment(body))).starts_with(".endc")) inControl = false;
            continue;
        }
        if (body.empty()) continue;
        if (body.front() == '*') {
            // Annotations are comments to ngspice: `+` after one continues the line before it.
            if (body.starts_with("*@"))
                deck.lines.push_back(annotationLine(body.substr(2), number));
            continue;
        }
        std::vector<Field> fields = splitFields(stripInlineComment(body));
        if (body.front() == '+') {
            fields = splitFields(stripInlineComment(body.substr(1)));
            if (continuable == kNone) {
                throw DeckError{number, "continuation line (+) with no line before it to continue"};
            }
            for (Field& f : fields) deck.lines[continuable].fields.push_back(std::move(f));
            continue;
        }
        if (fields.empty()) continue;
        DeckLine out;
        out.line = number;
        out.fields = std::move(fields);
        const std::string word = lower(out.fields.front().text);
        if (word.front() == '.') {
            out.type = DeckLine::Type::Command;
            if (word == ".end") break;
            if (word == ".control") {
                inControl = true;
                deck.notes.emplace_back(number, ".control block ignored (simulator commands)");
                continuable = kNone;
                continue;
            }
        }
        deck.lines.push_back(std::move(out));
        continuable = deck.lines.size() - 1;
    }
    return deck;
}

}  // namespace netcheck::spice
