// Escaping control characters for printing.
#include "netcheck/model/printable.hpp"

#include <cstdio>

#include "netcheck/model/utf8.hpp"

namespace netcheck {

namespace {

std::string hexEscape(const char* format, unsigned value) {
    char text[8];
    std::snprintf(text, sizeof text, format, value);
    return text;
}

}  // namespace

std::string escapeControls(std::string_view text) {
    std::string out;
    out.reserve(text.size());
    for (std::size_t at = 0; at < text.size();) {
        const CodePoint c = codePointAt(text, at);
        if (!c.wellFormed || (c.value < 0x80 && isControl(c.value))) {
            out += hexEscape("\\x%02x", static_cast<unsigned char>(text[at]));
        } else if (isControl(c.value)) {
            out += hexEscape("\\u%04x", static_cast<unsigned>(c.value));
        } else {
            out.append(text, at, c.length);
        }
        at += c.length;
    }
    return out;
}

std::string escapeControlsKeepingLines(std::string_view text) {
    std::string out;
    out.reserve(text.size());
    for (std::size_t start = 0; start < text.size();) {
        std::size_t end = text.find('\n', start);
        if (end == std::string_view::npos) end = text.size();
        out += escapeControls(text.substr(start, end - start));
        if (end < text.size()) out += '\n';
        start = end + 1;
    }
    return out;
}

}  // namespace netcheck
