// Rules on refs, kinds and values.
#include "netcheck/model/name_rules.hpp"

#include <cstdio>

#include "netcheck/model/utf8.hpp"

namespace netcheck {

namespace {

// Characters that look like nothing or like a space: a ref holding one reads the same as a ref
// without it, or as two words.
bool isBlank(char32_t c) {
    switch (c) {
        case U' ':
        case U'\t':
        case U'\n':
        case U'\v':
        case U'\f':
        case U'\r':
        case 0x00a0:  // no-break space
        case 0x1680:  // ogham space mark
        case 0x180e:  // Mongolian vowel separator
        case 0x2028:  // line separator
        case 0x2029:  // paragraph separator
        case 0x202f:  // narrow no-break space
        case 0x205f:  // medium mathematical space
        case 0x2060:  // word joiner
        case 0x3000:  // ideographic space
        case 0xfeff:  // zero-width no-break space
            return true;
        default:
            return c >= 0x2000 && c <= 0x200d;  // en quad .. zero-width joiner
    }
}

std::string codePointName(char32_t c) {
    char text[16];
    std::snprintf(text, sizeof text, "U+%04X", static_cast<unsigned>(c));
    return text;
}

// The first control character; tabs and line breaks count only when `blanksToo`.
std::optional<std::string> firstControl(std::string_view text, bool blanksToo) {
    for (std::size_t at = 0; at < text.size();) {
        const CodePoint c = codePointAt(text, at);
        if (c.wellFormed && isControl(c.value) && (blanksToo || !isBlank(c.value))) {
            return "holds a control character (" + codePointName(c.value) + ")";
        }
        at += c.length;
    }
    return std::nullopt;
}

}  // namespace

std::optional<std::string> refProblem(std::string_view ref) {
    if (ref.empty()) return "is empty";
    // A tab in a ref is a blank to the maker; an escape sequence is reported as what it is.
    if (auto control = firstControl(ref, false)) return control;
    for (std::size_t at = 0; at < ref.size();) {
        const CodePoint c = codePointAt(ref, at);
        if (c.wellFormed && isBlank(c.value)) {
            return c.value < 0x80
                       ? std::string("may not contain blanks")
                       : "may not contain blanks (" + codePointName(c.value) + " is a blank too)";
        }
        at += c.length;
    }
    return std::nullopt;
}

std::optional<std::string> textProblem(std::string_view text) {
    return firstControl(text, true);
}

std::string refIdentity(std::string_view ref) {
    std::string identity(ref);
    for (char& c : identity) {
        if (c >= 'a' && c <= 'z') c = static_cast<char>(c - 'a' + 'A');
    }
    return identity;
}

}  // namespace netcheck
